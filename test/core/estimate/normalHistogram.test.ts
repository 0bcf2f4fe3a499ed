import { describe, expect, it } from 'vitest';
import { thresholdFreedmanDiaconis, thresholdScott } from 'd3';
import { normalHistogram } from '../../../src/core/estimate/normalHistogram';
import { normalSample, uniforms } from './seededSamples';

describe('normalHistogram', () => {
  it("chooses as many bins as d3-array's Freedman-Diaconis and Scott rules", () => {
    // source: d3-array 3 (thresholdFreedmanDiaconis, thresholdScott), an independent implementation
    // of Freedman & Diaconis 1981 and Scott 1979
    for (const [m, seed] of [[50, 1], [777, 2], [5000, 3]] as const) {
      const x = normalSample(uniforms(seed), m);
      const values = Array.from(x);
      const lo = Math.min(...values);
      const hi = Math.max(...values);
      const fd = normalHistogram(x);
      expect(fd.rule).toBe('freedman-diaconis');
      expect(fd.counts.length).toBe(thresholdFreedmanDiaconis(values, lo, hi));
      const scott = normalHistogram(x, { rule: 'scott' });
      expect(scott.counts.length).toBe(thresholdScott(values, lo, hi));
    }
  });

  it('counts every value once and scales the N(0,1) law to counts', () => {
    // source: phi(0) = 1/sqrt(2 pi) = 0.398942280401433 (closed form); expected counts sum to
    // m (Phi(last edge) - Phi(first edge)) by telescoping
    const m = 3000;
    const out = normalHistogram(normalSample(uniforms(4), m));
    expect(out.counts.reduce((a, b) => a + b, 0)).toBe(m);
    const k = out.counts.length;
    expect(out.edges.length).toBe(k + 1);
    expect(out.edges[k]! - out.edges[0]!).toBeCloseTo(k * out.binWidth, 10);
    const sumExpected = out.expected.reduce((a, b) => a + b, 0);
    expect(sumExpected).toBeGreaterThan(0.99 * m);
    expect(sumExpected).toBeLessThanOrEqual(m);
    const atZero = Array.from(out.curveX).findIndex((v) => Math.abs(v) < 1e-12);
    expect(atZero).toBeGreaterThan(0);
    expect(out.curveY[atZero]!).toBeCloseTo(m * out.binWidth * 0.398942280401433, 9);
    // a seeded N(0,1) sample: each bin count within 4 Poisson-like standard errors of its expectation
    for (let j = 0; j < k; j++) expect(Math.abs(out.counts[j]! - out.expected[j]!)).toBeLessThan(4 * Math.sqrt(out.expected[j]!) + 1);
  });

  it('falls back to Scott when the interquartile range is 0, and handles constant samples', () => {
    const tied = normalHistogram([0, 0, 0, 0, 0, 0, 0, 1, 2, -3]);
    expect(tied.rule).toBe('scott');
    const constant = normalHistogram([2, 2, 2]);
    expect(Array.from(constant.counts)).toEqual([3]);
    expect(Array.from(constant.edges)).toEqual([1.5, 2.5]);
    expect(normalHistogram(normalSample(uniforms(5), 10000), { maxBins: 7 }).counts.length).toBe(7);
  });

  it('rejects bad options', () => {
    expect(() => normalHistogram([1], { maxBins: 0 })).toThrow(RangeError);
    expect(() => normalHistogram([1], { curvePoints: 1 })).toThrow(RangeError);
    expect(() => normalHistogram([1], { rule: 'sturges' as 'scott' })).toThrow(RangeError);
  });
});
