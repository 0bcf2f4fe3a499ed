import { bindActions, createAppStore, memoryStorage } from '../../../src/ui/store/store';
import type { StateStorage } from 'zustand/middleware';

/** A fresh store on its own in-memory storage, with its actions bound. */
export function testStore(storage: StateStorage = memoryStorage()) {
  const store = createAppStore(() => storage);
  return { store, storage, ...bindActions(store) };
}
