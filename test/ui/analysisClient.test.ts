import { describe, expect, it } from 'vitest';
import { fakeWorkers } from '../helpers/fakeWorkers';
import type { AnalysisResult, LengthRow } from '../../src/core/result/analysisResult';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import type { AnalysisProgress, AnalysisReport } from '../../src/ui/analysisClient';
import { WorkerStopped, createAnalysisClient, workerStoppedMessage } from '../../src/ui/analysisClient';
import type { WorkerLike } from '../../src/ui/analysisClient';
import { fakeResult, lengthRow } from './fixtures';

const never = (): Promise<never> => new Promise(() => {});

describe('analysis client', () => {
  it('starts no worker until the first call, and reuses it afterwards', async () => {
    const result = fakeResult();
    const { start, started } = fakeWorkers<WorkerLike>({ analyzeDemo: () => result });
    const client = createAnalysisClient(start);
    expect(started).toHaveLength(0);
    const signal = new AbortController().signal;
    await expect(client.analyzeDemo('d', 10, 1, DEFAULT_SETTINGS, { signal })).resolves.toEqual(result);
    await client.analyzeDemo('d', 10, 1, DEFAULT_SETTINGS, { signal });
    expect(started).toHaveLength(1);
    client.dispose();
  });

  it('delivers progress through the proxied callback', async () => {
    const api = {
      analyzeDemo: (_id: string, _n: number, _seed: number, _s: unknown, onProgress: (p: AnalysisProgress) => Promise<void>) =>
        onProgress({ kind: 'level', n: 2, active: 17 }).then(() => fakeResult()),
    };
    const { start } = fakeWorkers<WorkerLike>(api);
    const client = createAnalysisClient(start);
    const seen: AnalysisProgress[] = [];
    await client.analyzeDemo('d', 10, 1, DEFAULT_SETTINGS, { signal: new AbortController().signal, onProgress: (p) => seen.push(p) });
    expect(seen).toEqual([{ kind: 'level', n: 2, active: 17 }]);
    client.dispose();
  });

  it('hands row reports to onRows and progress to onProgress, through the one proxied callback', async () => {
    const row = lengthRow(1);
    const api = {
      analyzeDemo: (_id: string, _n: number, _seed: number, _s: unknown, onReport: (r: AnalysisReport) => Promise<void>) =>
        onReport({ kind: 'level', n: 1, active: 9 })
          .then(() => onReport({ kind: 'rows', rows: [row] }))
          .then(() => fakeResult()),
    };
    const { start } = fakeWorkers<WorkerLike>(api);
    const client = createAnalysisClient(start);
    const progress: AnalysisProgress[] = [];
    const rows: (readonly LengthRow[])[] = [];
    await client.analyzeDemo('d', 10, 1, DEFAULT_SETTINGS, {
      signal: new AbortController().signal,
      onProgress: (p) => progress.push(p),
      onRows: (r) => rows.push(r),
    });
    expect(progress).toEqual([{ kind: 'level', n: 1, active: 9 }]);
    expect(rows).toEqual([[row]]);
    client.dispose();
  });

  it('rejects with the core message intact', async () => {
    const { start } = fakeWorkers<WorkerLike>({
      analyzeDemo: () => {
        throw new RangeError('maxN must be an integer from 1 to N - 1 = 9; got 40');
      },
    });
    const client = createAnalysisClient(start);
    const error: unknown = await client.analyzeDemo('d', 10, 1, DEFAULT_SETTINGS, { signal: new AbortController().signal }).catch((e: unknown) => e);
    expect(error).toMatchObject({ name: 'RangeError', message: 'maxN must be an integer from 1 to N - 1 = 9; got 40' });
    client.dispose();
  });

  it('abort terminates the worker, rejects with an AbortError, and the next call starts a new worker', async () => {
    const result = fakeResult();
    const { start, started } = fakeWorkers<WorkerLike>({ analyzeDemo: (id: string): Promise<AnalysisResult> => (id === 'hang' ? never() : Promise.resolve(result)) });
    const client = createAnalysisClient(start);
    const controller = new AbortController();
    const pending = client.analyzeDemo('hang', 10, 1, DEFAULT_SETTINGS, { signal: controller.signal });
    controller.abort();
    await expect(pending).rejects.toMatchObject({ name: 'AbortError' });
    expect(started[0]?.terminated).toBe(true);
    await expect(client.analyzeDemo('d', 10, 1, DEFAULT_SETTINGS, { signal: new AbortController().signal })).resolves.toEqual(result);
    expect(started).toHaveLength(2);
    client.dispose();
  });

  it('a call with an already aborted signal rejects without starting a worker', async () => {
    const { start, started } = fakeWorkers<WorkerLike>({});
    const client = createAnalysisClient(start);
    const controller = new AbortController();
    controller.abort();
    await expect(client.analyzeDemo('d', 10, 1, DEFAULT_SETTINGS, { signal: controller.signal })).rejects.toMatchObject({ name: 'AbortError' });
    expect(started).toHaveLength(0);
  });

  it('a worker that dies during a call rejects it as WorkerStopped in plain words, and the next call starts a new worker', async () => {
    const result = fakeResult();
    const { start, started } = fakeWorkers<WorkerLike>({ analyzeDemo: (id: string): Promise<AnalysisResult> => (id === 'hang' ? never() : Promise.resolve(result)) });
    const workers: EventTarget[] = [];
    const client = createAnalysisClient(() => {
      const w = start();
      workers.push(w as unknown as EventTarget);
      return w;
    });
    const pending = client.analyzeDemo('hang', 10, 1, DEFAULT_SETTINGS, { signal: new AbortController().signal });
    // What a browser raises when a worker fails outside a call (a plain Event: Node has no ErrorEvent).
    workers[0]!.dispatchEvent(Object.assign(new Event('error'), { message: 'out of memory' }));
    const error: unknown = await pending.catch((e: unknown) => e);
    expect(error).toBeInstanceOf(WorkerStopped);
    expect((error as Error).message).toBe(workerStoppedMessage('out of memory'));
    expect((error as Error).message).toMatch(/^the analysis stopped unexpectedly \(out of memory\); .*press Run to start it again$/);
    expect(started[0]?.terminated).toBe(true);
    await expect(client.analyzeDemo('d', 10, 1, DEFAULT_SETTINGS, { signal: new AbortController().signal })).resolves.toEqual(result);
    expect(started).toHaveLength(2);
    client.dispose();
  });

  it('a worker error without a message still names what happened', async () => {
    const { start } = fakeWorkers<WorkerLike>({ analyzeDemo: never });
    const workers: EventTarget[] = [];
    const client = createAnalysisClient(() => {
      const w = start();
      workers.push(w as unknown as EventTarget);
      return w;
    });
    const pending = client.analyzeDemo('d', 10, 1, DEFAULT_SETTINGS, { signal: new AbortController().signal });
    workers[0]!.dispatchEvent(new Event('error'));
    await expect(pending).rejects.toMatchObject({ name: 'WorkerStopped', message: workerStoppedMessage('the analysis worker could not start or was stopped') });
    client.dispose();
  });
});
