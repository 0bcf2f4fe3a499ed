import { describe, expect, it } from 'vitest';
import { DEFAULT_DEMO, DEMO_LENGTH_RANGE } from '../../../src/ui/store/inputSlice';
import { testStore } from './testStore';

describe('input slice', () => {
  it('starts with the format guessed from the file and the default demo length', () => {
    const { store } = testStore();
    expect(store.getState().format).toBe('auto');
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

  it('setFormat, setCsvColumn and chooseInput replace their fields', () => {
    const s = testStore();
    s.setFormat('csv');
    s.setCsvColumn('sector');
    s.chooseInput({ kind: 'file', name: 'x.csv', bytes: 10 });
    const state = s.store.getState();
    expect([state.format, state.csvColumn, state.chosen]).toEqual(['csv', 'sector', { kind: 'file', name: 'x.csv', bytes: 10 }]);
  });
});
