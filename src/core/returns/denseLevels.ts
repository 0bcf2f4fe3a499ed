import type { SymbolArray } from '../sequence/sequence';
import { HISTOGRAM_BINS_PER_NAT, type LevelStats } from './levelStats';
import { logOfPositive } from './logOfPositive';
import { assembleLevel, type LevelSums, type ScanLayout } from './scanLayout';

/** Largest table of block ids kept: two tables of 2^14 Int32 entries (128 KiB) stay in the second-level cache. */
const DENSE_TABLE_LIMIT = 1 << 14;

/**
 * How many of the first levels to take by direct block ids: while A^n stays within the table limit
 * and within the sequence length (a table pass per level must not cost more than the positions).
 */
export function denseLevelCount(alphabetSize: number, N: number, maxN: number): number {
  let levels = 0;
  let size = 1;
  while (levels < maxN && size * alphabetSize <= Math.min(DENSE_TABLE_LIMIT, N)) {
    size *= alphabetSize;
    levels++;
  }
  return levels;
}

/** Working arrays of the dense levels. */
export interface DenseState {
  /** ids[p] = the n-block at p as a number in base A (most recent symbol last). */
  readonly ids: Int32Array;
  /** Occurrences of each block id at the current level. */
  readonly counts: Int32Array;
  /** Latest position seen with each block id during the statistics pass. */
  readonly last: Int32Array;
}

export function denseState(N: number, alphabetSize: number, levels: number): DenseState {
  const size = alphabetSize ** levels;
  return { ids: new Int32Array(N), counts: new Int32Array(size), last: new Int32Array(size) };
}

/**
 * One level n by direct block ids, for the first levels where A^n is small: every position is in
 * play there, so instead of moving positions between classes, two sequential passes over the
 * positions do the work (a tally of block ids, then the statistics), with the per-block tables in
 * cache. Consecutive occurrences p < q of a block give one return R = q - p, the forward return of p
 * and the backward return of q, exactly as consecutive members of a class do in the refinement.
 */
export function scanDenseLevel(
  symbols: SymbolArray,
  alphabetSize: number,
  n: number,
  state: DenseState,
  layout: ScanLayout,
  paths: Float64Array,
  capture: Int32Array | null,
): LevelStats {
  const { ids, counts, last } = state;
  const { N, maxN, batchShift, batchCount, sampleMask, strideShift, matchWindow, matchEnd, bins } = layout;
  const offset = n - 1;
  const positions = N - n + 1;
  const half = positions >>> 1;
  const size = alphabetSize ** n;
  counts.fill(0, 0, size);
  last.fill(-1, 0, size);
  for (let p = 0; p < positions; p++) {
    const id = ids[p] * alphabetSize + symbols[p + offset];
    ids[p] = id;
    counts[id]++;
  }
  let distinctBlocks = 0;
  let singletons = 0;
  let sumCountLogCount = 0;
  for (let id = 0; id < size; id++) {
    const c = counts[id];
    if (c === 0) continue;
    distinctBlocks++;
    if (c === 1) singletons++;
    else sumCountLogCount += c * logOfPositive(c);
  }

  const histogram = new Float64Array(bins);
  const maxBin = bins - 1;
  const batchAcc = new Float64Array(4 * batchCount);
  let forwardSumLog = 0;
  let forwardSumLog2 = 0;
  let forwardObserved = 0;
  let observed = 0;
  let sumLog = 0;
  let sumLog2 = 0;
  let sumLogRc = 0;
  let sumLogRc2 = 0;
  let matchCount = 0;
  for (let q = 0; q < positions; q++) {
    const id = ids[q];
    const c = counts[id];
    if (c < 2) continue;
    const logc = logOfPositive(c);
    const batchQ = (q >>> batchShift) << 2;
    batchAcc[batchQ + 3] += logc;
    const p = last[id];
    last[id] = q;
    if (p < 0) continue;
    const R = q - p;
    const logR = logOfPositive(R);
    const logR2 = logR * logR;
    forwardObserved++;
    forwardSumLog += logR;
    forwardSumLog2 += logR2;
    let weight = 0;
    if (p < half) {
      weight = 1;
      const batchP = (p >>> batchShift) << 2;
      batchAcc[batchP]++;
      batchAcc[batchP + 1] += logR;
      batchAcc[batchP + 2] += logR2;
    }
    if (q >= half) {
      weight++;
      batchAcc[batchQ]++;
      batchAcc[batchQ + 1] += logR;
      batchAcc[batchQ + 2] += logR2;
    }
    let bin = (logR * HISTOGRAM_BINS_PER_NAT) | 0;
    if (bin > maxBin) bin = maxBin;
    histogram[bin] += weight;
    observed += weight;
    sumLog += weight * logR;
    sumLog2 += weight * logR2;
    const lrc = logR + logc;
    sumLogRc += weight * lrc;
    sumLogRc2 += weight * lrc * lrc;
    if (q >= matchWindow && q < matchEnd && R <= matchWindow) matchCount++;
    if ((p & sampleMask) === 0) paths[(p >>> strideShift) * maxN + offset] = R;
    if (capture !== null) capture[p] = R;
  }
  const sums: LevelSums = {
    distinctBlocks,
    singletons,
    sumCountLogCount,
    forwardObserved,
    forwardSumLog,
    forwardSumLog2,
    observed,
    sumLog,
    sumLog2,
    sumLogRc,
    sumLogRc2,
    matchCount,
  };
  return assembleLevel(n, positions, sums, histogram, batchAcc);
}

/**
 * Hand over from the dense levels to class refinement: positions whose n-block recurs, sorted by
 * (block id, position) with the class-start marker (~p) on each class's first entry, written to
 * `order` by a stable counting sort. Returns the number of entries written.
 */
export function orderFromDense(state: DenseState, alphabetSize: number, n: number, positions: number, order: Int32Array): number {
  const { ids, counts, last } = state;
  const size = alphabetSize ** n;
  let cursor = 0;
  for (let id = 0; id < size; id++) {
    const c = counts[id];
    last[id] = cursor; // reused as the next free slot of each block
    if (c >= 2) cursor += c;
  }
  for (let p = 0; p < positions; p++) {
    const id = ids[p];
    if (counts[id] >= 2) order[last[id]++] = p;
  }
  let start = 0;
  for (let id = 0; id < size; id++) {
    const c = counts[id];
    if (c < 2) continue;
    order[start] = ~order[start];
    start += c;
  }
  return cursor;
}
