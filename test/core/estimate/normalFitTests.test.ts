import { describe, expect, it } from 'vitest';
import kstest from '@stdlib/stats-kstest';
import { andersonDarlingNormal } from '../../../src/core/estimate/andersonDarlingNormal';
import { kolmogorovSmirnovNormal } from '../../../src/core/estimate/kolmogorovSmirnovNormal';
import { DEPENDENCE_CAVEAT, normalFitTests } from '../../../src/core/estimate/normalFitTests';
import { normalSample, uniforms } from './seededSamples';

/** Four binomial standard errors of a proportion alpha over r draws. */
function binomialTolerance(alpha: number, r: number): number {
  return 4 * Math.sqrt((alpha * (1 - alpha)) / r);
}

const LEVELS = [0.01, 0.05, 0.1, 0.25, 0.5, 0.75, 0.9];

describe('kolmogorovSmirnovNormal', () => {
  it('agrees with @stdlib/stats-kstest on seeded N(0,1) and shifted samples', () => {
    // source: @stdlib/stats-kstest 0.2.3 (independent implementation; exact p-values of Marsaglia,
    // Tsang & Wang 2003)
    const stream = uniforms(101);
    for (const [m, shift] of [[5, 0], [30, 0], [30, 0.8], [200, 0], [200, 0.3], [1000, 0]] as const) {
      const x = normalSample(stream, m).map((v) => v + shift);
      const ref = kstest(Array.from(x), 'normal', 0, 1);
      const ours = kolmogorovSmirnovNormal(x);
      expect(ours.size).toBe(m);
      expect(ours.statistic).toBeCloseTo(ref.statistic, 13);
      expect(Math.abs(ours.pValue - ref.pValue)).toBeLessThan(1e-10);
    }
  });

  it('leaves the caller array unsorted and rejects empty or non-finite samples', () => {
    const x = Float64Array.of(0.5, -1, 2);
    kolmogorovSmirnovNormal(x);
    expect(Array.from(x)).toEqual([0.5, -1, 2]);
    expect(() => kolmogorovSmirnovNormal([])).toThrow(RangeError);
    expect(() => kolmogorovSmirnovNormal([0, Number.NaN])).toThrow(RangeError);
    expect(() => kolmogorovSmirnovNormal([0, Infinity])).toThrow(RangeError);
  });
});

describe('andersonDarlingNormal', () => {
  it('matches A^2 computed by hand for one and two values', () => {
    // source: by hand from the definition (Anderson & Darling 1954): m = 1, x = 0: -1 - 2 log(1/2);
    // m = 2, x = (-1, 1): -2 - log Phi(-1) - 3 log Phi(1), Phi(1) = 0.841344746068543 (A&S 26.2, from memory)
    expect(andersonDarlingNormal([0]).statistic).toBeCloseTo(2 * Math.log(2) - 1, 14);
    const phi1 = 0.841344746068543;
    expect(andersonDarlingNormal([1, -1]).statistic).toBeCloseTo(-2 - Math.log(1 - phi1) - 3 * Math.log(phi1), 12);
  });

  it('has mean 1 over N(0,1) samples, as E A^2 = 1 for every n', () => {
    // source: derived: E (F_n - F)^2 = F(1-F)/n, so E A^2 = n * integral of 1/n dF = 1 (Anderson &
    // Darling 1954, from memory); tolerance 4 standard errors of the simulated mean
    const stream = uniforms(202);
    const r = 3000;
    let sum = 0;
    let sum2 = 0;
    for (let k = 0; k < r; k++) {
      const a = andersonDarlingNormal(normalSample(stream, 25)).statistic;
      sum += a;
      sum2 += a * a;
    }
    const mean = sum / r;
    const se = Math.sqrt((sum2 / r - mean * mean) / (r - 1));
    expect(Math.abs(mean - 1)).toBeLessThan(4 * se);
  });

  it('gives A^2 = Infinity and p = 0 when Phi underflows', () => {
    const out = andersonDarlingNormal([0, 40]);
    expect(out.statistic).toBe(Infinity);
    expect(out.pValue).toBe(0);
  });
});

describe('normalFitTests', () => {
  it('gives uniform p-values for N(0,1) samples (both tests, m = 8 and m = 60)', () => {
    // source: under the null a continuous test's p-value is Uniform(0, 1) (common practice, no
    // source); each fraction P(p <= alpha) must lie within 4 binomial standard errors of alpha
    for (const [m, r, seed] of [[8, 4000, 303], [60, 3000, 304]] as const) {
      const stream = uniforms(seed);
      const ks = new Float64Array(r);
      const ad = new Float64Array(r);
      for (let k = 0; k < r; k++) {
        const out = normalFitTests(normalSample(stream, m));
        ks[k] = out.kolmogorovSmirnov.pValue;
        ad[k] = out.andersonDarling.pValue;
      }
      for (const alpha of LEVELS) {
        const tol = binomialTolerance(alpha, r);
        expect(Math.abs(ks.filter((p) => p <= alpha).length / r - alpha)).toBeLessThan(tol);
        expect(Math.abs(ad.filter((p) => p <= alpha).length / r - alpha)).toBeLessThan(tol);
      }
    }
  });

  it('rejects a sample with the wrong scale, and carries the dependence caveat', () => {
    // source: common practice, no source: 400 N(0, 1.3^2) values are far from N(0,1) for both tests
    const x = normalSample(uniforms(405), 400).map((v) => 1.3 * v);
    const out = normalFitTests(x);
    expect(out.size).toBe(400);
    expect(out.kolmogorovSmirnov.pValue).toBeLessThan(0.01);
    expect(out.andersonDarling.pValue).toBeLessThan(0.01);
    expect(out.caveat).toBe(DEPENDENCE_CAVEAT);
    expect(out.caveat).toMatch(/only indicative/);
  });
});
