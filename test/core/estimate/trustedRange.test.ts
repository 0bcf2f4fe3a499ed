import { describe, expect, it } from 'vitest';
import { trustedRange } from '../../../src/core/estimate/trustedRange';
import type { LevelStats } from '../../../src/core/returns/levelStats';

/** Levels with given positions and observed counts (other fields irrelevant to the range rule). */
function levels(spec: readonly [number, number][]): LevelStats[] {
  const z = new Float64Array(1);
  return spec.map(([positions, observed], j) => ({
    n: j + 1, positions, distinctBlocks: 1, singletons: 0, sumCountLogCount: 0,
    forwardObserved: observed, forwardSumLog: 0, forwardSumLog2: 0,
    observed, sumLog: observed, sumLog2: observed, sumLogRc: 0, sumLogRc2: 0,
    histogram: new Float64Array(8), matchCount: 0,
    batchObserved: z, batchSumLog: z, batchSumLog2: z, batchSumLogCount: z,
  }));
}

describe('trustedRange', () => {
  // censored fractions 0, 0, 0.1%, 0.5%, 2%, 10%
  const six = levels([[1000, 1000], [999, 999], [998, 997], [997, 992], [996, 976], [995, 895]]);

  it('ends at the last level whose censored fraction stays within the limit and keeps the top two levels', () => {
    // source: the stated rule in trustedRange.ts; fractions by hand
    const r = trustedRange(six, { maxCensoredFraction: 0.01 });
    expect([r.lo, r.hi]).toEqual([3, 4]);
    expect(r.warnings).toEqual([]);
    expect(r.reason).toContain('n = 5');
  });

  it('applies the other bottom rules', () => {
    // source: the stated rules: top three -> [hi - 2, hi]; upper half of [1, hi] -> [ceil((hi + 1)/2), hi]
    expect(trustedRange(six, { maxCensoredFraction: 0.05, lowerRule: 'top-three' })).toMatchObject({ lo: 3, hi: 5 });
    expect(trustedRange(six, { maxCensoredFraction: 0.05, lowerRule: 'upper-half' })).toMatchObject({ lo: 3, hi: 5 });
  });

  it('stops at the first level with too few observed returns', () => {
    // source: the stated rule (default minimum 100 observed returns)
    const r = trustedRange(levels([[1000, 1000], [999, 99], [998, 998]]), { maxCensoredFraction: 0.95 });
    expect([r.lo, r.hi]).toEqual([1, 1]);
    expect(r.warnings.map((w) => w.code)).toEqual(['too-few-returns', 'range-short']);
  });

  it('is empty, with a warning, when even n = 1 is censored beyond the limit', () => {
    // source: API contract
    const r = trustedRange(levels([[100, 90]]), { maxCensoredFraction: 0.01 });
    expect([r.lo, r.hi]).toEqual([0, 0]);
    expect(r.warnings.map((w) => w.code)).toEqual(['range-empty']);
  });

  it('stops where the unseen-tail bias exceeds the allowed share of the standard error', () => {
    // source: the stated rule; with a tiny standard error the first level that loses returns (n = 3) fails
    const r = trustedRange(six, { maxCensoredFraction: 0.05, meanStandardError: () => 1e-12 });
    expect(r.hi).toBe(2);
    expect(r.reason).toContain('returns longer than the data');
    const loose = trustedRange(six, { maxCensoredFraction: 0.05, meanStandardError: () => 1e12 });
    expect(loose.hi).toBe(5);
  });

  it('rejects a censoring limit outside [0, 1)', () => {
    // source: API contract
    expect(() => trustedRange(six, { maxCensoredFraction: 1 })).toThrow(RangeError);
    expect(() => trustedRange(six, { maxCensoredFraction: -0.1 })).toThrow(RangeError);
  });
});
