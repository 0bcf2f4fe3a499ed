import type { LevelStats } from '../returns/levelStats';
import { coarseSums, type BatchPlan } from './batchMeans';
import { censoringCorrectedMoments, groupCensoringOffsets } from './censoringCorrection';

/** Censoring-corrected moments of log R_n, for the whole level and for each coarse batch. */
export interface LevelBatchMoments {
  readonly n: number;
  /** Whole level (nats); null when nothing was observed. */
  readonly mean: number | null;
  readonly variance: number | null;
  /** Per coarse batch; NaN where the batch observed fewer than two returns. */
  readonly batchMean: Float64Array;
  readonly batchVariance: Float64Array;
  /** Observed returns per coarse batch (the weights of the batch values). */
  readonly batchObserved: Float64Array;
}

/**
 * The corrected mean and variance of log R_n over the level and per coarse batch. Each batch's raw
 * mean gets the offset that its own censoring pattern implies (groupCensoringOffsets), so the batch
 * values are comparable estimates of the level's corrected moments.
 */
export function levelBatchMoments(level: LevelStats, plan: BatchPlan): LevelBatchMoments {
  const whole = censoringCorrectedMoments(level);
  const O = coarseSums(level.batchObserved, plan);
  const S = coarseSums(level.batchSumLog, plan);
  const S2 = coarseSums(level.batchSumLog2, plan);
  const { meanOffset, varianceOffset } = groupCensoringOffsets(level, plan.start, plan.end);
  const batchMean = new Float64Array(plan.count);
  const batchVariance = new Float64Array(plan.count);
  for (let g = 0; g < plan.count; g++) {
    if (O[g] < 2) {
      batchMean[g] = Number.NaN;
      batchVariance[g] = Number.NaN;
      continue;
    }
    const m = S[g] / O[g];
    batchMean[g] = m + meanOffset[g];
    batchVariance[g] = Math.max(0, (S2[g] - O[g] * m * m) / (O[g] - 1)) + varianceOffset[g];
  }
  return { n: level.n, mean: whole.mean, variance: whole.variance, batchMean, batchVariance, batchObserved: O };
}
