import type { SymbolArray } from '../sequence/sequence';
import { HISTOGRAM_BINS_PER_NAT } from './levelStats';
import type { LevelSums } from './collectReturns';
import { logOfPositive } from './logOfPositive';
import { fillWords } from './packedWords';
import { emptySums } from './scanReturns';
import { sharedBuffer } from './sharedBuffer';

/**
 * The first `depth` levels of the scan, computed by position ranges instead of by class refinement,
 * so that every thread has work from level 1 on. For n <= depth an n-block is a number (its symbols
 * in base A, below A^depth <= PREFIX_TABLE_LIMIT), so its class is a table index: the forward return
 * of p is the next position with the same number. Two passes per range:
 *  1. countPrefixes: how often each n-block occurs in the range, and where first;
 *  2. scanPrefixLevels, given the whole sequence's counts and each block's first occurrence after the
 *     range: a right-to-left pass that meets the pairs (p, next p) of collectReturns, and lays out the
 *     range's positions by depth-block for the class refinement that continues after `depth`.
 * The sums equal collectReturns' to rounding (the same terms, added in another order).
 */

/** Positions per block of the pairs pass (prefixLevels: one level at a time within a block). */
const BLOCK = 4096;

/** Largest table of n-block numbers a range keeps per level (entries). */
export const PREFIX_TABLE_LIMIT = 1 << 16;

/** Table of the numbers of all n-blocks, n = 1..depth: level n starts at offsets[n - 1]. */
export interface PrefixTable {
  readonly alphabetSize: number;
  readonly depth: number;
  /** offsets[n - 1] = A + A^2 + ... + A^(n-1); offsets[depth] = the table's size. */
  readonly offsets: Int32Array;
}

export function prefixTable(alphabetSize: number, depth: number): PrefixTable {
  const offsets = new Int32Array(depth + 1);
  let width = 1;
  for (let n = 1; n <= depth; n++) {
    width *= alphabetSize;
    offsets[n] = offsets[n - 1] + width;
  }
  return { alphabetSize, depth, offsets };
}

/** Levels the range passes may go beyond the least depth, for classes too uneven to share there. */
const EXTRA_DEPTH = 6;

/**
 * Depths the range passes may stop at: from the smallest whose blocks can number `classesWanted`
 * up to EXTRA_DEPTH more, kept to maxN and within PREFIX_TABLE_LIMIT (depth 1 always possible).
 */
export function prefixDepths(alphabetSize: number, maxN: number, classesWanted: number): { least: number; most: number } {
  let least = 1;
  let width = alphabetSize;
  while (least < maxN && width < classesWanted && width * alphabetSize <= PREFIX_TABLE_LIMIT) {
    least++;
    width *= alphabetSize;
  }
  let most = least;
  while (most < maxN && most < least + EXTRA_DEPTH && width * alphabetSize <= PREFIX_TABLE_LIMIT) {
    most++;
    width *= alphabetSize;
  }
  return { least, most };
}

/** Positions [start, end) of the sequence; every thread reads `symbols` (shared), writes only its own. */
export interface PrefixCountTask {
  readonly symbols: SymbolArray;
  readonly alphabetSize: number;
  readonly depth: number;
  readonly start: number;
  readonly end: number;
  /** Shared, N entries (empty when symbols are not packed): pass 1 writes [start, end) of the
   * carried words at offset 0 (packedWords.ts), which every later refresh reads. */
  readonly words: Uint16Array;
}

/** Per table entry (PrefixTable): occurrences in the range, and the first position (-1: none). */
export interface PrefixCountResult {
  readonly counts: Int32Array;
  readonly first: Int32Array;
}

/**
 * Pass 1: counts and first occurrences of every n-block starting in [start, end), n <= depth. Only
 * the depth-blocks are counted position by position (a rolling number); a shorter block's entries
 * are the sums and minima over its extensions, plus the few positions near the end of the sequence
 * that have no depth-block. Also fills the range's share of the carried words.
 */
export function countPrefixes(task: PrefixCountTask): PrefixCountResult {
  const { symbols, alphabetSize: A, depth, start, end, words } = task;
  const N = symbols.length;
  const { offsets } = prefixTable(A, depth);
  const counts = new Int32Array(offsets[depth]);
  const first = new Int32Array(offsets[depth]).fill(-1);
  const base = offsets[depth - 1];
  const limit = Math.min(end, N - depth + 1);
  if (start < limit) {
    const top = A ** (depth - 1);
    let id = 0;
    for (let j = 0; j < depth - 1; j++) id = id * A + symbols[start + j];
    for (let p = start; p < limit; p++) {
      id = id * A + symbols[p + depth - 1];
      const t = base + id;
      if (counts[t]++ === 0) first[t] = p;
      id -= symbols[p] * top;
    }
  }
  for (let n = depth - 1; n >= 1; n--) {
    const from = offsets[n];
    for (let id = 0, t = offsets[n - 1]; t < offsets[n]; id++, t++) {
      for (let a = 0; a < A; a++) {
        const u = from + id * A + a;
        counts[t] += counts[u];
        if (first[u] >= 0 && (first[t] < 0 || first[u] < first[t])) first[t] = first[u];
      }
    }
  }
  // Positions whose depth-block would run past the end still have their shorter blocks.
  for (let p = Math.max(start, limit); p < end; p++) {
    let id = 0;
    for (let n = 1; n <= N - p; n++) {
      id = id * A + symbols[p + n - 1];
      const t = offsets[n - 1] + id;
      if (counts[t]++ === 0) first[t] = p;
    }
  }
  if (words.length > 0) fillWords(symbols, A, start, end, words);
  return { counts, first };
}

/** Fixed parameters of the scan that the range passes share with the class refinement. */
export interface ScanLayout {
  readonly batchLength: number;
  readonly batchCount: number;
  readonly stride: number;
  readonly matchWindow: number;
  readonly maxN: number;
  readonly bins: number;
}

/** What pass 2 of one range needs besides pass 1's answers. */
export interface PrefixLevelsTask extends PrefixCountTask, ScanLayout {
  /** Counts over the whole sequence (sum of every range's). */
  readonly totals: Int32Array;
  /** This range's own counts (pass 1), for laying out its positions. */
  readonly counts: Int32Array;
  /** First occurrence of each block after this range (-1: none). */
  readonly after: Int32Array;
  /** Offset of the carried words laid out beside the positions (the refinement's next refresh). */
  readonly wordOffset: number;
}

export interface PrefixLevelsResult {
  /** Sums of levels 1..depth over this range's positions; classes and sumCountLogCount are left 0
   * (they are properties of the whole sequence's counts: prefixClassSums). */
  readonly sums: LevelSums[];
  /** Sampled paths written by this range (NaN elsewhere), as ScanGroupResult. */
  readonly paths: Float64Array;
  readonly pathCounts: Float64Array;
  /** The range's positions whose depth-block occurs at least twice in the whole sequence, by block
   * number and then position (the slice of block b has the range's count of b entries). Shared
   * memory where the host has it, so that the class groups read their slices in place. */
  readonly laidOut: Int32Array;
  /** The carried words at wordOffset of the same entries (empty when symbols are not packed). */
  readonly laidWords: Uint16Array;
}

/**
 * Pass 2: for every position p of the range and n <= depth while p's n-block occurs at least twice
 * (a block seen once can have no longer block seen twice), the pair (p, next occurrence q) with the
 * same per-pair sums as collectReturns, or p's censored forward return when q does not exist.
 */
export function scanPrefixLevels(task: PrefixLevelsTask): PrefixLevelsResult {
  const { symbols, alphabetSize: A, depth, start, end, totals, counts, after } = task;
  const { batchLength, batchCount, stride, matchWindow, maxN, bins } = task;
  const N = symbols.length;
  const { offsets } = prefixTable(A, depth);
  const size = offsets[depth];
  const next = Int32Array.from(after);
  const logCount = new Float64Array(size);
  for (let t = 0; t < size; t++) if (totals[t] >= 2) logCount[t] = logOfPositive(totals[t]);

  // Where the range's positions of each depth-block go: slices in block order.
  const base = offsets[depth - 1];
  const sliceStart = new Int32Array(size - base);
  let laidOutLength = 0;
  for (let b = 0; b < sliceStart.length; b++) {
    sliceStart[b] = laidOutLength;
    if (totals[base + b] >= 2) laidOutLength += counts[base + b];
  }
  const laidOut = new Int32Array(sharedBuffer(4 * laidOutLength));
  const laidWords = new Uint16Array(sharedBuffer(task.words.length > 0 ? 2 * laidOutLength : 0));

  const sums = Array.from({ length: depth }, () => emptySums(bins, batchCount));
  const matchEnd = N - maxN;
  const batchShift = Math.log2(batchLength);
  const sampleMask = stride - 1;
  const strideShift = Math.log2(stride);
  const paths = new Float64Array(Math.ceil(N / stride) * maxN).fill(NaN);
  const pathCounts = new Float64Array(paths.length);
  const maxBin = bins - 1;
  // Blocks of positions, right to left, each level by level: a level's sums stay in registers for a
  // whole block (the tables of different levels are apart, so the order of levels does not matter).
  // ids[k] = number of the (n-1)-block at blockStart + k, or -1 once that block was seen only once.
  const ids = new Int32Array(BLOCK);
  for (let blockEnd = end; blockEnd > start; blockEnd -= BLOCK) {
    const blockStart = Math.max(start, blockEnd - BLOCK);
    ids.fill(0);
    for (let n = 1; n <= depth; n++) {
      const s = sums[n - 1];
      const acc = s.batches;
      const histogram = s.histogram;
      const offset = offsets[n - 1];
      const half = (N - n + 1) >>> 1;
      let forwardObserved = 0;
      let forwardSumLog = 0;
      let forwardSumLog2 = 0;
      let observed = 0;
      let sumLog = 0;
      let sumLog2 = 0;
      let sumLogRc = 0;
      let sumLogRc2 = 0;
      let matchCount = 0;
      // p <= N - n: the n-block must fit; the limit only falls with n, so later levels skip p too.
      for (let p = Math.min(blockEnd, N - n + 1) - 1; p >= blockStart; p--) {
        const k = p - blockStart;
        let id = ids[k];
        if (id < 0) continue;
        id = id * A + symbols[p + n - 1];
        const t = offset + id;
        // logCount is 0 for a block seen once (log 2 > 0 otherwise): one table read instead of two.
        const logc = logCount[t];
        if (logc === 0) {
          ids[k] = -1;
          continue;
        }
        ids[k] = id;
        const batchP = (p >>> batchShift) << 2;
        acc[batchP + 3] += logc;
        const q = next[t];
        next[t] = p;
        const sampled = (p & sampleMask) === 0;
        if (q < 0) {
          if (sampled) {
            paths[(p >>> strideShift) * maxN + n - 1] = -(N - n - p + 1);
            pathCounts[(p >>> strideShift) * maxN + n - 1] = totals[t];
          }
          continue;
        }
        const R = q - p;
        const logR = logOfPositive(R);
        const logR2 = logR * logR;
        forwardObserved++;
        forwardSumLog += logR;
        forwardSumLog2 += logR2;
        // The nearer-history view, as collectReturns: p takes it forward below half, q backward from half on.
        let weight = 0;
        if (p < half) {
          weight = 1;
          acc[batchP]++;
          acc[batchP + 1] += logR;
          acc[batchP + 2] += logR2;
        }
        if (q >= half) {
          weight++;
          const batchQ = (q >>> batchShift) << 2;
          acc[batchQ]++;
          acc[batchQ + 1] += logR;
          acc[batchQ + 2] += logR2;
        }
        if (weight > 0) {
          let bin = (logR * HISTOGRAM_BINS_PER_NAT) | 0;
          if (bin > maxBin) bin = maxBin;
          histogram[bin] += weight;
          observed += weight;
          sumLog += weight * logR;
          sumLog2 += weight * logR2;
          const rc = logR + logc;
          sumLogRc += weight * rc;
          sumLogRc2 += weight * rc * rc;
        }
        if (q >= matchWindow && q < matchEnd && R <= matchWindow) matchCount++;
        if (sampled) {
          paths[(p >>> strideShift) * maxN + n - 1] = R;
          pathCounts[(p >>> strideShift) * maxN + n - 1] = totals[t];
        }
      }
      s.forwardObserved += forwardObserved;
      s.forwardSumLog += forwardSumLog;
      s.forwardSumLog2 += forwardSumLog2;
      s.observed += observed;
      s.sumLog += sumLog;
      s.sumLog2 += sumLog2;
      s.sumLogRc += sumLogRc;
      s.sumLogRc2 += sumLogRc2;
      s.matchCount += matchCount;
    }
  }
  layOut(task, Math.min(end, N - depth + 1), totals.subarray(base), sliceStart, laidOut, laidWords);
  return { sums, paths, pathCounts, laidOut, laidWords };
}

/**
 * Positions [start, limit) whose depth-block b occurs at least twice (totals[b] >= 2), each to the
 * next free place of b's slice (sliceStart[b], advanced), by block and then position, with their
 * carried words. A separate forward pass with a rolling block number: writing these inside the pairs
 * pass cost several times more on this machine (measured), though the writes are the same, and here
 * the words are read in order.
 */
function layOut(task: PrefixLevelsTask, limit: number, totals: Int32Array, sliceStart: Int32Array, laidOut: Int32Array, laidWords: Uint16Array): void {
  const { symbols, alphabetSize: A, depth, start, words, wordOffset } = task;
  if (start >= limit) return;
  const withWords = laidWords.length > 0;
  const top = A ** (depth - 1);
  let id = 0;
  for (let j = 0; j < depth - 1; j++) id = id * A + symbols[start + j];
  for (let p = start; p < limit; p++) {
    id = id * A + symbols[p + depth - 1];
    if (totals[id] >= 2) {
      const slot = sliceStart[id]++;
      laidOut[slot] = p;
      if (withWords) laidWords[slot] = words[p + wordOffset];
    }
    id -= symbols[p] * top;
  }
}

/** Classes, sum of c log c and positions in play of level n, from the whole sequence's counts. */
export function prefixClassSums(table: PrefixTable, totals: Int32Array, n: number): { classes: number; sumCountLogCount: number; active: number } {
  let classes = 0;
  let sumCountLogCount = 0;
  let active = 0;
  for (let t = table.offsets[n - 1]; t < table.offsets[n]; t++) {
    const c = totals[t];
    if (c < 2) continue;
    classes++;
    active += c;
    sumCountLogCount += c * logOfPositive(c);
  }
  return { classes, sumCountLogCount, active };
}
