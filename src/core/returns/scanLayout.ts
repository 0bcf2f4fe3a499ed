import { HISTOGRAM_BINS_PER_NAT, type LevelStats, type SampledPaths } from './levelStats';

/** Smallest power of two >= x (x >= 1). */
export function powerOfTwoAtLeast(x: number): number {
  let p = 1;
  while (p < x) p *= 2;
  return p;
}

/** Bins of the log R histogram: log R <= log N, plus one spare bin. */
export function histogramBinCount(N: number): number {
  return Math.floor(HISTOGRAM_BINS_PER_NAT * Math.log(Math.max(N, 2))) + 2;
}

/** Default window of the sliding-window match lengths: half the sequence. */
export function matchWindowFor(N: number): number {
  return Math.max(1, Math.floor(N / 2));
}

/** Fixed facts of one scan that every level needs: batches, samples, match window, histogram. */
export interface ScanLayout {
  readonly N: number;
  readonly maxN: number;
  /** Batch of position p: p >>> batchShift. */
  readonly batchShift: number;
  readonly batchCount: number;
  /** Position p is sampled when (p & sampleMask) === 0; its sample index is p >>> strideShift. */
  readonly sampleMask: number;
  readonly strideShift: number;
  readonly sampleCount: number;
  readonly matchWindow: number;
  /** Positions in [matchWindow, matchEnd) take part in the match-length counts. */
  readonly matchEnd: number;
  readonly bins: number;
}

export function scanLayoutFor(N: number, maxN: number, batchTarget: number, sampleTarget: number, matchWindow: number): ScanLayout {
  const batchLength = powerOfTwoAtLeast(Math.ceil(N / Math.max(1, batchTarget)));
  const stride = powerOfTwoAtLeast(Math.ceil(N / Math.max(1, sampleTarget)));
  return {
    N,
    maxN,
    batchShift: Math.log2(batchLength),
    batchCount: Math.ceil(N / batchLength),
    sampleMask: stride - 1,
    strideShift: Math.log2(stride),
    sampleCount: Math.ceil(N / stride),
    matchWindow,
    matchEnd: N - maxN,
    bins: histogramBinCount(N),
  };
}

/** The scalar sums of one level, as the level loops accumulate them. */
export interface LevelSums {
  distinctBlocks: number;
  singletons: number;
  sumCountLogCount: number;
  forwardObserved: number;
  forwardSumLog: number;
  forwardSumLog2: number;
  observed: number;
  sumLog: number;
  sumLog2: number;
  sumLogRc: number;
  sumLogRc2: number;
  matchCount: number;
}

/**
 * The level's statistics from its sums, its histogram and its batch accumulator (per batch b:
 * observed, sum log R, sum (log R)^2, sum log count at 4b..4b+3, interleaved so one cache line
 * serves a batch in the hot loops).
 */
export function assembleLevel(n: number, positions: number, sums: LevelSums, histogram: Float64Array, batchAcc: Float64Array): LevelStats {
  const batchCount = batchAcc.length >>> 2;
  const batchObserved = new Float64Array(batchCount);
  const batchSumLog = new Float64Array(batchCount);
  const batchSumLog2 = new Float64Array(batchCount);
  const batchSumLogCount = new Float64Array(batchCount);
  for (let b = 0; b < batchCount; b++) {
    batchObserved[b] = batchAcc[4 * b];
    batchSumLog[b] = batchAcc[4 * b + 1];
    batchSumLog2[b] = batchAcc[4 * b + 2];
    batchSumLogCount[b] = batchAcc[4 * b + 3];
  }
  return { n, positions, ...sums, histogram, batchObserved, batchSumLog, batchSumLog2, batchSumLogCount };
}

/** A level at which every block occurs once: nothing returns, nothing matches. */
export function uniqueLevel(n: number, positions: number, layout: ScanLayout): LevelStats {
  const sums: LevelSums = {
    distinctBlocks: positions,
    singletons: positions,
    sumCountLogCount: 0,
    forwardObserved: 0,
    forwardSumLog: 0,
    forwardSumLog2: 0,
    observed: 0,
    sumLog: 0,
    sumLog2: 0,
    sumLogRc: 0,
    sumLogRc2: 0,
    matchCount: 0,
  };
  return assembleLevel(n, positions, sums, new Float64Array(layout.bins), new Float64Array(4 * layout.batchCount));
}

/** Entries never reached were unique blocks or last occurrences (censored) or lie past the end (0). */
export function completePaths(paths: Float64Array, layout: ScanLayout): SampledPaths {
  const { N, maxN, sampleCount, strideShift } = layout;
  const positions = new Int32Array(sampleCount);
  for (let s = 0; s < sampleCount; s++) {
    const p = s << strideShift;
    positions[s] = p;
    for (let n = 1; n <= maxN; n++) {
      const k = s * maxN + n - 1;
      if (Number.isNaN(paths[k])) paths[k] = p <= N - n ? -(N - n - p + 1) : 0;
    }
  }
  return { positions, forward: paths, maxN };
}
