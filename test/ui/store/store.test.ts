import { describe, expect, it } from 'vitest';
import { DEFAULT_SETTINGS } from '../../../src/core/result/analysisResult';
import { STORAGE_KEY, memoryStorage } from '../../../src/ui/store/store';
import { fakeResult } from '../fixtures';
import { testStore } from './testStore';

describe('app store persistence', () => {
  it('settings and the last result survive a reload; input and run state do not', () => {
    const storage = memoryStorage();
    const first = testStore(storage);
    first.updateSettings({ unit: 'bit' });
    first.setFormat('fasta');
    const result = fakeResult();
    first.completeRun(first.beginRun('x', 40), result);
    first.beginRun('still running', 40);

    const reloaded = testStore(storage).store.getState();
    expect(reloaded.settings).toEqual({ ...DEFAULT_SETTINGS, unit: 'bit' });
    expect(reloaded.result).toEqual(result);
    expect(reloaded.format).toBe('auto');
    expect(reloaded.run).toEqual({ status: 'idle', note: null });
  });

  it('a corrupt saved state gives a fresh page instead of an error', () => {
    const storage = memoryStorage();
    storage.setItem(STORAGE_KEY, JSON.stringify({ state: { settings: 'x', result: 42 }, version: 1 }));
    const state = testStore(storage).store.getState();
    expect(state.settings).toEqual(DEFAULT_SETTINGS);
    expect(state.result).toBeNull();
  });

  it('saves only settings, result, the paths flag and the view options', () => {
    const storage = memoryStorage();
    testStore(storage).updateSettings({ maxN: 7 });
    const saved = JSON.parse(String(storage.getItem(STORAGE_KEY))) as { state: Record<string, unknown> };
    expect(Object.keys(saved.state).sort()).toEqual(['pathsDropped', 'result', 'settings', 'view']);
  });
});
