import { notApplicable, type EstimatorResult } from './estimatorResult';
import type { LevelBatchMoments } from './levelBatchMoments';
import { slopeOverLevels } from './slopeOverLevels';

/**
 * Entropy rate as the least-squares slope of the (censoring-corrected) mean of log R_n against n over
 * the trusted range, nats. E log R_n = n h + (H_n - n h) - gamma + o(1) with the o(1) decaying
 * exponentially for exponentially phi-mixing sources (Kim, Osaka J. Math. 49 (2012) 1-20), and
 * H_n - n h converges as fast for finite-memory sources, so the slope loses the O(1/n) bias of
 * log R_n / n. Interval: the same slope computed from each coarse batch's means, batch means over
 * batches (Schmeiser 1982), weighted by the batch's observed returns at the top level.
 * @param range moments of the levels n_lo..n_hi in order
 */
export function returnSlope(range: readonly LevelBatchMoments[], confidence: number): EstimatorResult {
  if (range.length < 2) return notApplicable('A slope needs at least two trusted block lengths.');
  const { estimate, interval: ci } = slopeOverLevels(range, 'mean', confidence);
  if (!Number.isFinite(estimate)) return notApplicable('The trusted levels have no observed returns.');
  const top = range[range.length - 1];
  const lo = range[0].n;
  const hi = top.n;
  return {
    estimate,
    standardError: ci === null ? null : ci.standardError,
    interval: ci === null ? null : [ci.lower, ci.upper],
    lengthsUsed: [lo, hi],
    note: `Least-squares slope of mean log R_n against n for n = ${lo}..${hi}.`,
  };
}
