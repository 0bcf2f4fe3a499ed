/**
 * A symbol sequence as the engine consumes it: symbol ids 0..alphabet.length-1 in the narrowest
 * typed array that holds them (1 byte per symbol up to 256 symbols, 2 up to 65 536, else 4), so
 * 10^8 binary symbols cost 100 MB rather than 400 MB.
 */
export type SymbolArray = Uint8Array | Uint16Array | Int32Array;

export interface Sequence {
  /** Symbol ids in order of observation. */
  readonly symbols: SymbolArray;
  /** Display label of each symbol id (the character, token, base or byte value). */
  readonly alphabet: readonly string[];
  /** Occurrences of each symbol id; counts[k] belongs to alphabet[k]. */
  readonly counts: Float64Array;
}

/** The narrowest symbol array for an alphabet of the given size. */
export function allocateSymbols(length: number, alphabetSize: number): SymbolArray {
  if (alphabetSize <= 0x100) return new Uint8Array(length);
  if (alphabetSize <= 0x10000) return new Uint16Array(length);
  return new Int32Array(length);
}
