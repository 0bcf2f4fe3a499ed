import { describe, expect, it } from 'vitest';
import kstest from '@stdlib/stats-kstest';
import normalQuantile from '@stdlib/stats-base-dists-normal-quantile';
import { kolmogorovLimitSurvival, kolmogorovSmirnovPValue } from '../../../src/core/estimate/kolmogorovSmirnovPValue';

/**
 * n N(0,1) quantiles whose KS distance to N(0,1) is exactly d >= 1/n: every point moved up by
 * d - 1/(2n) in probability, those pushed past 1 held at 1 - 1e-12 (their gaps stay below 1/n <= d).
 */
function sampleAtDistance(n: number, d: number): number[] {
  return Array.from({ length: n }, (_, i) => normalQuantile(Math.min(1 - 1e-12, (i + 0.5) / n + (d - 0.5 / n)), 0, 1));
}

describe('kolmogorovLimitSurvival', () => {
  it('gives 0.10, 0.05, 0.01, 0.001 at the asymptotic critical values of sqrt(n) D_n', () => {
    // source: THEORY.md section 5 [calc from the Kolmogorov series, 40 digits]: 1.2238479, 1.3580986,
    // 1.6276236, 1.9494746 (the printed 1.22, 1.36, 1.63, 1.95 of Smirnov 1948, from memory)
    expect(kolmogorovLimitSurvival(1.2238479)).toBeCloseTo(0.1, 7);
    expect(kolmogorovLimitSurvival(1.3580986)).toBeCloseTo(0.05, 7);
    expect(kolmogorovLimitSurvival(1.6276236)).toBeCloseTo(0.01, 7);
    expect(kolmogorovLimitSurvival(1.9494746)).toBeCloseTo(0.001, 8);
  });

  it('agrees below x = 1 with the alternating series it does not use there', () => {
    // source: Kolmogorov 1933 / Marsaglia, Tsang & Wang 2003 section 1: the two series are equal
    // (Jacobi theta identity); here the alternating one is summed with 200 terms
    for (const x of [0.35, 0.5, 0.7, 0.9, 0.999]) {
      let s = 0;
      for (let k = 1; k <= 200; k++) s += (k % 2 === 1 ? 2 : -2) * Math.exp(-2 * k * k * x * x);
      expect(kolmogorovLimitSurvival(x)).toBeCloseTo(s, 12);
    }
    expect(kolmogorovLimitSurvival(0)).toBe(1);
    expect(kolmogorovLimitSurvival(40)).toBe(0);
  });
});

describe('kolmogorovSmirnovPValue', () => {
  it('matches the exact laws for one and two values', () => {
    // source: derived by hand from the order-statistic intervals i/n - d < U_(i) < (i-1)/n + d
    // (the construction behind Birnbaum, J. Am. Stat. Assoc. 47 (1952) 425-441):
    // n = 1: P(D < d) = 2d - 1 on [1/2, 1]; n = 2: 8 (d - 1/4)^2 on [1/4, 1/2], 1 - 2 (1-d)^2 on [1/2, 1]
    for (const d of [0.55, 0.7, 0.9, 0.99]) expect(kolmogorovSmirnovPValue(d, 1).pValue).toBeCloseTo(2 - 2 * d, 12);
    for (const d of [0.3, 0.4, 0.49]) expect(kolmogorovSmirnovPValue(d, 2).pValue).toBeCloseTo(1 - 8 * (d - 0.25) ** 2, 12);
    for (const d of [0.51, 0.6, 0.8]) expect(kolmogorovSmirnovPValue(d, 2).pValue).toBeCloseTo(2 * (1 - d) ** 2, 7);
    expect(kolmogorovSmirnovPValue(0.2, 2).pValue).toBe(1);
    expect(kolmogorovSmirnovPValue(1, 5).pValue).toBe(0);
  });

  it('agrees with @stdlib/stats-kstest on exact and tail cases', () => {
    // source: @stdlib/stats-kstest 0.2.3, an independent implementation of Marsaglia, Tsang & Wang 2003
    const cases: [number, number][] = [[3, 0.3], [10, 0.2], [10, 0.5], [40, 0.12], [100, 0.1], [100, 0.2], [500, 0.05], [1500, 0.03], [80, 0.31]];
    for (const [n, d] of cases) {
      const ref = kstest(sampleAtDistance(n, d), 'normal', 0, 1);
      expect(ref.statistic).toBeCloseTo(d, 12);
      const ours = kolmogorovSmirnovPValue(ref.statistic, n);
      expect(ours.method === 'exact' || ours.method === 'tail').toBe(true);
      expect(Math.abs(ours.pValue - ref.pValue)).toBeLessThan(1e-10);
    }
  });

  it('uses the asymptotic form only above n = 2600, within 1e-4 of the exact value', () => {
    // source: @stdlib/stats-kstest 0.2.3 (exact method) for the reference; the tolerance is ours:
    // Stephens' corrected argument leaves an O(1/n) error, measured here at about 1.3e-5
    for (const [n, d] of [[3000, 0.034], [2700, 0.0372]] as const) {
      const ref = kstest(sampleAtDistance(n, d), 'normal', 0, 1);
      const ours = kolmogorovSmirnovPValue(ref.statistic, n);
      expect(ours.method).toBe('asymptotic');
      expect(Math.abs(ours.pValue - ref.pValue)).toBeLessThan(1e-4);
    }
    expect(kolmogorovSmirnovPValue(0.04, 2000).method).toBe('exact');
  });

  it('rejects bad parameters', () => {
    expect(() => kolmogorovSmirnovPValue(0.1, 0)).toThrow(RangeError);
    expect(() => kolmogorovSmirnovPValue(0.1, 2.5)).toThrow(RangeError);
    expect(() => kolmogorovSmirnovPValue(-0.1, 10)).toThrow(RangeError);
    expect(() => kolmogorovSmirnovPValue(Number.NaN, 10)).toThrow(RangeError);
  });
});
