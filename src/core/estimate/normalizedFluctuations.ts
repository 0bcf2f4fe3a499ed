/** The normalized fluctuations of log R_n at one block length, and what was left out. */
export interface NormalizedFluctuations {
  /** (log R_n - n h) / (sigma sqrt n) for the kept positions, in position order. */
  readonly values: Float64Array;
  /** The positions the values belong to (same order). */
  readonly positions: Float64Array;
  /** Positions whose log R_n was missing (NaN: censored or past the end). */
  readonly missing: number;
  /** Positions with a value that were dropped because they lay closer than `gap` to a kept one. */
  readonly thinned: number;
}

/**
 * (log R_n - n h) / (sigma sqrt n) over sampled positions: asymptotically N(0,1) for well-mixing
 * sources with sigma^2 > 0 (Kontoyiannis, J. Theoret. Probab. 11 (1998) 795-811; THEORY.md
 * section 1).
 *
 * Thinning: positions are walked in increasing order and a position with a value is kept when it
 * lies at least `gap` after the last kept one (greedy, starting from the first position with a
 * value). Missing values (NaN) are skipped before thinning, so they neither count as kept nor
 * block a neighbour. With gap = 1 every position with a value is kept. Even thinned, log R_n(i)
 * looks about R_n(i) + n symbols ahead, so kept values stay dependent unless gap is much larger
 * than e^{nh}.
 *
 * @param logReturn log R_n (nats) per sampled position; NaN when censored or missing
 * @param positions the sampled positions (strictly increasing integers), same length
 * @param n block length (positive integer)
 * @param h entropy rate (nats per symbol, finite)
 * @param sigma square root of the variance rate (nats, > 0)
 * @param gap least distance between kept positions (integer >= 1); default 1
 * @throws RangeError on mismatched lengths, unsorted positions or bad parameters
 */
export function normalizedFluctuations(
  logReturn: ArrayLike<number>,
  positions: ArrayLike<number>,
  n: number,
  h: number,
  sigma: number,
  gap = 1,
): NormalizedFluctuations {
  if (logReturn.length !== positions.length) {
    throw new RangeError(`logReturn and positions must have the same length; got ${logReturn.length} and ${positions.length}`);
  }
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`n must be a positive integer; got ${n}`);
  if (!Number.isFinite(h)) throw new RangeError(`h must be a finite number; got ${h}`);
  if (!(sigma > 0) || !Number.isFinite(sigma)) throw new RangeError(`sigma must be positive and finite; got ${sigma}`);
  if (!Number.isInteger(gap) || gap < 1) throw new RangeError(`gap must be an integer >= 1; got ${gap}`);
  const count = positions.length;
  for (let k = 0; k < count; k++) {
    const p = positions[k];
    if (!Number.isInteger(p) || (k > 0 && p <= positions[k - 1])) {
      throw new RangeError(`positions must be strictly increasing integers; got ${p} at index ${k}`);
    }
  }
  const shift = n * h;
  const scale = 1 / (sigma * Math.sqrt(n));
  const values = new Float64Array(count);
  const kept = new Float64Array(count);
  let used = 0;
  let missing = 0;
  let thinned = 0;
  let last = -Infinity;
  for (let k = 0; k < count; k++) {
    const v = logReturn[k];
    if (Number.isNaN(v)) {
      missing++;
      continue;
    }
    if (!Number.isFinite(v)) throw new RangeError(`logReturn must be finite or NaN; got ${v} at index ${k}`);
    const p = positions[k];
    if (p - last < gap) {
      thinned++;
      continue;
    }
    last = p;
    values[used] = (v - shift) * scale;
    kept[used] = p;
    used++;
  }
  return { values: values.slice(0, used), positions: kept.slice(0, used), missing, thinned };
}
