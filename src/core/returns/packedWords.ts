import type { SymbolArray } from '../sequence/sequence';

/** Symbol bits and symbols per 16-bit carried word of an alphabet (perWord 1: not packed). */
export function wordLayout(alphabetSize: number): { bits: number; perWord: number; packed: boolean } {
  const bits = Math.max(1, Math.ceil(Math.log2(alphabetSize)));
  const perWord = bits <= 8 ? Math.floor(16 / bits) : 1;
  return { bits, perWord, packed: perWord > 1 };
}

/**
 * words[p] = the perWord symbols from p on (symbols[p + j] at bits j*bits; past the end: 0), for p
 * in [start, end), by a rolling pass. The word of position p at offset o is then words[p + o], so
 * one array serves every refresh of the carried words in the shared scan (splitScan.ts).
 */
export function fillWords(symbols: SymbolArray, alphabetSize: number, start: number, end: number, words: Uint16Array): void {
  const { bits, perWord } = wordLayout(alphabetSize);
  const N = symbols.length;
  const wordMask = (1 << (bits * perWord)) - 1;
  let w = 0;
  for (let p = Math.min(N, end + perWord - 1) - 1; p >= start; p--) {
    w = ((w << bits) | symbols[p]) & wordMask;
    if (p < end) words[p] = w;
  }
}
