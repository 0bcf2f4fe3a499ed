import { proxy } from 'comlink';
import type { AnalysisSettings, ComparisonResult } from '../core';
import type { ComparisonApi, ComparisonProgress, ComparisonSide } from '../../workers/comparison.worker';
import { workerHandle, type WorkerLike } from './workerHandle';

export type { ComparisonProgress, ComparisonSide };

/**
 * The page's handle on the comparison worker: one call at a time; aborting terminates the worker
 * (the only way to stop its loops) and the next call starts a fresh one. Errors arrive as rejected
 * promises with the core's message.
 */
export interface ComparisonClient {
  compare(a: ComparisonSide, b: ComparisonSide, settings: AnalysisSettings, signal: AbortSignal, onProgress: (p: ComparisonProgress) => void): Promise<ComparisonResult>;
  dispose(): void;
}

export type ComparisonWorkerLike = WorkerLike;

function startComparisonWorker(): Worker {
  return new Worker(new URL('../../workers/comparison.worker.ts', import.meta.url), { type: 'module', name: 'returnrate-comparison' });
}

export function createComparisonClient(start: () => ComparisonWorkerLike = startComparisonWorker): ComparisonClient {
  const handle = workerHandle<ComparisonApi>(start, (detail) => new Error(`Comparison worker failed: ${detail ?? 'it could not start'}`));
  return {
    compare(a, b, settings, signal, onProgress) {
      const reason = (): unknown => signal.reason ?? new DOMException('The comparison was cancelled.', 'AbortError');
      return handle.call(signal, reason, (api) => api.compare(a, b, settings, proxy(onProgress)));
    },
    dispose: () => handle.stop(new DOMException('The comparison worker was shut down.', 'AbortError')),
  };
}
