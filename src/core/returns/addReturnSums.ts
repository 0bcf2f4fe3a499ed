import type { LevelSums } from './collectReturns';
import type { LevelStats } from './levelStats';

/**
 * The scalar sums over the positions of one level that both LevelStats and the engine's LevelSums
 * carry: sum c log c over blocks, and the counts, sums and sums of squares of log R.
 */
export type ReturnSums = Pick<
  LevelStats,
  'sumCountLogCount' | 'forwardObserved' | 'forwardSumLog' | 'forwardSumLog2' | 'observed' | 'sumLog' | 'sumLog2' | 'sumLogRc' | 'sumLogRc2'
>;

/**
 * The sums of two disjoint sets of positions, added field by field into a new object. Every field
 * is a sum over positions, so adding is exact merging (up to floating-point rounding).
 */
export function addReturnSums(a: ReturnSums, b: ReturnSums): ReturnSums {
  return {
    sumCountLogCount: a.sumCountLogCount + b.sumCountLogCount,
    forwardObserved: a.forwardObserved + b.forwardObserved,
    forwardSumLog: a.forwardSumLog + b.forwardSumLog,
    forwardSumLog2: a.forwardSumLog2 + b.forwardSumLog2,
    observed: a.observed + b.observed,
    sumLog: a.sumLog + b.sumLog,
    sumLog2: a.sumLog2 + b.sumLog2,
    sumLogRc: a.sumLogRc + b.sumLogRc,
    sumLogRc2: a.sumLogRc2 + b.sumLogRc2,
  };
}

/** Two shares' sums of one level (groups of classes or ranges of positions), added (a new object; neither input is changed). */
export function addSums(a: LevelSums, b: LevelSums): LevelSums {
  const batches = Float64Array.from(a.batches);
  for (let i = 0; i < batches.length; i++) batches[i] += b.batches[i];
  const histogram = Float64Array.from(a.histogram);
  for (let i = 0; i < histogram.length; i++) histogram[i] += b.histogram[i];
  return {
    classes: a.classes + b.classes,
    ...addReturnSums(a, b),
    matchCount: a.matchCount + b.matchCount,
    batches,
    histogram,
  };
}
