import { describe, expect, it } from 'vitest';
import type { AnalysisClient } from '../../src/ui/analysisClient';
import type { CalibrationClient } from '../../src/ui/calibrationClient';
import { createCalibrationRunner } from '../../src/ui/calibrationRunner';
import { createRunner } from '../../src/ui/runner';
import { calibrationRunOfResult } from '../../src/ui/store/calibrationSlice';
import { calibrationView } from '../../src/ui/view/calibrationView';
import { extrasFixture } from '../helpers/sessionExtrasFixtures';
import { fakeResult } from './fixtures';
import { testStore } from './store/testStore';

/** A client that fails the test if anything is computed: opening a session must not run an analysis. */
const noClient: AnalysisClient = {
  analyzeFile: () => Promise.reject(new Error('analyzeFile called')),
  analyzeBytes: () => Promise.reject(new Error('analyzeBytes called')),
  analyzeDemo: () => Promise.reject(new Error('analyzeDemo called')),
  dispose: () => {},
};

/** A page showing the fixture's result with its calibration and comparison. */
function shownPage() {
  const { result, calibration, comparison } = extrasFixture();
  const s = testStore();
  s.completeRun(s.beginRun('x', 12), result);
  s.store.setState({ calibration: calibrationRunOfResult(calibration, result.entropy) });
  s.completeComparison(comparison);
  return s;
}

describe('sessions keep the calibration and the comparison', () => {
  it('sessionFile saves both; opening it in a fresh store shows the same calibration panel text and comparison, computing nothing', async () => {
    const { result, calibration, comparison } = extrasFixture();
    const page = shownPage();
    const file = createRunner(noClient, page.store).sessionFile(new Date('2026-12-01T23:55:00Z'))!;
    const other = testStore();
    await createRunner(noClient, other.store).openFile(new File([file.text], file.name));
    const state = other.store.getState();
    expect(state.failure).toBeNull();
    expect(state.result).toEqual(result);
    expect(state.calibration?.result).toEqual(calibration);
    expect(state.calibration?.status).toBe('done');
    expect(state.comparisonResult).toEqual(comparison);
    // The panel's words and numbers are those of the page that saved it, and it is not stale.
    const before = calibrationView(page.store.getState().calibration!, page.store.getState().result);
    const after = calibrationView(state.calibration!, state.result);
    expect(after).toEqual(before);
    expect(after.stale).toBe(false);
    expect(after.rows).toHaveLength(2);
    // The file sorts nested keys; the same analysis run again (settings in the core's key order) still matches.
    expect(Object.keys(state.calibration!.analysis.settings)).toEqual([...Object.keys(result.settings)].sort());
    expect(calibrationView(state.calibration!, { ...result }).stale).toBe(false);
  });

  it('a partial calibration comes back cancelled with its note; a stale one is not saved', async () => {
    const { result, calibration } = extrasFixture();
    const page = shownPage();
    const partial = { ...calibration, partial: true, replicatesRequested: 20 };
    page.store.setState({ calibration: calibrationRunOfResult(partial, result.entropy) });
    const other = testStore();
    await createRunner(noClient, other.store).openFile(new File([createRunner(noClient, page.store).sessionFile()!.text], 's.json'));
    expect(other.store.getState().calibration?.status).toBe('cancelled');
    expect(calibrationView(other.store.getState().calibration!, other.store.getState().result).partial).toBe(true);

    // The shown result changes: the calibration no longer belongs to it and stays out of the file.
    page.completeRun(page.beginRun('y', 12), { ...result, input: { ...result.input, sha256: 'c'.repeat(64) } });
    const text = createRunner(noClient, page.store).sessionFile()!.text;
    expect(text).not.toContain('"calibration"');
    expect(text).toContain('"comparison"');
  });

  it('an older session without them clears the calibration and comparison shown before', async () => {
    const page = shownPage();
    const plain = testStore();
    plain.completeRun(plain.beginRun('x', 40), fakeResult());
    const text = createRunner(noClient, plain.store).sessionFile()!.text;
    await createRunner(noClient, page.store).openSession(new File([text], 'old.json'));
    expect(page.store.getState().failure).toBeNull();
    expect(page.store.getState().calibration).toBeNull();
    expect(page.store.getState().comparisonResult).toBeNull();
  });
});

describe('opening a session during a calibration', () => {
  it('stops the running calibration (its signal aborts) and shows the session’s one instead', async () => {
    const { result } = extrasFixture();
    const s = testStore();
    s.completeRun(s.beginRun('x', 12), result);
    let signal: AbortSignal | null = null;
    const client: CalibrationClient = {
      calibrate: (_input, _settings, _replicates, _seed, call) =>
        new Promise((_resolve, reject) => {
          signal = call.signal;
          call.signal.addEventListener('abort', () => reject(new DOMException('stopped', 'AbortError')));
        }),
    };
    const running = createCalibrationRunner(client, s.store, () => ({ kind: 'demo', id: 'x', length: 3000, seed: 1 })).start();
    await Promise.resolve();
    expect(signal).not.toBeNull();
    expect(signal!.aborted).toBe(false);
    const file = createRunner(noClient, shownPage().store).sessionFile()!;
    await createRunner(noClient, s.store).openSession(new File([file.text], file.name));
    expect(signal!.aborted).toBe(true);
    await running;
    expect(s.store.getState().calibration?.status).toBe('done');
    expect(s.store.getState().calibration?.records).toHaveLength(10);
  });
});
