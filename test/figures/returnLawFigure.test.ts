import { describe, expect, it } from 'vitest';
import { EULER_GAMMA } from '../../src/core/estimate/exponentialLaw';
import { returnLawFigure, returnLawStatistics } from '../../src/figures/returnLawFigure';
import { logAxis } from '../../src/figures/logAxis';
import { clampViewLength, defaultViewLength, viewLengthRange } from '../../src/figures/viewLength';
import { fakeResult } from '../ui/fixtures';

/**
 * Hand-made fixture: N = 11 symbols, so at n = 2 there are M = 10 positions. Every sampled block
 * occurs twice (log count = log 2), so t = R_2 * 2 / 10: returns R = 5, 10, 20 give t = 1, 2, 4,
 * and a censored return with bound R > 15 gives t > 3.
 */
function fixture(withBounds = true) {
  const L = Math.log;
  return fakeResult({
    input: { ...fakeResult().input, symbols: 11 },
    paths: {
      positions: [0, 1, 2, 3],
      logReturn: [[0.1, L(5)], [0.1, L(10)], [0.1, L(20)], [0.1, null]],
      logCount: [[0, L(2)], [0, L(2)], [0, L(2)], [0, L(2)]],
      ...(withBounds ? { logCensoredBound: [[null, null], [null, null], [null, null], [null, L(15)]] } : {}),
    },
  });
}

describe('returnLawStatistics', () => {
  const law = returnLawStatistics(fixture(), 2).law;

  it('counts events and censored samples', () => {
    expect(law).toMatchObject({ size: 4, events: 3, censored: 1, missing: 0 });
  });

  it('follows Kaplan-Meier by hand: S = 3/4 on [1, 2), Greenwood SE sqrt(9/16 * 1/12) = 0.2165', () => {
    // Kaplan & Meier 1958 product limit; Greenwood's variance S^2 sum d/(r (r - d)) with r = 4 at risk and d = 1 at t = 1.
    const g = 75; // grid of 201 points over [0, 4]: s = 1.5
    expect(law?.s[g]).toBeCloseTo(1.5, 12);
    expect(law?.survival[g]).toBeCloseTo(0.75, 12);
    expect(law?.standardError[g]).toBeCloseTo(Math.sqrt((9 / 16) * (1 / 12)), 9);
    // On (2, 4): S = 3/4 * 2/3 = 1/2, variance 1/4 * (1/12 + 1/6) = 1/16.
    expect(law?.survival[110]).toBeCloseTo(0.5, 12);
    expect(law?.standardError[110]).toBeCloseTo(0.25, 9);
  });

  it('gives the mean of log t from the jumps (1/4 log 2 + 1/2 log 4 = 0.8664), -gamma and the KS distance 1 - 1/e', () => {
    // Jumps of S: 1/4 at t = 1, 1/4 at t = 2, 1/2 at t = 4 (the censored mass moves to t = 4).
    expect(law?.meanLog).toBeCloseTo(0.25 * Math.log(2) + 0.5 * Math.log(4), 9);
    // Euler's constant 0.5772156649 (Abramowitz & Stegun 1964, 6.1.3).
    expect(law?.expectedMeanLog).toBeCloseTo(-0.5772156649, 9);
    expect(EULER_GAMMA).toBeCloseTo(0.5772156649, 9);
    // Largest gap: just before t = 1, S = 1 against e^-1.
    expect(law?.ksDistance).toBeCloseTo(1 - Math.exp(-1), 9);
  });

  it('leaves censored samples out, with a note, when the result has no censoring bounds', () => {
    const s = returnLawStatistics(fixture(false), 2);
    expect(s.law).toMatchObject({ size: 3, censored: 0, missing: 1 });
    expect(s.notes[0]).toMatch(/no censoring bounds/);
  });

  it('explains what is missing instead of drawing', () => {
    expect(returnLawStatistics(fakeResult(), 2).problem).toMatch(/before block counts were kept/);
    expect(returnLawStatistics(fixture(), 20).problem).toMatch(/longer than the sequence/);
  });
});

describe('returnLawFigure', () => {
  it('draws P(t > s) on a log axis from 10^-2 to 1 with e^(-s) and the Greenwood band', () => {
    const f = returnLawFigure(returnLawStatistics(fixture(), 2), { width: 400, height: 300 });
    if (f.kind !== 'figure') throw new Error(f.message);
    const m = f.model;
    // Lowest step 1/2; e^-4 = 0.0183 lies within two decades of it, so the axis reaches 10^-2.
    expect(m.y.ticks.map((t) => t.label)).toEqual(['10⁻²', '10⁻¹', '1']);
    expect(m.x.domain).toEqual([0, 4]);
    expect(m.lines.map((l) => l.id)).toEqual(['exponential', 'survival']);
    expect(m.legend.map((e) => e.label)).toEqual(['Kaplan-Meier P(t > s), 4 samples (1 censored)', 'Pointwise 95% band (Greenwood)', 'Exp(1): e^(−s)']);
    expect(m.bands[0]?.path).not.toBe('');
    // Read-out stops on the grid: at s = 1.5 (after t = 1, before t = 2) Kaplan-Meier gives 3/4, and
    // e^-1.5 = 0.2231 (Abramowitz & Stegun 4.2, from memory).
    const at = m.readout.find((r) => r.heading?.value === '1.500');
    expect(at?.rows.map((r) => r.value)).toEqual(['0.7500', '0.2165', '0.2231']);
    expect(f).toMatchSnapshot();
  });
});

describe('logAxis', () => {
  it('widens to whole decades and puts e^(-s) on a straight line', () => {
    const { scale, axis } = logAxis([0.03, 0.5], [200, 0], { label: 'P', unit: '' });
    expect(axis.domain).toEqual([0.01, 1]);
    expect(axis.ticks.map((t) => [t.label, t.position])).toEqual([
      ['10⁻²', 200],
      ['10⁻¹', 100],
      ['1', 0],
    ]);
    // log10 e^(-s) = -s / ln 10 is linear in s.
    expect(scale(-1 / Math.LN10) - scale(0)).toBeCloseTo(scale(-2 / Math.LN10) - scale(-1 / Math.LN10), 9);
  });
});

describe('view lengths', () => {
  const withPaths = fakeResult({ paths: { positions: [0, 1], logReturn: [[1, 2, 3, null], [1, 2, 3, 4]] } });

  it('range up to the last n with a value; default in the middle of the trusted range; clamped', () => {
    expect(viewLengthRange(withPaths)).toEqual([1, 4]);
    expect(defaultViewLength({ ...withPaths, trustedRange: { lo: 3, hi: 4, reason: '' } })).toBe(3);
    expect(defaultViewLength({ ...withPaths, trustedRange: null })).toBe(2); // entropy.lengthsUsed [2, 3]
    expect(clampViewLength(withPaths, 9)).toBe(4);
    expect(clampViewLength(withPaths, 0)).toBe(1);
    expect(clampViewLength(withPaths, null)).toBe(2);
  });
});
