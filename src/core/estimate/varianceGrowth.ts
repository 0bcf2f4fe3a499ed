import { notApplicable, type EstimatorResult } from './estimatorResult';
import type { LevelBatchMoments } from './levelBatchMoments';
import { slopeOverLevels } from './slopeOverLevels';

/**
 * sigma^2 as the least-squares slope of Var(log R_n) against n over the trusted range, nats^2 per
 * symbol. Heuristic: Var(log R_n) ~ Var(-log mu(A_n)) + pi^2/6 ~ n sigma^2 + const (THEORY.md
 * section 3: good for i.i.d. sources, poor for sticky chains at moderate n), from the almost-sure
 * approximation of log R_n by -log mu(A_n) (Kontoyiannis 1998). Interval: the same slope from each
 * coarse batch's variances, batch means with Student t (Schmeiser 1982).
 */
export function varianceGrowth(range: readonly LevelBatchMoments[], confidence: number): EstimatorResult {
  if (range.length < 2) return notApplicable('A variance slope needs at least two trusted block lengths.');
  const { estimate, interval: ci } = slopeOverLevels(range, 'variance', confidence);
  if (!Number.isFinite(estimate)) return notApplicable('The trusted levels have too few observed returns.');
  const top = range[range.length - 1];
  return {
    estimate,
    standardError: ci === null ? null : ci.standardError,
    interval: ci === null ? null : [ci.lower, ci.upper],
    lengthsUsed: [range[0].n, top.n],
    note: `Slope of Var(log R_n) against n for n = ${range[0].n}..${top.n}; a heuristic that needs Var(log R_n) - n sigma^2 to have settled.`,
  };
}
