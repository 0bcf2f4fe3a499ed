import type { SymbolArray } from '../sequence/sequence';
import { countPrefixes, scanPrefixLevels, type PrefixCountResult, type PrefixCountTask, type PrefixLevelsResult, type PrefixLevelsTask } from './prefixLevels';
import { scanGroup, type ScanGroupResult, type ScanGroupTask } from './splitScan';
import { scanFreeDiagnostics, type ScanFreeDiagnostics } from '../diagnostics/mixingDiagnostics';
import { chunkBounds, largestChunk, scanChunk, type ChunkPlan, type ScanPart } from './chunkedScan';
import { reserveScanWorkspace, type ScanWorkspace } from './scanReturns';

/** The sequence whose scan-free diagnostics a thread computes beside the scan's class groups. */
export interface DiagnosticsTask {
  readonly symbols: SymbolArray;
  readonly alphabetSize: number;
}

/** One chunk of a chunked run (chunkedScan.ts), scanned on its own; `symbols` is the whole sequence. */
export interface ChunkTask {
  readonly symbols: SymbolArray;
  readonly alphabetSize: number;
  readonly plan: ChunkPlan;
  readonly index: number;
}

/** One piece of a shared analysis, as plain data that can be posted to a worker thread: the scan's
 * jobs, the diagnostics that need no scan (analyzeSplit.ts runs them with the class groups), and
 * the chunks of a chunked run. */
export type ScanJob =
  | { readonly kind: 'count'; readonly task: PrefixCountTask }
  | { readonly kind: 'levels'; readonly task: PrefixLevelsTask }
  | { readonly kind: 'group'; readonly task: ScanGroupTask }
  | { readonly kind: 'diagnostics'; readonly task: DiagnosticsTask }
  | { readonly kind: 'chunk'; readonly task: ChunkTask };

export type ScanJobResult = PrefixCountResult | PrefixLevelsResult | ScanGroupResult | ScanFreeDiagnostics | ScanPart;

/** Runs a batch of jobs (in this process in tests, on worker threads in hosts); results in job order.
 * onDone, when given, hears the index of each job as it finishes. */
export type ScanRunner = (jobs: ScanJob[], onDone?: (index: number) => void) => ScanJobResult[] | Promise<ScanJobResult[]>;

export function runScanJob(job: ScanJob): ScanJobResult {
  switch (job.kind) {
    case 'count':
      return countPrefixes(job.task);
    case 'levels':
      return scanPrefixLevels(job.task);
    case 'group':
      return scanGroup(job.task, threadWorkspace);
    case 'diagnostics':
      return scanFreeDiagnostics(job.task.symbols, job.task.alphabetSize);
    case 'chunk': {
      const { symbols, alphabetSize, plan, index } = job.task;
      const { offset, length } = chunkBounds(plan, index);
      // Sized for the longest chunk from the first, so that no thread replaces its arrays later on.
      reserveScanWorkspace(threadWorkspace, largestChunk(plan), alphabetSize);
      return scanChunk(symbols.subarray(offset, offset + length), alphabetSize, plan, index, { workspace: threadWorkspace });
    }
  }
}

/**
 * This thread's working arrays (ScanWorkspace), kept from one class group or chunk to the next: a
 * thread runs several one after another, and fresh memory costs a page fault per page on first
 * touch (about 3 ms per MB on this machine, measured), which it would pay for each. A worker thread
 * frees them when it ends with its run.
 */
const threadWorkspace: ScanWorkspace = {};

/** A runner that runs every job here, one after the other. */
export const inThisThread: ScanRunner = (jobs, onDone) =>
  jobs.map((job, k) => {
    const result = runScanJob(job);
    onDone?.(k);
    return result;
  });

/** Buffers a job owns alone and can move to its thread (never the shared symbols). */
export function jobTransfers(job: ScanJob): ArrayBuffer[] {
  switch (job.kind) {
    case 'count':
      return [];
    case 'levels':
      return movable([job.task.counts, job.task.after]);
    case 'group':
      return movable([job.task.slices]);
    case 'diagnostics':
    case 'chunk':
      return [];
  }
}

/** Buffers of a result, moved back to the caller. */
export function resultTransfers(result: ScanJobResult): ArrayBuffer[] {
  if ('first' in result) return movable([result.counts, result.first]);
  // Small results, copied: the diagnostics, and a chunk's per-level sums.
  if ('moments' in result || 'plan' in result) return [];
  const perLevel = result.sums.flatMap((s) => [s.batches, s.histogram]);
  const own = 'laidOut' in result ? [result.laidOut, result.laidWords] : [];
  return movable([result.paths, result.pathCounts, ...perLevel, ...own]);
}

function movable(arrays: ArrayBufferView[]): ArrayBuffer[] {
  const buffers = new Set<ArrayBuffer>();
  for (const a of arrays) if (a.buffer instanceof ArrayBuffer) buffers.add(a.buffer);
  return [...buffers];
}
