/**
 * The cell of every value for increasing cut points c_1 <= ... <= c_m: cell = the number of cut
 * points at or below the value, so v < c_1 is cell 0, c_1 <= v < c_2 is cell 1, ..., v >= c_m is
 * cell m. A value equal to a cut point goes to the cell above it.
 * @returns cell indices 0..m
 */
export function cellsByCuts(values: Float64Array, cuts: Float64Array): Int32Array {
  const cells = new Int32Array(values.length);
  const m = cuts.length;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    // Binary search for the first cut point above v.
    let lo = 0;
    let hi = m;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (cuts[mid] <= v) lo = mid + 1;
      else hi = mid;
    }
    cells[i] = lo;
  }
  return cells;
}
