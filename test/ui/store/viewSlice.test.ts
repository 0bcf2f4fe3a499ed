import { describe, expect, it } from 'vitest';
import { DEFAULT_VIEW, restoreView } from '../../../src/ui/store/viewSlice';
import { memoryStorage } from '../../../src/ui/store/store';
import { testStore } from './testStore';

describe('view slice', () => {
  it('updateView replaces the snapshot, and the options survive a reload', () => {
    const storage = memoryStorage();
    const s = testStore(storage);
    const before = s.store.getState().view;
    s.updateView({ z: 2.5, showPaths: false });
    expect(before).toEqual(DEFAULT_VIEW);
    expect(s.store.getState().view).toEqual({ ...DEFAULT_VIEW, z: 2.5, showPaths: false });
    expect(testStore(storage).store.getState().view).toEqual({ ...DEFAULT_VIEW, z: 2.5, showPaths: false });
  });

  it('resetView brings back the defaults; restoreView keeps valid fields only', () => {
    const s = testStore();
    s.updateView({ delta: 0.3 });
    s.resetView();
    expect(s.store.getState().view).toEqual(DEFAULT_VIEW);
    expect(restoreView({ delta: 0.2, errorC: 'big', showPaths: 1 })).toEqual({ ...DEFAULT_VIEW, delta: 0.2 });
    expect(restoreView(undefined)).toEqual(DEFAULT_VIEW);
  });

  it('restoreView keeps chosen block lengths and gap only when they are integers >= 1', () => {
    expect(restoreView({ fluctuationN: 7, returnLawN: 3, fluctuationGap: 25 })).toEqual({ ...DEFAULT_VIEW, fluctuationN: 7, returnLawN: 3, fluctuationGap: 25 });
    expect(restoreView({ fluctuationN: 2.5, returnLawN: 0, fluctuationGap: -1 })).toEqual(DEFAULT_VIEW);
  });
});
