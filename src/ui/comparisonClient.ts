import { proxy, wrap } from 'comlink';
import type { Remote } from 'comlink';
import type { AnalysisSettings, ComparisonResult } from '../core';
import type { ComparisonApi, ComparisonProgress, ComparisonSide } from '../../workers/comparison.worker';

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

export type ComparisonWorkerLike = Pick<Worker, 'terminate' | 'addEventListener'> & Parameters<typeof wrap>[0];

function startComparisonWorker(): Worker {
  return new Worker(new URL('../../workers/comparison.worker.ts', import.meta.url), { type: 'module', name: 'returnrate-comparison' });
}

export function createComparisonClient(start: () => ComparisonWorkerLike = startComparisonWorker): ComparisonClient {
  let worker: ComparisonWorkerLike | null = null;
  let remote: Remote<ComparisonApi> | null = null;
  const pending = new Set<(reason: unknown) => void>();

  const stop = (reason: unknown): void => {
    worker?.terminate();
    worker = null;
    remote = null;
    for (const reject of [...pending]) reject(reason);
    pending.clear();
  };

  const ensure = (): Remote<ComparisonApi> => {
    if (remote !== null) return remote;
    const w = start();
    w.addEventListener('error', (event: Event) => {
      const detail = (event as Partial<ErrorEvent>).message;
      if (worker === w) stop(new Error(`Comparison worker failed: ${typeof detail === 'string' && detail !== '' ? detail : 'it could not start'}`));
    });
    worker = w;
    remote = wrap<ComparisonApi>(w);
    return remote;
  };

  return {
    compare(a, b, settings, signal, onProgress) {
      const reason = (): unknown => signal.reason ?? new DOMException('The comparison was cancelled.', 'AbortError');
      if (signal.aborted) return Promise.reject(reason());
      const api = ensure();
      return new Promise<ComparisonResult>((resolve, reject) => {
        const onAbort = (): void => stop(reason());
        const settle = (): void => {
          pending.delete(reject);
          signal.removeEventListener('abort', onAbort);
        };
        pending.add(reject);
        signal.addEventListener('abort', onAbort, { once: true });
        api.compare(a, b, settings, proxy(onProgress)).then(
          (value) => {
            settle();
            resolve(value);
          },
          (error: unknown) => {
            settle();
            reject(error);
          },
        );
      });
    },
    dispose: () => stop(new DOMException('The comparison worker was shut down.', 'AbortError')),
  };
}
