import type { SymbolArray } from '../sequence/sequence';
import type { LevelStats, ReturnScan, SampledPaths } from './levelStats';
import { mergeLevelStats, mergeSampledPaths } from './mergeLevels';
import { matchWindowFor, powerOfTwoAtLeast } from './scanLayout';
import { reserveScanWorkspace, scanReturns, type ScanWorkspace } from './scanReturns';
import type { ScanJob, ScanRunner } from './scanJobs';

/**
 * How a sequence of N symbols is cut into chunks that are scanned on their own and merged.
 *
 * Every chunk is analysed as a sequence of its own: a return whose next (or previous) occurrence
 * lies in another chunk is censored at the chunk's end (or start), the nearer-history split is the
 * chunk's middle, and block frequencies are the chunk's own (c / P_k for a chunk with P_k n-blocks).
 * That is the one approximation of a chunked run; merging the chunks is then exact. Chunks share the
 * whole sequence's batch grid and sampling stride, so the chunk size is rounded up to a multiple of
 * both (powers of two), and the remainder of N joins the last chunk (so no chunk is shorter than the
 * chunk size, which must exceed maxN).
 */
export interface ChunkPlan {
  /** Length N of the whole sequence. */
  readonly length: number;
  readonly maxN: number;
  /** Chunk length after rounding; the last chunk also takes the remainder. */
  readonly chunkSize: number;
  readonly chunkCount: number;
  /** Whole-sequence batch length and count, sampling stride (as an unchunked scan would use). */
  readonly batchLength: number;
  readonly batchCount: number;
  readonly stride: number;
  /** Match-length window of every chunk: half the chunk size (half of N for one chunk). */
  readonly matchWindow: number;
}

/** Fine batches and sampled paths aimed for, as scanReturns' defaults. */
const BATCH_TARGET = 256;
const SAMPLE_TARGET = 256;

/**
 * The chunk plan for N symbols and a requested chunk size.
 * @param sampleTarget sampled paths to aim for over the whole sequence (default 256)
 * @throws RangeError when the size is not a whole number above maxN
 */
export function chunkPlan(N: number, requestedSize: number, maxN: number, sampleTarget = SAMPLE_TARGET): ChunkPlan {
  if (!Number.isInteger(N) || N < 2) throw new RangeError(`the sequence needs at least 2 symbols; got ${N}`);
  if (!Number.isInteger(requestedSize) || requestedSize <= maxN) {
    throw new RangeError(`the chunk size must be a whole number above maxN = ${maxN}; got ${requestedSize}`);
  }
  const batchLength = powerOfTwoAtLeast(Math.ceil(N / BATCH_TARGET));
  const stride = powerOfTwoAtLeast(Math.ceil(N / Math.max(1, sampleTarget)));
  const unit = Math.max(batchLength, stride);
  const chunkSize = Math.ceil(requestedSize / unit) * unit;
  const chunkCount = Math.max(1, Math.floor(N / chunkSize));
  return {
    length: N,
    maxN,
    chunkSize,
    chunkCount,
    batchLength,
    batchCount: Math.ceil(N / batchLength),
    stride,
    matchWindow: matchWindowFor(chunkCount === 1 ? N : chunkSize),
  };
}

/** Length of the longest chunk: the last, which takes the remainder of N. */
export function largestChunk(plan: ChunkPlan): number {
  return chunkBounds(plan, plan.chunkCount - 1).length;
}

/** First position and length of chunk `index`. */
export function chunkBounds(plan: ChunkPlan, index: number): { offset: number; length: number } {
  if (!Number.isInteger(index) || index < 0 || index >= plan.chunkCount) {
    throw new RangeError(`there is no part ${index}: the plan has parts 0 to ${plan.chunkCount - 1}`);
  }
  const offset = index * plan.chunkSize;
  const length = index === plan.chunkCount - 1 ? plan.length - offset : plan.chunkSize;
  return { offset, length };
}

/** n-blocks of the merged run: every chunk's own, sum over chunks of L_k - n + 1. */
export function mergedPositions(plan: ChunkPlan, n: number): number {
  return plan.length - plan.chunkCount * (n - 1);
}

/**
 * One chunk's contribution to the merged statistics: its levels on the whole sequence's batch grid
 * (zero outside the chunk), with block counts rescaled to the merged positions (see scanChunk), and
 * its sampled paths at whole-sequence positions.
 */
export interface ScanPart {
  readonly plan: ChunkPlan;
  readonly index: number;
  readonly alphabetSize: number;
  readonly levels: readonly LevelStats[];
  readonly paths: SampledPaths;
  /** Positions of this chunk that take part in the match-length sums. */
  readonly matchPositions: number;
  readonly exhausted: boolean;
}

export interface ChunkHooks {
  readonly onLevel?: (level: LevelStats, active: number) => void;
  readonly shouldStop?: () => boolean;
  /** Working arrays kept from one chunk's scan to the next (ScanWorkspace). */
  readonly workspace?: ScanWorkspace;
}

/**
 * Scans one chunk (its symbols alone, ids from the shared alphabet) and shifts its statistics onto
 * the whole sequence: batch b of the chunk is batch offset/batchLength + b, sampled position p is
 * offset + p.
 *
 * Frequencies: a block seen c times among the chunk's P_k n-blocks has frequency c / P_k. The merged
 * level's estimators read counts against the merged positions P (log P - sum c log c / P for the
 * plug-in, log(R c / P) for the exponential law, log c_(k-1) - log c_k for the conditional
 * information), so counts enter as c P / P_k: every log c gains d = log(P / P_k). The plug-in block
 * entropy of the merge is then the position-weighted mean of the chunks' own, and the rest follows
 * in the same way. The sums stay plain sums, so parts merge by adding.
 */
export function scanChunk(
  chunkSymbols: SymbolArray,
  alphabetSize: number,
  plan: ChunkPlan,
  index: number,
  hooks: ChunkHooks = {},
): ScanPart {
  const { offset, length } = chunkBounds(plan, index);
  if (chunkSymbols.length !== length) {
    throw new RangeError(`part ${index} has ${length} symbols in the plan; got ${chunkSymbols.length}`);
  }
  const scan = scanReturns(chunkSymbols, alphabetSize, {
    maxN: plan.maxN,
    batchLength: plan.batchLength,
    sampleStride: plan.stride,
    matchWindow: plan.matchWindow,
    ...(hooks.onLevel === undefined ? {} : { onLevel: hooks.onLevel }),
    ...(hooks.shouldStop === undefined ? {} : { shouldStop: hooks.shouldStop }),
    ...(hooks.workspace === undefined ? {} : { workspace: hooks.workspace }),
  });
  const firstBatch = offset / plan.batchLength;
  const levels = scan.levels.map((level) => {
    const d = plan.chunkCount === 1 ? 0 : Math.log(mergedPositions(plan, level.n) / level.positions);
    return shiftLevel(level, firstBatch, plan, offset, d);
  });
  const paths = shiftPaths(scan.paths, offset, plan, length);
  return { plan, index, alphabetSize, levels, paths, matchPositions: scan.matchPositions, exhausted: scan.exhausted };
}

/** A chunk's level on the global batch grid, every log count raised by d. */
function shiftLevel(level: LevelStats, firstBatch: number, plan: ChunkPlan, offset: number, d: number): LevelStats {
  const place = (local: Float64Array): Float64Array => {
    const out = new Float64Array(plan.batchCount);
    out.set(local, firstBatch);
    return out;
  };
  const batchSumLogCount = place(level.batchSumLogCount);
  if (d !== 0) {
    // Every n-block position of the chunk, [offset, offset + P_k), gains d in its batch.
    const end = offset + level.positions;
    for (let b = firstBatch; b * plan.batchLength < end; b++) {
      const from = Math.max(offset, b * plan.batchLength);
      const to = Math.min(end, (b + 1) * plan.batchLength);
      batchSumLogCount[b] += (to - from) * d;
    }
  }
  return {
    ...level,
    sumCountLogCount: level.sumCountLogCount + level.positions * d,
    // sum (x + d)^2 = sum x^2 + 2 d sum x + m d^2 over the m observed returns
    sumLogRc: level.sumLogRc + level.observed * d,
    sumLogRc2: level.sumLogRc2 + 2 * d * level.sumLogRc + level.observed * d * d,
    batchObserved: place(level.batchObserved),
    batchSumLog: place(level.batchSumLog),
    batchSumLog2: place(level.batchSumLog2),
    batchSumLogCount,
  };
}

/** Sampled paths at whole-sequence positions; counts rescaled by P / P_k like the levels. */
function shiftPaths(paths: SampledPaths, offset: number, plan: ChunkPlan, length: number): SampledPaths {
  const { maxN } = paths;
  const positions = new Int32Array(paths.positions.length);
  for (let s = 0; s < positions.length; s++) positions[s] = paths.positions[s] + offset;
  const counts = Float64Array.from(paths.counts);
  if (plan.chunkCount > 1) {
    for (let n = 1; n <= maxN; n++) {
      const scale = mergedPositions(plan, n) / (length - n + 1);
      for (let s = 0; s < positions.length; s++) counts[s * maxN + n - 1] *= scale;
    }
  }
  return { positions, forward: Float64Array.from(paths.forward), counts, maxN };
}

/**
 * The merged scan of a complete set of parts of one plan (any order).
 * @throws RangeError when the parts disagree on the plan or alphabet size, or a part is missing or
 *   repeated
 */
export function mergeScanParts(parts: readonly ScanPart[]): ReturnScan {
  if (parts.length === 0) throw new RangeError('no parts to merge');
  const plan = parts[0].plan;
  const key = JSON.stringify(plan);
  const seen = new Set<number>();
  for (const part of parts) {
    if (JSON.stringify(part.plan) !== key) throw new RangeError(`part ${part.index} was cut by a different chunk plan than part ${parts[0].index}`);
    if (part.alphabetSize !== parts[0].alphabetSize) {
      throw new RangeError(`part ${part.index} has ${part.alphabetSize} symbols in its alphabet, part ${parts[0].index} ${parts[0].alphabetSize}`);
    }
    if (seen.has(part.index)) throw new RangeError(`part ${part.index} is given twice`);
    seen.add(part.index);
  }
  const missing: number[] = [];
  for (let k = 0; k < plan.chunkCount; k++) if (!seen.has(k)) missing.push(k);
  if (missing.length > 0) throw new RangeError(`parts missing: ${missing.join(', ')} (of 0 to ${plan.chunkCount - 1})`);
  const merger = partMerger(plan);
  for (const part of [...parts].sort((a, b) => a.index - b.index)) merger.add(part);
  return merger.finish();
}

/**
 * Parts of one plan merged as they come, in part order (0, 1, ...): the levels are added in the
 * same order as mergeScanParts adds them, so the result is the same to the last bit, while only the
 * running sums are kept (a part's levels span the whole batch grid: about 0.75 MB at 10^9 symbols
 * and maxN 40, so a run of a thousand chunks would otherwise hold 750 MB of them).
 */
export function partMerger(plan: ChunkPlan): { add(part: ScanPart): void; finish(): ReturnScan } {
  let levels: LevelStats[] | null = null;
  let alphabetSize = 0;
  let matchPositions = 0;
  let exhausted = true;
  const paths: SampledPaths[] = [];
  return {
    add(part) {
      if (part.index !== paths.length) throw new RangeError(`part ${part.index} came where part ${paths.length} was due`);
      alphabetSize = part.alphabetSize;
      levels = levels === null ? [...part.levels] : levels.map((acc, j) => mergeLevelStats(acc, part.levels[j]));
      matchPositions += part.matchPositions;
      exhausted &&= part.exhausted;
      paths.push(part.paths);
    },
    finish() {
      if (levels === null || paths.length !== plan.chunkCount) throw new RangeError(`${paths.length} of ${plan.chunkCount} parts were merged`);
      return {
        length: plan.length,
        alphabetSize,
        maxN: plan.maxN,
        levels,
        batchLength: plan.batchLength,
        batchCount: plan.batchCount,
        matchWindow: plan.matchWindow,
        matchPositions,
        paths: mergeSampledPaths(paths),
        exhausted,
        captured: null,
      };
    },
  };
}

/**
 * A chunked run in one process: every chunk of `symbols` scanned in turn and merged. Peak memory
 * is that of one chunk's scan besides the symbols.
 */
export function scanChunked(symbols: SymbolArray, alphabetSize: number, plan: ChunkPlan, hooks: ChunkHooks = {}): ReturnScan {
  checkPlanLength(symbols, plan);
  const merger = partMerger(plan);
  const withSpace = { ...hooks, workspace: hooks.workspace ?? {} };
  reserveScanWorkspace(withSpace.workspace, largestChunk(plan), alphabetSize);
  for (let k = 0; k < plan.chunkCount; k++) {
    const { offset, length } = chunkBounds(plan, k);
    merger.add(scanChunk(symbols.subarray(offset, offset + length), alphabetSize, plan, k, withSpace));
  }
  return merger.finish();
}

function checkPlanLength(symbols: SymbolArray, plan: ChunkPlan): void {
  if (symbols.length !== plan.length) throw new RangeError(`the plan is for ${plan.length} symbols; got ${symbols.length}`);
}

/** Chunk jobs per thread in one batch of scanChunkedOn: enough that a thread whose chunks ran short
 * takes another while the rest finish, few enough that the parts waiting for the merge stay few. */
export const CHUNKS_PER_THREAD = 4;

/**
 * scanChunked with the chunks as jobs for `run` (worker threads in hosts: a free thread takes the
 * next chunk), merged as scanChunked merges them, in batches of CHUNKS_PER_THREAD chunks per thread
 * so that the parts held at once stay few. `symbols` should be shared memory, so that the threads
 * read it without a copy.
 */
export async function scanChunkedOn(symbols: SymbolArray, alphabetSize: number, plan: ChunkPlan, threads: number, run: ScanRunner): Promise<ReturnScan> {
  checkPlanLength(symbols, plan);
  const merger = partMerger(plan);
  const batch = CHUNKS_PER_THREAD * Math.max(1, threads);
  for (let from = 0; from < plan.chunkCount; from += batch) {
    const jobs: ScanJob[] = [];
    for (let index = from; index < Math.min(plan.chunkCount, from + batch); index++) jobs.push({ kind: 'chunk', task: { symbols, alphabetSize, plan, index } });
    for (const part of (await run(jobs)) as ScanPart[]) merger.add(part);
  }
  return merger.finish();
}
