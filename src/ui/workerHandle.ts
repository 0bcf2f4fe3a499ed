import { wrap } from 'comlink';
import type { Remote } from 'comlink';

/** Anything with the Worker surface the clients use; tests hand in a fake. */
export type WorkerLike = Pick<Worker, 'terminate' | 'addEventListener'> & Parameters<typeof wrap>[0];

/**
 * A lazily started worker behind comlink, with the life cycle the page's clients share: aborting a
 * call terminates the worker (the only way to stop a tight loop), so every pending call rejects
 * with the abort reason, and the next call starts a fresh worker. A worker that fails to load or
 * throws outside a call (an 'error' event) fails the pending calls with `failure(detail)`.
 */
export interface WorkerHandle<Api> {
  call<T>(signal: AbortSignal, abortReason: () => unknown, run: (api: Remote<Api>) => Promise<T>): Promise<T>;
  /** Terminates the worker if one runs; pending calls reject with `reason`. */
  stop(reason: unknown): void;
}

/**
 * @param failure the error for a worker's 'error' event; `detail` is what the browser reported, or
 *   null when it reported nothing
 * @param onStart called with each new worker (development hooks)
 */
export function workerHandle<Api>(start: () => WorkerLike, failure: (detail: string | null) => Error, onStart?: (w: WorkerLike) => void): WorkerHandle<Api> {
  let worker: WorkerLike | null = null;
  let remote: Remote<Api> | null = null;
  const pending = new Set<(reason: unknown) => void>();

  const stop = (reason: unknown): void => {
    worker?.terminate();
    worker = null;
    remote = null;
    for (const reject of [...pending]) reject(reason);
    pending.clear();
  };

  const ensure = (): Remote<Api> => {
    if (remote !== null) return remote;
    const w = start();
    w.addEventListener('error', (event: Event) => {
      const detail = (event as Partial<ErrorEvent>).message;
      if (worker === w) stop(failure(typeof detail === 'string' && detail !== '' ? detail : null));
    });
    worker = w;
    onStart?.(w);
    remote = wrap<Api>(w);
    return remote;
  };

  const call = <T>(signal: AbortSignal, abortReason: () => unknown, run: (api: Remote<Api>) => Promise<T>): Promise<T> => {
    if (signal.aborted) return Promise.reject(abortReason());
    const api = ensure();
    return new Promise<T>((resolve, reject) => {
      const onAbort = (): void => stop(abortReason());
      const settle = (): void => {
        pending.delete(reject);
        signal.removeEventListener('abort', onAbort);
      };
      pending.add(reject);
      signal.addEventListener('abort', onAbort, { once: true });
      run(api).then(
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
  };

  return { call, stop };
}
