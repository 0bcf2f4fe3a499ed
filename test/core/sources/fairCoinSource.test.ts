import { describe, expect, it } from 'vitest';
import { fairCoinSource } from '../../../src/core/sources/fairCoinSource';

describe('fairCoinSource', () => {
  it('states h = log 2, sigma^2 = 0 and no Gaussian limit', () => {
    const { facts, id } = fairCoinSource();
    expect(id).toBe('coin');
    expect(facts.entropyRate).toBe(Math.LN2);
    expect(facts.sigma2).toBe(0);
    expect(facts.gaussianLimit).toBe(false);
  });

  it('makes bits of any length, including lengths that are not multiples of 16', () => {
    for (const n of [0, 1, 15, 16, 17, 1001]) {
      const seq = fairCoinSource().generate(n, 9);
      expect(seq.symbols).toHaveLength(n);
      expect(seq.counts[0]! + seq.counts[1]!).toBe(n);
      for (const s of seq.symbols) expect(s === 0 || s === 1).toBe(true);
    }
  });

  it('a shorter sample is a prefix of a longer one with the same seed', () => {
    const long = fairCoinSource().generate(100, 3);
    const short = fairCoinSource().generate(37, 3);
    expect(Array.from(short.symbols)).toEqual(Array.from(long.symbols.subarray(0, 37)));
  });

  it('gives information log 2 per symbol', () => {
    const detailed = fairCoinSource().generateDetailed!(10, 1);
    expect(Array.from(detailed.information)).toEqual(new Array(10).fill(Math.LN2));
  });
});
