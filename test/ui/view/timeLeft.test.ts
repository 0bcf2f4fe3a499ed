import { describe, expect, it } from 'vitest';
import { formatDuration, timeLeftSeconds } from '../../../src/ui/view/timeLeft';

const base = { elapsedSeconds: 2, n: 5, maxN: 10, positionLevelsDone: 1000 } as const;

describe('timeLeftSeconds', () => {
  it('sums the geometric decay of the positions in play over the remaining levels', () => {
    // by hand: r = 200/400 = 1/2, m = 5: 200 (1/2 + 1/4 + 1/8 + 1/16 + 1/32) = 193.75 position-levels
    // at 2 s per 1000 position-levels: 0.3875 s
    expect(timeLeftSeconds({ ...base, active: 200, previousActive: 400 })).toBeCloseTo(0.3875, 12);
  });

  it('extrapolates linearly when nothing leaves the active set, and never lets the count grow', () => {
    // by hand: 5 levels of 300 positions at 2 ms each
    expect(timeLeftSeconds({ ...base, active: 300, previousActive: 300 })).toBeCloseTo(3, 12);
    expect(timeLeftSeconds({ ...base, active: 300, previousActive: 250 })).toBeCloseTo(3, 12);
  });

  it('is 0 at the last level or with no positions left, and null without two reports', () => {
    expect(timeLeftSeconds({ ...base, n: 10, active: 50, previousActive: 60 })).toBe(0);
    expect(timeLeftSeconds({ ...base, active: 0, previousActive: 60 })).toBe(0);
    expect(timeLeftSeconds({ ...base, active: 50, previousActive: null })).toBeNull();
    expect(timeLeftSeconds({ ...base, active: 50, previousActive: 60, positionLevelsDone: 0 })).toBeNull();
  });
});

describe('formatDuration', () => {
  it('writes seconds, minutes and hours for people', () => {
    expect(formatDuration(0.4)).toBe('< 1 s');
    expect(formatDuration(42.4)).toBe('42 s');
    expect(formatDuration(185)).toBe('3 min 05 s');
    expect(formatDuration(3720)).toBe('1 h 02 min');
    expect(formatDuration(Number.NaN)).toBe('—');
  });
});
