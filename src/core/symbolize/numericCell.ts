/** What a cell or line of a numeric series holds. */
export type NumericCellKind = 'number' | 'missing' | 'infinite' | 'not-a-number';

// Decimal numbers only: Number() would also take '0x1f', '1_000' is refused by it anyway, and ''
// would become 0 — a missing value must never turn into a number.
const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
// Missing-value markers, compared case-insensitively: an empty cell, NaN and NA (as R writes them).
const MISSING = new Set(['', 'nan', 'na']);
const INFINITE = /^[+-]?(?:inf|infinity)$/i;

/**
 * Classifies the trimmed text of one cell: a finite decimal number (e.g. '3', '-0.5', '1e-3',
 * '.5'), a missing value ('' or 'NaN' / 'NA' in any case), an infinity ('inf', '-Infinity', or a
 * decimal too large for a double such as '1e400'), or anything else.
 */
export function numericCellKind(text: string): NumericCellKind {
  if (DECIMAL.test(text)) return Number.isFinite(Number(text)) ? 'number' : 'infinite';
  if (MISSING.has(text.toLowerCase())) return 'missing';
  if (INFINITE.test(text)) return 'infinite';
  return 'not-a-number';
}
