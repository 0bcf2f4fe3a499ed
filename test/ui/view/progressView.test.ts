import { describe, expect, it } from 'vitest';
import type { RunPhase } from '../../../src/ui/store/runSlice';
import { progressView } from '../../../src/ui/view/progressView';

const base = { status: 'running', id: 1, label: 'x', maxN: 40, startedAtMs: 0, levels: null, shares: null } as const;

describe('progressView', () => {
  it('shows idle with its note, or "Ready."', () => {
    expect(progressView({ status: 'idle', note: null })).toEqual({ status: 'Idle', detail: 'Ready.', value: 0, max: 1, elapsed: null, timeLeft: null });
    expect(progressView({ status: 'idle', note: 'Cancelled.' }).detail).toBe('Cancelled.');
  });

  it('is indeterminate before the first report', () => {
    const view = progressView({ ...base, progress: null }, 2_400);
    expect(view.value).toBeNull();
    expect(view.elapsed).toBe('2 s elapsed');
  });

  it('counts block lengths against maxN and bytes against the file size', () => {
    const level = progressView({ ...base, progress: { kind: 'level', n: 7, active: 12_345 } }, 0);
    expect(level).toMatchObject({ status: 'Running', detail: 'Block length n = 7 of at most 40 · 12,345 positions still in play', value: 7, max: 40 });
    expect(level.timeLeft).toBe('time left: estimating…');
    const read = progressView({ ...base, label: 'f', progress: { kind: 'read', bytes: 2048, totalBytes: 4096 } }, 0);
    expect(read).toMatchObject({ value: 2048, max: 4096, detail: 'Reading f: 2.0 KiB of 4.0 KiB' });
  });

  it('states the time left from the track, counted down since the last report', () => {
    // maxN 4, after n = 2: a_2 = 50, a_1 = 100, so r = 1/2 and levels 3, 4 hold 25 + 12.5 = 37.5
    // position-levels; 100 position-levels took 1 s, so 0.375 s remain at the report (t = 1.1 s).
    const run: RunPhase = {
      ...base,
      maxN: 4,
      progress: { kind: 'level', n: 2, active: 50 },
      levels: { firstAtMs: 100, lastAtMs: 1_100, active: 50, previousActive: 100, positionLevelsSinceFirst: 100 },
    };
    expect(progressView(run, 1_100).timeLeft).toBe('less than 1 s left');
    const slow: RunPhase = { ...run, levels: { ...run.levels!, lastAtMs: 100_100 } };
    // 100 s per 100 position-levels: 37.5 s at the report, 27.5 s ten seconds later
    expect(progressView(slow, 100_100).timeLeft).toBe('about 38 s left');
    expect(progressView(slow, 110_100).timeLeft).toBe('about 28 s left');
    expect(progressView(slow, 110_100).elapsed).toBe('1 min 50 s elapsed');
  });

  it('moves the bar by finished class groups of a shared scan, with the time per group so far', () => {
    // API contract (progressView.ts): levels 6..40 span 35 of the bar; 3 of 8 groups done in 6 s,
    // so 2 s per group and 5 groups (10 s) to come, counted down since the last report.
    const shares = { kind: 'shares', done: 3, total: 8, firstN: 6, active: 9_000_000 } as const;
    const run: RunPhase = { ...base, progress: shares, shares: { firstAtMs: 1_000, lastAtMs: 7_000 } };
    const view = progressView(run, 9_000);
    expect(view.detail).toBe('Block lengths n = 6 to 40, shared among workers: 3 of 8 groups of blocks done · 9,000,000 positions in play');
    expect(view.value).toBeCloseTo(5 + (35 * 3) / 8, 12);
    expect(view.max).toBe(40);
    expect(view.timeLeft).toBe('about 8 s left');
    const started = progressView({ ...run, progress: { ...shares, done: 0 }, shares: { firstAtMs: 1_000, lastAtMs: 1_000 } }, 2_000);
    expect(started.timeLeft).toBe('time left: estimating…');
    expect(started.value).toBe(5);
  });
});
