/** A series cut into buckets of consecutive values, each drawn as its min and max. */
export interface DownsampledSeries {
  /** Index of each bucket's first value, plus the series length at the end (buckets + 1 entries). */
  readonly starts: Int32Array;
  readonly min: Float64Array;
  readonly max: Float64Array;
}

/**
 * Min and max of each of `buckets` runs of consecutive values (as equal in length as possible; one
 * value per bucket when the series is shorter), so a line drawn through them shows every spike of a
 * long series at one bucket per pixel.
 */
export function downsampleMinMax(values: Float64Array, buckets: number): DownsampledSeries {
  if (!(Number.isInteger(buckets) && buckets >= 1)) throw new RangeError(`buckets must be an integer >= 1, got ${buckets}`);
  const N = values.length;
  const B = Math.min(buckets, N);
  const starts = new Int32Array(B + 1);
  const min = new Float64Array(B);
  const max = new Float64Array(B);
  for (let b = 0; b <= B; b++) starts[b] = Math.floor((b * N) / B);
  for (let b = 0; b < B; b++) {
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = starts[b]; i < starts[b + 1]; i++) {
      const v = values[i];
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
    min[b] = lo;
    max[b] = hi;
  }
  return { starts, min, max };
}
