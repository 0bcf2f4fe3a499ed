/** Number formatting for the page; fixed 'en-US' so text (and tests) do not depend on the browser's locale. */
const COUNT = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

/** Decimals used when an estimate has no interval to size them from. */
export const DEFAULT_DECIMALS = 4;
const MAX_DECIMALS = 10;

/** An integer count with thousands separators, e.g. 200,000. */
export function formatCount(value: number): string {
  return COUNT.format(value);
}

/**
 * Decimals that show an interval's half-width to two significant digits, so the estimate is
 * printed no more precisely than it is known (common practice, no source).
 */
export function decimalsForInterval(low: number, high: number): number {
  const half = (high - low) / 2;
  if (!(half > 0) || !Number.isFinite(half)) return DEFAULT_DECIMALS;
  const decimals = 1 - Math.floor(Math.log10(half));
  return Math.min(MAX_DECIMALS, Math.max(0, decimals));
}

/** A value with fixed decimals; '—' for null or non-finite values. */
export function formatFixed(value: number | null, decimals: number): string {
  if (value === null || !Number.isFinite(value)) return '—';
  const text = value.toFixed(decimals);
  // Avoid "-0.000" for values that round to zero.
  return /^-0\.?0*$/.test(text) ? text.slice(1) : text;
}

/** A unit label for people: 'nat^2/symbol' becomes 'nat²/symbol'. */
export function prettyUnit(unit: string): string {
  return unit.replace(/\^2/g, '²');
}

/** A fraction as a percentage with one decimal, e.g. 0.0123 -> '1.2%'. */
export function formatPercent(fraction: number): string {
  return Number.isFinite(fraction) ? `${(fraction * 100).toFixed(1)}%` : '—';
}

/** Bytes in binary units, e.g. 4194304 -> '4.0 MiB'. */
export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  const units = ['KiB', 'MiB', 'GiB', 'TiB'];
  let value = bytes / 1024;
  let k = 0;
  while (value >= 1024 && k < units.length - 1) {
    value /= 1024;
    k++;
  }
  return `${value.toFixed(1)} ${units[k]}`;
}
