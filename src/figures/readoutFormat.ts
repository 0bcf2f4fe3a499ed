/** Read-out numbers: four significant digits, a true minus sign, '—' for missing (common practice, no source). */
export function readoutNumber(value: number | null): string {
  if (value === null || !Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  const text = abs >= 1e5 || abs < 1e-3 ? value.toExponential(3) : value.toPrecision(4);
  return text.replace('-', '−');
}

/** A fraction as a percentage with one decimal; '—' for missing. */
export function readoutPercent(fraction: number | null): string {
  if (fraction === null || !Number.isFinite(fraction)) return '—';
  return `${(fraction * 100).toFixed(1)}%`;
}

/** A user-set parameter as typed, up to four significant digits and without trailing zeros (1.96, 0.25, 1). */
export function parameterText(value: number): string {
  return Number.isFinite(value) ? String(Number(value.toPrecision(4))).replace('-', '−') : '—';
}
