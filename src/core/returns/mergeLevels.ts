import type { LevelStats, SampledPaths } from './levelStats';
import { addReturnSums } from './addReturnSums';

/**
 * The per-n sufficient statistics of the analysis are sums over positions (counts, sums and sums of
 * squares of log R, sum of c log c, the fixed-grid histogram, per-batch sums, match counts), so two
 * disjoint sets of positions merge by adding them field by field. Nothing here compares blocks, so
 * symbol ids need not agree between the parts.
 *
 * Both levels must have the same n and the same batch grid (global batch index, same length);
 * histograms may differ in length (a shorter part has fewer bins, all above them empty).
 * @throws RangeError when n or the batch grids differ
 */
export function mergeLevelStats(a: LevelStats, b: LevelStats): LevelStats {
  if (a.n !== b.n) throw new RangeError(`cannot merge levels of different block lengths ${a.n} and ${b.n}`);
  if (a.batchObserved.length !== b.batchObserved.length) {
    throw new RangeError(`cannot merge levels with ${a.batchObserved.length} and ${b.batchObserved.length} batches`);
  }
  return {
    n: a.n,
    positions: a.positions + b.positions,
    distinctBlocks: a.distinctBlocks + b.distinctBlocks,
    singletons: a.singletons + b.singletons,
    ...addReturnSums(a, b),
    histogram: addArrays(a.histogram, b.histogram),
    matchCount: a.matchCount + b.matchCount,
    batchObserved: addArrays(a.batchObserved, b.batchObserved),
    batchSumLog: addArrays(a.batchSumLog, b.batchSumLog),
    batchSumLog2: addArrays(a.batchSumLog2, b.batchSumLog2),
    batchSumLogCount: addArrays(a.batchSumLogCount, b.batchSumLogCount),
  };
}

/** Element-wise sum into a new array as long as the longer input. */
function addArrays(a: Float64Array, b: Float64Array): Float64Array {
  const out = new Float64Array(Math.max(a.length, b.length));
  out.set(a);
  for (let i = 0; i < b.length; i++) out[i] += b[i];
  return out;
}

/**
 * Sampled paths of disjoint sets of sampled positions, as one set sorted by position.
 * @throws RangeError when maxN differs or a position occurs twice
 */
export function mergeSampledPaths(parts: readonly SampledPaths[]): SampledPaths {
  if (parts.length === 0) throw new RangeError('no sampled paths to merge');
  const maxN = parts[0].maxN;
  const rows: { position: number; part: SampledPaths; row: number }[] = [];
  for (const part of parts) {
    if (part.maxN !== maxN) throw new RangeError(`cannot merge sampled paths with maxN ${maxN} and ${part.maxN}`);
    for (let s = 0; s < part.positions.length; s++) rows.push({ position: part.positions[s], part, row: s });
  }
  rows.sort((x, y) => x.position - y.position);
  const positions = new Int32Array(rows.length);
  const forward = new Float64Array(rows.length * maxN);
  const counts = new Float64Array(rows.length * maxN);
  rows.forEach(({ position, part, row }, s) => {
    if (s > 0 && positions[s - 1] === position) throw new RangeError(`sampled position ${position} occurs in two parts`);
    positions[s] = position;
    forward.set(part.forward.subarray(row * maxN, (row + 1) * maxN), s * maxN);
    counts.set(part.counts.subarray(row * maxN, (row + 1) * maxN), s * maxN);
  });
  return { positions, forward, counts, maxN };
}
