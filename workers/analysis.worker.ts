import { expose, releaseProxy } from 'comlink';
import { analyzeSequence, analyzeSequenceSplit, createDigestingReader, isShared, jobPool, SHARE_FROM_SYMBOLS, sharedSymbols, lengthRowOfLevel, longestSegment, pageMemoryCheck } from '../src/core';
import type { AnalysisHooks, AnalysisResult, AnalysisSettings, InputSummary, JobPool, JobPort, ShareProgress, JobReply, LengthRow, LevelStats, ReadResult, ReaderOptions, Sequence } from '../src/core';
import { demoScenario } from './demoScenarios';
import { createRowThrottle } from './rowThrottle';

/** Reading reports bytes read; the scan reports each finished block length n and the positions still active. */
export type AnalysisProgress =
  | { readonly kind: 'read'; readonly bytes: number; readonly totalBytes: number }
  | { readonly kind: 'level'; readonly n: number; readonly active: number }
  | ({ readonly kind: 'shares' } & ShareProgress);
/** Rows of the per-n table finished since the last such report (in the run's unit), for the partial view. */
export interface RowsReport {
  readonly kind: 'rows';
  readonly rows: readonly LengthRow[];
}
export type AnalysisReport = AnalysisProgress | RowsReport;
export type ProgressCallback = (report: AnalysisReport) => void;
export type FileReadOptions = ReaderOptions & { readonly name: string };

/** Report reading progress about every 4 MiB. */
const READ_REPORT_BYTES = 1 << 22;
/** Least time between two row reports: about 10 a second at most, so the page redraws calmly. */
const ROW_REPORT_MS = 100;

/** Level hooks that report progress per level and the finished table rows, coalesced (rowThrottle.ts). */
function levelHooks(settings: AnalysisSettings, onProgress: ProgressCallback): Pick<AnalysisHooks, 'onLevel' | 'onLevelStats' | 'onShares'> {
  const throttle = createRowThrottle<LengthRow>(ROW_REPORT_MS, (rows) => onProgress({ kind: 'rows', rows }));
  let previous: LevelStats | null = null;
  return {
    onLevel: (n, active) => onProgress({ kind: 'level', n, active }),
    onShares: (shares) => onProgress({ kind: 'shares', ...shares }),
    onLevelStats: (level) => {
      throttle.push(lengthRowOfLevel(level, previous, settings.unit), performance.now());
      previous = level;
      // The scan always ends with n = maxN; the estimates that follow may take a while.
      if (level.n === settings.maxN) throttle.flush();
    },
  };
}

async function readBlob(blob: Blob, options: ReaderOptions, onProgress: ProgressCallback): Promise<ReadResult & { sha256: string }> {
  const reader = createDigestingReader({ ...options, sizeHint: blob.size });
  const stream = blob.stream().getReader();
  let bytes = 0;
  let reported = 0;
  for (;;) {
    const { done, value } = await stream.read();
    if (done) break;
    reader.push(value);
    bytes += value.length;
    if (bytes - reported >= READ_REPORT_BYTES) {
      reported = bytes;
      onProgress({ kind: 'read', bytes, totalBytes: blob.size });
    }
  }
  return reader.finish();
}

function readBuffer(buffer: ArrayBuffer, options: ReaderOptions): ReadResult & { sha256: string } {
  const reader = createDigestingReader(options);
  reader.push(new Uint8Array(buffer));
  return reader.finish();
}

/**
 * The sequence the page analyses: the whole input, or under missing 'split' the longest segment of
 * the series (blocks may not cross a cut, and the page shows one result; the command line analyses
 * every segment), with a warning that says so.
 */
function symbolizedPart(read: ReadResult, options: ReaderOptions): { sequence: Sequence; warnings: ReadResult['warnings'] } {
  if (options.missing !== 'split' || read.records === undefined || read.records.length <= 1) return { sequence: read.sequence, warnings: read.warnings };
  const longest = longestSegment(read.sequence, read.records);
  if (longest === null) return { sequence: read.sequence, warnings: read.warnings };
  const message = `the series was cut into ${read.records.length} segments at missing values; the page analyses the longest, ${longest.record.name} (${longest.sequence.symbols.length} symbols); the command line analyses every segment (--missing split)`;
  return { sequence: longest.sequence, warnings: [...read.warnings, { code: 'segment-analysed', message }] };
}

/** Refuses, before the scan, a run whose estimated peak memory exceeds the page's budget (core:
 * pageMemoryCheck), counting the sub-workers when the scan will be shared (sharingCores). */
function checkMemory(sequence: Sequence, settings: AnalysisSettings): void {
  pageMemoryCheck({ symbols: sequence.symbols.length, alphabetSize: sequence.alphabet.length, maxN: settings.maxN, threads: sharingCores(sequence.symbols.length), symbolsShared: isShared(sequence.symbols) });
}

/** Sub-workers a scan of this many symbols runs on: one per core when the page is cross-origin
 * isolated and there are at least SHARE_FROM_SYMBOLS symbols, else 1 (this worker). */
function sharingCores(symbols: number): number {
  const cores = navigator.hardwareConcurrency || 1;
  return cores >= 2 && self.crossOriginIsolated && symbols >= SHARE_FROM_SYMBOLS ? cores : 1;
}

/**
 * The sub-workers started before a file is read, when it is large enough that its scan will most
 * likely be shared (a symbol takes at least one byte in every format): their start and warm-up
 * (warmUpScan.ts) then overlap the reading. analyzeOnWorkers uses them or closes them.
 */
function earlyPool(bytes: number): JobPool | null {
  const cores = sharingCores(bytes);
  return cores > 1 ? subWorkerPool(cores) : null;
}

function subWorkerPool(count: number): JobPool {
  return jobPool(Array.from({ length: count }, subWorkerPort));
}

/** One sub-worker as the job pool sees it; it ends with the scan (or with this worker). */
function subWorkerPort(): JobPort {
  const worker = new Worker(new URL('./scanJob.worker.ts', import.meta.url), { type: 'module' });
  return {
    post: (message, transfer) => worker.postMessage(message, transfer),
    listen: (onReply, onFailure) => {
      worker.onmessage = (event: MessageEvent<JobReply>) => onReply(event.data);
      worker.onerror = (event) => onFailure(new Error(`a scan sub-worker failed: ${event.message}`));
    },
    close: () => worker.terminate(),
  };
}

/**
 * The analysis on one worker, or shared among navigator.hardwareConcurrency sub-workers when the
 * page is cross-origin isolated (SharedArrayBuffer needs it: COOP/COEP headers, vite.config.ts) and
 * the sequence has at least SHARE_FROM_SYMBOLS symbols. Without isolation a note says why one worker ran.
 */
async function analyzeOnWorkers(
  sequence: Sequence,
  input: Omit<InputSummary, 'symbols' | 'alphabetSize'>,
  settings: AnalysisSettings,
  hooks: AnalysisHooks,
  early: JobPool | null,
): Promise<AnalysisResult> {
  const cores = navigator.hardwareConcurrency || 1;
  if (cores < 2 || sequence.symbols.length < SHARE_FROM_SYMBOLS) {
    early?.close();
    return analyzeSequence(sequence, input, settings, hooks);
  }
  if (!self.crossOriginIsolated) {
    const result = analyzeSequence(sequence, input, settings, hooks);
    const note = {
      code: 'one-worker',
      message: 'The page is not cross-origin isolated (served without the COOP/COEP headers), so the analysis ran on one worker instead of sharing it among the processor cores.',
    };
    return { ...result, warnings: [...result.warnings, note] };
  }
  // Read into shared memory when the sub-workers were started ahead (earlyPool); else copied there.
  const shared = sharedSymbols(sequence.symbols);
  const pool = early ?? subWorkerPool(cores);
  try {
    return await analyzeSequenceSplit({ ...sequence, symbols: shared }, input, settings, cores, pool.run, hooks, pool.close);
  } finally {
    pool.close();
  }
}

function release(callback: ProgressCallback): void {
  (callback as Partial<Record<typeof releaseProxy, () => void>>)[releaseProxy]?.();
}

const api = {
  /** Reads bytes (a transferred ArrayBuffer, or a File/Blob streamed in chunks), hashes them and analyses the sequence. */
  async analyzeBytes(input: ArrayBuffer | Blob, options: FileReadOptions, settings: AnalysisSettings, onProgress: ProgressCallback): Promise<AnalysisResult> {
    const early = earlyPool(input instanceof ArrayBuffer ? input.byteLength : input.size);
    try {
      const { name, ...given } = options;
      const readerOptions = early === null ? given : { ...given, sharedMemory: true };
      const read = input instanceof ArrayBuffer ? readBuffer(input, readerOptions) : await readBlob(input, readerOptions, onProgress);
      const { sequence, warnings } = symbolizedPart(read, readerOptions);
      checkMemory(sequence, settings);
      const summary = { name, sha256: read.sha256, format: readerOptions.format, ...(read.symbolization === undefined ? {} : { symbolization: read.symbolization }) };
      const result = await analyzeOnWorkers(sequence, summary, settings, levelHooks(settings, onProgress), early);
      return warnings.length === 0 ? result : { ...result, warnings: [...warnings, ...result.warnings] };
    } finally {
      early?.close();
      release(onProgress);
    }
  },

  /** Generates an invented demo sequence and analyses it; the generator's exact h and sigma^2 go into result.reference. */
  analyzeDemo(id: string, length: number, seed: number, settings: AnalysisSettings, onProgress: ProgressCallback): AnalysisResult {
    try {
      const demo = demoScenario(id);
      const { entropyRate, sigma2 } = demo.source.facts;
      return analyzeSequence(demo.source.generate(length, seed), { name: demo.title, sha256: null, format: 'generated' }, settings, {
        ...levelHooks(settings, onProgress),
        reference: { source: demo.title, entropyRateNats: entropyRate, sigma2Nats: sigma2 },
      });
    } finally {
      release(onProgress);
    }
  },
};

expose(api);

export type AnalysisApi = typeof api;
