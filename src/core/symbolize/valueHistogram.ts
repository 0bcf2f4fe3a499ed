/** Counts of values in equal-width bins over [min, max]. */
export interface ValueHistogram {
  /** bins + 1 increasing edges; bin k is [edges[k], edges[k+1]), the last bin also holds max. */
  readonly edges: Float64Array;
  readonly counts: Float64Array;
}

/**
 * An equal-width histogram of finite values over their range. One bin when all values are equal
 * (edges value ± 0.5). Small and pure rather than d3-array's bin, so the core stays free of
 * dependencies beyond what it already has.
 * @param bins number of bins, at least 1
 */
export function valueHistogram(values: Float64Array, bins: number): ValueHistogram {
  if (!(Number.isInteger(bins) && bins >= 1)) throw new RangeError(`bins must be an integer >= 1, got ${bins}`);
  if (values.length === 0) throw new RangeError('valueHistogram needs at least one value');
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v < min) min = v;
    if (v > max) max = v;
  }
  if (min === max) return { edges: Float64Array.from([min - 0.5, max + 0.5]), counts: Float64Array.from([values.length]) };
  const width = (max - min) / bins;
  const edges = new Float64Array(bins + 1);
  for (let k = 0; k <= bins; k++) edges[k] = min + k * width;
  edges[bins] = max;
  const counts = new Float64Array(bins);
  for (let i = 0; i < values.length; i++) {
    const k = Math.min(bins - 1, Math.floor((values[i] - min) / width));
    counts[k]++;
  }
  return { edges, counts };
}
