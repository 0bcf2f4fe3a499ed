import { describe, expect, it } from 'vitest';
import { keyValueStorage } from '../../../src/ui/store/keyValueStorage';
import type { KeyValueStore } from '../../../src/ui/store/keyValueStorage';
import { memoryStorage } from '../../../src/ui/store/memoryStorage';

/** An async in-memory key-value store standing in for IndexedDB (Node has none); `fail` makes every call reject. */
function fakeKeyValue(fail = false): KeyValueStore & { items: Map<string, unknown> } {
  const items = new Map<string, unknown>();
  const guard = async <T>(f: () => T): Promise<T> => {
    await Promise.resolve();
    if (fail) throw new DOMException('blocked', 'InvalidStateError');
    return f();
  };
  return {
    items,
    get: (k) => guard(() => items.get(k)),
    set: (k, v) => guard(() => void items.set(k, v)),
    del: (k) => guard(() => void items.delete(k)),
  };
}

describe('keyValueStorage', () => {
  it('writes and reads through the key-value store, and removes', async () => {
    const kv = fakeKeyValue();
    const storage = keyValueStorage(kv, null);
    expect(await storage.getItem('k')).toBeNull();
    await storage.setItem('k', '{"a":1}');
    expect(kv.items.get('k')).toBe('{"a":1}');
    expect(await storage.getItem('k')).toBe('{"a":1}');
    await storage.removeItem('k');
    expect(await storage.getItem('k')).toBeNull();
  });

  it('reads a state saved in the old storage once, and removes it there after the first write', async () => {
    const kv = fakeKeyValue();
    const legacy = memoryStorage();
    legacy.setItem('k', 'old');
    const storage = keyValueStorage(kv, legacy);
    expect(await storage.getItem('k')).toBe('old');
    expect(legacy.getItem('k')).toBe('old');
    await storage.setItem('k', 'new');
    expect(legacy.getItem('k')).toBeNull();
    expect(await storage.getItem('k')).toBe('new');
  });

  it('goes on with the old storage when the key-value store fails, and never throws', async () => {
    const legacy = memoryStorage();
    legacy.setItem('k', 'kept');
    const storage = keyValueStorage(fakeKeyValue(true), legacy);
    expect(await storage.getItem('k')).toBe('kept');
    await storage.setItem('k', 'next');
    expect(legacy.getItem('k')).toBe('next');
    const full = { ...memoryStorage(), setItem: () => { throw new DOMException('full', 'QuotaExceededError'); } };
    await expect(keyValueStorage(fakeKeyValue(true), full).setItem('k', 'x')).resolves.toBeUndefined();
    await expect(keyValueStorage(fakeKeyValue(true), null).getItem('k')).resolves.toBeNull();
  });
});
