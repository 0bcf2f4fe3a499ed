import { describe, expect, it } from 'vitest';
import { blockCounts, conditionalLogLikelihood, markovOrderFit, orderCap } from '../../../src/core/calibration/markovOrderFit';
import { iidSource } from '../../../src/core/sources/iidSource';
import { markovSource } from '../../../src/core/sources/markovSource';
import { ORDER_TWO, THREE_STATE, TWO_STATE } from '../../helpers/referenceChains';

describe('markovOrderFit', () => {
  // BIC is a consistent order estimator (Csiszár & Shields 2000, from memory): on long chains of
  // known order it must pick that order. Fixed seeds; N = 2e5 leaves every cell well sampled.
  it('picks order 0 for an i.i.d. sequence', () => {
    for (const seed of [1, 2, 3]) {
      const seq = iidSource([0.3, 0.7]).generate(200000, seed);
      expect(markovOrderFit(seq.symbols, 2).order).toBe(0);
    }
  });

  it('picks order 1 for the two-state and three-state chains of THEORY.md section 2', () => {
    for (const seed of [1, 2, 3]) {
      expect(markovOrderFit(markovSource(TWO_STATE).generate(200000, seed).symbols, 2).order).toBe(1);
      expect(markovOrderFit(markovSource(THREE_STATE).generate(200000, seed).symbols, 3).order).toBe(1);
    }
  });

  it('picks order 2 for an order-2 binary chain', () => {
    for (const seed of [1, 2, 3]) {
      const fit = markovOrderFit(markovSource(ORDER_TWO, 2).generate(200000, seed).symbols, 2);
      expect(fit.order).toBe(2);
      expect(fit.scores.map((s) => s.order)).toEqual(Array.from({ length: fit.maxOrder + 1 }, (_, k) => k));
    }
  });

  it('counts (k+1)-blocks with the most recent symbol least significant', () => {
    // By hand: 0 1 1 0 1, pairs 01, 11, 10, 01 -> index 2 x_{t-1} + x_t: 1, 3, 2, 1.
    const symbols = Uint8Array.from([0, 1, 1, 0, 1]);
    expect(Array.from(blockCounts(symbols, 2, 1))).toEqual([0, 2, 1, 1]);
    // Triples 011, 110, 101 -> 3, 6, 5.
    expect(Array.from(blockCounts(symbols, 2, 2))).toEqual([0, 0, 0, 1, 0, 1, 1, 0]);
    // From t = 2 only: pairs 11, 10, 01.
    expect(Array.from(blockCounts(symbols, 2, 1, 2))).toEqual([0, 1, 1, 1]);
  });

  it('maximized log-likelihood of counts, by hand', () => {
    // Row 0: counts 0, 2 -> 2 log 1 = 0; row 1: counts 1, 1 -> 2 log(1/2).
    expect(conditionalLogLikelihood(Float64Array.from([0, 2, 1, 1]), 2)).toBeCloseTo(2 * Math.log(0.5), 14);
  });

  it('caps the order where A^(k+1) cells would hold fewer than 20 observations each', () => {
    // 2^(k+1) * 20 <= N - k: N = 1e4 allows k = 7 (2^8 * 20 = 5120), not 8 (10240).
    expect(orderCap(2, 10000).maxOrder).toBe(7);
    // 4^k contexts: 4^5 = 1024 allowed, 4^6 not; N large enough for cells.
    expect(orderCap(4, 1e9).maxOrder).toBe(5);
    expect(orderCap(2, 1e12).maxOrder).toBe(10);
    // A single symbol's law only: 1000 symbols at N = 100.
    expect(orderCap(1000, 100).maxOrder).toBe(0);
  });

  it('refuses sequences too short or alphabets too large', () => {
    expect(() => markovOrderFit(Uint8Array.from([0]), 2)).toThrow(/at least 2 symbols/);
    expect(() => markovOrderFit(new Int32Array(10), 5000)).toThrow(/at most 1024/);
  });
});
