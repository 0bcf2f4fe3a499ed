import type { LevelBatchMoments } from '../estimate/levelBatchMoments';
import type { PairedLevel } from './pairedWaits';

/**
 * Mean and variance of log W_n pooled over all segment pairs and per pair, in the shape the slope
 * estimators take (LevelBatchMoments, one batch per pair). A censored wait (the block never occurs
 * in its B segment) is counted at its least possible value log(|B_g| - n + 2): the moments are then
 * lower bounds, close to the truth while censoring is rare (the trusted range keeps it at most
 * maxCensoredFraction). Pairs weigh by their positions. Pair values are NaN with fewer than two
 * positions.
 */
export function waitingMoments(level: PairedLevel): LevelBatchMoments {
  const K = level.pairPositions.length;
  let count = 0;
  let s = 0;
  let s2 = 0;
  const batchMean = new Float64Array(K);
  const batchVariance = new Float64Array(K);
  for (let g = 0; g < K; g++) {
    const c = level.pairPositions[g];
    count += c;
    s += level.pairSumLog[g];
    s2 += level.pairSumLog2[g];
    const m = momentsOf(c, level.pairSumLog[g], level.pairSumLog2[g]);
    batchMean[g] = m.mean ?? Number.NaN;
    batchVariance[g] = m.variance ?? Number.NaN;
  }
  const whole = momentsOf(count, s, s2);
  return { n: level.n, mean: whole.mean, variance: whole.variance, batchMean, batchVariance, batchObserved: level.pairPositions.slice() };
}

/** Mean and sample variance from a count and the sums of x and x^2. */
export function momentsOf(count: number, sum: number, sum2: number): { mean: number | null; variance: number | null } {
  if (count < 2) return { mean: null, variance: null };
  const mean = sum / count;
  return { mean, variance: Math.max(0, (sum2 - count * mean * mean) / (count - 1)) };
}
