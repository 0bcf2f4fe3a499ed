import { describe, expect, it } from 'vitest';
import type { ComparisonResult } from '../../src/core';
import type { ComparisonClient, ComparisonSide } from '../../src/ui/comparisonClient';
import { COMPARE_SOURCE_LENGTH, createComparisonRunner } from '../../src/ui/comparisonRunner';
import type { CurrentInput } from '../../src/ui/runner';
import { DEMO_SCENARIOS } from '../../workers/demoScenarios';
import { testStore } from './store/testStore';

/** A client that records the two sides it was given and never finishes (the tests read the sides). */
function recordingClient() {
  const sides: (readonly [ComparisonSide, ComparisonSide])[] = [];
  const client: ComparisonClient = {
    compare: (a, b, _settings, signal) => {
      sides.push([a, b]);
      return new Promise<ComparisonResult>((_resolve, reject) => {
        signal.addEventListener('abort', () => reject(new DOMException('cancelled', 'AbortError')));
      });
    },
    dispose: () => {},
  };
  return { client, sides };
}

const tick = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));
const entry = (id: string) => DEMO_SCENARIOS.find((d) => d.id === id);

describe('comparison runner', () => {
  it('a gallery entry on both sides generates two different sequences: B takes the next seed', async () => {
    const s = testStore();
    const { client, sides } = recordingClient();
    const runner = createComparisonRunner(client, s.store, () => null);
    runner.chooseDemo('A', 'song-upper-valley');
    runner.chooseDemo('B', 'song-upper-valley', 30_000);
    runner.setLength('A', 40_000);
    expect(s.store.getState().comparisonRun.sideA).toEqual({ kind: 'demo', id: 'song-upper-valley', label: entry('song-upper-valley')?.title, length: 40_000 });
    void runner.compare();
    await tick();
    const seed = entry('song-upper-valley')?.seed ?? Number.NaN;
    expect(sides[0]).toEqual([
      { kind: 'demo', id: 'song-upper-valley', length: 40_000, seed },
      { kind: 'demo', id: 'song-upper-valley', length: 30_000, seed: seed + 1 },
    ]);
    expect(s.store.getState().comparisonRun.status).toBe('running');
    expect(s.store.getState().comparisonRun.startedAtMs).toEqual(expect.any(Number));
    runner.cancel();
    await tick();
    expect(s.store.getState().comparisonRun.status).toBe('cancelled');
  });

  it('"the input loaded above" is read when the comparison starts: the chosen demo, or the open file with the reading choices', async () => {
    const s = testStore();
    const { client, sides } = recordingClient();
    let current: CurrentInput | null = { kind: 'demo', id: 'dry-wet-days', length: 7_000, seed: 1_277 };
    const runner = createComparisonRunner(client, s.store, () => current);
    runner.chooseLoadedInput();
    runner.chooseDemo('B', 'source:coin');
    expect(s.store.getState().comparisonRun.sideA).toEqual({ kind: 'input' });
    expect(s.store.getState().comparisonRun.sideB).toMatchObject({ kind: 'demo', length: COMPARE_SOURCE_LENGTH });
    void runner.compare();
    await tick();
    expect(sides[0]?.[0]).toEqual({ kind: 'demo', id: 'dry-wet-days', length: 7_000, seed: 1_277 });
    runner.cancel();
    await tick();
    current = { kind: 'file', file: new File(['a,b\n1,2\n'], 'log.csv') };
    s.updateReading({ format: 'csv', csvColumn: 'b' });
    void runner.compare();
    await tick();
    await tick();
    const a = sides[1]?.[0];
    expect(a?.kind).toBe('file');
    expect(a?.kind === 'file' ? a.options : null).toMatchObject({ name: 'log.csv', format: 'csv' });
    runner.cancel();
  });

  it('fails with a clear message when the loaded file is no longer held, or a side is missing', async () => {
    const s = testStore();
    const { client, sides } = recordingClient();
    const runner = createComparisonRunner(client, s.store, () => null);
    runner.chooseLoadedInput();
    runner.chooseDemo('B', 'source:coin');
    await runner.compare();
    expect(s.store.getState().comparisonRun).toMatchObject({ status: 'failed', message: expect.stringContaining('open it again') });
    runner.chooseDemo('A', 'source:coin');
    runner.chooseSource('B', 'coin', 'Fair coin');
    s.chooseCompareSide('B', null);
    await runner.compare();
    expect(s.store.getState().comparisonRun.message).toBe('Choose sequence B first: a file or a generated sequence.');
    expect(sides).toHaveLength(0);
  });
});
