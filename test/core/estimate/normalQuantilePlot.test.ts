import { describe, expect, it } from 'vitest';
import normalQuantile from '@stdlib/stats-base-dists-normal-quantile';
import { normalQuantilePlot } from '../../../src/core/estimate/normalQuantilePlot';
import { normalSample, uniforms } from './seededSamples';

describe('normalQuantilePlot', () => {
  it("puts Blom's positions close to the expected normal order statistics", () => {
    // source: expected order statistics of 5 N(0,1) values 1.16296, 0.49502, 0 (Teichroew 1956;
    // Harter 1961, from memory); Blom's approximation is good to about 0.02 there
    const out = normalQuantilePlot([3, 1, 2, 5, 4]);
    expect(Array.from(out.sample)).toEqual([1, 2, 3, 4, 5]);
    expect(Array.from(out.rank)).toEqual([1, 2, 3, 4, 5]);
    const expected = [-1.16296, -0.49502, 0, 0.49502, 1.16296];
    for (let i = 0; i < 5; i++) expect(Math.abs(out.theoretical[i]! - expected[i]!)).toBeLessThan(0.02);
    expect(out.theoretical[2]!).toBeCloseTo(0, 14);
  });

  it('gives the closed-form band of the smallest and largest of m values', () => {
    // source: the largest of m uniforms has cdf u^m (Beta(m, 1)), the smallest 1 - (1-u)^m (Beta(1, m))
    // (David & Nagaraja 2003, section 2.1): band Phi^-1(q^{1/m}) and Phi^-1(1 - (1-q)^{1/m})
    const m = 40;
    const out = normalQuantilePlot(normalSample(uniforms(7), m));
    const q = (u: number) => normalQuantile(u, 0, 1);
    expect(out.upper[m - 1]!).toBeCloseTo(q(0.975 ** (1 / m)), 9);
    expect(out.lower[m - 1]!).toBeCloseTo(q(0.025 ** (1 / m)), 9);
    expect(out.lower[0]!).toBeCloseTo(q(1 - 0.975 ** (1 / m)), 9);
    expect(out.upper[0]!).toBeCloseTo(q(1 - 0.025 ** (1 / m)), 9);
    // the median of m = 40 values: symmetric band around 0
    expect(out.lower[19]! + out.upper[20]!).toBeCloseTo(0, 9);
  });

  it('covers each order statistic of N(0,1) samples with probability 0.95', () => {
    // source: the band is exact pointwise (order-statistic law above); each point's coverage over
    // r = 2000 seeded samples must lie within 4 binomial standard errors of 0.95
    const m = 15;
    const r = 2000;
    const stream = uniforms(8);
    const band = normalQuantilePlot(new Float64Array(m));
    const inside = new Float64Array(m);
    for (let k = 0; k < r; k++) {
      const x = normalSample(stream, m).sort();
      for (let i = 0; i < m; i++) if (x[i]! >= band.lower[i]! && x[i]! <= band.upper[i]!) inside[i] = inside[i]! + 1;
    }
    const tol = 4 * Math.sqrt((0.95 * 0.05) / r);
    for (let i = 0; i < m; i++) expect(Math.abs(inside[i]! / r - 0.95)).toBeLessThan(tol);
  });

  it('downsamples to at most maxPoints, keeping both tails in full', () => {
    // source: common practice, no source
    const m = 100000;
    const out = normalQuantilePlot(normalSample(uniforms(9), m), { maxPoints: 300 });
    expect(out.size).toBe(m);
    expect(out.rank.length).toBeLessThanOrEqual(300);
    expect(out.rank.length).toBeGreaterThan(150);
    expect(out.rank[0]!).toBe(1);
    expect(out.rank[out.rank.length - 1]!).toBe(m);
    for (let i = 1; i < 6; i++) {
      expect(out.rank[i]!).toBe(i + 1);
      expect(out.rank[out.rank.length - 1 - i]!).toBe(m - i);
    }
    for (let j = 1; j < out.rank.length; j++) {
      expect(out.rank[j]!).toBeGreaterThan(out.rank[j - 1]!);
      expect(out.sample[j]!).toBeGreaterThanOrEqual(out.sample[j - 1]!);
    }
  });

  it('rejects bad options', () => {
    expect(() => normalQuantilePlot([1, 2], { maxPoints: 1 })).toThrow(RangeError);
    expect(() => normalQuantilePlot([1, 2], { level: 1 })).toThrow(RangeError);
    expect(() => normalQuantilePlot([])).toThrow(RangeError);
  });
});
