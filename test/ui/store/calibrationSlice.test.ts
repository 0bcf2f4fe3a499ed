import { describe, expect, it } from 'vitest';
import { ORDER_ONE_FACTS } from '../../helpers/calibrationFacts';
import type { ReplicateRecord } from '../../../src/core';
import { DEFAULT_SETTINGS } from '../../../src/core';
import { restoreCalibration } from '../../../src/ui/store/calibrationSlice';
import { bindActions, createAppStore, memoryStorage, persistedPart } from '../../../src/ui/store/store';
import { calibrationMatches, calibrationView } from '../../../src/ui/view/calibrationView';

const facts = ORDER_ONE_FACTS;
const analysis = { input: { name: 'data.txt', sha256: 'ab', symbols: 1000 }, settings: DEFAULT_SETTINGS, entropy: { estimate: 1.1, ci95: [1.0, 1.2] as const } };
const rec = (i: number, h: number): ReplicateRecord => ({ replicate: i, seed: i, entropy: h, entropyInterval: [h - 0.1, h + 0.1], entropyMethod: 'plugin-conditional', sigma2: 0.5, sigma2Interval: [0.4, 0.6] });

describe('calibration slice', () => {
  it('collects records, summarises them as they come, and keeps them when cancelled (partial)', () => {
    const store = createAppStore(() => memoryStorage());
    const a = bindActions(store);
    const id = a.beginCalibration(analysis, 10, 1);
    expect(store.getState().calibration?.status).toBe('fitting');
    a.calibrationFitted(id, facts);
    a.addCalibrationRecord(id, rec(0, 1.05));
    a.addCalibrationRecord(id, rec(1, 1.15));
    const run = store.getState().calibration!;
    expect(run.result?.summary.entropy.mean).toBeCloseTo(1.1, 14);
    expect(run.result?.partial).toBe(true);
    expect(calibrationView(run, null).progress).toBe('Replicate 2 of 10');
    a.cancelCalibration(id);
    const v = calibrationView(store.getState().calibration!, null);
    expect(v.progress).toBe('Stopped at 2 of 10 replicates (partial)');
    expect(v.partial).toBe(true);
    expect(v.message).toMatch(/Cancelled after 2 of 10 replicates/);
    // A record from an older calibration is ignored.
    const next = a.beginCalibration(analysis, 10, 1);
    a.addCalibrationRecord(id, rec(2, 9));
    expect(store.getState().calibration?.id).toBe(next);
    expect(store.getState().calibration?.records).toHaveLength(0);
  });

  it('is saved with the page and comes back cancelled when it was running', () => {
    const store = createAppStore(() => memoryStorage());
    const a = bindActions(store);
    const id = a.beginCalibration(analysis, 10, 1);
    a.calibrationFitted(id, facts);
    a.addCalibrationRecord(id, rec(0, 1.05));
    const saved = JSON.parse(JSON.stringify(persistedPart(store.getState()))) as unknown;
    const back = restoreCalibration(saved);
    expect(back.calibration?.status).toBe('cancelled');
    expect(back.calibration?.records).toHaveLength(1);
    expect(back.calibrationReplicates).toBe(50);
    expect(restoreCalibration({ calibration: { id: 'x' } }).calibration).toBeNull();
  });

  it('is stale for a result of another input or other settings', () => {
    const store = createAppStore(() => memoryStorage());
    const a = bindActions(store);
    a.beginCalibration(analysis, 10, 1);
    const run = store.getState().calibration!;
    const shown = { input: { ...analysis.input, format: 'chars', alphabetSize: 2 }, settings: DEFAULT_SETTINGS } as unknown as Parameters<typeof calibrationMatches>[1];
    expect(calibrationMatches(run, shown)).toBe(true);
    expect(calibrationMatches(run, { ...shown!, settings: { ...DEFAULT_SETTINGS, maxN: 12 } })).toBe(false);
    expect(calibrationMatches(run, { ...shown!, input: { ...shown!.input, sha256: 'cd' } })).toBe(false);
    expect(calibrationView(run, null).stale).toBe(true);
  });
});
