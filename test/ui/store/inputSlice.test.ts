import { describe, expect, it } from 'vitest';
import { DEFAULT_DEMO, DEFAULT_READING, DEMO_LENGTH_RANGE, restoreReading } from '../../../src/ui/store/inputSlice';
import { testStore } from './testStore';

describe('input slice', () => {
  it('starts with the format guessed from the file and the default demo length', () => {
    const { store } = testStore();
    expect(store.getState().reading.format).toBe('auto');
    expect(store.getState().demoLength).toBe(DEFAULT_DEMO.length);
    expect(store.getState().chosen).toBeNull();
  });

  it('setDemoLength keeps integers inside the allowed range and ignores anything else', () => {
    const s = testStore();
    s.setDemoLength(3_000_000);
    expect(s.store.getState().demoLength).toBe(3_000_000);
    for (const bad of [DEMO_LENGTH_RANGE[0] - 1, DEMO_LENGTH_RANGE[1] + 1, 1500.5, Number.NaN]) {
      s.setDemoLength(bad);
      expect(s.store.getState().demoLength).toBe(3_000_000);
    }
  });

  it('updateReading and chooseInput replace their fields', () => {
    const s = testStore();
    const before = s.store.getState().reading;
    s.updateReading({ format: 'csv', csvColumn: 'sector' });
    s.chooseInput({ kind: 'file', name: 'x.csv', bytes: 10 });
    const state = s.store.getState();
    expect(state.reading).toEqual({ ...DEFAULT_READING, format: 'csv', csvColumn: 'sector' });
    expect(state.reading).not.toBe(before);
    expect(state.chosen).toEqual({ kind: 'file', name: 'x.csv', bytes: 10 });
  });

  it('choosing a demo drops the file preview', () => {
    const s = testStore();
    s.showPreview({ kind: 'failed', name: 'x', message: 'gone' });
    s.chooseInput({ kind: 'file', name: 'x', bytes: 1 });
    expect(s.store.getState().preview).not.toBeNull();
    s.chooseInput({ kind: 'demo', id: 'hilltop-wind', length: 1000, seed: 1 });
    expect(s.store.getState().preview).toBeNull();
  });

  it('restoreReading keeps valid saved fields and replaces the rest by defaults', () => {
    expect(restoreReading({ format: 'chars', keepWhitespace: true, ambiguity: 'maybe', csvColumn: 3 })).toEqual({
      ...DEFAULT_READING,
      format: 'chars',
      keepWhitespace: true,
    });
    expect(restoreReading(null)).toBe(DEFAULT_READING);
  });
});
