import { describe, expect, it } from 'vitest';
import { batchMeansInterval, batchPlan, coarseSums, longRunVariance } from '../../../src/core/estimate/batchMeans';

describe('batchPlan', () => {
  it('merges only complete fine batches into coarse batches whose sizes differ by at most one fine batch', () => {
    // source: by hand: 10 fine batches of 8 cover 80 positions; 77 positions leave 9 complete ones, in 4 groups
    const plan = batchPlan(8, 10, 77, 4);
    expect(plan.count).toBe(4);
    expect(Array.from(plan.fineStart)).toEqual([0, 2, 4, 6]);
    expect(Array.from(plan.fineEnd)).toEqual([2, 4, 6, 9]);
    expect(Array.from(plan.start)).toEqual([0, 16, 32, 48]);
    expect(Array.from(plan.end)).toEqual([16, 32, 48, 72]);
    expect(Array.from(coarseSums(Float64Array.from([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]), plan))).toEqual([3, 7, 11, 24]);
  });

  it('uses fewer coarse batches when there are fewer complete fine batches than wanted', () => {
    // source: API contract
    expect(batchPlan(4, 3, 12, 32).count).toBe(3);
    expect(batchPlan(4, 3, 3, 32).count).toBe(0);
  });
});

describe('batchMeansInterval', () => {
  it('gives the textbook standard error sqrt(sum (v - vbar)^2 / (a (a - 1))) for equal weights, with t quantiles', () => {
    // source: Schmeiser 1982 (batch means); values by hand: v = 1, 2, 3, 6: vbar 3, sum of squares 14, a = 4
    const ci = batchMeansInterval(3, [1, 2, 3, 6], [1, 1, 1, 1], 0.95)!;
    expect(ci.standardError).toBeCloseTo(Math.sqrt(14 / 12), 12);
    expect(ci.degreesOfFreedom).toBe(3);
    // t_3 quantile 0.975 = 3.182446 (from memory; standard t tables)
    expect((ci.upper - 3) / ci.standardError).toBeCloseTo(3.182446, 5);
    expect(ci.lower).toBeCloseTo(6 - ci.upper, 12);
  });

  it('returns null with fewer than two finite batch values', () => {
    // source: API contract
    expect(batchMeansInterval(1, [1, Number.NaN], [1, 1], 0.95)).toBeNull();
  });
});

describe('longRunVariance', () => {
  it('equals 1/(a-1) sum L_g (Ybar_g - Ybar)^2 with chi-square limits on a - 1 degrees of freedom', () => {
    // source: THEORY.md section 6 (batch means); by hand: sums 2, 4, 9 over sizes 2, 2, 3 -> means 1, 2, 3, Ybar = 15/7
    const lrv = longRunVariance([2, 4, 9], [2, 2, 3], 0.95)!;
    const ybar = 15 / 7;
    const ss = 2 * (1 - ybar) ** 2 + 2 * (2 - ybar) ** 2 + 3 * (3 - ybar) ** 2;
    expect(lrv.mean).toBeCloseTo(ybar, 14);
    expect(lrv.variance).toBeCloseTo(ss / 2, 12);
    // chi-square(2) quantiles: 0.025 -> 0.0506356, 0.975 -> 7.377759 (from memory; standard tables)
    expect(lrv.lower).toBeCloseTo(ss / 7.377759, 5);
    expect(lrv.upper).toBeCloseTo(ss / 0.0506356, 3);
    expect(lrv.standardError).toBeCloseTo((ss / 2) * Math.sqrt(2 / 2), 12);
  });
});
