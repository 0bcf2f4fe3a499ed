/**
 * What to do with missing values (empty cells or lines, 'NaN', 'NA'): 'skip' drops them and
 * joins the values on either side (the count is reported); 'split' cuts the series at every run of
 * missing values into segments that are symbolized and analysed apart, so that no pattern or block
 * spans a cut. A missing value never becomes a symbol.
 */
export type MissingPolicy = 'skip' | 'split';

export const MISSING_POLICIES: readonly MissingPolicy[] = ['skip', 'split'];
