import { describe, expect, it } from 'vitest';
import { DEFAULT_SETTINGS } from '../../../src/core/result/analysisResult';
import { restoreSettings } from '../../../src/ui/store/settingsSlice';
import { testStore } from './testStore';

describe('settings slice', () => {
  it('updateSettings replaces the snapshot and leaves the old one untouched', () => {
    const s = testStore();
    const before = s.store.getState().settings;
    s.updateSettings({ unit: 'bit', maxN: 12 });
    const after = s.store.getState().settings;
    expect(after).not.toBe(before);
    expect(before).toEqual(DEFAULT_SETTINGS);
    expect(after).toEqual({ ...DEFAULT_SETTINGS, unit: 'bit', maxN: 12 });
  });

  it('resetSettings brings back the defaults', () => {
    const s = testStore();
    s.updateSettings({ confidence: 0.99 });
    s.resetSettings();
    expect(s.store.getState().settings).toEqual(DEFAULT_SETTINGS);
  });

  it('restoreSettings keeps valid stored fields and falls back to defaults for the rest', () => {
    expect(restoreSettings({ unit: 'bit', maxN: 'many', confidence: 0.9, extra: 1 })).toEqual({
      ...DEFAULT_SETTINGS,
      unit: 'bit',
      confidence: 0.9,
    });
    expect(restoreSettings(null)).toEqual(DEFAULT_SETTINGS);
    expect(restoreSettings({ unit: 'dit', intervalSeconds: 0.5 })).toEqual({ ...DEFAULT_SETTINGS, intervalSeconds: 0.5 });
  });
});
