import { allocateSymbols, type SymbolArray } from '../sequence/sequence';
import { collectReturns, type LevelSums, type ReturnGeometry } from './collectReturns';
import type { LevelStats, ReturnScan, SampledPaths } from './levelStats';
import { wordLayout } from './packedWords';
import { partitionBinaryLevel } from './partitionBinaryLevel';
import { partitionLevel, refinementBuffers, ScanCancelled, type SampleSink } from './partitionLevel';
import { histogramBinCount, matchWindowFor, powerOfTwoAtLeast } from './scanLayout';

export { ScanCancelled } from './partitionLevel';

/** How far the class groups of a shared scan are: `done` of `total` jobs, for levels firstN..maxN. */
export interface ShareProgress {
  readonly done: number;
  readonly total: number;
  readonly firstN: number;
  /** Positions in play when the groups started. */
  readonly active: number;
}

export interface ScanOptions {
  /** Largest block length, 1 <= maxN <= N. */
  readonly maxN: number;
  /** Number of fine batches of consecutive positions to aim for (rounded so the batch length is a
   * power of two); default 256, enough for estimators that merge them into a few dozen. */
  readonly batchTarget?: number;
  /** Number of sampled forward paths to aim for (every stride-th position, stride a power of two);
   * default 256. */
  readonly sampleTarget?: number;
  /** Window of the sliding-window match lengths; default floor(N/2). */
  readonly matchWindow?: number;
  /** Called after each level with its statistics and the number of positions still in play. */
  readonly onLevel?: (level: LevelStats, active: number) => void;
  /** Polled between classes; returning true abandons the scan with ScanCancelled. */
  readonly shouldStop?: () => boolean;
  /** Shared scans only (splitScan.ts): called when the class groups that compute levels firstN to
   * maxN start (done 0) and as each finishes, since no level is complete before all are. */
  readonly onShares?: (progress: ShareProgress) => void;
  /** Keep the forward return of every position at this one block length (see ReturnScan.captured). */
  readonly captureLevel?: number;
  /** Positions per fine batch (a power of two), overriding batchTarget: chunked runs use the whole
   * sequence's batch length so that their batches line up (chunkedScan.ts). */
  readonly batchLength?: number;
  /** Sampling stride of the paths (a power of two), overriding sampleTarget, for the same reason. */
  readonly sampleStride?: number;
  /** Working arrays kept by the caller across scans (chunkedScan.ts): used when long enough, and
   * filled with new ones otherwise (ScanWorkspace). */
  readonly workspace?: ScanWorkspace;
}

/**
 * The per-position working arrays of scanReturns, kept across scans of one chunked run. Each scan
 * otherwise leaves its arrays (12 bytes a position) to the garbage collector, which reclaims
 * them only after several more: a chunked run of 1e7 symbols in chunks of 1e6 peaked about 50 MB
 * higher without reuse (measured; with a collection forced after each chunk it did not).
 */
export interface ScanWorkspace {
  order?: Int32Array;
  next?: Int32Array;
  words?: Uint16Array;
  nextWords?: Uint16Array;
  scratch?: SymbolArray;
}

/**
 * Makes the workspace's arrays hold `length` positions, so that scans of up to that many reuse them
 * (a chunked run reserves its largest chunk first: the last chunk, which takes the remainder, would
 * otherwise replace the arrays near the end and leave the old ones to the collector).
 */
export function reserveScanWorkspace(space: ScanWorkspace, length: number, alphabetSize: number): void {
  scanWorkArrays(space, length, alphabetSize);
}

/** Views of `length` entries of the workspace's arrays, replaced by new ones when too short. */
export function scanWorkArrays(space: ScanWorkspace, length: number, alphabetSize: number): Required<ScanWorkspace> {
  const { packed } = wordLayout(alphabetSize);
  const wordLength = packed ? length : 0;
  const scratchLength = packed ? 0 : length;
  if ((space.order?.length ?? -1) < length) {
    space.order = new Int32Array(length);
    space.next = new Int32Array(length);
  }
  if ((space.words?.length ?? -1) < wordLength) {
    space.words = new Uint16Array(wordLength);
    space.nextWords = new Uint16Array(wordLength);
  }
  // A scratch array must also be wide enough for the alphabet's ids.
  const wanted = allocateSymbols(0, alphabetSize).BYTES_PER_ELEMENT;
  if (space.scratch === undefined || space.scratch.length < scratchLength || space.scratch.BYTES_PER_ELEMENT < wanted) space.scratch = allocateSymbols(scratchLength, alphabetSize);
  return {
    order: space.order!.subarray(0, length),
    next: space.next!.subarray(0, length),
    words: space.words!.subarray(0, wordLength),
    nextWords: space.nextWords!.subarray(0, wordLength),
    scratch: space.scratch.subarray(0, scratchLength),
  };
}

/**
 * First returns of every n-block, n = 1..maxN, at every position, summarized per level.
 *
 * Class refinement: all positions still in play are kept sorted by (class of their n-block,
 * position). Going from n-1 to n each class is split stably by the symbol at offset n-1 (a counting
 * pass per class). Inside a class, the forward return of a member is the distance to the next member,
 * its backward return the distance to the previous one, and the class size is the block's count.
 * A position whose block becomes unique can never return at a larger n and leaves the active set,
 * so the work per level is proportional to the positions still in play, which shrink geometrically
 * once e^{nh} passes N. Memory: the symbols, two Int32 order arrays and one scratch symbol array,
 * reused across levels (about 10 bytes per symbol for a byte alphabet).
 */
export function scanReturns(symbols: SymbolArray, alphabetSize: number, options: ScanOptions): ReturnScan {
  const N = symbols.length;
  const maxN = options.maxN;
  if (!Number.isInteger(maxN) || maxN < 1 || maxN > N) {
    throw new RangeError(`maxN must be an integer from 1 to the sequence length ${N}; got ${maxN}`);
  }
  if (!Number.isInteger(alphabetSize) || alphabetSize < 1) {
    throw new RangeError(`alphabetSize must be a positive integer; got ${alphabetSize}`);
  }
  const batchLength = options.batchLength ?? powerOfTwoAtLeast(Math.ceil(N / Math.max(1, options.batchTarget ?? 256)));
  const strideGiven = options.sampleStride;
  if (!isPowerOfTwo(batchLength) || (strideGiven !== undefined && !isPowerOfTwo(strideGiven))) {
    throw new RangeError(`batchLength and sampleStride must be powers of two; got ${batchLength} and ${String(strideGiven)}`);
  }
  const batchShift = Math.log2(batchLength);
  const batchCount = Math.ceil(N / batchLength);
  const stride = strideGiven ?? powerOfTwoAtLeast(Math.ceil(N / Math.max(1, options.sampleTarget ?? 256)));
  const strideShift = Math.log2(stride);
  const sampleCount = Math.ceil(N / stride);
  const matchWindow = options.matchWindow ?? matchWindowFor(N);
  if (!Number.isInteger(matchWindow) || matchWindow < 1) {
    throw new RangeError(`matchWindow must be a positive integer; got ${matchWindow}`);
  }
  const matchEnd = N - maxN;
  const bins = histogramBinCount(N);
  const shouldStop = options.shouldStop;
  const captureLevel = options.captureLevel ?? 0;
  if (!Number.isInteger(captureLevel) || captureLevel < 0 || captureLevel > maxN) {
    throw new RangeError(`captureLevel must be an integer from 1 to maxN ${maxN}; got ${captureLevel}`);
  }
  // Positions not reached at the captured level are unique blocks: censored at N - n - i.
  let captured: Int32Array | null = null;
  if (captureLevel > 0) {
    captured = new Int32Array(N - captureLevel + 1);
    for (let i = 0; i < captured.length; i++) captured[i] = -(N - captureLevel - i + 1);
  }

  // Sampled forward paths start unset (NaN) and are completed once the scan ends.
  const paths = new Float64Array(sampleCount * maxN).fill(NaN);
  const pathCounts = new Float64Array(sampleCount * maxN);

  // Small alphabets: each entry carries the next `perWord` symbols of its position packed in 16 bits,
  // refreshed from the sequence once every perWord levels. This turns the random read of
  // x[p + n - 1] (the dominant cost once classes are scattered over the sequence) into a sequential
  // read of the carried word on all other levels.
  const { bits, perWord, packed } = wordLayout(alphabetSize);
  const binary = alphabetSize === 2;
  const work = scanWorkArrays(options.workspace ?? {}, N, alphabetSize);
  let { order, next, words, nextWords } = work;
  for (let i = 0; i < N; i++) order[i] = i;
  if (N > 0) order[0] = ~0;
  const buffers = refinementBuffers(symbols, alphabetSize, work.scratch);
  const sample: SampleSink = { mask: stride - 1, shift: strideShift, maxN, forward: paths, counts: pathCounts };
  const geometry: ReturnGeometry = { N, batchShift, matchWindow, matchEnd };
  let activeLength = N;

  const levels: LevelStats[] = [];
  let removedAlive = 0; // positions whose block became unique earlier and still have an n-block
  let n = 1;
  for (; n <= maxN && activeLength > 0; n++) {
    if (shouldStop !== undefined && shouldStop()) throw new ScanCancelled();
    const wordShift = ((n - 1) % perWord) * bits;
    if (packed && wordShift === 0) refreshWords(symbols, n - 1, bits, perWord, order, activeLength, words, nextWords);
    const partition = binary ? partitionBinaryLevel : partitionLevel;
    const split = partition(buffers, order, words, activeLength, next, nextWords, n, wordShift, sample, shouldStop);
    const sums = emptySums(bins, batchCount);
    collectReturns(next, split.active, n, geometry, sample, n === captureLevel ? captured : null, sums);
    if (!split.droppedFromActive && n >= 2) removedAlive--; // the dropped position had become unique before
    const singletons = removedAlive + split.newSingletons;
    removedAlive += split.newSingletons;
    const level = levelFromSums(n, N - n + 1, sums, singletons, batchCount);
    levels.push(level);
    activeLength = split.active;
    const swap = order;
    order = next;
    next = swap;
    const swapWords = words;
    words = nextWords;
    nextWords = swapWords;
    options.onLevel?.(level, activeLength);
  }
  const exhausted = n <= maxN;
  // Every block is unique from here on: no classes, every position a singleton, nothing returns.
  for (; n <= maxN; n++) {
    const positions = N - n + 1;
    const level = levelFromSums(n, positions, emptySums(bins, batchCount), positions, batchCount);
    levels.push(level);
    options.onLevel?.(level, 0);
  }
  return {
    length: N,
    alphabetSize,
    maxN,
    levels,
    batchLength,
    batchCount,
    matchWindow,
    matchPositions: Math.max(0, matchEnd - matchWindow),
    paths: completePaths(paths, pathCounts, N, maxN, stride, sampleCount),
    exhausted,
    captured,
  };
}

/**
 * Load into words[k] the next perWord symbols (from offset on) of the position at order[k].
 * First every position's word is built in position order with a rolling window (sequential), then
 * gathered in class order: one random read per entry instead of perWord, and independent reads, so
 * the processor overlaps their cache misses. `spare` is overwritten.
 */
export function refreshWords(
  symbols: SymbolArray,
  offset: number,
  bits: number,
  perWord: number,
  order: Int32Array,
  activeLength: number,
  words: Uint16Array,
  spare: Uint16Array,
): void {
  const N = symbols.length;
  const wordMask = (1 << (bits * perWord)) - 1;
  let w = 0;
  for (let p = N - 1; p >= 0; p--) {
    const q = p + offset;
    w = ((w << bits) | (q < N ? symbols[q] : 0)) & wordMask;
    spare[p] = w;
  }
  for (let k = 0; k < activeLength; k++) {
    let p = order[k];
    if (p < 0) p = ~p;
    words[k] = spare[p];
  }
}

function isPowerOfTwo(x: number): boolean {
  return Number.isInteger(x) && x >= 1 && x <= 2 ** 30 && (x & (x - 1)) === 0;
}

/** Sums of a level before any return is added. */
export function emptySums(bins: number, batchCount: number): LevelSums {
  return {
    classes: 0,
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
    batches: new Float64Array(4 * batchCount),
    histogram: new Float64Array(bins),
  };
}

/** Sampled paths written by one share of a shared scan (NaN where it wrote nothing), copied into
 * `into`: the shares write disjoint entries, so merging is taking what each wrote. */
export interface WrittenPaths {
  readonly paths: Float64Array;
  readonly pathCounts: Float64Array;
}

export function mergeWrittenPaths(into: WrittenPaths, from: WrittenPaths): void {
  for (let k = 0; k < into.paths.length; k++) {
    if (!Number.isNaN(from.paths[k])) {
      into.paths[k] = from.paths[k];
      into.pathCounts[k] = from.pathCounts[k];
    }
  }
}

/** Entries never reached were unique blocks (censored, count 1) or lie past the end (0). */
export function completePaths(
  paths: Float64Array,
  counts: Float64Array,
  N: number,
  maxN: number,
  stride: number,
  sampleCount: number,
): SampledPaths {
  const positions = new Int32Array(sampleCount);
  for (let s = 0; s < sampleCount; s++) {
    const p = s * stride;
    positions[s] = p;
    for (let n = 1; n <= maxN; n++) {
      const k = s * maxN + n - 1;
      if (Number.isNaN(paths[k])) {
        const inside = p <= N - n;
        paths[k] = inside ? -(N - n - p + 1) : 0;
        counts[k] = inside ? 1 : 0;
      }
    }
  }
  return { positions, forward: paths, counts, maxN };
}

/** One level's LevelStats from its sums; the batch sums are laid out one array per quantity. */
export function levelFromSums(n: number, positions: number, sums: LevelSums, singletons: number, batchCount: number): LevelStats {
  const batchObserved = new Float64Array(batchCount);
  const batchSumLog = new Float64Array(batchCount);
  const batchSumLog2 = new Float64Array(batchCount);
  const batchSumLogCount = new Float64Array(batchCount);
  const acc = sums.batches;
  for (let b = 0; b < batchCount; b++) {
    batchObserved[b] = acc[4 * b];
    batchSumLog[b] = acc[4 * b + 1];
    batchSumLog2[b] = acc[4 * b + 2];
    batchSumLogCount[b] = acc[4 * b + 3];
  }
  return {
    n,
    positions,
    distinctBlocks: sums.classes + singletons,
    singletons,
    sumCountLogCount: sums.sumCountLogCount,
    forwardObserved: sums.forwardObserved,
    forwardSumLog: sums.forwardSumLog,
    forwardSumLog2: sums.forwardSumLog2,
    observed: sums.observed,
    sumLog: sums.sumLog,
    sumLog2: sums.sumLog2,
    sumLogRc: sums.sumLogRc,
    sumLogRc2: sums.sumLogRc2,
    histogram: sums.histogram,
    matchCount: sums.matchCount,
    batchObserved,
    batchSumLog,
    batchSumLog2,
    batchSumLogCount,
  };
}
