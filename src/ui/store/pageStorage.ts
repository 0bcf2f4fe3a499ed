import { createStore, del, get, set } from 'idb-keyval';
import type { StateStorage } from 'zustand/middleware';
import { keyValueStorage } from './keyValueStorage';
import { memoryStorage } from './memoryStorage';

/** IndexedDB database and object store of the page's saved state. */
export const PAGE_DATABASE = 'returnrate';
const PAGE_OBJECT_STORE = 'workbench';

function localStorageOrNull(): StateStorage | null {
  try {
    if (typeof localStorage !== 'undefined') return localStorage;
  } catch {
    // Access can throw when storage is disabled.
  }
  return null;
}

/**
 * Where the page keeps its state across reloads: IndexedDB (whole results, no size cap), reading
 * an older localStorage copy once; localStorage alone where IndexedDB is missing; memory where both
 * are (the page then forgets on reload). `wholeResults` says whether results need no size cap.
 */
export function pageStorage(): { storage: StateStorage; wholeResults: boolean } {
  const legacy = localStorageOrNull();
  if (typeof indexedDB !== 'undefined') {
    const db = createStore(PAGE_DATABASE, PAGE_OBJECT_STORE);
    const storage = keyValueStorage({ get: (k) => get(k, db), set: (k, v) => set(k, v, db), del: (k) => del(k, db) }, legacy);
    return { storage, wholeResults: true };
  }
  return { storage: legacy ?? memoryStorage(), wholeResults: false };
}

/**
 * The same place for data besides the saved state (the running analysis's rows), without the
 * one-time move from localStorage: that move is for the saved state's key alone, and another key
 * read or written through the same adapter would end it early.
 */
export function pageSideStorage(): StateStorage {
  if (typeof indexedDB !== 'undefined') {
    const db = createStore(PAGE_DATABASE, PAGE_OBJECT_STORE);
    return keyValueStorage({ get: (k) => get(k, db), set: (k, v) => set(k, v, db), del: (k) => del(k, db) }, null);
  }
  return localStorageOrNull() ?? memoryStorage();
}
