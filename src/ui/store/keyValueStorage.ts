import type { StateStorage } from 'zustand/middleware';

/** The three calls of an async key-value store (idb-keyval's get/set/del bound to one database). */
export interface KeyValueStore {
  get(key: string): Promise<unknown>;
  set(key: string, value: string): Promise<void>;
  del(key: string): Promise<void>;
}

/**
 * A zustand StateStorage over an async key-value store (IndexedDB in the page), which holds the
 * whole last result, sampled paths included, where localStorage's few MB did not.
 *
 * `legacy` is the storage used before (localStorage): when the key-value store has nothing yet,
 * the state saved there is read once and removed after the first write that succeeds. When the
 * key-value store fails (IndexedDB disabled or blocked, as in some private windows) the adapter
 * goes on with `legacy` alone; a failed write is dropped quietly, as the page can only forget.
 */
export function keyValueStorage(store: KeyValueStore, legacy: StateStorage | null): StateStorage {
  let broken = false;
  let legacyPending = legacy !== null;
  const quietly = (action: () => unknown): void => {
    try {
      void action();
    } catch {
      // A full or disabled localStorage: nothing more to do.
    }
  };
  return {
    async getItem(name) {
      if (!broken) {
        try {
          const value = await store.get(name);
          if (typeof value === 'string') return value;
        } catch {
          broken = true;
        }
      }
      const old = legacy === null ? null : await legacy.getItem(name);
      if (old === null) legacyPending = false;
      return old;
    },
    async setItem(name, value) {
      if (broken) return quietly(() => legacy?.setItem(name, value));
      try {
        await store.set(name, value);
      } catch {
        broken = true;
        return quietly(() => legacy?.setItem(name, value));
      }
      if (legacyPending) {
        legacyPending = false;
        quietly(() => legacy?.removeItem(name));
      }
    },
    async removeItem(name) {
      quietly(() => legacy?.removeItem(name));
      if (broken) return;
      try {
        await store.del(name);
      } catch {
        broken = true;
      }
    },
  };
}
