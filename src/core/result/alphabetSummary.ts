import type { Sequence } from '../sequence/sequence';

/** One symbol of the alphabet with its number of occurrences. */
export interface SymbolCount {
  readonly symbol: string;
  readonly count: number;
}

/** Symbols listed in a result at most; a countable alphabet can have millions. */
export const ALPHABET_LISTED = 1000;

/**
 * The alphabet with counts, most frequent first (ties in order of first appearance), at most
 * `limit` symbols; `unlisted` counts the symbols left out.
 */
export function alphabetSummary(sequence: Sequence, limit = ALPHABET_LISTED): { symbols: SymbolCount[]; unlisted: number } {
  const ids = Array.from({ length: sequence.alphabet.length }, (_, k) => k);
  ids.sort((a, b) => sequence.counts[b] - sequence.counts[a] || a - b);
  const shown = ids.slice(0, limit);
  return {
    symbols: shown.map((k) => ({ symbol: sequence.alphabet[k], count: sequence.counts[k] })),
    unlisted: ids.length - shown.length,
  };
}
