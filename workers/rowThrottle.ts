/**
 * Coalesces items pushed in a tight loop into batches sent at most once per `intervalMs`.
 *
 * Why not a timer-based throttle (lodash's, for one): the scan runs synchronously in the worker, so
 * a trailing-edge timer would not fire until the whole scan is over. Here the decision is made on
 * each push from the clock reading the caller passes in: the first item goes at once, later ones
 * wait until `intervalMs` has passed since the last batch, and `flush` sends what is left (the
 * caller flushes when the last level is done).
 */
export interface RowThrottle<T> {
  /** Adds an item at clock time nowMs (ms), sending the pending batch when the interval has passed. */
  push(item: T, nowMs: number): void;
  /** Sends the pending items, if any. */
  flush(): void;
}

/**
 * @param intervalMs least time between two batches, in ms (e.g. 100 for about 10 a second)
 * @param send receives each batch, oldest item first; the array is not reused afterwards
 * @throws RangeError for a negative or non-finite interval
 */
export function createRowThrottle<T>(intervalMs: number, send: (items: T[]) => void): RowThrottle<T> {
  if (!(Number.isFinite(intervalMs) && intervalMs >= 0)) throw new RangeError(`intervalMs must be a finite number >= 0; got ${intervalMs}`);
  let pending: T[] = [];
  let lastSentMs = Number.NEGATIVE_INFINITY;
  const flush = (): void => {
    if (pending.length === 0) return;
    const batch = pending;
    pending = [];
    send(batch);
  };
  return {
    push(item, nowMs) {
      pending.push(item);
      if (nowMs - lastSentMs >= intervalMs) {
        lastSentMs = nowMs;
        flush();
      }
    },
    flush,
  };
}
