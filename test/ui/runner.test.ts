import { describe, expect, it } from 'vitest';
import type { AnalysisResult } from '../../src/core/result/analysisResult';
import type { AnalysisClient, CallOptions } from '../../src/ui/analysisClient';
import { createRunner, openDemoIfEmpty } from '../../src/ui/runner';
import { DEFAULT_DEMO } from '../../src/ui/store/inputSlice';
import { fakeResult } from './fixtures';
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
  it('runDemo passes the demo id, length, seed and settings, forwards progress and stores the result', async () => {
    const s = testStore();
    const { client, calls } = fakeClient();
    const runner = createRunner(client, s.store);
    s.setDemoLength(5_000);
    const done = runner.runDemo();
    await tick();
    const call = calls[0];
    expect(call?.args).toEqual([DEFAULT_DEMO.id, 5_000, DEFAULT_DEMO.seed, s.store.getState().settings]);
    call?.call.onProgress?.({ kind: 'level', n: 4, active: 321 });
    expect(s.store.getState().run).toMatchObject({ status: 'running', progress: { kind: 'level', n: 4, active: 321 } });
    const result = fakeResult();
    call?.resolve(result);
    await done;
    expect(s.store.getState().result).toBe(result);
    expect(s.store.getState().chosen).toEqual({ kind: 'demo', id: DEFAULT_DEMO.id, length: 5_000, seed: DEFAULT_DEMO.seed });
  });

  it('runFile guesses the format from the file and hands the CSV column to the reader', async () => {
    const s = testStore();
    const { client, calls } = fakeClient();
    const runner = createRunner(client, s.store);
    s.setCsvColumn('2');
    const file = new File(['a,b,c\n1,2,3\n'], 'log.csv');
    const done = runner.runFile(file);
    await tick();
    expect(calls[0]?.args[1]).toEqual({ format: 'csv', column: 2, name: 'log.csv' });
    calls[0]?.reject(new Error('bad'));
    await done;
    expect(s.store.getState().failure).toEqual({ title: 'The analysis of “log.csv” failed', message: 'bad' });
  });

  it('cancel ends the run as cancelled, not failed', async () => {
    const s = testStore();
    const { client } = fakeClient();
    const runner = createRunner(client, s.store);
    const done = runner.runDemo();
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
    const first = runner.runDemo();
    await tick();
    const second = runner.runDemo();
    await tick();
    expect(calls[0]?.call.signal.aborted).toBe(true);
    expect(calls[1]?.call.signal.aborted).toBe(false);
    const result = fakeResult();
    calls[1]?.resolve(result);
    await Promise.all([first, second]);
    expect(s.store.getState().result).toBe(result);
    expect(s.store.getState().run).toEqual({ status: 'idle', note: null });
  });

  it('rerun repeats the last file, or runs the demo when none was chosen', async () => {
    const s = testStore();
    const { client, calls } = fakeClient();
    const runner = createRunner(client, s.store);
    void runner.rerun();
    await tick();
    expect(calls[0]?.kind).toBe('demo');
    void runner.runFile(new File(['x y'], 'seq.txt'));
    await tick();
    void runner.rerun();
    await tick();
    expect(calls.map((c) => c.kind)).toEqual(['demo', 'file', 'file']);
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
});
