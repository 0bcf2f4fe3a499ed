import { EULER_GAMMA } from './exponentialLaw';
import { kaplanMeier, kaplanMeierAt, kaplanMeierIndex, kaplanMeierMean } from './kaplanMeier';

/** Shown beside the return law's standard errors and distance. */
export const RETURN_LAW_CAVEAT =
  'Sampled positions whose return windows overlap give dependent values; the standard errors assume independent values, so they are only indicative.';

/** How close t = R_n * count / (N - n + 1) is to the Exp(1) law at one block length. */
export interface ReturnLaw {
  /** Samples used: observed returns (events) plus censored ones. */
  readonly size: number;
  readonly events: number;
  readonly censored: number;
  /** Samples with neither a return nor a censoring bound (left out). */
  readonly missing: number;
  /** Grid of s values, evenly spaced over [0, largest observed t]. */
  readonly s: Float64Array;
  /** Kaplan-Meier estimate of P(t > s) on the grid (NaN where it says nothing). */
  readonly survival: Float64Array;
  /** Greenwood standard error of `survival` (0 before the first event). */
  readonly standardError: Float64Array;
  /** e^{-s}: the Exp(1) survival function on the grid. */
  readonly exponential: Float64Array;
  /**
   * Kaplan-Meier mean of log t (restricted to the largest observation: a lower bound when that one
   * is censored), its standard error, and the Exp(1) value -gamma.
   */
  readonly meanLog: number;
  readonly meanLogStandardError: number;
  readonly expectedMeanLog: number;
  /** sup over s up to the largest observation of |S_KM(s) - e^{-s}|. */
  readonly ksDistance: number;
  /** Plain-language warning that overlapping positions are dependent (RETURN_LAW_CAVEAT). */
  readonly caveat: string;
}

/** Options of returnLaw. */
export interface ReturnLawOptions {
  /** Points of the survival grid (>= 2); default 101. */
  readonly gridPoints?: number;
}

/**
 * The return-time law at one block length n: for each sampled position, t = R_n * count / M with
 * count the number of occurrences of the position's n-block and M = N - n + 1 positions, so
 * t = R_n times the block's empirical frequency. For well-mixing sources t tends to Exp(1) in law
 * (Hirata; Galves & Schmitt; Abadi; THEORY.md section 1), so log P(t > s) should follow the line
 * -s, and E log t -> -gamma (Kim, Osaka J. Math. 49 (2012) 1-20).
 *
 * A censored position (its next occurrence lies past the end) only says R_n > bound; it enters the
 * Kaplan-Meier estimator (Kaplan & Meier 1958) as right-censored at t = bound * count / M.
 * Dropping such positions instead biases the law towards short returns (THEORY.md section 7).
 * Everything is computed on log t, where the inputs live; Kaplan-Meier only uses the order.
 *
 * @param logReturn log R_n (nats) per sample; NaN when censored or missing
 * @param logCount log of the count of the sample's n-block in the whole sequence (0 when unique)
 * @param logCensorBound log of the lower bound of R_n for a censored sample; NaN otherwise. Used
 *   only where logReturn is NaN; a sample with both NaN is counted as missing.
 * @param positions M = N - n + 1, the number of positions at this block length
 * @throws RangeError on mismatched lengths or bad parameters
 */
export function returnLaw(
  logReturn: ArrayLike<number>,
  logCount: ArrayLike<number>,
  logCensorBound: ArrayLike<number>,
  positions: number,
  options: ReturnLawOptions = {},
): ReturnLaw {
  const gridPoints = options.gridPoints ?? 101;
  const k = logReturn.length;
  if (logCount.length !== k || logCensorBound.length !== k) {
    throw new RangeError(`logReturn, logCount and logCensorBound must have the same length; got ${k}, ${logCount.length}, ${logCensorBound.length}`);
  }
  if (!Number.isInteger(positions) || positions < 1) throw new RangeError(`positions must be a positive integer; got ${positions}`);
  if (!Number.isInteger(gridPoints) || gridPoints < 2) throw new RangeError(`gridPoints must be an integer >= 2; got ${gridPoints}`);
  const logM = Math.log(positions);
  const y = new Float64Array(k);
  const cens = new Uint8Array(k);
  let used = 0;
  let missing = 0;
  for (let i = 0; i < k; i++) {
    const c = logCount[i];
    if (!(c >= 0) || !Number.isFinite(c)) throw new RangeError(`logCount must be finite and >= 0; got ${c} at index ${i}`);
    const r = logReturn[i];
    const b = logCensorBound[i];
    if (Number.isFinite(r)) {
      y[used] = r + c - logM;
      cens[used++] = 0;
    } else if (Number.isFinite(b)) {
      y[used] = b + c - logM;
      cens[used++] = 1;
    } else {
      missing++;
    }
  }
  const curve = kaplanMeier(y.subarray(0, used), cens.subarray(0, used));
  const restricted = kaplanMeierMean(curve);
  const tMax = used > 0 ? Math.exp(curve.lastTime) : 0;
  const s = new Float64Array(gridPoints);
  const survival = new Float64Array(gridPoints);
  const standardError = new Float64Array(gridPoints);
  const exponential = new Float64Array(gridPoints);
  for (let g = 0; g < gridPoints; g++) {
    const v = (tMax * g) / (gridPoints - 1);
    s[g] = v;
    exponential[g] = Math.exp(-v);
    const logV = Math.log(v); // -Infinity at 0: before every observation, S = 1
    survival[g] = used > 0 ? kaplanMeierAt(curve, g === gridPoints - 1 ? curve.lastTime : logV) : Number.NaN;
    const idx = kaplanMeierIndex(curve, g === gridPoints - 1 ? curve.lastTime : logV);
    standardError[g] = Number.isNaN(survival[g]) ? Number.NaN : idx < 0 ? 0 : curve.standardError[idx];
  }
  // The largest gap between a step function and the continuous decreasing e^{-s} sits at a jump:
  // compare both sides of every event time, and the value at the last observation.
  let ks = 0;
  let before = 1;
  for (let j = 0; j < curve.times.length; j++) {
    const e = Math.exp(-Math.exp(curve.times[j]));
    ks = Math.max(ks, Math.abs(before - e), Math.abs(curve.survival[j] - e));
    before = curve.survival[j];
  }
  if (used > 0) ks = Math.max(ks, Math.abs(before - Math.exp(-tMax)));
  return {
    size: used,
    events: curve.events,
    censored: curve.censored,
    missing,
    s,
    survival,
    standardError,
    exponential,
    meanLog: restricted.mean,
    meanLogStandardError: restricted.standardError,
    expectedMeanLog: -EULER_GAMMA,
    ksDistance: used > 0 ? ks : Number.NaN,
    caveat: RETURN_LAW_CAVEAT,
  };
}
