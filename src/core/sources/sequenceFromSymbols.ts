import type { Sequence, SymbolArray } from '../sequence/sequence';

/** Checks a requested sample length; generators call it before allocating. */
export function checkLength(length: number): void {
  if (!Number.isSafeInteger(length) || length < 0) {
    throw new RangeError(`length must be a non-negative integer, got ${length}`);
  }
}

/** Symbol labels '0', '1', ..., for sources whose symbols are plain indices. */
export function indexLabels(size: number): string[] {
  const labels = new Array<string>(size);
  for (let k = 0; k < size; k++) labels[k] = String(k);
  return labels;
}

// One counting loop per array type: a loop that sees several typed-array kinds runs several times slower.
function count8(symbols: Uint8Array, counts: Float64Array): void {
  const n = symbols.length;
  for (let i = 0; i < n; i++) counts[symbols[i]]++;
}

function count16(symbols: Uint16Array, counts: Float64Array): void {
  const n = symbols.length;
  for (let i = 0; i < n; i++) counts[symbols[i]]++;
}

function count32(symbols: Int32Array, counts: Float64Array): void {
  const n = symbols.length;
  for (let i = 0; i < n; i++) counts[symbols[i]]++;
}

/** Wraps generated ids into a Sequence, counting each symbol once (ids must be < alphabet.length). */
export function sequenceFromSymbols(symbols: SymbolArray, alphabet: readonly string[]): Sequence {
  const counts = new Float64Array(alphabet.length);
  if (symbols instanceof Uint8Array) count8(symbols, counts);
  else if (symbols instanceof Uint16Array) count16(symbols, counts);
  else count32(symbols, counts);
  return { symbols, alphabet, counts };
}
