import type { LevelStats } from '../returns/levelStats';
import { longRunVariance, type BatchPlan } from './batchMeans';
import { batchSizes, conditionalInformationSums, wellSampledLength } from './conditionalInformation';

/** Default for the sigma^2 block length: at least 100 occurrences per distinct k-block on average. */
export const SIGMA2_MIN_MEAN_COUNT = 100;

export interface InformationVarianceResult {
  /** sigma^2 in nats^2 per symbol; null when there are too few batches. */
  readonly estimate: number | null;
  readonly standardError: number | null;
  readonly interval: readonly [number, number] | null;
  /** Block length k of the conditional information used. */
  readonly k: number;
  readonly note: string;
}

/**
 * sigma^2 = lim Var(-log mu(X_1..X_m))/m (Kontoyiannis, J. Theoret. Probab. 11 (1998); the
 * varentropy rate of Kontoyiannis & Verdu, IEEE Trans. IT 60 (2014)) as the batch-means long-run
 * variance of the empirical conditional information Y_p = log c_{k-1}(p) - log c_k(p), with a
 * chi-square interval on a-1 degrees of freedom (batchMeans.ts).
 *
 * Choice of k: larger k removes the bias from memory longer than k-1 (for a Markov source of order
 * r every k > r is exact), but the estimated conditional probabilities are frozen into Y and add
 * roughly (distinct (k-1)-blocks)/M to the variance (one over the mean count). So k is the plateau
 * length of the conditional entropies when one was found (`plateauK`, see pluginConditional.ts:
 * there memory no longer shows), capped by the largest k with at least minMeanCount occurrences
 * per distinct block (at 100 the added variance is about 0.01 nat^2); without a plateau, that
 * largest k (at least 1).
 * @param plateauK block length where the conditional entropies stopped falling, or null
 */
export function informationVariance(
  levels: readonly LevelStats[],
  planAt: (positions: number) => BatchPlan,
  confidence: number,
  plateauK: number | null = null,
  minMeanCount = SIGMA2_MIN_MEAN_COUNT,
): InformationVarianceResult {
  if (levels.length === 0) return { estimate: null, standardError: null, interval: null, k: 0, note: 'No levels.' };
  const sampled = wellSampledLength(levels, minMeanCount);
  const k = plateauK !== null && plateauK >= 1 ? Math.max(1, Math.min(plateauK, sampled)) : Math.max(1, sampled);
  const plan = planAt(levels[k - 1].positions);
  const lrv = longRunVariance(conditionalInformationSums(levels, k, plan), batchSizes(plan), confidence);
  const why =
    sampled === 0
      ? `k = 1 although single symbols are seen fewer than ${minMeanCount} times each on average: expect an upward bias.`
      : plateauK !== null && k === plateauK
        ? `k = ${k}, where the conditional block entropies reach their plateau.`
        : `k = ${k}, the largest block length with >= ${minMeanCount} occurrences per block on average.`;
  if (lrv === null) return { estimate: null, standardError: null, interval: null, k, note: `Too few batches. ${why}` };
  return {
    estimate: lrv.variance,
    standardError: lrv.standardError,
    interval: [lrv.lower, lrv.upper],
    k,
    note: `Batch-means long-run variance of the conditional information over ${lrv.degreesOfFreedom + 1} batches; ${why}`,
  };
}
