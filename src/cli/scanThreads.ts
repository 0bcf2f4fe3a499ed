import { statSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { analyzeSequenceSplit, jobPool, SHARE_FROM_SYMBOLS, sharedSymbols, type AnalysisHooks, type AnalysisResult, type AnalysisSettings, type InputSummary, type JobPool, type JobPort, type ScanRunner, type Sequence } from '../core';
import { isPositiveInteger, numberOption } from './options';

type Values = Record<string, string | boolean | undefined>;

/**
 * --threads W, or by default os.availableParallelism() for inputs of at least SHARE_FROM_SYMBOLS
 * symbols (one thread below: starting workers would cost about what they save).
 */
export function threadsOption(values: Values, symbols: number): number {
  const given = numberOption(values, 'threads', isPositiveInteger, 'a whole number of at least 1');
  if (given !== undefined) return given;
  return symbols >= SHARE_FROM_SYMBOLS ? availableParallelism() : 1;
}

/**
 * Threads of a chunked run in this process (chunks are independent jobs): --threads W, or by
 * default one per core for inputs of at least SHARE_FROM_SYMBOLS symbols; never more than the
 * chunks. Plans and part files are written by one thread.
 */
export function chunkThreadsOption(values: Values, symbols: number, chunks: number): number {
  const wanted = threadsOption(values, symbols);
  return values.plan === true || values['parts-out'] !== undefined ? 1 : Math.max(1, Math.min(wanted, chunks));
}

/** The sources run through tsx (tests, `npm run returnrate`); the bundle has a built worker beside it. */
const FROM_SOURCES = import.meta.url.endsWith('.ts');
const WORKER_URL = new URL(FROM_SOURCES ? './scanWorker.ts' : './scanWorker.mjs', import.meta.url);

/**
 * From the sources, the worker must load TypeScript: Node 20 does not pass `--import tsx` on to
 * worker threads, so a two-line script registers tsx's loader in the thread and then imports it.
 */
function tsxBootstrap(): string {
  const api = import.meta.resolve('tsx/esm/api');
  return `import(${JSON.stringify(api)}).then((m) => { m.register(); return import(${JSON.stringify(WORKER_URL.href)}); });`;
}

/** One worker thread as the job pool sees it. */
function threadPort(): JobPort {
  const worker = FROM_SOURCES ? new Worker(tsxBootstrap(), { eval: true }) : new Worker(WORKER_URL);
  let closing = false;
  return {
    post: (message, transfer) => worker.postMessage(message, transfer),
    listen: (onReply, onFailure) => {
      worker.on('message', onReply);
      worker.on('error', onFailure);
      worker.on('exit', (code) => {
        if (!closing) onFailure(new Error(`a scan thread stopped with exit code ${code}`));
      });
    },
    close: () => {
      closing = true;
      void worker.terminate();
    },
  };
}

/**
 * `count` worker threads for one shared scan, started now so that they are ready by the first
 * batch; close() when the scan is over (they would keep the process alive). With RETURNRATE_DEBUG=1
 * each batch's kind and time go to standard error.
 */
export function startScanThreads(count: number): JobPool {
  const pool = jobPool(Array.from({ length: count }, threadPort));
  if (process.env.RETURNRATE_DEBUG !== '1') return pool;
  const started = performance.now();
  const run: ScanRunner = async (jobs, onDone) => {
    const from = performance.now();
    const results = await pool.run(jobs, onDone);
    const seconds = (t: number) => ((t - started) / 1000).toFixed(2);
    process.stderr.write(`returnrate: debug: ${jobs.length} ${jobs[0]?.kind ?? ''} jobs from ${seconds(from)} s to ${seconds(performance.now())} s\n`);
    return results;
  };
  return { run, close: pool.close };
}

/** Worker threads started before the input is read (threadsAhead). */
export interface EarlyThreads {
  readonly count: number;
  readonly pool: JobPool;
}

/**
 * Starts the scan's threads while the input is still being read, when the run will most likely
 * share its scan: --threads W > 1, or by default a file of at least SHARE_FROM_SYMBOLS bytes (a
 * symbol takes at least one byte in every format) or --source with such a --length, on a machine
 * with several cores. A thread's start and its warm-up (warmUpScan.ts) then overlap the reading
 * instead of delaying the scan. The caller closes the pool, also when the guess was wrong.
 */
export function threadsAhead(file: string | undefined, values: Values): EarlyThreads | null {
  if (values.chunk !== undefined) return null;
  const given = numberOption(values, 'threads', isPositiveInteger, 'a whole number of at least 1');
  let count = given ?? 1;
  if (given === undefined && availableParallelism() >= 2) {
    const length = values.source !== undefined ? Number(values.length) : file === undefined ? 0 : sizeOf(file);
    if (length >= SHARE_FROM_SYMBOLS) count = availableParallelism();
  }
  return count > 1 ? { count, pool: startScanThreads(count) } : null;
}

function sizeOf(file: string): number {
  try {
    return statSync(file).size;
  } catch {
    return 0; // the reader names what is wrong with the file
  }
}

/**
 * The analysis shared among `threads` worker threads, which end with it.
 * @param early threads started during the read (threadsAhead), used when they are as many
 */
export async function analyzeOnThreads(
  sequence: Sequence,
  input: Omit<InputSummary, 'symbols' | 'alphabetSize'>,
  settings: AnalysisSettings,
  threads: number,
  hooks: AnalysisHooks,
  early: EarlyThreads | null = null,
): Promise<AnalysisResult> {
  const pool = early !== null && early.count === threads ? early.pool : startScanThreads(threads);
  try {
    return await analyzeSequenceSplit({ ...sequence, symbols: sharedSymbols(sequence.symbols) }, input, settings, threads, pool.run, hooks, pool.close);
  } finally {
    pool.close();
  }
}
