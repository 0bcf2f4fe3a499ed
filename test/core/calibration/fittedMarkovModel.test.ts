import { describe, expect, it } from 'vitest';
import { fittedMarkovModel, generateFromModel, markovModelOfRows } from '../../../src/core/calibration/fittedMarkovModel';
import { blockCounts, markovOrderFit } from '../../../src/core/calibration/markovOrderFit';
import { markovSource } from '../../../src/core/sources/markovSource';
import { ORDER_TWO, TWO_STATE } from '../../helpers/referenceChains';

// [calc] THEORY.md section 2, closed form of Kontoyiannis & Verdú 2014.
const TWO_STATE_H = 0.394668712115;
const TWO_STATE_SIGMA2 = 0.606682202706;

function meanAndSd(xs: readonly number[]): { mean: number; sd: number } {
  const mean = xs.reduce((s, x) => s + x, 0) / xs.length;
  const sd = Math.sqrt(xs.reduce((s, x) => s + (x - mean) ** 2, 0) / (xs.length - 1));
  return { mean, sd };
}

/** log of the spectral radius of M_t(i,j) = P_ij^(1-t) over the lifted states, by power iteration. */
function lambda(model: ReturnType<typeof markovModelOfRows>, t: number): number {
  const { states, alphabetSize: a, rows, nextState } = model;
  let v = new Float64Array(states).fill(1);
  let rho = 0;
  for (let iter = 0; iter < 5000; iter++) {
    const w = new Float64Array(states);
    for (let s = 0; s < states; s++) {
      for (let j = 0; j < a; j++) {
        const p = rows[s * a + j]!;
        if (p > 0) w[s]! += p ** (1 - t) * v[nextState[s * a + j]!]!;
      }
    }
    let norm = 0;
    for (const x of w) norm = Math.max(norm, x);
    for (let s = 0; s < states; s++) w[s]! /= norm;
    const done = Math.abs(norm - rho) < 1e-16 * norm;
    rho = norm;
    v = w;
    if (done && iter > 50) break;
  }
  return Math.log(rho);
}

describe('fittedMarkovModel', () => {
  it('states the exact h and sigma^2 of the two-state chain of THEORY.md section 2', () => {
    const model = markovModelOfRows(TWO_STATE, 1);
    // [calc] THEORY.md section 2, closed form of Kontoyiannis & Verdú 2014.
    expect(model.entropyRateNats).toBeCloseTo(TWO_STATE_H, 11);
    expect(model.sigma2Nats).toBeCloseTo(TWO_STATE_SIGMA2, 11);
    expect(Array.from(model.stationary)).toEqual([expect.closeTo(0.8, 12), expect.closeTo(0.2, 12)]);
  });

  it('lifts an i.i.d. law to order 1: Bernoulli(0.3) from counts 3 and 7', () => {
    const model = fittedMarkovModel(Float64Array.from([3, 7]), 2, 0);
    // [calc] THEORY.md section 2: p = 0.3, h = 0.610864302055, sigma^2 = 0.150761869486.
    expect(model.entropyRateNats).toBeCloseTo(0.610864302055, 11);
    expect(model.sigma2Nats).toBeCloseTo(0.150761869486, 11);
  });

  it('the fitted model of a long two-state chain has h and sigma^2 within 4 standard errors of the exact values', () => {
    // Eight independent paths of 2e5 symbols; the standard error is the spread of the fitted values
    // over the paths divided by sqrt(8); each path must also lie within 4 spreads.
    const hs: number[] = [];
    const s2s: number[] = [];
    for (let seed = 11; seed < 19; seed++) {
      const seq = markovSource(TWO_STATE).generate(200000, seed);
      const model = fittedMarkovModel(blockCounts(seq.symbols, 2, 1), 2, 1);
      hs.push(model.entropyRateNats);
      s2s.push(model.sigma2Nats);
    }
    const h = meanAndSd(hs);
    const s2 = meanAndSd(s2s);
    expect(Math.abs(h.mean - TWO_STATE_H)).toBeLessThan((4 * h.sd) / Math.sqrt(8));
    expect(Math.abs(s2.mean - TWO_STATE_SIGMA2)).toBeLessThan((4 * s2.sd) / Math.sqrt(8));
    for (const x of hs) expect(Math.abs(x - TWO_STATE_H)).toBeLessThan(4 * h.sd);
    // The spread of h-hat is about sqrt(sigma^2 / N) (asymptotic normality of the plug-in rate, from memory).
    expect(h.sd).toBeGreaterThan(0.5 * Math.sqrt(TWO_STATE_SIGMA2 / 200000));
    expect(h.sd).toBeLessThan(2 * Math.sqrt(TWO_STATE_SIGMA2 / 200000));
  });

  it('exact h and sigma^2 of a lifted order-2 chain agree with the derivatives of Lambda(t)', () => {
    // THEORY.md section 2: Lambda(t) = log spectral radius of P_ij^(1-t); h = Lambda'(0),
    // sigma^2 = Lambda''(0). Central differences with step d: errors of order d^2 (about 1e-7 here).
    const model = markovModelOfRows(ORDER_TWO, 2);
    const d = 1e-3;
    const up = lambda(model, d);
    const down = lambda(model, -d);
    const zero = lambda(model, 0);
    expect(zero).toBeCloseTo(0, 13);
    expect(model.entropyRateNats).toBeCloseTo((up - down) / (2 * d), 6);
    expect(model.sigma2Nats).toBeCloseTo((up - 2 * zero + down) / (d * d), 5);
    // And the same as the repo's own order-k source (same convention for contexts).
    const source = markovSource(ORDER_TWO, 2);
    expect(model.entropyRateNats).toBeCloseTo(source.facts.entropyRate!, 12);
    expect(model.sigma2Nats).toBeCloseTo(source.facts.sigma2!, 12);
  });

  it('keeps only observed transitions and drops the one into the unseen final context', () => {
    // 0 1 0 1 0 1 1, order 2: contexts 01 -> 0 (twice) and 1 (once), 10 -> 1 (twice); the last
    // transition 01 -> 1 leads into context 11, never seen as a context: dropped by hand, leaving
    // the cycle 01 -> 10 -> 01 (period 2, h = 0).
    const symbols = Uint8Array.from([0, 1, 0, 1, 0, 1, 1]);
    const fit = markovOrderFit(symbols, 2);
    const model = fittedMarkovModel(blockCounts(symbols, 2, 2), 2, 2);
    expect(fit.maxOrder).toBe(0);
    expect(model.states).toBe(2);
    expect(Array.from(model.contexts)).toEqual([1, 2]);
    expect(model.droppedTransitions).toBe(1);
    expect(model.period).toBe(2);
    expect(model.entropyRateNats).toBe(0);
    expect(Array.from(generateFromModel(model, 6, 5)).join('').match(/^(01)+$|^(10)+$/)).not.toBeNull();
  });

  it('a context seen only before the chain settles is transient and never generated', () => {
    // 0 0 0 1 1 1 1, order 1: 0 -> 0 twice, 0 -> 1 once, 1 -> 1 three times: {1} is the closed class.
    const model = fittedMarkovModel(blockCounts(Uint8Array.from([0, 0, 0, 1, 1, 1, 1]), 2, 1), 2, 1);
    expect(model.transientStates).toBe(1);
    expect(Array.from(model.stationary)).toEqual([0, 1]);
    expect(Array.from(generateFromModel(model, 20, 3)).every((x) => x === 1)).toBe(true);
  });

  it('generates the same path for the same seed, with the stationary frequencies', () => {
    const model = markovModelOfRows(TWO_STATE, 1);
    const a = generateFromModel(model, 100000, 7);
    expect(Array.from(generateFromModel(model, 1000, 7))).toEqual(Array.from(a.subarray(0, 1000)));
    // Fraction of 1s: pi_1 = 0.2; the long-run variance of the indicator of state 1 is
    // pi_1 pi_0 (1 + lambda)/(1 - lambda) with lambda = 1 - a - b = 0.5 (from memory), i.e. 0.48.
    const ones = Array.from(a).reduce((s, x) => s + x, 0) / a.length;
    expect(Math.abs(ones - 0.2)).toBeLessThan(4 * Math.sqrt(0.48 / a.length));
  });
});
