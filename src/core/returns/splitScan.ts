import { allocateSymbols, type SymbolArray } from '../sequence/sequence';
import { addSums } from './addReturnSums';
import { collectReturns, type LevelSums, type ReturnGeometry } from './collectReturns';
import type { LevelStats, ReturnScan } from './levelStats';
import { wordLayout } from './packedWords';
import { partitionBinaryLevel } from './partitionBinaryLevel';
import { partitionLevel, refinementBuffers, ScanCancelled, type RefinementBuffers, type SampleSink } from './partitionLevel';
import { assembleOrder, classSlices, gatherSlices, prefixByRanges } from './prefixByRanges';
import { sharedBuffer } from './sharedBuffer';
import type { ScanJob, ScanRunner } from './scanJobs';
import { histogramBinCount, matchWindowFor, powerOfTwoAtLeast } from './scanLayout';
import { completePaths, emptySums, levelFromSums, mergeWrittenPaths, scanReturns, scanWorkArrays, type ScanOptions, type ScanWorkspace, type WrittenPaths } from './scanReturns';

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
  /** Where the group's classes after the split level are: slices of shared arrays of positions,
   * each class ascending (classSlices: [piece, start, length, 1 at a class start] per slice). */
  readonly pieces: readonly Int32Array[];
  readonly slices: Int32Array;
  /** The carried words of the same entries at the refresh before firstN, or empty arrays: then the
   * group gathers them from `words`. */
  readonly pieceWords: readonly Uint16Array[];
  /** The carried words at offset 0 of every position (packedWords.ts; shared, read only; empty for
   * alphabets above 256). */
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

/**
 * Sequences shorter than this are scanned on one thread by default (command line and page): below
 * it, starting the threads and the range passes cost about what sharing saves (measured on 2 cores:
 * 1e6 fair-coin symbols 0.73 s on one thread against 0.90 s on two, 3e6 about 2.0 s both).
 */
export const SHARE_FROM_SYMBOLS = 5_000_000;

/** Classes per group wanted at the split, so that sharing them by size balances well. */
const CLASSES_PER_GROUP = 16;

/** Jobs per group after the split: more than one, so that a thread whose jobs ran short takes the
 * next one while another is still busy (the work of a class is not known from its size alone). */
const JOBS_PER_GROUP = 4;

/**
 * Refines one group's classes for every level from firstN to maxN, with the same partition and
 * statistics passes as scanReturns. The group's classes are independent of all others: a class
 * only ever splits into subclasses of itself, so no communication is needed.
 */
export function scanGroup(task: ScanGroupTask, workspace: ScanWorkspace = {}): ScanGroupResult {
  const { symbols, alphabetSize, firstN, maxN, batchLength, batchCount, stride, matchWindow, words: allWords } = task;
  const N = symbols.length;
  const bins = histogramBinCount(N);
  const sampleCount = Math.ceil(N / stride);
  const paths = new Float64Array(sampleCount * maxN).fill(NaN);
  const pathCounts = new Float64Array(sampleCount * maxN);
  const sample: SampleSink = { mask: stride - 1, shift: Math.log2(stride), maxN, forward: paths, counts: pathCounts };
  const geometry: ReturnGeometry = { N, batchShift: Math.log2(batchLength), matchWindow, matchEnd: N - maxN };
  const entries = sliceEntries(task.slices);
  const { scratch, ...arrays } = scanWorkArrays(workspace, entries, alphabetSize);
  gatherSlices(task.pieces, task.pieceWords, task.slices, arrays.order, arrays.words);
  // Carried words as in scanReturns, refreshed at multiples of perWord from the shared array, and
  // at firstN too unless the slices brought them. A group cannot poll a stop request (it runs on
  // another thread); a host that cancels ends its threads instead.
  const r: Refinement = { ...arrays, active: entries, wordsLoaded: task.pieceWords.some((w) => w.length > 0) };
  const context: RefinementContext = { alphabetSize, allWords, buffers: refinementBuffers(symbols, alphabetSize, scratch), sample, geometry, shouldStop: undefined };
  const sums: LevelSums[] = [];
  const active: number[] = [];
  for (let n = firstN; n <= maxN; n++) {
    const level = emptySums(bins, batchCount);
    if (r.active > 0) refineLevel(r, n, context, level);
    sums.push(level);
    active.push(r.active);
  }
  return { sums, active, paths, pathCounts };
}

/** One class refinement between two levels: the entries in play and their carried words, and the
 * spare arrays the next level is written to. */
interface RefinementArrays {
  order: Int32Array;
  next: Int32Array;
  words: Uint16Array;
  nextWords: Uint16Array;
}

interface Refinement extends RefinementArrays {
  active: number;
  wordsLoaded: boolean;
}

/** What stays fixed across the levels of a refinement. */
interface RefinementContext {
  readonly alphabetSize: number;
  /** The shared carried words at offset 0 of every position (packedWords.ts). */
  readonly allWords: Uint16Array;
  readonly buffers: RefinementBuffers;
  readonly sample: SampleSink;
  readonly geometry: ReturnGeometry;
  readonly shouldStop: (() => boolean) | undefined;
}

/**
 * Level n of a refinement, as one turn of scanReturns' loop: the carried words refreshed at
 * multiples of perWord (or first of all, when none are loaded yet), every class split by its
 * members' symbol at offset n - 1, the level's returns summed into `sums`, and the arrays swapped.
 */
function refineLevel(r: Refinement, n: number, context: RefinementContext, sums: LevelSums): void {
  const { alphabetSize, allWords, buffers, sample, geometry, shouldStop } = context;
  const { bits, perWord, packed } = wordLayout(alphabetSize);
  const wordShift = ((n - 1) % perWord) * bits;
  if (packed && (wordShift === 0 || !r.wordsLoaded)) gatherWords(allWords, n - 1 - ((n - 1) % perWord), r.order, r.active, r.words);
  r.wordsLoaded = true;
  const partition = alphabetSize === 2 ? partitionBinaryLevel : partitionLevel;
  const outcome = partition(buffers, r.order, r.words, r.active, r.next, r.nextWords, n, wordShift, sample, shouldStop);
  collectReturns(r.next, outcome.active, n, geometry, sample, null, sums);
  r.active = outcome.active;
  [r.order, r.next] = [r.next, r.order];
  [r.words, r.nextWords] = [r.nextWords, r.words];
}

/** words[k] = the carried word at `offset` of the position at order[k]: allWords[p + offset]. */
function gatherWords(allWords: Uint16Array, offset: number, order: Int32Array, activeLength: number, words: Uint16Array): void {
  for (let k = 0; k < activeLength; k++) {
    let p = order[k];
    if (p < 0) p = ~p;
    words[k] = allWords[p + offset];
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
 * scanReturns with the work shared among `groups` threads from the first level on. Levels up to a
 * small depth (whose blocks fit a table, prefixLevels.ts) are computed by equal ranges of positions;
 * from there the classes of equal blocks are independent, so once they number at least
 * `classesPerGroup` per group and none holds more than 1/groups of the positions in play, they are
 * shared out as JOBS_PER_GROUP jobs per group, balanced by size (assignClasses), each refined on its
 * own for all later n; a free thread takes the next job (jobPool.ts). When the classes at the depth
 * are too few or too uneven, this thread refines them further until they are not. The sums of the
 * shares are added per level. Return times and every count are exactly those of scanReturns; sums
 * of logarithms agree to rounding (the same terms, added in another grouping). Levels are reported
 * through onLevel after each shared step, in order.
 * @param classesPerGroup classes per group wanted before sharing (default 16; tests share earlier)
 * @throws RangeError as scanReturns, and for captureLevel (not supported here)
 */
export async function scanReturnsSplit(
  symbols: SymbolArray,
  alphabetSize: number,
  options: ScanOptions,
  groups: number,
  run: ScanRunner,
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
  if (groups === 1) return scanReturns(symbols, alphabetSize, options);
  const batchLength = options.batchLength ?? powerOfTwoAtLeast(Math.ceil(N / Math.max(1, options.batchTarget ?? 256)));
  const batchCount = Math.ceil(N / batchLength);
  const stride = options.sampleStride ?? powerOfTwoAtLeast(Math.ceil(N / Math.max(1, options.sampleTarget ?? 256)));
  const sampleCount = Math.ceil(N / stride);
  const matchWindow = options.matchWindow ?? matchWindowFor(N);
  const bins = histogramBinCount(N);
  const shouldStop = options.shouldStop;
  const paths = new Float64Array(sampleCount * maxN).fill(NaN);
  const pathCounts = new Float64Array(sampleCount * maxN);
  const { packed } = wordLayout(alphabetSize);
  const sample: SampleSink = { mask: stride - 1, shift: Math.log2(stride), maxN, forward: paths, counts: pathCounts };
  const geometry: ReturnGeometry = { N, batchShift: Math.log2(batchLength), matchWindow, matchEnd: N - maxN };
  const levels: LevelStats[] = [];
  let firstEmpty = maxN + 1; // first level after which nothing was left in play
  const finish = (n: number, sums: LevelSums, active: number): void => {
    const level = levelFromSums(n, N - n + 1, sums, N - n + 1 - active, batchCount);
    levels.push(level);
    if (active === 0 && firstEmpty > maxN) firstEmpty = n;
    options.onLevel?.(level, active);
  };
  // Filled by the range passes; read by every later refresh of the carried words, in any thread.
  const allWords = new Uint16Array(packed ? sharedBuffer(2 * N) : new ArrayBuffer(0));
  const mergePaths = (from: WrittenPaths): void => mergeWrittenPaths({ paths, pathCounts }, from);
  const wantedClasses = classesPerGroup * groups;
  const shareable = (classSizes: Int32Array, active: number, classes: number): boolean =>
    active > 0 && classes >= wantedClasses && largestOf(classSizes) * groups <= active;

  if (shouldStop !== undefined && shouldStop()) throw new ScanCancelled();
  const layout = { batchLength, batchCount, stride, matchWindow, maxN, bins };
  const prefix = await prefixByRanges(symbols, alphabetSize, groups, wantedClasses, layout, allWords, run);
  const depth = prefix.depth;
  prefix.sums.forEach((sums, j) => finish(j + 1, sums, prefix.active[j]));
  mergePaths(prefix);
  let n = depth + 1;
  let activeLength = prefix.active[depth - 1];
  const jobOf = (pieces: readonly Int32Array[], pieceWords: readonly Uint16Array[], slices: Int32Array): ScanJob => ({
    kind: 'group',
    task: { symbols, alphabetSize, firstN: n, maxN, pieces, pieceWords, slices, words: allWords, batchLength, batchCount, stride, matchWindow },
  });
  const jobCount = (classes: number): number => Math.min(classes, groups * JOBS_PER_GROUP);
  // This thread refines the classes further while they are too few or too uneven to share: the
  // order once they are (n is then the first level left), or null when maxN comes first.
  const refineUntilShareable = (start: Int32Array): Int32Array | null => {
    const r: Refinement = {
      order: start,
      next: new Int32Array(activeLength),
      words: new Uint16Array(packed ? activeLength : 0),
      nextWords: new Uint16Array(packed ? activeLength : 0),
      active: activeLength,
      wordsLoaded: false,
    };
    const context: RefinementContext = { alphabetSize, allWords, buffers: refinementBuffers(symbols, alphabetSize, allocateSymbols(packed ? 0 : activeLength, alphabetSize)), sample, geometry, shouldStop };
    for (; n <= maxN; n++) {
      if (shouldStop !== undefined && shouldStop()) throw new ScanCancelled();
      const sums = emptySums(bins, batchCount);
      if (r.active > 0) refineLevel(r, n, context, sums);
      activeLength = r.active;
      finish(n, sums, activeLength);
      if (n < maxN && activeLength > 0 && sums.classes >= wantedClasses && classRuns(r.order, activeLength).largest * groups <= activeLength) {
        n++;
        return r.order;
      }
    }
    return null;
  };
  let jobs: ScanJob[] | null = null;
  if (n <= maxN && shareable(prefix.classSizes, activeLength, prefix.sums[depth - 1].classes)) {
    // The usual case: the groups read their classes straight from the ranges' shared layouts.
    const blocks = Array.from(prefix.classSizes.keys()).filter((b) => prefix.classSizes[b] > 0);
    const shares = assignClasses(blocks.map((b) => prefix.classSizes[b]), jobCount(blocks.length));
    jobs = shares.map((members) => jobOf(prefix.pieces, prefix.pieceWords, classSlices(prefix, members.map((i) => blocks[i]))));
  } else if (n <= maxN && activeLength > 0) {
    const refined = refineUntilShareable(assembleOrder(prefix, activeLength));
    if (refined !== null) {
      const runs = classRuns(refined, activeLength);
      const sizes = runs.ends.map((e, i) => e - runs.starts[i]);
      // One shared piece, markers taken off: the slices say where classes start.
      const piece = new Int32Array(sharedBuffer(4 * activeLength));
      for (let k = 0; k < activeLength; k++) piece[k] = refined[k] < 0 ? ~refined[k] : refined[k];
      jobs = assignClasses(sizes, jobCount(sizes.length)).map((members) =>
        jobOf([piece], [], Int32Array.from(members.flatMap((i) => [0, runs.starts[i], sizes[i], 1]))),
      );
    }
  }
  if (jobs !== null) {
    // Largest first: a thread's first group then sizes the arrays it keeps for the rest (scanJobs.ts).
    jobs.sort((a, b) => entriesOf(b) - entriesOf(a));
    // Jobs on other threads cannot poll shouldStop; a host that cancels ends its threads instead.
    if (shouldStop !== undefined && shouldStop()) throw new ScanCancelled();
    const shares = { total: jobs.length, firstN: n, active: activeLength };
    options.onShares?.({ ...shares, done: 0 });
    let done = 0;
    const results = (await run(jobs, options.onShares === undefined ? undefined : () => options.onShares?.({ ...shares, done: ++done }))) as ScanGroupResult[];
    results.forEach(mergePaths);
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

/** Entries of a group's slices (classSlices: the length is the third of each four). */
function sliceEntries(slices: Int32Array): number {
  let entries = 0;
  for (let i = 2; i < slices.length; i += 4) entries += slices[i];
  return entries;
}

function entriesOf(job: ScanJob): number {
  return job.kind === 'group' ? sliceEntries(job.task.slices) : 0;
}

function largestOf(values: Int32Array): number {
  let largest = 0;
  for (const v of values) if (v > largest) largest = v;
  return largest;
}
