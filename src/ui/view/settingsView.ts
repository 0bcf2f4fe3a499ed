/** Bounds of the largest block length offered in the page (the engine is designed for N_max up to about 64). */
export const MAX_N_RANGE = [1, 64] as const;

/** Confidence levels offered for every interval. */
export const CONFIDENCE_CHOICES: readonly { readonly value: number; readonly label: string }[] = [
  { value: 0.9, label: '90%' },
  { value: 0.95, label: '95%' },
  { value: 0.99, label: '99%' },
];

/** A largest block length typed by the user: an integer inside MAX_N_RANGE, or null. */
export function parseMaxN(text: string): number | null {
  const t = text.trim();
  if (!/^\d+$/.test(t)) return null;
  const value = Number(t);
  return value >= MAX_N_RANGE[0] && value <= MAX_N_RANGE[1] ? value : null;
}
