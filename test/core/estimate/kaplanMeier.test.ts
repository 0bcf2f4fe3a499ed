import { describe, expect, it } from 'vitest';
import { kaplanMeier, kaplanMeierAt, kaplanMeierIndex, kaplanMeierMean } from '../../../src/core/estimate/kaplanMeier';
import { exponentialSample, uniforms } from './seededSamples';

// The 6-MP arm of the Freireich et al. remission trial (Blood 21 (1963) 699-716), the standard
// textbook example of Kaplan-Meier (Gehan 1965; Klein & Moeschberger, Survival Analysis, 2nd ed.
// 2003, section 4.2; from memory). Censored times marked with 1.
const TIMES = [6, 6, 6, 6, 7, 9, 10, 10, 11, 13, 16, 17, 19, 20, 22, 23, 25, 32, 32, 34, 35];
const CENSORED = [0, 0, 0, 1, 0, 1, 0, 1, 1, 0, 0, 1, 1, 1, 0, 0, 1, 1, 1, 1, 1];

describe('kaplanMeier', () => {
  it('reproduces the textbook estimate for the 6-MP arm', () => {
    // source: Klein & Moeschberger 2003 / Kalbfleisch & Prentice 1980 (from memory): S = 0.857,
    // 0.807, 0.753, 0.690, 0.627, 0.538, 0.448 at t = 6, 7, 10, 13, 16, 22, 23, Greenwood standard
    // errors 0.076, 0.087, 0.096, 0.107, 0.114, 0.128, 0.135 (printed to 3 decimals)
    const curve = kaplanMeier(TIMES, CENSORED);
    expect(Array.from(curve.times)).toEqual([6, 7, 10, 13, 16, 22, 23]);
    expect(Array.from(curve.atRisk)).toEqual([21, 17, 15, 12, 11, 7, 6]);
    expect(Array.from(curve.deaths)).toEqual([3, 1, 1, 1, 1, 1, 1]);
    const s = [0.857, 0.807, 0.753, 0.69, 0.627, 0.538, 0.448];
    const se = [0.076, 0.087, 0.096, 0.107, 0.114, 0.128, 0.135];
    for (let j = 0; j < 7; j++) {
      expect(Math.abs(curve.survival[j]! - s[j]!)).toBeLessThanOrEqual(5e-4 + 1e-12);
      expect(Math.abs(curve.standardError[j]! - se[j]!)).toBeLessThanOrEqual(5e-4 + 1e-12);
    }
    expect(curve.events).toBe(9);
    expect(curve.censored).toBe(12);
    // exact products by hand: S(6) = 18/21, S(23) = 18/21 * 16/17 * 14/15 * 11/12 * 10/11 * 6/7 * 5/6
    expect(curve.survival[0]!).toBeCloseTo(18 / 21, 14);
    expect(curve.survival[6]!).toBeCloseTo((18 / 21) * (16 / 17) * (14 / 15) * (11 / 12) * (10 / 11) * (6 / 7) * (5 / 6), 14);
  });

  it('is a step function, undefined past a censored last observation', () => {
    const curve = kaplanMeier(TIMES, CENSORED);
    expect(kaplanMeierAt(curve, 5.9)).toBe(1);
    expect(kaplanMeierAt(curve, 6)).toBeCloseTo(18 / 21, 14);
    expect(kaplanMeierAt(curve, 9.99)).toBe(curve.survival[1]);
    expect(kaplanMeierAt(curve, 35)).toBe(curve.survival[6]);
    expect(kaplanMeierAt(curve, 35.5)).toBeNaN();
    const allEvents = kaplanMeier([1, 2], [0, 0]);
    expect(kaplanMeierAt(allEvents, 3)).toBe(0);
  });

  it('without censoring is the empirical survival function, with the sample mean and its standard error', () => {
    // source: closed form: with no censoring, n_j = m - (observations before t_j), S = fraction > t;
    // the restricted mean is the sample mean, with standard error sqrt(sum (x - mean)^2)/m
    const x = [2.5, -1, 0.5, 0.5, 3, 1.25];
    const curve = kaplanMeier(x, new Uint8Array(6));
    for (const t of [-2, -1, 0, 0.5, 1, 2.5, 3]) {
      expect(kaplanMeierAt(curve, t)).toBeCloseTo(x.filter((v) => v > t).length / 6, 14);
    }
    const mean = x.reduce((a, b) => a + b, 0) / 6;
    const rm = kaplanMeierMean(curve);
    expect(rm.mean).toBeCloseTo(mean, 13);
    expect(rm.standardError).toBeCloseTo(Math.sqrt(x.reduce((a, b) => a + (b - mean) ** 2, 0)) / 6, 13);
  });

  it('recovers e^{-t} and the mean of log T from censored Exp(1) data', () => {
    // source: closed forms P(T > t) = e^{-t}, E log T = -gamma = -0.5772156649 (THEORY.md section 3);
    // independent censoring C ~ Exp(1/4); tolerance 4 Greenwood / Kaplan-Meier standard errors
    const stream = uniforms(606);
    const m = 4000;
    const t = exponentialSample(stream, m);
    const c = exponentialSample(stream, m).map((v) => 4 * v);
    const y = new Float64Array(m);
    const cens = new Uint8Array(m);
    for (let i = 0; i < m; i++) {
      cens[i] = c[i]! < t[i]! ? 1 : 0;
      y[i] = Math.log(Math.min(t[i]!, c[i]!));
    }
    const curve = kaplanMeier(y, cens);
    expect(curve.censored).toBeGreaterThan(600);
    for (const s of [0.1, 0.5, 1, 2, 3]) {
      const j = kaplanMeierIndex(curve, Math.log(s));
      expect(curve.times[j]!).toBeLessThanOrEqual(Math.log(s));
      expect(curve.times[j + 1]!).toBeGreaterThan(Math.log(s));
      expect(Math.abs(curve.survival[j]! - Math.exp(-s))).toBeLessThan(4 * curve.standardError[j]!);
    }
    const rm = kaplanMeierMean(curve);
    expect(Math.abs(rm.mean - -0.5772156649015329)).toBeLessThan(4 * rm.standardError);
  });

  it('handles empty input and rejects bad input', () => {
    expect(kaplanMeier([], []).size).toBe(0);
    expect(kaplanMeierMean(kaplanMeier([], [])).mean).toBeNaN();
    expect(() => kaplanMeier([1, 2], [0])).toThrow(RangeError);
    expect(() => kaplanMeier([1, Number.NaN], [0, 0])).toThrow(RangeError);
  });
});
