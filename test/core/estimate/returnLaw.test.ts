import { describe, expect, it } from 'vitest';
import kstest from '@stdlib/stats-kstest';
import { RETURN_LAW_CAVEAT, returnLaw } from '../../../src/core/estimate/returnLaw';
import { exponentialSample, uniforms } from './seededSamples';

const EULER_GAMMA = 0.5772156649015329; // THEORY.md section 3 (DLMF 5.2.3)

/** Inputs whose t = R * count / M are the given values: counts 1..5 cycling, M = 10^6. */
function inputsFor(t: ArrayLike<number>, censored: ArrayLike<number>, m = 1e6) {
  const k = t.length;
  const logReturn = new Float64Array(k);
  const logCount = new Float64Array(k);
  const logBound = new Float64Array(k).fill(Number.NaN);
  for (let i = 0; i < k; i++) {
    logCount[i] = Math.log(1 + (i % 5));
    const logR = Math.log(t[i]!) + Math.log(m) - logCount[i]!;
    if (censored[i]) logBound[i] = logR;
    logReturn[i] = censored[i] ? Number.NaN : logR;
  }
  return { logReturn, logCount, logBound, m };
}

describe('returnLaw', () => {
  it('without censoring gives the KS distance of @stdlib/stats-kstest against Exp(1)', () => {
    // source: @stdlib/stats-kstest 0.2.3 with the 'exponential' cdf at rate 1
    const t = exponentialSample(uniforms(11), 500);
    const { logReturn, logCount, logBound, m } = inputsFor(t, new Uint8Array(500));
    const law = returnLaw(logReturn, logCount, logBound, m);
    expect(law.events).toBe(500);
    expect(law.censored).toBe(0);
    expect(law.ksDistance).toBeCloseTo(kstest(Array.from(t), 'exponential', 1).statistic, 9);
    // no censoring: the mean of log t is the sample mean
    expect(law.meanLog).toBeCloseTo(Array.from(t).reduce((a, v) => a + Math.log(v), 0) / 500, 9);
    expect(law.caveat).toBe(RETURN_LAW_CAVEAT);
  });

  it('recovers e^{-s} and -gamma from right-censored Exp(1) values', () => {
    // source: closed forms P(t > s) = e^{-s}, E log t = -gamma (THEORY.md section 3); censoring at
    // an independent Exp(1/3) time; tolerance 4 standard errors (Greenwood; Kaplan-Meier mean)
    const stream = uniforms(12);
    const k = 5000;
    const t = exponentialSample(stream, k);
    const c = exponentialSample(stream, k).map((v) => 3 * v);
    const seen = t.map((v, i) => Math.min(v, c[i]!));
    const cens = Uint8Array.from(t, (v, i) => (c[i]! < v ? 1 : 0));
    const { logReturn, logCount, logBound, m } = inputsFor(seen, cens);
    logReturn[0] = Number.NaN; // one sample with neither a return nor a bound
    logBound[0] = Number.NaN;
    const law = returnLaw(logReturn, logCount, logBound, m, { gridPoints: 41 });
    expect(law.missing).toBe(1);
    expect(law.size).toBe(k - 1);
    expect(law.censored).toBeGreaterThan(800);
    expect(law.s.length).toBe(41);
    expect(law.s[0]).toBe(0);
    expect(law.survival[0]).toBe(1);
    expect(law.s[40]).toBeCloseTo(Math.max(...seen), 9);
    for (let g = 1; g < 41 && law.s[g]! < 3; g++) {
      expect(law.exponential[g]).toBeCloseTo(Math.exp(-law.s[g]!), 14);
      expect(Math.abs(law.survival[g]! - law.exponential[g]!)).toBeLessThan(4 * law.standardError[g]! + 1e-12);
    }
    expect(law.expectedMeanLog).toBeCloseTo(-EULER_GAMMA, 15);
    expect(Math.abs(law.meanLog + EULER_GAMMA)).toBeLessThan(4 * law.meanLogStandardError);
    // a KS-type distance of order 1/sqrt(k) under the null (Kolmogorov's 1% point 1.63/sqrt(k)
    // bounds it for uncensored data; censoring widens it, hence the factor 2)
    expect(law.ksDistance).toBeLessThan((2 * 1.63) / Math.sqrt(k));
    // dropping the censored samples biases the mean of log t low (THEORY.md section 7)
    const dropped = returnLaw(logReturn, logCount, new Float64Array(k).fill(Number.NaN), m);
    expect(dropped.meanLog).toBeLessThan(law.meanLog - 4 * law.meanLogStandardError);
  });

  it('rejects bad input', () => {
    const one = [0];
    expect(() => returnLaw(one, one, [0, 0], 10)).toThrow(/same length/);
    expect(() => returnLaw(one, one, one, 0)).toThrow(RangeError);
    expect(() => returnLaw(one, [-1], one, 10)).toThrow(/logCount/);
    expect(() => returnLaw(one, one, one, 10, { gridPoints: 1 })).toThrow(RangeError);
    const empty = returnLaw([Number.NaN], [0], [Number.NaN], 10);
    expect(empty.size).toBe(0);
    expect(empty.missing).toBe(1);
    expect(empty.ksDistance).toBeNaN();
  });
});
