import { describe, expect, it } from 'vitest';
import { andersonDarlingLimitCdf, andersonDarlingPValue } from '../../../src/core/estimate/andersonDarlingPValue';

describe('andersonDarlingLimitCdf', () => {
  it('gives 0.90, 0.95, 0.975, 0.99, 0.999 at the asymptotic critical values', () => {
    // source: THEORY.md section 5 [calc: the limit law's series, 40 digits, checked by 4e6
    // simulations], 0.001 point also in Marsaglia & Marsaglia, J. Stat. Softw. 9(2) (2004).
    // Tolerance: the quantiles have 4 decimals (density there <= 0.13, so <= 7e-6 in p) plus the
    // error of the short fit adinf (a few 1e-6; measured 1.0e-5 in all at 2.4924, 2.5e-6 at 5.9694).
    expect(Math.abs(andersonDarlingLimitCdf(1.933) - 0.9)).toBeLessThan(2e-5);
    expect(Math.abs(andersonDarlingLimitCdf(2.4924) - 0.95)).toBeLessThan(2e-5);
    expect(Math.abs(andersonDarlingLimitCdf(3.0775) - 0.975)).toBeLessThan(2e-5);
    expect(Math.abs(andersonDarlingLimitCdf(3.8781) - 0.99)).toBeLessThan(2e-5);
    expect(Math.abs(andersonDarlingLimitCdf(5.9694) - 0.999)).toBeLessThan(5e-6);
  });

  it('matches the classical printed 5% and 1% points to their rounding', () => {
    // source: Anderson & Darling, J. Am. Stat. Assoc. 49 (1954) 765-769 and Stephens, J. Am. Stat.
    // Assoc. 69 (1974) 730-737 (from memory): 2.492 at 5%, 3.857 at 1%. The 1% point of the older
    // tables is about 0.02 low (THEORY.md section 5), so it only holds to 5e-4 in p.
    expect(Math.abs(1 - andersonDarlingLimitCdf(2.492) - 0.05)).toBeLessThan(5e-5);
    expect(Math.abs(1 - andersonDarlingLimitCdf(3.857) - 0.01)).toBeLessThan(5e-4);
  });

  it('is continuous where its two fitted pieces meet and runs from 0 to 1', () => {
    // source: common practice, no source (a cdf has no jump at z = 2)
    expect(Math.abs(andersonDarlingLimitCdf(2 - 1e-9) - andersonDarlingLimitCdf(2))).toBeLessThan(5e-6);
    expect(andersonDarlingLimitCdf(0)).toBe(0);
    expect(andersonDarlingLimitCdf(Infinity)).toBe(1);
  });
});

describe('andersonDarlingPValue', () => {
  it('gives the exact law for one value', () => {
    // source: derived by hand: A_1^2 = -1 - log(U(1-U)), P(A_1^2 >= z) = 1 - sqrt(1 - 4 e^{-1-z})
    for (const z of [0.5, 1, 2, 5, 12]) {
      expect(andersonDarlingPValue(z, 1)).toBeCloseTo(1 - Math.sqrt(1 - 4 * Math.exp(-1 - z)), 12);
    }
    expect(andersonDarlingPValue(0.3, 1)).toBe(1);
  });

  it('approaches the limit law as n grows, with the finite-n shift Marsaglia & Marsaglia describe', () => {
    // source: Marsaglia & Marsaglia 2004: the correction is O(1/n)
    const p = 1 - andersonDarlingLimitCdf(2.4924);
    expect(Math.abs(andersonDarlingPValue(2.4924, 100000) - p)).toBeLessThan(1e-6);
    expect(Math.abs(andersonDarlingPValue(2.4924, 10) - p)).toBeLessThan(0.01);
    // the fitted correction does not vanish exactly at x = 1 (its polynomial sums to -6e-4), so the
    // smallest p-value it gives is about 6e-4/n: p-values are good to about 1e-5, not below
    expect(andersonDarlingPValue(1e6, 50)).toBeLessThan(2e-5);
    expect(andersonDarlingPValue(0, 50)).toBe(1);
  });

  it('rejects bad parameters', () => {
    expect(() => andersonDarlingPValue(1, 0)).toThrow(RangeError);
    expect(() => andersonDarlingPValue(-1, 10)).toThrow(RangeError);
    expect(() => andersonDarlingPValue(Number.NaN, 10)).toThrow(RangeError);
  });
});
