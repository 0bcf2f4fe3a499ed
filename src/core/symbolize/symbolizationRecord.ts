/**
 * How a real-valued input became symbols, as kept in a result's input summary (JSON, sessions,
 * reports, figure captions). Plain data.
 */
export interface SymbolizationRecord {
  /** Canonical spec text, e.g. 'quantile:4', 'threshold:0.5,1.2', 'ordinal:3:1'. */
  readonly spec: string;
  /** Cut points in increasing order (quantile, threshold); empty for ordinal patterns. */
  readonly cutPoints: readonly number[];
  /** Every cell (or, for ordinal orders above 5, every pattern seen) with its count, in symbol order. */
  readonly cells: readonly { readonly label: string; readonly count: number }[];
  /** Numbers read (missing values not included). */
  readonly values: number;
  /** Missing values seen, and what was done with them. */
  readonly missing: number;
  readonly missingPolicy: 'skip' | 'split';
  /** Stretches analysed apart (1 under 'skip'), and those too short for one ordinal pattern and left out. */
  readonly segments: number;
  readonly segmentsDropped: number;
}
