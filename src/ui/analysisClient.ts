import { proxy, transfer } from 'comlink';
import type { Remote } from 'comlink';
import type { AnalysisResult, AnalysisSettings, LengthRow } from '../core';
import type { AnalysisApi, AnalysisProgress, AnalysisReport, FileReadOptions } from '../../workers/analysis.worker';
import { workerHandle, type WorkerLike } from './workerHandle';

export type { AnalysisProgress, AnalysisReport, FileReadOptions };

/** Every call can be stopped; progress and partial rows are optional. */
export interface CallOptions {
  readonly signal: AbortSignal;
  readonly onProgress?: (progress: AnalysisProgress) => void;
  /** Per-n table rows as the scan finishes them (a few at a time, at most about 10 batches a second). */
  readonly onRows?: (rows: readonly LengthRow[]) => void;
}

/**
 * The page's handle on the analysis worker. One call at a time is the intended use: aborting any
 * call terminates the worker (the only way to stop a tight loop), so every pending call rejects
 * with an AbortError, and the next call starts a fresh worker.
 */
export interface AnalysisClient {
  /** Streams a File or Blob through the reader in the worker (the page stays responsive for large files). */
  analyzeFile(file: Blob, options: FileReadOptions, settings: AnalysisSettings, call: CallOptions): Promise<AnalysisResult>;
  /** Moves the buffer to the worker (transferred, so it is detached here afterwards). */
  analyzeBytes(bytes: ArrayBuffer, options: FileReadOptions, settings: AnalysisSettings, call: CallOptions): Promise<AnalysisResult>;
  analyzeDemo(id: string, length: number, seed: number, settings: AnalysisSettings, call: CallOptions): Promise<AnalysisResult>;
  /** Terminates the worker if one runs; pending calls reject with an AbortError. */
  dispose(): void;
}

/**
 * The worker died while it was running a call (a crash, running out of memory, killed). The page
 * says so in these words and keeps the settings and the rows computed so far; Run starts a fresh
 * worker.
 */
export class WorkerStopped extends Error {
  override readonly name = 'WorkerStopped';
}

/** The words the page shows for a worker that died; `detail` is what the browser reported, if anything. */
export function workerStoppedMessage(detail: string): string {
  return `the analysis stopped unexpectedly (${detail}); the settings and the rows computed so far are kept: press Run to start it again`;
}

export type { WorkerLike };

function startAnalysisWorker(): Worker {
  return new Worker(new URL('../../workers/analysis.worker.ts', import.meta.url), { type: 'module', name: 'returnrate-analysis' });
}

function abortError(signal: AbortSignal): unknown {
  return signal.reason ?? new DOMException('The analysis was cancelled.', 'AbortError');
}

/** One proxied callback carries both kinds of report; this splits them to the call's two listeners. */
function reportListener(options: CallOptions): (report: AnalysisReport) => void {
  const { onProgress, onRows } = options;
  return (report) => {
    if (report.kind === 'rows') onRows?.(report.rows);
    else onProgress?.(report);
  };
}

/** A client that starts its worker lazily with `start` (default: workers/analysis.worker.ts as a module worker). */
export function createAnalysisClient(start: () => WorkerLike = startAnalysisWorker): AnalysisClient {
  // A worker that fails to load or throws outside a call would leave calls hanging; fail them.
  const handle = workerHandle<AnalysisApi>(
    start,
    (detail) => new WorkerStopped(workerStoppedMessage(detail ?? 'the analysis worker could not start or was stopped')),
    import.meta.env.DEV ? exposeStopHook : undefined,
  );
  const call = <T>(options: CallOptions, run: (api: Remote<AnalysisApi>, onReport: (r: AnalysisReport) => void) => Promise<T>): Promise<T> => {
    const { signal } = options;
    return handle.call(signal, () => abortError(signal), (api) => run(api, proxy(reportListener(options))));
  };

  return {
    analyzeFile: (file, options, settings, c) => call(c, (api, p) => api.analyzeBytes(file, options, settings, p)),
    analyzeBytes: (bytes, options, settings, c) => call(c, (api, p) => api.analyzeBytes(transfer(bytes, [bytes]), options, settings, p)),
    analyzeDemo: (id, length, seed, settings, c) => call(c, (api, p) => api.analyzeDemo(id, length, seed, settings, p)),
    dispose: () => handle.stop(new DOMException('The analysis worker was shut down.', 'AbortError')),
  };
}

/**
 * Development builds only (the browser tests run on the dev server): `__returnrateStopWorker()` in
 * the page stops the current analysis worker the way a crash does. A worker's death raises no event
 * by itself, so the hook terminates it and then raises the 'error' event that a worker failing to
 * load or throwing outside a call would raise; the client treats both the same.
 */
function exposeStopHook(w: WorkerLike): void {
  (globalThis as { __returnrateStopWorker?: () => void }).__returnrateStopWorker = () => {
    w.terminate();
    (w as unknown as EventTarget).dispatchEvent(new ErrorEvent('error', { message: 'the worker was terminated' }));
  };
}
