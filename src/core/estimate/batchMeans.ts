import chisquareQuantile from '@stdlib/stats-base-dists-chisquare-quantile';
import tQuantile from '@stdlib/stats-base-dists-t-quantile';

/**
 * Number of coarse batches for every confidence interval. A fixed, small number of batches with
 * Student-t (or chi-square) quantiles on a - 1 degrees of freedom keeps the intervals honest when
 * the batches are long compared with the dependence (Schmeiser, Oper. Res. 30 (1982) 556-568, who
 * found 10 to 30 batches enough: more batches buy little width and cost coverage). Return times
 * make dependence long: log R_n(i) looks up to about e^{nh} symbols ahead (THEORY.md section 6), so
 * long batches matter more here than the consistency that growing batch counts would give
 * (Glynn & Whitt 1991). 32 divides the engine's power-of-two fine batches evenly.
 */
export const INTERVAL_BATCHES = 32;

/** How the engine's fine batches are merged into coarse batches of consecutive positions. */
export interface BatchPlan {
  /** Number of coarse batches (0 when there are too few positions). */
  readonly count: number;
  /** Per coarse batch: first fine batch and one past the last. */
  readonly fineStart: Int32Array;
  readonly fineEnd: Int32Array;
  /** Per coarse batch: first position and one past the last. */
  readonly start: Int32Array;
  readonly end: Int32Array;
}

/**
 * Coarse batches made of complete fine batches only, so that every level n whose positions cover
 * `positions` sees the same positions in each batch (fine batch b = positions [b, b+1) * batchLength).
 * Sizes differ by at most one fine batch.
 * @param positions positions common to all levels used (N - n_max + 1 for levels up to n_max)
 * @param target number of coarse batches wanted; default INTERVAL_BATCHES
 */
export function batchPlan(batchLength: number, batchCount: number, positions: number, target = INTERVAL_BATCHES): BatchPlan {
  if (!Number.isInteger(target) || target < 1) throw new RangeError(`target must be a positive integer; got ${target}`);
  const fine = Math.max(0, Math.min(batchCount, Math.floor(positions / batchLength)));
  const a = Math.min(target, fine);
  const fineStart = new Int32Array(a);
  const fineEnd = new Int32Array(a);
  const start = new Int32Array(a);
  const end = new Int32Array(a);
  for (let g = 0; g < a; g++) {
    fineStart[g] = Math.floor((g * fine) / a);
    fineEnd[g] = Math.floor(((g + 1) * fine) / a);
    start[g] = fineStart[g] * batchLength;
    end[g] = fineEnd[g] * batchLength;
  }
  return { count: a, fineStart, fineEnd, start, end };
}

/** Sums of a per-fine-batch array over each coarse batch. */
export function coarseSums(values: Float64Array, plan: BatchPlan): Float64Array {
  const out = new Float64Array(plan.count);
  for (let g = 0; g < plan.count; g++) {
    let s = 0;
    for (let b = plan.fineStart[g]; b < plan.fineEnd[g]; b++) s += values[b];
    out[g] = s;
  }
  return out;
}

/** A two-sided interval with its standard error and degrees of freedom. */
export interface BatchInterval {
  readonly standardError: number;
  readonly lower: number;
  readonly upper: number;
  readonly degreesOfFreedom: number;
}

/**
 * Batch-means interval for a statistic computed on the whole sample (`estimate`) and on each coarse
 * batch (`batchValues`, weighted by batch size): the standard error is that of the weighted mean of
 * the batch values, SE^2 = a/(a-1) * sum_g w_g^2 (v_g - vbar)^2 / (sum w)^2 (equal weights give the
 * textbook sum (v_g - vbar)^2 / (a (a-1)), Schmeiser 1982), and the interval is
 * estimate +- t_{a-1} SE. Needs a >= 2 finite batch values.
 * @param confidence two-sided level in (0, 1)
 * @returns null when fewer than two batches have a finite value
 */
export function batchMeansInterval(
  estimate: number,
  batchValues: ArrayLike<number>,
  weights: ArrayLike<number>,
  confidence: number,
): BatchInterval | null {
  let a = 0;
  let sw = 0;
  let swv = 0;
  for (let g = 0; g < batchValues.length; g++) {
    const v = batchValues[g];
    const w = weights[g];
    if (!Number.isFinite(v) || !(w > 0)) continue;
    a++;
    sw += w;
    swv += w * v;
  }
  if (a < 2 || !Number.isFinite(estimate)) return null;
  const mean = swv / sw;
  let ss = 0;
  for (let g = 0; g < batchValues.length; g++) {
    const v = batchValues[g];
    const w = weights[g];
    if (!Number.isFinite(v) || !(w > 0)) continue;
    ss += w * w * (v - mean) * (v - mean);
  }
  const standardError = Math.sqrt(((a / (a - 1)) * ss) / (sw * sw));
  const q = tQuantile(0.5 + confidence / 2, a - 1);
  return { standardError, lower: estimate - q * standardError, upper: estimate + q * standardError, degreesOfFreedom: a - 1 };
}

/** A long-run variance with its chi-square interval. */
export interface LongRunVariance {
  /** Estimated lim Var(sum of m values)/m. */
  readonly variance: number;
  readonly lower: number;
  readonly upper: number;
  readonly standardError: number;
  readonly degreesOfFreedom: number;
  /** Mean of the values over the batched positions. */
  readonly mean: number;
}

/**
 * Batch-means estimate of the long-run variance sigma^2 = lim Var(Y_1 + ... + Y_m)/m from the batch
 * sums of Y and the batch sizes: sigma^2 = 1/(a-1) sum_g L_g (Ybar_g - Ybar)^2 (THEORY.md section 6,
 * with unequal sizes L_g), and the interval (a-1) sigma^2 / chi2_{a-1}(1 - alpha/2 and alpha/2),
 * exact when the batch means are independent normal (the usual batch-means assumption,
 * Schmeiser 1982). Standard error sigma^2 sqrt(2/(a-1)).
 * @returns null when fewer than two batches
 */
export function longRunVariance(batchSums: ArrayLike<number>, batchSizes: ArrayLike<number>, confidence: number): LongRunVariance | null {
  let a = 0;
  let total = 0;
  let size = 0;
  for (let g = 0; g < batchSums.length; g++) {
    if (!(batchSizes[g] > 0) || !Number.isFinite(batchSums[g])) continue;
    a++;
    total += batchSums[g];
    size += batchSizes[g];
  }
  if (a < 2) return null;
  const mean = total / size;
  let ss = 0;
  for (let g = 0; g < batchSums.length; g++) {
    const L = batchSizes[g];
    if (!(L > 0) || !Number.isFinite(batchSums[g])) continue;
    const d = batchSums[g] / L - mean;
    ss += L * d * d;
  }
  const df = a - 1;
  const variance = ss / df;
  const alpha = 1 - confidence;
  return {
    variance,
    lower: ss / chisquareQuantile(1 - alpha / 2, df),
    upper: ss / chisquareQuantile(alpha / 2, df),
    standardError: variance * Math.sqrt(2 / df),
    degreesOfFreedom: df,
    mean,
  };
}
