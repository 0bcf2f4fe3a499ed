import { createHash } from 'node:crypto';
import { describe, expect, it, vi } from 'vitest';
import type { AnalysisResult } from '../../src/core/result/analysisResult';
import type { AnalysisClient, CallOptions } from '../../src/ui/analysisClient';
import { createRunner, openDemoIfEmpty } from '../../src/ui/runner';
import { DEFAULT_DEMO } from '../../src/ui/store/inputSlice';
import { DEMO_SCENARIOS } from '../../workers/demoScenarios';
import { fakeResult, lengthRow } from './fixtures';
import { testStore } from './store/testStore';

interface PendingCall {
  readonly kind: 'file' | 'demo';
  readonly args: readonly unknown[];
  readonly call: CallOptions;
  resolve(result: AnalysisResult): void;
  reject(error: unknown): void;
}

/** A client whose calls wait until the test settles them; abort rejects like the real one. */
function fakeClient() {
  const calls: PendingCall[] = [];
  const record = (kind: PendingCall['kind'], args: readonly unknown[], call: CallOptions): Promise<AnalysisResult> =>
    new Promise((resolve, reject) => {
      call.signal.addEventListener('abort', () => reject(new DOMException('cancelled', 'AbortError')));
      calls.push({ kind, args, call, resolve, reject });
    });
  const client: AnalysisClient = {
    analyzeFile: (file, options, settings, call) => record('file', [file, options, settings], call),
    analyzeBytes: (bytes, options, settings, call) => record('file', [bytes, options, settings], call),
    analyzeDemo: (id, length, seed, settings, call) => record('demo', [id, length, seed, settings], call),
    dispose: () => {},
  };
  return { client, calls };
}

const tick = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));

describe('runner', () => {
  it('run with nothing chosen generates the default demo at the current length, forwards progress and stores the result', async () => {
    const s = testStore();
    const { client, calls } = fakeClient();
    const runner = createRunner(client, s.store);
    s.setDemoLength(5_000);
    const done = runner.run();
    await tick();
    const call = calls[0];
    expect(call?.args).toEqual([DEFAULT_DEMO.id, 5_000, DEFAULT_DEMO.seed, s.store.getState().settings]);
    call?.call.onProgress?.({ kind: 'level', n: 4, active: 321 });
    expect(s.store.getState().run).toMatchObject({ status: 'running', progress: { kind: 'level', n: 4, active: 321 } });
    call?.call.onRows?.([lengthRow(1), lengthRow(2)]);
    expect(s.store.getState().partial).toMatchObject({ status: 'running', unit: s.store.getState().settings.unit, rows: [{ n: 1 }, { n: 2 }] });
    const result = fakeResult();
    call?.resolve(result);
    await done;
    expect(s.store.getState().result).toBe(result);
    expect(s.store.getState().partial).toBeNull();
    expect(s.store.getState().chosen).toEqual({ kind: 'demo', id: DEFAULT_DEMO.id, length: 5_000, seed: DEFAULT_DEMO.seed });
  });

  it('currentInput is what the next run reads: the default demo, a chosen demo at the current length, the open file', async () => {
    const s = testStore();
    const { client } = fakeClient();
    const runner = createRunner(client, s.store);
    s.setDemoLength(6_000);
    expect(runner.currentInput()).toEqual({ kind: 'demo', id: DEFAULT_DEMO.id, length: 6_000, seed: DEFAULT_DEMO.seed });
    runner.chooseDemo('stirred-tank');
    s.setDemoLength(8_000);
    expect(runner.currentInput()).toMatchObject({ kind: 'demo', id: 'stirred-tank', length: 8_000 });
    const file = new File(['x y'], 'seq.txt');
    await runner.openFile(file);
    expect(runner.currentInput()).toEqual({ kind: 'file', file });
    // A file named by a reloaded page is no longer held.
    expect(createRunner(client, s.store).currentInput()).toBeNull();
  });

  it('chooseDemo picks a gallery entry with its own seed; run generates it', async () => {
    const s = testStore();
    const { client, calls } = fakeClient();
    const runner = createRunner(client, s.store);
    const entry = DEMO_SCENARIOS.find((d) => d.id === 'stirred-tank');
    runner.chooseDemo('stirred-tank');
    expect(calls).toHaveLength(0);
    void runner.run();
    await tick();
    expect(calls[0]?.args.slice(0, 3)).toEqual(['stirred-tank', DEFAULT_DEMO.length, entry?.seed]);
  });

  it('openFile previews the head without running; changed reading choices refresh the preview', async () => {
    const s = testStore();
    const { client, calls } = fakeClient();
    const runner = createRunner(client, s.store);
    await runner.openFile(new File(['N NE E\nSE S SW\n'], 'wind.txt'));
    const first = s.store.getState().preview;
    expect(calls).toHaveLength(0);
    expect(first?.kind === 'ready' && [first.model.format, first.model.symbolsInHead]).toEqual(['tokens', 6]);
    s.updateReading({ format: 'chars' });
    runner.refreshPreview();
    const second = s.store.getState().preview;
    // by hand: N N E E S E S S W = 9 characters without the spaces
    expect(second?.kind === 'ready' && [second.model.format, second.model.symbolsInHead]).toEqual(['chars', 9]);
  });

  it('run reads the open file with the reading choices: the guessed format and the CSV column', async () => {
    const s = testStore();
    const { client, calls } = fakeClient();
    const runner = createRunner(client, s.store);
    s.updateReading({ csvColumn: '2' });
    await runner.openFile(new File(['a,b,c\n1,2,3\n'], 'log.csv'));
    const done = runner.run();
    await tick();
    expect(calls[0]?.args[1]).toEqual({ format: 'csv', column: 2, hasHeader: true, name: 'log.csv' });
    calls[0]?.reject(new Error('bad'));
    await done;
    expect(s.store.getState().failure).toEqual({ title: 'The analysis of “log.csv” failed', message: 'bad' });
  });

  it('cancel ends the run as cancelled, not failed', async () => {
    const s = testStore();
    const { client } = fakeClient();
    const runner = createRunner(client, s.store);
    const done = runner.run();
    await tick();
    runner.cancel();
    await done;
    const { run, failure } = s.store.getState();
    expect(run.status === 'idle' && run.note).toMatch(/Cancelled/);
    expect(failure).toBeNull();
  });

  it('a new run aborts the one in progress and only the new result is kept', async () => {
    const s = testStore();
    const { client, calls } = fakeClient();
    const runner = createRunner(client, s.store);
    const first = runner.run();
    await tick();
    const second = runner.run();
    await tick();
    expect(calls[0]?.call.signal.aborted).toBe(true);
    expect(calls[1]?.call.signal.aborted).toBe(false);
    const result = fakeResult();
    calls[1]?.resolve(result);
    await Promise.all([first, second]);
    expect(s.store.getState().result).toBe(result);
    expect(s.store.getState().run).toEqual({ status: 'idle', note: null });
  });

  it('run repeats the open file until a demo is chosen', async () => {
    const s = testStore();
    const { client, calls } = fakeClient();
    const runner = createRunner(client, s.store);
    await runner.openFile(new File(['x y'], 'seq.txt'));
    void runner.run();
    await tick();
    void runner.run();
    await tick();
    runner.chooseDemo('dry-wet-days');
    void runner.run();
    await tick();
    expect(calls.map((c) => c.kind)).toEqual(['file', 'file', 'demo']);
  });

  it('openDemoIfEmpty starts the demo only when there is no result and nothing runs', async () => {
    const s = testStore();
    const { client, calls } = fakeClient();
    const runner = createRunner(client, s.store);
    openDemoIfEmpty(runner, s.store);
    openDemoIfEmpty(runner, s.store);
    await tick();
    expect(calls).toHaveLength(1);
    calls[0]?.resolve(fakeResult());
    await tick();
    openDemoIfEmpty(runner, s.store);
    await tick();
    expect(calls).toHaveLength(1);
  });
  it('sessionFile writes the shown result as a session that openSession shows again, numbers identical, without running', async () => {
    const s = testStore();
    const { client, calls } = fakeClient();
    const runner = createRunner(client, s.store);
    expect(runner.sessionFile()).toBeNull();
    const result = fakeResult({ input: { name: 'a "b", <c>.txt', symbols: 10, alphabetSize: 2, sha256: null, format: 'chars' } });
    s.completeRun(s.beginRun('x', 40), result);
    s.updateView({ z: 3 });
    const file = runner.sessionFile(new Date('2026-12-01T10:00:00Z'));
    expect(file?.name).toBe('a _b_, _c_.txt.returnrate-session.json');

    const other = testStore();
    const second = createRunner(client, other.store);
    await second.openFile(new File([file!.text], 'saved.json'));
    expect(other.store.getState().result).toEqual(result);
    expect(other.store.getState().view.z).toBe(3);
    expect(other.store.getState().run).toEqual({ status: 'idle', note: 'Opened session saved 2026-12-01 10:00 UTC.' });
    expect(other.store.getState().chosen).toBeNull();
    expect(calls).toEqual([]);
  });

  it('a session of a newer schema gets the clear message and leaves the shown result', async () => {
    const s = testStore();
    const runner = createRunner(fakeClient().client, s.store);
    const result = fakeResult();
    s.completeRun(s.beginRun('x', 40), result);
    const text = runner.sessionFile()!.text.replace('"returnrate.session/1"', '"returnrate.session/2"');
    await runner.openSession(new File([text], 'future.json'));
    expect(s.store.getState().failure).toEqual({
      title: 'Could not open the session “future.json”',
      message: 'this session was saved by a newer returnrate (schema returnrate.session/2); this version reads returnrate.session/1',
    });
    expect(s.store.getState().result).toBe(result);
  });

  it('a file opened after a session is hashed and said to be the same data or not', async () => {
    const s = testStore();
    const runner = createRunner(fakeClient().client, s.store);
    const bytes = 'N NE E\nSE S SW\n';
    // SHA-256 of the bytes above from Node's crypto (OpenSSL), independent of @noble/hashes.
    const sha = createHash('sha256').update(bytes).digest('hex');
    s.completeRun(s.beginRun('x', 40), fakeResult({ input: { name: 'wind.txt', symbols: 6, alphabetSize: 6, sha256: sha, format: 'tokens' } }));
    await runner.openSession(new File([runner.sessionFile()!.text], 's.json'));
    await runner.openFile(new File([bytes], 'wind-again.txt'));
    await vi.waitFor(() => expect(s.store.getState().dataCheck).toEqual({ kind: 'same', name: 'wind-again.txt' }));
    await runner.openFile(new File([bytes + 'N\n'], 'wind-longer.txt'));
    await vi.waitFor(() => expect(s.store.getState().dataCheck).toEqual({ kind: 'different', name: 'wind-longer.txt' }));
    expect(s.store.getState().preview).toMatchObject({ kind: 'ready', name: 'wind-longer.txt' });
  });
});
