import { chunkPlan, CHUNKS_PER_THREAD, largestChunk } from './chunkedScan';
import { histogramBinCount, powerOfTwoAtLeast } from './scanLayout';

/** What the peak memory of a run depends on. */
export interface MemoryEstimateInput {
  /** Symbols in the whole sequence. */
  readonly symbols: number;
  readonly alphabetSize: number;
  readonly maxN: number;
  /** Chunk length of a chunked run (one chunk's scan at a time); null or absent for one scan. */
  readonly chunkSize?: number | null;
  /** Scans held at once (worker threads, each with its own share); default 1. */
  readonly threads?: number;
  /** The symbols were read into shared memory (ReaderOptions.sharedMemory), so threads need no copy. */
  readonly symbolsShared?: boolean;
  /** What the host costs before any data (the Node process, the page's worker); default 64 MiB,
   * the resident size of the command line after start-up (measured, DEVELOPERS.md). */
  readonly baseBytes?: number;
}

/** Estimated peak memory in bytes, by part. */
export interface MemoryEstimate {
  readonly totalBytes: number;
  /** The symbol ids of the whole sequence (1, 2 or 4 bytes each). */
  readonly symbolsBytes: number;
  /** The engine's per-position arrays for the scan(s) held at once. */
  readonly engineBytes: number;
  /** Per-level statistics, sampled paths, the alphabet's labels and counts. */
  readonly smallBytes: number;
  readonly baseBytes: number;
}

/** Bytes per symbol id for an alphabet (allocateSymbols). */
export function bytesPerSymbolId(alphabetSize: number): number {
  return alphabetSize <= 0x100 ? 1 : alphabetSize <= 0x10000 ? 2 : 4;
}

/**
 * Bytes per position of the engine's working arrays (scanReturns): two Int32 order arrays, and either
 * two Uint16 carried-word arrays (alphabets up to 256) or one scratch symbol array.
 */
export function engineBytesPerPosition(alphabetSize: number): number {
  const packed = alphabetSize <= 0x100 && alphabetSize >= 1;
  return 8 + (packed ? 4 : bytesPerSymbolId(alphabetSize));
}

/** Per distinct symbol: its label string and map entry in the reader (from memory: a short V8
 * string and a Map slot are a few dozen bytes) plus the Float64 count and the engine's counters. */
const BYTES_PER_ALPHABET_SYMBOL = 96;
export const DEFAULT_BASE_BYTES = 64 * 1024 * 1024;
/** Each worker thread's own V8 instance and compiled code (measured about 12-20 MB resident per
 * thread of the command line at 10^6 symbols, DEVELOPERS.md). */
const THREAD_BYTES = 16 * 1024 * 1024;

/**
 * Peak memory of a run, from the sizes the engine allocates (read from scanReturns and the reader):
 * the symbols of the whole sequence stay alive throughout; each scan held at once adds its
 * per-position arrays for its positions (a chunk, or a thread's share of N); the per-level statistics
 * (histogram and four batch arrays, twice while a level is summed) and the sampled paths are small.
 * Reading peaks lower (symbols plus the growth slack of one array), so it does not set the peak.
 */
export function estimatePeakMemory(input: MemoryEstimateInput): MemoryEstimate {
  const { symbols: N, alphabetSize, maxN } = input;
  if (!Number.isInteger(N) || N < 0) throw new RangeError(`symbols must be a whole number >= 0; got ${N}`);
  if (!Number.isInteger(alphabetSize) || alphabetSize < 1) throw new RangeError(`alphabetSize must be a positive whole number; got ${alphabetSize}`);
  const threads = input.threads ?? 1;
  if (!Number.isInteger(threads) || threads < 1) throw new RangeError(`threads must be a whole number >= 1; got ${threads}`);
  // A chunked run's arrays hold its longest chunk (the last takes the remainder; chunkPlan).
  const chunked = input.chunkSize !== undefined && input.chunkSize !== null && input.chunkSize < N && input.chunkSize > maxN;
  const scanned = chunked ? largestChunk(chunkPlan(N, input.chunkSize!, maxN)) : N;
  // Threads (splitScan.ts): the symbols are copied once into shared memory unless the reader wrote
  // them there; the range passes leave the carried words of every position and each range's layout
  // of the positions in play (positions and words) in shared memory until the scan ends; each thread
  // then keeps the working arrays of its largest class group. With no class above 1/threads of the
  // positions, those hold between a quarter of one scan's arrays (even classes, a fair coin) and all
  // of them; 3/8 is taken, which measured within 15% of the peak for a fair coin (1e6 to 1e9) and an
  // uneven Markov chain (DEVELOPERS.md, Scale); with half, the coin at 1e9 came out 23% over.
  // Chunked runs on threads: each thread scans one chunk at a time, as a run of one thread does.
  const split = threads > 1 && !chunked;
  const symbolsBytes = N * bytesPerSymbolId(alphabetSize) * (threads > 1 && input.symbolsShared !== true ? 2 : 1);
  const wordBytes = alphabetSize <= 0x100 ? 2 : 0;
  const engineBytes = split
    ? scanned * (wordBytes + 4 + wordBytes + (3 / 8) * engineBytesPerPosition(alphabetSize))
    : threads * scanned * engineBytesPerPosition(alphabetSize);
  const batchCount = Math.ceil(N / powerOfTwoAtLeast(Math.ceil(N / 256)));
  const levelBytes = (histogramBinCount(N) + 2 * 4 * batchCount) * 8;
  const pathBytes = 256 * maxN * 16;
  // Level sums held at once: one scan's per thread; a chunked run keeps the running merge and the
  // parts of one batch (scanChunkedOn: CHUNKS_PER_THREAD per thread), or one part on one thread.
  const heldLevels = chunked ? 1 + (threads > 1 ? CHUNKS_PER_THREAD * threads : 1) : threads;
  const smallBytes = maxN * levelBytes * heldLevels + pathBytes + alphabetSize * BYTES_PER_ALPHABET_SYMBOL + (threads > 1 ? threads * THREAD_BYTES : 0);
  const baseBytes = input.baseBytes ?? DEFAULT_BASE_BYTES;
  return { totalBytes: symbolsBytes + engineBytes + smallBytes + baseBytes, symbolsBytes, engineBytes, smallBytes, baseBytes };
}

/** What fits a memory budget: the run as asked, or a chunked run, or nothing. */
export type MemoryAdvice =
  | { readonly kind: 'fits'; readonly estimate: MemoryEstimate }
  | { readonly kind: 'chunk'; readonly estimate: MemoryEstimate; readonly chunkSize: number; readonly chunkEstimate: MemoryEstimate }
  | {
      readonly kind: 'too-large';
      readonly estimate: MemoryEstimate;
      /** The smallest chunk the advice would name (2^16, or 4 maxN when larger) and what that run needs: the least memory that takes this input. */
      readonly smallestChunkSize: number;
      readonly smallestChunkEstimate: MemoryEstimate;
    };

/**
 * Checks a run against a budget; when it does not fit, the largest chunk size (a multiple of 2^16,
 * at least 4 maxN) whose run does. A smaller maxN is never the advice: the engine's arrays do not
 * depend on it.
 */
export function adviseMemory(input: MemoryEstimateInput, budgetBytes: number): MemoryAdvice {
  const estimate = estimatePeakMemory(input);
  if (estimate.totalBytes <= budgetBytes) return { kind: 'fits', estimate };
  const step = 1 << 16;
  const smallest = Math.max(step, 4 * input.maxN);
  // What a chunked run needs besides its chunk's arrays does not depend on the chunk's size.
  const chunked = estimatePeakMemory({ ...input, chunkSize: smallest });
  const spare = budgetBytes - (chunked.totalBytes - chunked.engineBytes);
  // Each thread of a chunked run holds one chunk's arrays, for the longest chunk (up to twice the
  // size: the last takes the remainder), so the bound from the spare memory is walked down until
  // the run fits.
  const perPosition = engineBytesPerPosition(input.alphabetSize) * (input.threads ?? 1);
  let chunkSize = Math.floor(spare / perPosition / step) * step;
  while (chunkSize >= smallest && estimatePeakMemory({ ...input, chunkSize }).totalBytes > budgetBytes) chunkSize -= step;
  if (chunkSize < smallest) return { kind: 'too-large', estimate, smallestChunkSize: smallest, smallestChunkEstimate: estimatePeakMemory({ ...input, chunkSize: smallest }) };
  return { kind: 'chunk', estimate, chunkSize, chunkEstimate: estimatePeakMemory({ ...input, chunkSize }) };
}

/** Bytes as "1.4 GB" (decimal units, two significant digits). */
export function formatBytes(bytes: number): string {
  const units = ['bytes', 'kB', 'MB', 'GB', 'TB'];
  let u = 0;
  let x = bytes;
  while (x >= 1000 && u < units.length - 1) {
    x /= 1000;
    u++;
  }
  return `${u === 0 ? x.toFixed(0) : x.toPrecision(2)} ${units[u]}`;
}

/**
 * The one-line refusal for a run that does not fit, with what would.
 * @param budgetSource where the budget came from, e.g. "--max-memory" or "the machine's memory"
 * @param host 'page' names the command line's chunked run instead of an option of the page
 */
export function memoryAdviceMessage(advice: MemoryAdvice, budgetBytes: number, budgetSource: string, host: 'cli' | 'page' = 'cli'): string | null {
  if (advice.kind === 'fits') return null;
  // Too large even in chunks: name the least memory that takes it, so the user knows what machine (or
  // --max-memory) would; a chunk no smaller than the sequence is no chunked run at all.
  const least =
    advice.kind !== 'too-large'
      ? ''
      : advice.smallestChunkEstimate.totalBytes < advice.estimate.totalBytes
        ? `about ${formatBytes(advice.smallestChunkEstimate.totalBytes)}, the smallest chunked run (--chunk ${advice.smallestChunkSize})`
        : `about ${formatBytes(advice.estimate.totalBytes)}`;
  if (host === 'page') {
    const what =
      advice.kind === 'chunk'
        ? `; the command line can run it in chunks (returnrate analyze FILE --chunk ${advice.chunkSize})`
        : `; the command line can run it where it has ${least}`;
    return `this run needs about ${formatBytes(advice.estimate.totalBytes)} of memory, more than the page's ${formatBytes(budgetBytes)} (${budgetSource})${what}`;
  }
  const need = `this run needs about ${formatBytes(advice.estimate.totalBytes)} but ${formatBytes(budgetBytes)} are available (${budgetSource})`;
  if (advice.kind === 'too-large') return `${need}; the program and the symbols alone leave no room for a scan: it needs at least ${least}`;
  return `${need}; a chunked run fits: --chunk ${advice.chunkSize} (about ${formatBytes(advice.chunkEstimate.totalBytes)}; returns are then censored at chunk ends)`;
}
