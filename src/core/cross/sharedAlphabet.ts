import type { Sequence } from '../sequence/sequence';

/** Two sequences recoded over one alphabet, so that a block of A and a block of B compare by ids. */
export interface SharedAlphabet {
  /** Symbol ids of A and of B in the shared alphabet. */
  readonly symbolsA: Int32Array;
  readonly symbolsB: Int32Array;
  /** Labels of the shared ids: A's symbols first (in A's order), then those only B uses. */
  readonly alphabet: readonly string[];
  /** Labels of symbols that occur in A but never in B: every block holding one is censored. */
  readonly missingInB: readonly string[];
  /** Labels of symbols that occur in B but never in A (harmless; reported for the user). */
  readonly missingInA: readonly string[];
}

/**
 * Maps the symbol labels of A and B to one alphabet: two symbols are the same when their labels are
 * equal strings (a 'G' in one file is a 'G' in the other). Symbols with zero count (possible in
 * generated alphabets) are not reported as missing.
 */
export function sharedAlphabet(a: Sequence, b: Sequence): SharedAlphabet {
  const index = new Map<string, number>();
  const alphabet: string[] = [];
  const mapA = new Int32Array(a.alphabet.length);
  for (let k = 0; k < a.alphabet.length; k++) {
    const label = a.alphabet[k];
    let id = index.get(label);
    if (id === undefined) {
      id = alphabet.length;
      index.set(label, id);
      alphabet.push(label);
    }
    mapA[k] = id;
  }
  const mapB = new Int32Array(b.alphabet.length);
  for (let k = 0; k < b.alphabet.length; k++) {
    const label = b.alphabet[k];
    let id = index.get(label);
    if (id === undefined) {
      id = alphabet.length;
      index.set(label, id);
      alphabet.push(label);
    }
    mapB[k] = id;
  }
  const usedA = new Uint8Array(alphabet.length);
  const usedB = new Uint8Array(alphabet.length);
  for (let k = 0; k < a.alphabet.length; k++) if (a.counts[k] > 0) usedA[mapA[k]] = 1;
  for (let k = 0; k < b.alphabet.length; k++) if (b.counts[k] > 0) usedB[mapB[k]] = 1;
  const missingInB: string[] = [];
  const missingInA: string[] = [];
  for (let id = 0; id < alphabet.length; id++) {
    if (usedA[id] && !usedB[id]) missingInB.push(alphabet[id]);
    if (usedB[id] && !usedA[id]) missingInA.push(alphabet[id]);
  }
  const symbolsA = new Int32Array(a.symbols.length);
  for (let i = 0; i < symbolsA.length; i++) symbolsA[i] = mapA[a.symbols[i]];
  const symbolsB = new Int32Array(b.symbols.length);
  for (let j = 0; j < symbolsB.length; j++) symbolsB[j] = mapB[b.symbols[j]];
  return { symbolsA, symbolsB, alphabet, missingInB, missingInA };
}
