import { describe, expect, it } from 'vitest';
import { DEFAULT_SETTINGS } from '../../../src/core/result/analysisResult';
import { DEFAULT_DEMO, DEFAULT_READING } from '../../../src/ui/store/inputSlice';
import { STORAGE_KEY, memoryStorage } from '../../../src/ui/store/store';
import { fakeResult } from '../fixtures';
import { testStore } from './testStore';

describe('app store persistence', () => {
  it('settings, reading choices, demo length and the last result survive a reload; chosen input, preview and run state do not', () => {
    const storage = memoryStorage();
    const first = testStore(storage);
    first.updateSettings({ unit: 'bit' });
    first.updateReading({ format: 'fasta', ambiguity: 'symbol' });
    first.setDemoLength(50_000);
    first.chooseInput({ kind: 'file', name: 'a.txt', bytes: 3 });
    const result = fakeResult();
    first.completeRun(first.beginRun('x', 40), result);
    first.beginRun('still running', 40);

    const reloaded = testStore(storage).store.getState();
    expect(reloaded.settings).toEqual({ ...DEFAULT_SETTINGS, unit: 'bit' });
    expect(reloaded.result).toEqual(result);
    expect(reloaded.reading).toEqual({ ...DEFAULT_READING, format: 'fasta', ambiguity: 'symbol' });
    expect(reloaded.demoLength).toBe(50_000);
    expect(reloaded.chosen).toBeNull();
    expect(reloaded.preview).toBeNull();
    expect(reloaded.run).toEqual({ status: 'idle', note: null });
  });

  it('a corrupt saved state gives a fresh page instead of an error', () => {
    const storage = memoryStorage();
    storage.setItem(STORAGE_KEY, JSON.stringify({ state: { settings: 'x', result: 42, reading: { format: 'pdf', csvHeader: 'yes' }, demoLength: -4 }, version: 1 }));
    const state = testStore(storage).store.getState();
    expect(state.settings).toEqual(DEFAULT_SETTINGS);
    expect(state.reading).toEqual(DEFAULT_READING);
    expect(state.demoLength).toBe(DEFAULT_DEMO.length);
    expect(state.result).toBeNull();
  });

  it('saves only settings, reading choices, demo length, view options, result and the paths flag, the calibration and the last comparison', () => {
    const storage = memoryStorage();
    testStore(storage).updateSettings({ maxN: 7 });
    const saved = JSON.parse(String(storage.getItem(STORAGE_KEY))) as { state: Record<string, unknown> };
    expect(Object.keys(saved.state).sort()).toEqual(['calibration', 'calibrationReplicates', 'comparisonResult', 'demoLength', 'pathsDropped', 'reading', 'result', 'settings', 'view']);
  });

  it('writes the saved state only when a saved part changes, not on run progress', () => {
    const storage = memoryStorage();
    const writes: string[] = [];
    const counting = { ...storage, setItem: (name: string, value: string) => (writes.push(value), storage.setItem(name, value)) };
    const s = testStore(counting);
    const id = s.beginRun('x', 40);
    const afterBegin = writes.length;
    s.reportProgress(id, { kind: 'level', n: 1, active: 1000 });
    s.reportProgress(id, { kind: 'level', n: 2, active: 800 });
    expect(writes.length).toBe(afterBegin);
    const result = fakeResult();
    s.completeRun(id, result);
    expect(writes.length).toBe(afterBegin + 1);
    expect(testStore(storage).store.getState().result).toEqual(result);
    s.updateSettings({ unit: 'bit' });
    expect(writes.length).toBe(afterBegin + 2);
  });
});
