/** Smallest p-value printed as a number; below it the text says '< 1e-4' (common practice, no source). */
export const SMALLEST_SHOWN_P = 1e-4;

/** A p-value for reading: '< 1e-4' below that, else up to three significant digits; '—' when missing. */
export function pValueText(p: number | null): string {
  if (p === null || !Number.isFinite(p)) return '—';
  if (p < SMALLEST_SHOWN_P) return '< 1e-4';
  return String(Number(p.toPrecision(3)));
}
