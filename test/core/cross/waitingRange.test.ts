import { describe, expect, it } from 'vitest';
import type { PairedLevel } from '../../../src/core/cross/pairedWaits';
import { SLOPE_LEVELS, waitingRange } from '../../../src/core/cross/waitingRange';

/** A level with the given counts (per-pair sums are not read by the range rule). */
function level(n: number, positions: number, censored: number): PairedLevel {
  const empty = new Float64Array(1);
  return { n, positions, observed: positions - censored, censored, pairPositions: empty, pairObserved: empty, pairSumLog: empty, pairSumLog2: empty };
}

describe('waitingRange', () => {
  it('takes the last level before the censored fraction passes the cap, and the SLOPE_LEVELS - 1 levels below it', () => {
    const levels = [level(1, 1000, 0), level(2, 999, 0), level(3, 998, 1), level(4, 997, 2), level(5, 996, 9), level(6, 995, 30)];
    const r = waitingRange(levels, 0.01);
    expect(SLOPE_LEVELS).toBe(4);
    expect([r.lo, r.hi]).toEqual([2, 5]);
    expect(r.reason).toMatch(/at n = 6 3\.02% of A's blocks never appear/);
    // Fewer trusted levels than SLOPE_LEVELS: the fit starts at n = 1.
    const three = waitingRange(levels.slice(0, 3).concat([level(4, 997, 30)]), 0.01);
    expect([three.lo, three.hi]).toEqual([1, 3]);
    expect(r.warnings).toEqual([]);
  });

  it('stops where fewer than 100 waits are observed, and warns when no or only one level qualifies', () => {
    expect(waitingRange([level(1, 50, 0)], 0.01).warnings.map((w) => w.code)).toEqual(['range-empty']);
    const short = waitingRange([level(1, 1000, 0), level(2, 999, 500)], 0.01);
    expect([short.lo, short.hi]).toEqual([1, 1]);
    expect(short.warnings.map((w) => w.code)).toEqual(['range-short']);
    expect(() => waitingRange([], 1)).toThrow(RangeError);
  });
});
