import { describe, expect, it } from 'vitest';
import { STORAGE_KEY, bindActions, createAppStore, whenHydrated } from '../../../src/ui/store/store';
import { keyValueStorage } from '../../../src/ui/store/keyValueStorage';
import type { KeyValueStore } from '../../../src/ui/store/keyValueStorage';
import { fakeResult } from '../fixtures';

const settle = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));

/** An async in-memory key-value store standing in for IndexedDB, counting writes. */
function fakeKeyValue() {
  const items = new Map<string, string>();
  const writes: string[] = [];
  const kv: KeyValueStore = {
    get: async (k) => items.get(k),
    set: async (k, v) => void (writes.push(v), items.set(k, v)),
    del: async (k) => void items.delete(k),
  };
  return { kv, items, writes };
}

function bigResult() {
  const positions = Array.from({ length: 2_000 }, (_, i) => i * 7);
  const logReturn = positions.map((p) => Array.from({ length: 40 }, (_, n) => (p + n) % 11 === 0 ? null : Math.log(1 + p + n)));
  return fakeResult({ paths: { positions, logReturn } });
}

describe('app store on an async storage (IndexedDB in the page)', () => {
  it('keeps a large result whole, sampled paths and their nulls included, across a reload', async () => {
    const { kv } = fakeKeyValue();
    const first = createAppStore(() => keyValueStorage(kv, null), { maxResultChars: Infinity });
    await new Promise<void>((resolve) => whenHydrated(resolve, first));
    const actions = bindActions(first);
    const result = bigResult();
    expect(JSON.stringify(result).length).toBeGreaterThan(400_000);
    actions.completeRun(actions.beginRun('x', 40), result);
    actions.updateView({ showPaths: false });
    await settle();

    const reloaded = createAppStore(() => keyValueStorage(kv, null), { maxResultChars: Infinity });
    expect(reloaded.getState().result).toBeNull(); // not yet read
    await new Promise<void>((resolve) => whenHydrated(resolve, reloaded));
    expect(reloaded.getState().result).toEqual(result);
    expect(reloaded.getState().pathsDropped).toBe(false);
    expect(reloaded.getState().view.showPaths).toBe(false);
  });

  it('writes nothing before the saved state is read, so an early update cannot wipe the saved result', async () => {
    const { kv, items, writes } = fakeKeyValue();
    const result = fakeResult();
    items.set(STORAGE_KEY, JSON.stringify({ state: { result, pathsDropped: false }, version: 1 }));
    const store = createAppStore(() => keyValueStorage(kv, null), { maxResultChars: Infinity });
    const actions = bindActions(store);
    actions.showPreview(null); // an update while the saved state is on its way
    expect(writes).toEqual([]);
    await new Promise<void>((resolve) => whenHydrated(resolve, store));
    expect(store.getState().result).toEqual(result);
    expect((JSON.parse(items.get(STORAGE_KEY) ?? '{}') as { state: { result: unknown } }).state.result).toEqual(result);
  });

  it('writes once per change of a saved part, not on run progress', async () => {
    const { kv, writes } = fakeKeyValue();
    const store = createAppStore(() => keyValueStorage(kv, null), { maxResultChars: Infinity });
    await new Promise<void>((resolve) => whenHydrated(resolve, store));
    const actions = bindActions(store);
    const id = actions.beginRun('x', 40);
    const afterBegin = writes.length;
    actions.reportProgress(id, { kind: 'level', n: 1, active: 1000 });
    actions.reportProgress(id, { kind: 'level', n: 2, active: 800 });
    await settle();
    expect(writes.length).toBe(afterBegin);
    actions.completeRun(id, fakeResult());
    await settle();
    expect(writes.length).toBe(afterBegin + 1);
  });
});
