import { batchMeansInterval, type BatchInterval } from './batchMeans';
import { leastSquaresSlope } from './leastSquaresSlope';
import type { LevelBatchMoments } from './levelBatchMoments';

/** Which per-level moment to regress on n. */
export type LevelMoment = 'mean' | 'variance';

/**
 * Least-squares slope of a moment of log R_n against n over a range of levels, with a batch-means
 * interval: the same slope computed from each coarse batch's moments, batch means over batches
 * (Schmeiser 1982), weighted by the batch's observed returns at the top level.
 * @returns estimate NaN when the moments are missing; interval null when fewer than two batches
 *   give a finite slope
 */
export function slopeOverLevels(
  range: readonly LevelBatchMoments[],
  moment: LevelMoment,
  confidence: number,
): { estimate: number; interval: BatchInterval | null } {
  const ns = new Float64Array(range.length);
  const values = new Float64Array(range.length);
  for (let j = 0; j < range.length; j++) {
    ns[j] = range[j].n;
    values[j] = (moment === 'mean' ? range[j].mean : range[j].variance) ?? Number.NaN;
  }
  const estimate = leastSquaresSlope(ns, values);
  if (!Number.isFinite(estimate) || range.length === 0) return { estimate: Number.NaN, interval: null };
  const a = range[0].batchMean.length;
  const slopes = new Float64Array(a);
  const column = new Float64Array(range.length);
  for (let g = 0; g < a; g++) {
    for (let j = 0; j < range.length; j++) column[j] = moment === 'mean' ? range[j].batchMean[g] : range[j].batchVariance[g];
    slopes[g] = leastSquaresSlope(ns, column);
  }
  const top = range[range.length - 1];
  return { estimate, interval: batchMeansInterval(estimate, slopes, top.batchObserved, confidence) };
}
