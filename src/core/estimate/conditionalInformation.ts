import type { LevelStats } from '../returns/levelStats';
import { coarseSums, type BatchPlan } from './batchMeans';

/**
 * Per coarse batch, the sum over its positions p of the empirical conditional information
 * Y_p = log c_{k-1}(p) - log c_k(p) = -log(count of x[p..p+k) / count of x[p..p+k-1)), the
 * plug-in estimate of -log P(x_{p+k-1} | x_p..x_{p+k-2}); for k = 1 the (k-1)-block is empty and
 * c_0 = N. Their mean is the plug-in conditional entropy, and for a source of memory below k their
 * long-run variance is sigma^2 (the sum over p is -log of the fitted order-(k-1) Markov probability;
 * Kontoyiannis & Verdu, IEEE Trans. IT 60 (2014), for the variance of the information).
 * @param levels all levels, levels[j].n = j + 1
 * @param plan coarse batches lying inside the positions of level k
 */
export function conditionalInformationSums(levels: readonly LevelStats[], k: number, plan: BatchPlan): Float64Array {
  if (!Number.isInteger(k) || k < 1 || k > levels.length) throw new RangeError(`k must be in [1, ${levels.length}]; got ${k}`);
  const current = coarseSums(levels[k - 1].batchSumLogCount, plan);
  if (k === 1) {
    const logN = Math.log(levels[0].positions);
    for (let g = 0; g < plan.count; g++) current[g] = (plan.end[g] - plan.start[g]) * logN - current[g];
    return current;
  }
  const previous = coarseSums(levels[k - 2].batchSumLogCount, plan);
  for (let g = 0; g < plan.count; g++) current[g] = previous[g] - current[g];
  return current;
}

/** Sizes (positions) of the coarse batches of a plan. */
export function batchSizes(plan: BatchPlan): Float64Array {
  const out = new Float64Array(plan.count);
  for (let g = 0; g < plan.count; g++) out[g] = plan.end[g] - plan.start[g];
  return out;
}

/**
 * Largest k such that every level 1..k has at least `minMeanCount` occurrences per distinct block on
 * average (positions / distinct blocks) and at most `maxSingletonShare` of its positions in blocks
 * seen once; 0 when even single symbols fail. The singleton share is the Good-Turing estimate of
 * the probability of blocks not seen at all (Good, Biometrika 40 (1953)): a mean count alone
 * misses heavy-tailed block laws (continued-fraction digits at N = 1e5 have 25 occurrences per
 * 2-block on average but 2.3% of positions in singletons, and the plug-in is 0.05 nat low there).
 */
export function wellSampledLength(levels: readonly LevelStats[], minMeanCount: number, maxSingletonShare = 1): number {
  let k = 0;
  for (const level of levels) {
    if (level.distinctBlocks <= 0 || level.positions / level.distinctBlocks < minMeanCount) break;
    if (level.singletons > maxSingletonShare * level.positions) break;
    k = level.n;
  }
  return k;
}
