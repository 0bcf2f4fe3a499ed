import { describe, expect, it } from 'vitest';
import { ReadError } from '../../../src/core/sequence/readError';
import { describeFailure, isAbortError } from '../../../src/ui/store/runSlice';
import { fakeResult, lengthRow } from '../fixtures';
import { testStore } from './testStore';

describe('run slice', () => {
  it('beginRun gives each run a new id and starts without progress', () => {
    const s = testStore();
    const first = s.beginRun('a', 40, 1_000);
    const second = s.beginRun('b', 20, 2_000);
    expect(second).toBe(first + 1);
    expect(s.store.getState().run).toEqual({ status: 'running', id: second, label: 'b', maxN: 20, progress: null, startedAtMs: 2_000, levels: null, shares: null });
  });

  it('level reports build the time-left track: first and last time, the last two counts, the work between', () => {
    const s = testStore();
    const id = s.beginRun('x', 40, 0);
    s.reportProgress(id, { kind: 'read', bytes: 10, totalBytes: 20 }, 50);
    s.reportProgress(id, { kind: 'level', n: 1, active: 1000 }, 100);
    s.reportProgress(id, { kind: 'level', n: 2, active: 800 }, 300);
    s.reportProgress(id, { kind: 'level', n: 3, active: 500 }, 460);
    const { run } = s.store.getState();
    // by hand: levels 2 and 3 worked on the 1000 and 800 positions left after levels 1 and 2
    expect(run.status === 'running' && run.levels).toEqual({ firstAtMs: 100, lastAtMs: 460, active: 500, previousActive: 800, positionLevelsSinceFirst: 1800 });
  });

  it('share reports keep the time of the first and of the last, and leave the level track alone', () => {
    const s = testStore();
    const id = s.beginRun('x', 40, 0);
    s.reportProgress(id, { kind: 'level', n: 5, active: 1000 }, 100);
    const shares = { kind: 'shares', total: 8, firstN: 6, active: 1000 } as const;
    s.reportProgress(id, { ...shares, done: 0 }, 200);
    s.reportProgress(id, { ...shares, done: 1 }, 900);
    s.reportProgress(id, { ...shares, done: 2 }, 1500);
    const { run } = s.store.getState();
    expect(run.status === 'running' && run.shares).toEqual({ firstAtMs: 200, lastAtMs: 1500 });
    expect(run.status === 'running' && run.levels).toMatchObject({ firstAtMs: 100, lastAtMs: 100, active: 1000 });
  });

  it('reports of an older run are ignored once a newer one started', () => {
    const s = testStore();
    const old = s.beginRun('old', 40);
    const current = s.beginRun('new', 40);
    s.reportProgress(old, { kind: 'level', n: 9, active: 5 });
    s.completeRun(old, fakeResult());
    s.failRun(old, new Error('late'));
    s.cancelRun(old);
    const state = s.store.getState();
    expect(state.run).toMatchObject({ status: 'running', id: current, progress: null });
    expect(state.result).toBeNull();
    expect(state.failure).toBeNull();
    s.reportProgress(current, { kind: 'level', n: 3, active: 70 });
    expect(s.store.getState().run).toMatchObject({ progress: { kind: 'level', n: 3, active: 70 } });
  });

  it('completeRun stores the result and returns to idle', () => {
    const s = testStore();
    const id = s.beginRun('x', 40);
    const result = fakeResult();
    s.completeRun(id, result);
    expect(s.store.getState().result).toBe(result);
    expect(s.store.getState().run).toEqual({ status: 'idle', note: null });
  });

  it('cancelRun returns to idle with a note and keeps the previous result', () => {
    const s = testStore();
    const result = fakeResult();
    s.completeRun(s.beginRun('x', 40), result);
    s.cancelRun(s.beginRun('y', 40));
    const state = s.store.getState();
    expect(state.run.status).toBe('idle');
    expect(state.run.status === 'idle' && state.run.note).toMatch(/Cancelled/);
    expect(state.result).toBe(result);
  });

  it('failRun keeps the core message unchanged and titles it by kind of error', () => {
    const s = testStore();
    const error = new ReadError('missing-column', "no column 'speed'; the header has time, sector", { line: 1 });
    s.failRun(s.beginRun('“log.csv”', 40), error);
    expect(s.store.getState().failure).toEqual({ title: 'Could not read “log.csv”', message: error.message });
    s.dismissFailure();
    expect(s.store.getState().failure).toBeNull();
  });

  it('describeFailure reads errors rebuilt by comlink (plain objects with name and message)', () => {
    const rebuilt = Object.assign(new Error('maxN must be an integer from 1 to N - 1 = 9; got 40'), { name: 'RangeError' });
    expect(describeFailure(rebuilt, 'the demo')).toEqual({
      title: 'The analysis of the demo refused its input',
      message: 'maxN must be an integer from 1 to N - 1 = 9; got 40',
    });
    expect(describeFailure('boom', 'x')).toEqual({ title: 'The analysis of x failed', message: 'boom' });
    expect(describeFailure(new Error(''), 'x').message).toBe('no details were given');
  });

  it('isAbortError recognises AbortError by name only', () => {
    expect(isAbortError(new DOMException('stop', 'AbortError'))).toBe(true);
    expect(isAbortError(new Error('AbortError'))).toBe(false);
    expect(isAbortError(null)).toBe(false);
  });

  it('beginRun starts an empty partial table in the run\'s unit; addPartialRows appends rows n = 1..k in order', () => {
    // source: API contract (runSlice.ts)
    const s = testStore();
    const id = s.beginRun('chain', 12, 0, 'bit');
    expect(s.store.getState().partial).toEqual({ runId: id, label: 'chain', unit: 'bit', maxN: 12, rows: [], status: 'running' });
    s.addPartialRows(id, [lengthRow(1), lengthRow(2)]);
    const before = s.store.getState().partial;
    s.addPartialRows(id, [lengthRow(2), lengthRow(4)]); // a repeat and a gap: ignored, state unchanged
    expect(s.store.getState().partial).toBe(before);
    s.addPartialRows(id, [lengthRow(3)]);
    expect(s.store.getState().partial?.rows.map((r) => r.n)).toEqual([1, 2, 3]);
    // Snapshots are replaced, never mutated.
    expect(before?.rows.map((r) => r.n)).toEqual([1, 2]);
  });

  it('rows of an older run are ignored, and a new run starts from an empty partial table', () => {
    const s = testStore();
    const old = s.beginRun('old', 12);
    s.addPartialRows(old, [lengthRow(1)]);
    const current = s.beginRun('new', 12);
    s.addPartialRows(old, [lengthRow(2)]);
    expect(s.store.getState().partial).toMatchObject({ runId: current, rows: [] });
  });

  it('completeRun and failRun clear the partial rows', () => {
    const s = testStore();
    const a = s.beginRun('a', 12);
    s.addPartialRows(a, [lengthRow(1)]);
    s.completeRun(a, fakeResult());
    expect(s.store.getState().partial).toBeNull();
    const b = s.beginRun('b', 12);
    s.addPartialRows(b, [lengthRow(1)]);
    s.failRun(b, new Error('bad'));
    expect(s.store.getState().partial).toBeNull();
  });

  it('cancelRun keeps the rows computed so far, marked cancelled, with a note naming where it stopped', () => {
    const s = testStore();
    const result = fakeResult();
    s.completeRun(s.beginRun('x', 40), result);
    const id = s.beginRun('y', 40);
    s.addPartialRows(id, [lengthRow(1), lengthRow(2), lengthRow(3)]);
    s.cancelRun(id);
    const state = s.store.getState();
    expect(state.partial).toMatchObject({ runId: id, status: 'cancelled' });
    expect(state.partial?.rows).toHaveLength(3);
    expect(state.run.status === 'idle' && state.run.note).toBe(
      'Cancelled at n = 3 of 40; the rows n = 1..3 stay in the table and figure, the previous result in the summary.',
    );
    expect(state.result).toBe(result);
  });

  it('failRun after the worker died keeps the rows computed so far, marked stopped, and titles the failure', () => {
    const s = testStore();
    const result = fakeResult();
    s.completeRun(s.beginRun('x', 40), result);
    const id = s.beginRun('“chain.txt”', 40);
    s.addPartialRows(id, [lengthRow(1), lengthRow(2)]);
    const died = Object.assign(new Error('the analysis stopped unexpectedly (the worker was terminated); press Run to start it again'), { name: 'WorkerStopped' });
    s.failRun(id, died);
    const state = s.store.getState();
    expect(state.partial).toMatchObject({ runId: id, status: 'stopped' });
    expect(state.partial?.rows).toHaveLength(2);
    expect(state.failure).toEqual({ title: 'The analysis of “chain.txt” stopped unexpectedly', message: died.message });
    expect(state.run.status).toBe('idle');
    expect(state.result).toBe(result);
    // Run again: a fresh run starts from an empty table.
    const again = s.beginRun('“chain.txt”', 40);
    expect(s.store.getState().partial).toMatchObject({ runId: again, status: 'running', rows: [] });
  });

  it('cancelRun before any row finished leaves no partial table', () => {
    const s = testStore();
    s.cancelRun(s.beginRun('y', 40));
    expect(s.store.getState().partial).toBeNull();
    expect(s.store.getState().run).toEqual({ status: 'idle', note: 'Cancelled; the previous result stays shown.' });
  });
});
