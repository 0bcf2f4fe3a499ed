import type { SymbolArray } from '../sequence/sequence';
import { addSums } from './addReturnSums';
import type { LevelSums } from './collectReturns';
import { prefixClassSums, prefixDepths, prefixTable, type PrefixCountResult, type PrefixTable, type ScanLayout, type PrefixCountTask, type PrefixLevelsResult } from './prefixLevels';
import { wordLayout } from './packedWords';
import type { ScanJob, ScanRunner } from './scanJobs';
import { mergeWrittenPaths } from './scanReturns';

export interface PrefixOutcome {
  /** Levels done by the range passes. */
  readonly depth: number;
  /** Sums and positions in play of levels 1..depth. */
  readonly sums: LevelSums[];
  readonly active: number[];
  /** Each range's positions in play after level depth, by class and then position (laidOut of
   * scanPrefixLevels), and their carried words at the next refresh's offset (empty if not packed). */
  readonly pieces: Int32Array[];
  readonly pieceWords: Uint16Array[];
  /** Size of each depth-block's class, 0 for a block seen once or never. */
  readonly classSizes: Int32Array;
  /** Where class b starts in piece r, and how long it is there: [r][b]. */
  readonly sliceStarts: Int32Array[];
  readonly sliceLengths: Int32Array[];
  /** Sampled paths of levels 1..depth (NaN where not written). */
  readonly paths: Float64Array;
  readonly pathCounts: Float64Array;
}

/**
 * Levels 1..depth of the scan by `ranges` equal ranges of positions, each pass a batch of jobs for
 * `run` (prefixLevels.ts): counts (and the carried words) up to the deepest level allowed, then this
 * thread chooses the depth (the first whose classes number `wantedClasses` with none above 1/ranges
 * of the positions in play) and joins the counts, then the pairs and the layout.
 */
export async function prefixByRanges(
  symbols: SymbolArray,
  alphabetSize: number,
  ranges: number,
  wantedClasses: number,
  layout: ScanLayout,
  words: Uint16Array,
  run: ScanRunner,
): Promise<PrefixOutcome> {
  const N = symbols.length;
  const depths = prefixDepths(alphabetSize, layout.maxN, wantedClasses);
  const tasks: PrefixCountTask[] = Array.from({ length: ranges }, (_, r) => ({
    symbols,
    alphabetSize,
    depth: depths.most,
    start: Math.round((r * N) / ranges),
    end: Math.round(((r + 1) * N) / ranges),
    words,
  }));
  const counted = (await run(tasks.map((task) => ({ kind: 'count', task })))) as PrefixCountResult[];
  const deepest = prefixTable(alphabetSize, depths.most);
  const allTotals = new Int32Array(deepest.offsets[depths.most]);
  for (const { counts } of counted) for (let t = 0; t < allTotals.length; t++) allTotals[t] += counts[t];
  let depth = depths.least;
  while (depth < depths.most && !shareableAt(deepest, allTotals, depth, wantedClasses, ranges)) depth++;
  // The tables of shorter blocks come first, so the chosen depth's are the tables' beginnings.
  const table = prefixTable(alphabetSize, depth);
  const size = table.offsets[depth];
  const base = table.offsets[depth - 1];
  const totals = allTotals.slice(0, size);
  // First occurrence after range r: the earliest first occurrence among the later ranges.
  const after: Int32Array[] = new Array<Int32Array>(ranges);
  let later = new Int32Array(size).fill(-1);
  for (let r = ranges - 1; r >= 0; r--) {
    after[r] = later;
    later = Int32Array.from(later);
    const first = counted[r].first;
    for (let t = 0; t < size; t++) if (first[t] >= 0) later[t] = first[t];
  }
  // The depth-level counts stay here for the slices; the rest moves to the jobs.
  const classSizes = totals.slice(base, size).map((c) => (c >= 2 ? c : 0));
  const sliceLengths = counted.map((c) => c.counts.slice(base, size).map((k, b) => (classSizes[b] > 0 ? k : 0)));
  const sliceStarts = sliceLengths.map((lengths) => {
    const starts = new Int32Array(lengths.length);
    for (let b = 1; b < lengths.length; b++) starts[b] = starts[b - 1] + lengths[b - 1];
    return starts;
  });
  const { perWord } = wordLayout(alphabetSize);
  const wordOffset = depth - (depth % perWord);
  const levelJobs: ScanJob[] = tasks.map((task, r) => ({
    kind: 'levels',
    task: { ...task, depth, ...layout, totals, counts: counted[r].counts.slice(0, size), after: after[r], wordOffset },
  }));
  const scanned = (await run(levelJobs)) as PrefixLevelsResult[];

  const sums: LevelSums[] = [];
  const active: number[] = [];
  for (let n = 1; n <= depth; n++) {
    const level = scanned.map((s) => s.sums[n - 1]).reduce(addSums);
    const classes = prefixClassSums(table, totals, n);
    level.classes = classes.classes;
    level.sumCountLogCount = classes.sumCountLogCount;
    sums.push(level);
    active.push(classes.active);
  }
  const { paths, pathCounts } = scanned[0];
  for (const s of scanned.slice(1)) mergeWrittenPaths({ paths, pathCounts }, s);
  const pieces = scanned.map((s) => s.laidOut);
  const pieceWords = scanned.map((s) => s.laidWords);
  return { depth, sums, active, pieces, pieceWords, classSizes, sliceStarts, sliceLengths, paths, pathCounts };
}

/** Whether level n's classes number `wanted`, with none above 1/groups of the positions in play. */
function shareableAt(table: PrefixTable, totals: Int32Array, n: number, wanted: number, groups: number): boolean {
  const { classes, active } = prefixClassSums(table, totals, n);
  let largest = 0;
  for (let t = table.offsets[n - 1]; t < table.offsets[n]; t++) if (totals[t] > largest) largest = totals[t];
  return classes >= wanted && largest * groups <= active;
}

/**
 * The slices of the given classes (depth-block numbers, in order) as quadruples [piece, start,
 * length, 1 at a class's first slice]: each class is its slice of every range in turn, so its
 * positions stay ascending.
 */
export function classSlices(prefix: PrefixOutcome, classes: readonly number[]): Int32Array {
  const quads: number[] = [];
  for (const b of classes) {
    let first = 1;
    prefix.pieces.forEach((_, r) => {
      const length = prefix.sliceLengths[r][b];
      if (length === 0) return;
      quads.push(r, prefix.sliceStarts[r][b], length, first);
      first = 0;
    });
  }
  return Int32Array.from(quads);
}

/** Positions (and, if given, words) of the slices, one after the other, class starts marked ~p. */
export function gatherSlices(pieces: readonly Int32Array[], pieceWords: readonly Uint16Array[], slices: Int32Array, order: Int32Array, words: Uint16Array): void {
  let at = 0;
  for (let i = 0; i < slices.length; i += 4) {
    const [r, start, length, first] = [slices[i], slices[i + 1], slices[i + 2], slices[i + 3]];
    order.set(pieces[r].subarray(start, start + length), at);
    if (words.length > 0 && r < pieceWords.length && pieceWords[r].length > 0) words.set(pieceWords[r].subarray(start, start + length), at);
    if (first === 1) order[at] = ~order[at];
    at += length;
  }
}

/** Every class in play after level depth in one order array (class starts marked ~p). */
export function assembleOrder(prefix: PrefixOutcome, active: number): Int32Array {
  const order = new Int32Array(active);
  const blocks = Array.from(prefix.classSizes.keys()).filter((b) => prefix.classSizes[b] > 0);
  gatherSlices(prefix.pieces, [], classSlices(prefix, blocks), order, new Uint16Array(0));
  return order;
}
