import { describe, expect, it } from 'vitest';
import { fakeWorkers } from '../helpers/fakeWorkers';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import type { ComparisonProgress, ComparisonWorkerLike } from '../../src/ui/comparisonClient';
import { createComparisonClient } from '../../src/ui/comparisonClient';

const side = { kind: 'source', spec: 'coin', length: 10, seed: 1 } as const;

describe('comparison client', () => {
  it('delivers progress and the result, and keeps the core message of a failure', async () => {
    const { start } = fakeWorkers<ComparisonWorkerLike>({
      compare: (_a: unknown, _b: unknown, _s: unknown, onProgress: (p: ComparisonProgress) => Promise<void>) =>
        onProgress({ stage: 'waiting', done: 1, total: 2 }).then(() => ({ schema: 'returnrate.comparison/1' })),
    });
    const client = createComparisonClient(start);
    const seen: ComparisonProgress[] = [];
    const result = await client.compare(side, side, DEFAULT_SETTINGS, new AbortController().signal, (p) => seen.push(p));
    expect(result).toEqual({ schema: 'returnrate.comparison/1' });
    expect(seen).toEqual([{ stage: 'waiting', done: 1, total: 2 }]);
    client.dispose();

    const failing = createComparisonClient(fakeWorkers<ComparisonWorkerLike>({ compare: () => Promise.reject(new RangeError('maxN must be an integer')) }).start);
    await expect(failing.compare(side, side, DEFAULT_SETTINGS, new AbortController().signal, () => {})).rejects.toThrow('maxN must be an integer');
    failing.dispose();
  });

  it('terminates the worker on abort and rejects the call; the next call starts a fresh worker', async () => {
    const { start, started } = fakeWorkers<ComparisonWorkerLike>({ compare: () => new Promise(() => {}) });
    const client = createComparisonClient(start);
    const controller = new AbortController();
    const pending = client.compare(side, side, DEFAULT_SETTINGS, controller.signal, () => {});
    controller.abort();
    await expect(pending).rejects.toMatchObject({ name: 'AbortError' });
    expect(started[0]!.terminated).toBe(true);
    const again = client.compare(side, side, DEFAULT_SETTINGS, new AbortController().signal, () => {});
    expect(started).toHaveLength(2);
    client.dispose();
    await expect(again).rejects.toMatchObject({ name: 'AbortError' });
  });
});
