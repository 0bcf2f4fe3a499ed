import type { SymbolizationRecord } from '../core';

/** Cut points listed in full up to this many; more are cut short with their count. */
const CUTS_LISTED = 8;

function cutsText(cuts: readonly number[]): string {
  const shown = cuts.slice(0, CUTS_LISTED).map((c) => String(Number(c.toPrecision(6))));
  return cuts.length > CUTS_LISTED ? `${shown.join(', ')}, … (${cuts.length} in all)` : shown.join(', ');
}

/**
 * How a real-valued input became symbols, in one line for captions and reports, e.g.
 * 'quantile:4, cut points 0.12, 0.5, 0.93; 3 missing values skipped'.
 */
export function symbolizationText(s: SymbolizationRecord): string {
  const parts = [s.cutPoints.length > 0 ? `${s.spec}, cut points ${cutsText(s.cutPoints)}` : s.spec];
  if (s.missing === 0) parts.push('no missing values');
  else if (s.missingPolicy === 'skip') parts.push(`${s.missing} missing value${s.missing === 1 ? '' : 's'} skipped`);
  else parts.push(`${s.missing} missing value${s.missing === 1 ? '' : 's'}: series split into ${s.segments} segment${s.segments === 1 ? '' : 's'}, analysed apart`);
  return parts.join('; ');
}

/** The published method behind a symbolization, for a report's methods paragraph. */
export function symbolizationMethod(s: SymbolizationRecord): string {
  if (s.spec.startsWith('ordinal:')) {
    return 'The real-valued input was turned into ordinal patterns (Bandt & Pompe, Phys. Rev. Lett. 88 (2002) 174102): each window of D values (delay TAU) becomes the permutation that sorts it, ties ranked by order of occurrence.';
  }
  if (s.spec.startsWith('quantile:')) {
    return 'The real-valued input was cut into cells of equal empirical mass at its empirical quantiles (c_j = the smallest value x with F_N(x) > j/K; a value equal to a cut point goes to the cell above).';
  }
  return 'The real-valued input was cut into cells at the given thresholds (a value equal to a cut point goes to the cell above).';
}
