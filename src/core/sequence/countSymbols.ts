import type { SymbolArray } from './sequence';

/** Occurrences of each id 0..alphabetSize-1 in `symbols`. */
export function countSymbols(symbols: SymbolArray, alphabetSize: number): Float64Array {
  const counts = new Float64Array(alphabetSize);
  for (let i = 0; i < symbols.length; i++) counts[symbols[i]]++;
  return counts;
}
