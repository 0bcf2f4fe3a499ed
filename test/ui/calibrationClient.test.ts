import { describe, expect, it } from 'vitest';
import { fakeWorkers } from '../helpers/fakeWorkers';
import type { CalibrationModelFacts, ReplicateRecord } from '../../src/core';
import { DEFAULT_SETTINGS } from '../../src/core';
import { calibrationPoolSize, createCalibrationClient, MAX_CALIBRATION_WORKERS } from '../../src/ui/calibrationClient';
import type { CalibrationWorkerLike } from '../../src/ui/calibrationClient';

const facts = { order: 1 } as CalibrationModelFacts;
const fitted = { facts, model: {}, alphabet: ['0', '1'], length: 100 };
const record = (i: number): ReplicateRecord => ({ replicate: i, seed: i, entropy: 1, entropyInterval: [0.9, 1.1], entropyMethod: 'm', sigma2: null, sigma2Interval: null });
const demo = { kind: 'demo', id: 'd', length: 100, seed: 1 } as const;

describe('calibrationPoolSize', () => {
  it('is the number of cores, at most 4, and 1 when unknown', () => {
    expect(MAX_CALIBRATION_WORKERS).toBe(4);
    expect(calibrationPoolSize(8)).toBe(4);
    expect(calibrationPoolSize(2)).toBe(2);
    expect(calibrationPoolSize(1)).toBe(1);
    expect(calibrationPoolSize(undefined)).toBe(1);
    expect(calibrationPoolSize(0)).toBe(1);
  });
});

describe('calibration client', () => {
  it('fits once, runs every replicate exactly once on the pool, and terminates the workers at the end', async () => {
    let fits = 0;
    const { start, started } = fakeWorkers<CalibrationWorkerLike>({ fit: () => (fits++, fitted), replicate: (_f: unknown, _s: unknown, _b: number, i: number) => record(i) });
    const seen: number[] = [];
    let gotFacts: CalibrationModelFacts | null = null;
    await createCalibrationClient(start, 3).calibrate(demo, DEFAULT_SETTINGS, 10, 1, {
      signal: new AbortController().signal,
      onFitted: (f) => void (gotFacts = f),
      onRecord: (r) => void seen.push(r.replicate),
    });
    expect(fits).toBe(1);
    expect(gotFacts).toEqual(facts);
    expect(seen.sort((a, b) => a - b)).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9]);
    expect(started).toHaveLength(3);
    expect(started.every((w) => w.terminated)).toBe(true);
  });

  it('abort terminates every worker and rejects; records already delivered stay delivered', async () => {
    const controller = new AbortController();
    const seen: number[] = [];
    const { start, started } = fakeWorkers<CalibrationWorkerLike>({
      fit: () => fitted,
      // Replicate 0 answers, the others never do (a tight loop that only termination stops).
      replicate: (_f: unknown, _s: unknown, _b: number, i: number) => (i === 0 ? record(0) : new Promise(() => {})),
    });
    const call = createCalibrationClient(start, 2).calibrate(demo, DEFAULT_SETTINGS, 10, 1, {
      signal: controller.signal,
      onRecord: (r) => {
        seen.push(r.replicate);
        controller.abort();
      },
    });
    await expect(call).rejects.toBeDefined();
    expect(seen).toEqual([0]);
    expect(started.every((w) => w.terminated)).toBe(true);
  });

  it('a failure in a worker rejects with its message', async () => {
    const { start, started } = fakeWorkers<CalibrationWorkerLike>({
      fit: () => {
        throw new RangeError('a Markov chain can be fitted to at most 1024 distinct symbols; got 5000');
      },
    });
    const call = createCalibrationClient(start, 2).calibrate(demo, DEFAULT_SETTINGS, 10, 1, { signal: new AbortController().signal });
    await expect(call).rejects.toThrow('at most 1024 distinct symbols');
    expect(started.every((w) => w.terminated)).toBe(true);
  });
});
