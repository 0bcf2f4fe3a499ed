import { describe, expect, it } from 'vitest';
import { crossReferenceOfSpecs, transitionRowsOfSpec } from '../../../src/core/cross/crossReferenceOfSpecs';

describe('crossReferenceOfSpecs', () => {
  it('reads first-order matrices from coin, bernoulli, iid and markov specs; other sources have none', () => {
    expect(transitionRowsOfSpec('coin')).toEqual([
      [0.5, 0.5],
      [0.5, 0.5],
    ]);
    expect(transitionRowsOfSpec('bernoulli:0.3')).toEqual([
      [0.7, 0.3],
      [0.7, 0.3],
    ]);
    expect(transitionRowsOfSpec('markov:0.9,0.1;0.4,0.6')).toEqual([
      [0.9, 0.1],
      [0.4, 0.6],
    ]);
    expect(transitionRowsOfSpec('golden')).toBeNull();
    expect(transitionRowsOfSpec('cf')).toBeNull();
  });

  it('gives H = log 2 against a fair coin, D = 0 for a source against itself, and null for unequal alphabets', () => {
    // Against the uniform law -log Q(x_1..x_n) = n log 2 for every path (closed form, markovCrossFacts).
    const coin = crossReferenceOfSpecs('bernoulli:0.3', 'coin')!;
    expect(coin.crossEntropyNats).toBeCloseTo(Math.LN2, 14);
    expect(coin.sigma2CrossNats!).toBeCloseTo(0, 14);
    // h(Bernoulli(0.3)) = 0.610864302055 (THEORY.md section 2 [calc]).
    expect(coin.entropyANats).toBeCloseTo(0.610864302055, 11);
    expect(crossReferenceOfSpecs('markov:0.9,0.1;0.4,0.6', 'markov:0.9,0.1;0.4,0.6')!.relativeEntropyNats).toBe(0);
    expect(crossReferenceOfSpecs('iid:0.2,0.3,0.5', 'coin')).toBeNull();
    expect(() => crossReferenceOfSpecs('nonsense', 'coin')).toThrow(RangeError);
  });
});
