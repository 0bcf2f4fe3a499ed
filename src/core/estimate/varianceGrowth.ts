import { batchMeansInterval } from './batchMeans';
import { notApplicable, type EstimatorResult } from './estimatorResult';
import { leastSquaresSlope } from './leastSquaresSlope';
import type { LevelBatchMoments } from './levelBatchMoments';

/**
 * sigma^2 as the least-squares slope of Var(log R_n) against n over the trusted range, nats^2 per
 * symbol. Heuristic: Var(log R_n) ~ Var(-log mu(A_n)) + pi^2/6 ~ n sigma^2 + const (THEORY.md
 * section 3: good for i.i.d. sources, poor for sticky chains at moderate n), from the almost-sure
 * approximation of log R_n by -log mu(A_n) (Kontoyiannis 1998). Interval: the same slope from each
 * coarse batch's variances, batch means with Student t (Schmeiser 1982).
 */
export function varianceGrowth(range: readonly LevelBatchMoments[], confidence: number): EstimatorResult {
  if (range.length < 2) return notApplicable('A variance slope needs at least two trusted block lengths.');
  const ns = new Float64Array(range.length);
  const vars = new Float64Array(range.length);
  for (let j = 0; j < range.length; j++) {
    ns[j] = range[j].n;
    vars[j] = range[j].variance ?? Number.NaN;
  }
  const estimate = leastSquaresSlope(ns, vars);
  if (!Number.isFinite(estimate)) return notApplicable('The trusted levels have too few observed returns.');
  const a = range[0].batchVariance.length;
  const slopes = new Float64Array(a);
  const column = new Float64Array(range.length);
  for (let g = 0; g < a; g++) {
    for (let j = 0; j < range.length; j++) column[j] = range[j].batchVariance[g];
    slopes[g] = leastSquaresSlope(ns, column);
  }
  const top = range[range.length - 1];
  const ci = batchMeansInterval(estimate, slopes, top.batchObserved, confidence);
  return {
    estimate,
    standardError: ci === null ? null : ci.standardError,
    interval: ci === null ? null : [ci.lower, ci.upper],
    lengthsUsed: [range[0].n, top.n],
    note: `Slope of Var(log R_n) against n for n = ${range[0].n}..${top.n}; a heuristic that needs Var(log R_n) - n sigma^2 to have settled.`,
  };
}
