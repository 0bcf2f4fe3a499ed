import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import type { GroupRunner, ScanGroupResult, ScanGroupTask, SymbolArray } from '../core';
import { isPositiveInteger, numberOption } from './options';

type Values = Record<string, string | boolean | undefined>;

/** Below this many symbols the default is one thread: starting workers would cost more than they save. */
const THREADS_FROM_SYMBOLS = 1_000_000;

/**
 * --threads W, or by default os.availableParallelism() for inputs of at least a million symbols
 * (one thread below).
 */
export function threadsOption(values: Values, symbols: number): number {
  const given = numberOption(values, 'threads', isPositiveInteger, 'a whole number of at least 1');
  if (given !== undefined) return given;
  return symbols >= THREADS_FROM_SYMBOLS ? availableParallelism() : 1;
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

/** Runs one task on a fresh worker thread; the task's order and word arrays move to it. */
function runOnThread(task: ScanGroupTask): Promise<ScanGroupResult> {
  return new Promise((resolve, reject) => {
    const started = performance.now();
    const entries = task.order.length;
    const worker = FROM_SOURCES ? new Worker(tsxBootstrap(), { eval: true }) : new Worker(WORKER_URL);
    const debug = process.env.RETURNRATE_DEBUG === '1';
    if (debug) worker.once('online', () => process.stderr.write(`returnrate: debug: scan thread online after ${(performance.now() - started).toFixed(0)} ms\n`));
    worker.once('message', (result: ScanGroupResult) => {
      if (debug) process.stderr.write(`returnrate: debug: scan thread done after ${(performance.now() - started).toFixed(0)} ms (${entries} entries from n = ${task.firstN}, split ${(started / 1000).toFixed(2)} s after start)\n`);
      resolve(result);
      void worker.terminate();
    });
    worker.once('error', reject);
    worker.once('exit', (code) => {
      if (code !== 0) reject(new Error(`a scan thread stopped with exit code ${code}`));
    });
    worker.postMessage(task, [task.order.buffer, task.words.buffer] as ArrayBuffer[]);
  });
}

/** A GroupRunner that gives every group a worker thread of its own. */
export const threadRunner: GroupRunner = (tasks) => Promise.all(tasks.map(runOnThread));

/** The symbols in a SharedArrayBuffer, so every thread reads the one copy. */
export function sharedSymbols(symbols: SymbolArray): SymbolArray {
  const shared = new SharedArrayBuffer(symbols.byteLength);
  const copy = new (symbols.constructor as new (b: SharedArrayBuffer) => SymbolArray)(shared);
  copy.set(symbols);
  return copy;
}
