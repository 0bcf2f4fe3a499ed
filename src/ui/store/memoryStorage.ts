import type { StateStorage } from 'zustand/middleware';

/** An in-memory StateStorage, for tests and for pages where no browser storage is available. */
export function memoryStorage(): StateStorage {
  const items = new Map<string, string>();
  return {
    getItem: (name) => items.get(name) ?? null,
    setItem: (name, value) => void items.set(name, value),
    removeItem: (name) => void items.delete(name),
  };
}
