/**
 * The K - 1 cut points that split a sample into K cells of equal empirical mass.
 *
 * Definition: c_j = the smallest sample value x with F_N(x) > j/K, where F_N is the empirical
 * distribution function; that is the order statistic x_(floor(jN/K) + 1) (1-based), or sorted[floor(jN/K)]
 * 0-based. It is the right-continuous inverse of F_N, a variant of definition 1 of Hyndman & Fan,
 * The American Statistician 50 (1996) 361-365, which takes F_N(x) >= p. With the cell rule of
 * `cellsByCuts` (a value equal to a cut point goes to the cell above it), exactly floor(jN/K) values
 * lie below c_j when the values are distinct, so every cell holds floor or ceil of N/K values. Tied
 * values can make cut points equal; the cells between them are then empty.
 * @param values the sample (not changed)
 * @param cells K >= 2
 */
export function quantileCuts(values: Float64Array, cells: number): Float64Array {
  if (!(Number.isInteger(cells) && cells >= 2)) throw new RangeError(`cells must be an integer >= 2, got ${cells}`);
  const N = values.length;
  if (N === 0) throw new RangeError('quantileCuts needs at least one value');
  const sorted = Float64Array.from(values).sort();
  const cuts = new Float64Array(cells - 1);
  for (let j = 1; j < cells; j++) cuts[j - 1] = sorted[Math.min(N - 1, Math.floor((j * N) / cells))];
  return cuts;
}
