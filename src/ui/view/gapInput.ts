/** Largest gap accepted: far beyond any sampled stretch, small enough to stay an exact integer. */
export const MAX_GAP = 1e9;

/** A typed gap between kept positions: a whole number from 1 to MAX_GAP, or the message to show. */
export function parseGap(text: string): { value: number } | { message: string } {
  const trimmed = text.trim();
  if (trimmed === '') return { message: 'Enter a gap: a whole number of symbols, 1 or more.' };
  if (!/^\d+$/.test(trimmed)) return { message: `The gap must be a whole number of symbols, 1 or more; got “${trimmed}”.` };
  const value = Number(trimmed);
  if (value < 1 || value > MAX_GAP) return { message: `The gap must be from 1 to ${MAX_GAP.toLocaleString('en-US')}; got ${trimmed}.` };
  return { value };
}
