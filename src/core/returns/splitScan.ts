import { allocateSymbols, type SymbolArray } from '../sequence/sequence';
import { addReturnSums } from './addReturnSums';
import { collectReturns, type LevelSums, type ReturnGeometry } from './collectReturns';
import type { LevelStats, ReturnScan } from './levelStats';
import { partitionBinaryLevel } from './partitionBinaryLevel';
import { partitionLevel, ScanCancelled, type RefinementBuffers, type SampleSink } from './partitionLevel';
import { histogramBinCount, matchWindowFor, powerOfTwoAtLeast } from './scanLayout';
import { completePaths, emptySums, levelFromSums, refreshWords, type ScanOptions } from './scanReturns';

/**
 * The classes of one share of the work after the split, and what is needed to refine them alone.
 * Everything is plain data (typed arrays and numbers), so a task can be posted to a worker thread;
 * `symbols` may live in a SharedArrayBuffer, read only.
 */
export interface ScanGroupTask {
  readonly symbols: SymbolArray;
  readonly alphabetSize: number;
  /** First block length this group refines (the split level + 1) and the last. */
  readonly firstN: number;
  readonly maxN: number;
  /** The group's classes after the split level: positions, class starts marked ~p. Owned by the group. */
  readonly order: Int32Array;
  /** Carried words of the same entries (empty for alphabets above 256). Owned by the group. */
  readonly words: Uint16Array;
  readonly batchLength: number;
  readonly batchCount: number;
  readonly stride: number;
  readonly matchWindow: number;
}

/** One group's sums per level firstN..maxN, with the entries it still had in play after each. */
export interface ScanGroupResult {
  readonly sums: LevelSums[];
  readonly active: number[];
  /** Sampled paths written by this group (NaN elsewhere), layout as SampledPaths. */
  readonly paths: Float64Array;
  readonly pathCounts: Float64Array;
}

/** Runs the groups' tasks: in this process (tests, one thread) or on worker threads (hosts). */
export type GroupRunner = (tasks: ScanGroupTask[]) => ScanGroupResult[] | Promise<ScanGroupResult[]>;

/** Classes per group wanted at the split, so that sharing them by size balances well. */
const CLASSES_PER_GROUP = 16;

/**
 * Refines one group's classes for every level from firstN to maxN, with the same partition and
 * statistics passes as scanReturns. The group's classes are independent of all others: a class
 * only ever splits into subclasses of itself, so no communication is needed.
 */
export function scanGroup(task: ScanGroupTask, shouldStop?: () => boolean): ScanGroupResult {
  const { symbols, alphabetSize, firstN, maxN, batchLength, batchCount, stride, matchWindow } = task;
  const N = symbols.length;
  const bits = Math.max(1, Math.ceil(Math.log2(alphabetSize)));
  const perWord = bits <= 8 ? Math.floor(16 / bits) : 1;
  const packed = perWord > 1;
  const binary = alphabetSize === 2;
  const bins = histogramBinCount(N);
  const sampleCount = Math.ceil(N / stride);
  const paths = new Float64Array(sampleCount * maxN).fill(NaN);
  const pathCounts = new Float64Array(sampleCount * maxN);
  const sample: SampleSink = { mask: stride - 1, shift: Math.log2(stride), maxN, forward: paths, counts: pathCounts };
  const geometry: ReturnGeometry = { N, batchShift: Math.log2(batchLength), matchWindow, matchEnd: N - maxN };
  let order: Int32Array = task.order;
  let next: Int32Array = new Int32Array(order.length);
  let words: Uint16Array = task.words;
  let nextWords: Uint16Array = new Uint16Array(packed ? order.length : 0);
  const buffers = refinementBuffers(symbols, alphabetSize, bits, packed, order.length);
  const sums: LevelSums[] = [];
  const active: number[] = [];
  let activeLength = order.length;
  for (let n = firstN; n <= maxN; n++) {
    const level = emptySums(bins, batchCount);
    if (activeLength > 0) {
      if (shouldStop !== undefined && shouldStop()) throw new ScanCancelled();
      const wordShift = ((n - 1) % perWord) * bits;
      if (packed && wordShift === 0) gatherWords(symbols, n - 1, bits, perWord, order, activeLength, words);
      const partition = binary ? partitionBinaryLevel : partitionLevel;
      const split = partition(buffers, order, words, activeLength, next, nextWords, n, wordShift, sample, shouldStop);
      collectReturns(next, split.active, n, geometry, sample, null, level);
      activeLength = split.active;
      [order, next] = [next, order];
      [words, nextWords] = [nextWords, words];
    }
    sums.push(level);
    active.push(activeLength);
  }
  return { sums, active, paths, pathCounts };
}

/**
 * The refinement's working buffers for `length` positions of `symbols`, `bits` bits a symbol; the
 * scratch copy of the symbols is needed only when they are not packed into words.
 */
function refinementBuffers(symbols: SymbolArray, alphabetSize: number, bits: number, packed: boolean, length: number): RefinementBuffers {
  return {
    symbols,
    packed,
    symbolMask: (1 << bits) - 1,
    counts: new Int32Array(alphabetSize),
    touched: new Int32Array(Math.min(alphabetSize, symbols.length) + 1),
    scratch: allocateSymbols(packed ? 0 : length, alphabetSize),
  };
}

/**
 * words[k] = the next perWord symbols from offset on of the position at order[k], read directly
 * (the perWord symbols are adjacent, usually one cache line). scanReturns instead builds every
 * position's word in a rolling pass over the whole sequence; a group holds only a share of the
 * positions, so that pass (and its N-entry buffer) would cost every group the whole sequence.
 */
function gatherWords(symbols: SymbolArray, offset: number, bits: number, perWord: number, order: Int32Array, activeLength: number, words: Uint16Array): void {
  const N = symbols.length;
  for (let k = 0; k < activeLength; k++) {
    let p = order[k];
    if (p < 0) p = ~p;
    let w = 0;
    for (let j = 0; j < perWord; j++) {
      const q = p + offset + j;
      if (q < N) w |= symbols[q] << (j * bits);
    }
    words[k] = w;
  }
}

/** The classes of order[0, active) as [start, end) runs, and the size of the largest. */
export function classRuns(order: Int32Array, active: number): { starts: Int32Array; ends: Int32Array; largest: number } {
  let count = 0;
  for (let k = 0; k < active; k++) if (order[k] < 0) count++;
  const starts = new Int32Array(count);
  const ends = new Int32Array(count);
  let c = -1;
  let largest = 0;
  for (let k = 0; k < active; k++) {
    if (order[k] < 0) {
      if (c >= 0) largest = Math.max(largest, k - starts[c]);
      starts[++c] = k;
    }
    ends[c] = k + 1;
  }
  if (c >= 0) largest = Math.max(largest, ends[c] - starts[c]);
  return { starts, ends, largest };
}

/**
 * Shares classes among `groups` by size: largest first, each to the group with the least so far
 * (longest-processing-time-first scheduling, Graham 1969: within 4/3 of the best balance). Returns
 * for each group the indices of its classes, in their original order.
 */
export function assignClasses(sizes: ArrayLike<number>, groups: number): number[][] {
  const byDecreasingSize = Array.from({ length: sizes.length }, (_, i) => i).sort((a, b) => sizes[b] - sizes[a] || a - b);
  const load = new Float64Array(groups);
  const members: number[][] = Array.from({ length: groups }, () => []);
  for (const i of byDecreasingSize) {
    let g = 0;
    for (let h = 1; h < groups; h++) if (load[h] < load[g]) g = h;
    load[g] += sizes[i];
    members[g].push(i);
  }
  for (const m of members) m.sort((a, b) => a - b);
  return members;
}

/**
 * scanReturns with the work shared among `groups` after the first levels: once the classes number
 * at least 16 per group and none holds more than 1/groups of the positions in play, they are shared
 * among `groups` by size (assignClasses), each group refined on its own for all later n (runGroups may run them on worker threads), and the groups'
 * sums are added per level. Return times and every count are exactly those of scanReturns; sums of
 * logarithms agree to rounding (they are added in a different grouping). Levels before the split
 * are reported through onLevel as they finish, later ones after the groups are done.
 * @param classesPerGroup classes per group wanted before splitting (default 16; tests split earlier)
 * @throws RangeError as scanReturns, and for captureLevel (not supported here)
 */
export async function scanReturnsSplit(
  symbols: SymbolArray,
  alphabetSize: number,
  options: ScanOptions,
  groups: number,
  runGroups: GroupRunner,
  classesPerGroup = CLASSES_PER_GROUP,
): Promise<ReturnScan> {
  const N = symbols.length;
  const maxN = options.maxN;
  if (!Number.isInteger(maxN) || maxN < 1 || maxN > N) {
    throw new RangeError(`maxN must be an integer from 1 to the sequence length ${N}; got ${maxN}`);
  }
  if (!Number.isInteger(alphabetSize) || alphabetSize < 1) throw new RangeError(`alphabetSize must be a positive integer; got ${alphabetSize}`);
  if (!Number.isInteger(groups) || groups < 1) throw new RangeError(`groups must be a whole number >= 1; got ${groups}`);
  if ((options.captureLevel ?? 0) > 0) throw new RangeError('captureLevel needs the single-threaded scan');
  const batchLength = options.batchLength ?? powerOfTwoAtLeast(Math.ceil(N / Math.max(1, options.batchTarget ?? 256)));
  const batchCount = Math.ceil(N / batchLength);
  const stride = options.sampleStride ?? powerOfTwoAtLeast(Math.ceil(N / Math.max(1, options.sampleTarget ?? 256)));
  const sampleCount = Math.ceil(N / stride);
  const matchWindow = options.matchWindow ?? matchWindowFor(N);
  const bins = histogramBinCount(N);
  const shouldStop = options.shouldStop;
  const paths = new Float64Array(sampleCount * maxN).fill(NaN);
  const pathCounts = new Float64Array(sampleCount * maxN);

  // Levels before the split: the loop of scanReturns.
  let order = new Int32Array(N);
  let next = new Int32Array(N);
  const bits = Math.max(1, Math.ceil(Math.log2(alphabetSize)));
  const perWord = bits <= 8 ? Math.floor(16 / bits) : 1;
  const packed = perWord > 1;
  let words = new Uint16Array(packed ? N : 0);
  let nextWords = new Uint16Array(packed ? N : 0);
  for (let i = 0; i < N; i++) order[i] = i;
  if (N > 0) order[0] = ~0;
  const buffers = refinementBuffers(symbols, alphabetSize, bits, packed, N);
  const sample: SampleSink = { mask: stride - 1, shift: Math.log2(stride), maxN, forward: paths, counts: pathCounts };
  const geometry: ReturnGeometry = { N, batchShift: Math.log2(batchLength), matchWindow, matchEnd: N - maxN };
  const levels: LevelStats[] = [];
  let activeLength = N;
  let firstEmpty = maxN + 1; // first level after which nothing was left in play
  const finish = (n: number, sums: LevelSums, active: number): void => {
    const level = levelFromSums(n, N - n + 1, sums, N - n + 1 - active, batchCount);
    levels.push(level);
    if (active === 0 && firstEmpty > maxN) firstEmpty = n;
    options.onLevel?.(level, active);
  };
  let n = 1;
  let split = false;
  for (; n <= maxN && !split; n++) {
    if (shouldStop !== undefined && shouldStop()) throw new ScanCancelled();
    const sums = emptySums(bins, batchCount);
    if (activeLength > 0) {
      const wordShift = ((n - 1) % perWord) * bits;
      if (packed && wordShift === 0) refreshWords(symbols, n - 1, bits, perWord, order, activeLength, words, nextWords);
      const partition = alphabetSize === 2 ? partitionBinaryLevel : partitionLevel;
      const outcome = partition(buffers, order, words, activeLength, next, nextWords, n, wordShift, sample, shouldStop);
      collectReturns(next, outcome.active, n, geometry, sample, null, sums);
      activeLength = outcome.active;
      [order, next] = [next, order];
      [words, nextWords] = [nextWords, words];
    }
    finish(n, sums, activeLength);
    // The largest class is only looked for once there are classes enough (one pass over the order).
    split = groups > 1 && activeLength > 0 && sums.classes >= classesPerGroup * groups && classRuns(order, activeLength).largest * groups <= activeLength;
  }

  if (split && n <= maxN) {
    const runs = classRuns(order, activeLength);
    const sizes = runs.ends.map((e, i) => e - runs.starts[i]);
    const tasks: ScanGroupTask[] = assignClasses(sizes, groups).map((members) => {
      let length = 0;
      for (const i of members) length += sizes[i];
      const groupOrder = new Int32Array(length);
      const groupWords = new Uint16Array(packed ? length : 0);
      let at = 0;
      for (const i of members) {
        groupOrder.set(order.subarray(runs.starts[i], runs.ends[i]), at);
        if (packed) groupWords.set(words.subarray(runs.starts[i], runs.ends[i]), at);
        at += sizes[i];
      }
      return { symbols, alphabetSize, firstN: n, maxN, order: groupOrder, words: groupWords, batchLength, batchCount, stride, matchWindow };
    });
    // The whole-sequence arrays are not needed any more; let them go before the groups allocate
    // (the async function's frame would keep them alive until it returns).
    // eslint-disable-next-line no-useless-assignment
    order = next = new Int32Array(0);
    // eslint-disable-next-line no-useless-assignment
    words = nextWords = new Uint16Array(0);
    const results = await runGroups(tasks);
    for (const r of results) {
      for (let k = 0; k < paths.length; k++) {
        if (!Number.isNaN(r.paths[k])) {
          paths[k] = r.paths[k];
          pathCounts[k] = r.pathCounts[k];
        }
      }
    }
    for (let j = 0; n <= maxN; n++, j++) {
      const sums = results.map((r) => r.sums[j]).reduce(addSums);
      finish(n, sums, results.reduce((s, r) => s + r.active[j], 0));
    }
  }
  for (; n <= maxN; n++) finish(n, emptySums(bins, batchCount), 0);
  return {
    length: N,
    alphabetSize,
    maxN,
    levels,
    batchLength,
    batchCount,
    matchWindow,
    matchPositions: Math.max(0, N - maxN - matchWindow),
    paths: completePaths(paths, pathCounts, N, maxN, stride, sampleCount),
    exhausted: firstEmpty < maxN,
    captured: null,
  };
}

/** Two groups' sums of one level, added (a new object; neither input is changed). */
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
