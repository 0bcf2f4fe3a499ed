import { batchMeansInterval } from './batchMeans';
import { notApplicable, type EstimatorResult } from './estimatorResult';
import type { LevelBatchMoments } from './levelBatchMoments';

/**
 * Entropy rate from the mean return time at one block length: (1/n) mean log R_n, nats, the
 * quantity of the Ornstein-Weiss theorem ((1/n) log R_n -> h almost surely; Ornstein & Weiss, IEEE
 * Trans. IT 39 (1993) 78-83). Since E log R_n - n h tends to the constant (H_n - n h) - gamma
 * (THEORY.md section 1) it keeps a bias of order 1/n (about -0.58/n for i.i.d. sources): shown for
 * comparison, never the headline. Interval: batch means of the per-batch value (Schmeiser 1982).
 * @param top moments of the level used (normally the top of the trusted range)
 */
export function returnMean(top: LevelBatchMoments | null, confidence: number): EstimatorResult {
  if (top === null || top.mean === null) return notApplicable('No block length has enough observed returns.');
  const n = top.n;
  const estimate = top.mean / n;
  const values = new Float64Array(top.batchMean.length);
  for (let g = 0; g < values.length; g++) values[g] = top.batchMean[g] / n;
  const ci = batchMeansInterval(estimate, values, top.batchObserved, confidence);
  return {
    estimate,
    standardError: ci === null ? null : ci.standardError,
    interval: ci === null ? null : [ci.lower, ci.upper],
    lengthsUsed: [n, n],
    note: `Mean of log R_n / n at n = ${n}; biased by about (H_n - n h - gamma)/n, i.e. of order 1/n.`,
  };
}
