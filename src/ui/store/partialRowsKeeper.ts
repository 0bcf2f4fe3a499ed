import type { StateStorage } from 'zustand/middleware';
import type { PartialRows } from './runSlice';

/** Storage key of the running analysis's rows, apart from the saved state so each batch writes only the rows. */
export const PARTIAL_ROWS_KEY = 'returnrate.workbench.partial';

/** What the keeper needs of the store: the partial rows and the run, read, set and watched. */
export interface PartialRowsStore {
  getState(): { readonly partial: PartialRows | null; readonly run: { readonly status: string } };
  setState(patch: { partial: PartialRows }): void;
  subscribe(listener: (state: { readonly partial: PartialRows | null }, previous: { readonly partial: PartialRows | null }) => void): () => void;
}

const STATUSES: readonly PartialRows['status'][] = ['running', 'cancelled', 'stopped', 'interrupted'];

/** Saved rows read back, or null when missing or not of the expected shape. */
export function parsePartialRows(text: string | null): PartialRows | null {
  if (text === null) return null;
  let v: unknown;
  try {
    v = JSON.parse(text);
  } catch {
    return null;
  }
  if (typeof v !== 'object' || v === null) return null;
  const p = v as Partial<Record<keyof PartialRows, unknown>>;
  const rowsOk = Array.isArray(p.rows) && p.rows.length > 0 && p.rows.every((r: unknown, k) => typeof r === 'object' && r !== null && (r as { n?: unknown }).n === k + 1);
  if (!rowsOk || typeof p.label !== 'string' || typeof p.runId !== 'number' || typeof p.maxN !== 'number') return null;
  if ((p.unit !== 'nat' && p.unit !== 'bit') || !STATUSES.includes(p.status as PartialRows['status'])) return null;
  return v as PartialRows;
}

/**
 * Keeps the per-n rows of the running (or last stopped) analysis across a reload: every change of
 * the store's `partial` is written under PARTIAL_ROWS_KEY (removed when the run completes), and
 * once the saved state is read (`whenHydrated`) rows that were still running come back marked
 * 'interrupted' (a reload ended their run), unless a run already started. Rows are a few hundred
 * numbers per n, so writing them on every batch costs little; the saved result is not rewritten.
 * Returns the function that stops the keeper.
 */
export function keepPartialRows(store: PartialRowsStore, storage: StateStorage, whenHydrated: (then: () => void) => void): () => void {
  let restored = false;
  const write = (partial: PartialRows | null): void => {
    const done = partial === null || partial.rows.length === 0 ? storage.removeItem(PARTIAL_ROWS_KEY) : storage.setItem(PARTIAL_ROWS_KEY, JSON.stringify(partial));
    // A failed write loses only the rows of this run; the page goes on.
    if (done instanceof Promise) done.catch(() => undefined);
  };
  whenHydrated(() => {
    void Promise.resolve(storage.getItem(PARTIAL_ROWS_KEY))
      .catch(() => null)
      .then((text) => {
        const saved = parsePartialRows(text);
        const now = store.getState();
        if (saved !== null && now.partial === null && now.run.status !== 'running') {
          store.setState({ partial: saved.status === 'running' ? { ...saved, status: 'interrupted' } : saved });
        }
        restored = true;
      });
  });
  return store.subscribe((state, previous) => {
    if (restored && state.partial !== previous.partial) write(state.partial);
  });
}
