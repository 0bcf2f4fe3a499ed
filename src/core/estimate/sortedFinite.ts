/**
 * A sorted copy of a sample, checking that every value is finite (the goodness-of-fit statistics
 * need an ordered sample; the caller's array is left untouched).
 * @param what name used in the error message
 * @throws RangeError when the sample is empty or holds NaN or an infinity
 */
export function sortedFinite(sample: ArrayLike<number>, what = 'sample'): Float64Array {
  if (sample.length < 1) throw new RangeError(`${what} must hold at least one value`);
  const out = Float64Array.from(sample);
  for (let i = 0; i < out.length; i++) {
    if (!Number.isFinite(out[i])) throw new RangeError(`${what} must be finite; got ${out[i]} at index ${i}`);
  }
  return out.sort();
}
