import { describe, expect, it } from 'vitest';
import { markovEntropyRate } from '../../../src/core/sources/markovEntropy';
import {
  renewalEntropyRate,
  renewalGapEntropy,
  renewalGapProbability,
  renewalMeanGap,
} from '../../../src/core/sources/renewalLaw';

describe('renewalMeanGap', () => {
  it('is zeta(alpha): zeta(2) = pi^2/6, zeta(1.5), zeta(3)', () => {
    // pi^2/6 (Euler); zeta(1.5) = 2.612375348685488 and zeta(3) = 1.2020569031595942 (from memory)
    expect(renewalMeanGap(2)).toBeCloseTo(Math.PI ** 2 / 6, 14);
    expect(renewalMeanGap(1.5)).toBeCloseTo(2.612375348685488, 14);
    expect(renewalMeanGap(3)).toBeCloseTo(1.2020569031595942, 14);
  });

  it('rejects tail exponents outside (1, 100]', () => {
    expect(() => renewalMeanGap(1)).toThrow(RangeError);
    expect(() => renewalMeanGap(Number.NaN)).toThrow(/tail exponent/);
    expect(() => renewalMeanGap(101)).toThrow(RangeError);
  });
});

describe('renewalGapEntropy', () => {
  it('agrees with a direct sum over 10^6 terms plus a bound on the rest', () => {
    for (const alpha of [1.5, 2.5]) {
      let direct = 0;
      const m = 1_000_000;
      for (let k = m; k >= 1; k--) {
        const p = renewalGapProbability(alpha, k);
        direct -= p * Math.log(p);
      }
      // Beyond m, p(k) <= alpha k^-(alpha+1) and -p log p is decreasing, so the tail is at most
      // integral_m^inf alpha x^-(alpha+1) (alpha+1) log(x) dx (1 + o(1)) <= 2 (alpha+1) m^-alpha log m.
      const tail = 2 * (alpha + 1) * m ** -alpha * Math.log(m);
      const h = renewalGapEntropy(alpha);
      expect(h).toBeGreaterThanOrEqual(direct - 1e-12);
      expect(h - direct).toBeLessThanOrEqual(tail);
    }
  });

  it('has a probability law that sums to 1', () => {
    let total = 0;
    for (let k = 1; k <= 100_000; k++) total += renewalGapProbability(2, k);
    // Telescoping: sum_{k<=K} p(k) = 1 - (K+1)^-alpha; 1e5 additions round to ~1e-14 at most.
    expect(Math.abs(total - (1 - 100_001 ** -2))).toBeLessThan(1e-13);
  });
});

describe('renewalEntropyRate', () => {
  it('equals the entropy rate of the age chain for a truncated gap law (checks h = H(T)/E[T])', () => {
    // Gap law truncated at K: P(T = m) = p(m)/P(T <= K). Age chain on a = 0..K-1 (zeros since the
    // last 1): from age a, emit 1 (back to age 0) with hazard P(T = a+1)/P(T >= a+1), else 0 (to
    // a+1). The age is a function of the symbols and vice versa, so both have the same h.
    const alpha = 1.5;
    const k = 200;
    const p = Array.from({ length: k }, (_, i) => renewalGapProbability(alpha, i + 1));
    const mass = p.reduce((a, b) => a + b, 0);
    const q = p.map((x) => x / mass);
    const rows: number[][] = [];
    let survival = 1;
    for (let a = 0; a < k; a++) {
      const hazard = a === k - 1 ? 1 : q[a]! / survival;
      const row = new Array<number>(k).fill(0);
      row[0] = hazard;
      if (a < k - 1) row[a + 1] = 1 - hazard;
      rows.push(row);
      survival -= q[a]!;
    }
    let entropy = 0;
    let mean = 0;
    for (let m = 1; m <= k; m++) {
      entropy -= q[m - 1]! * Math.log(q[m - 1]!);
      mean += m * q[m - 1]!;
    }
    expect(markovEntropyRate(rows)).toBeCloseTo(entropy / mean, 11);
  });

  it('is H(T)/zeta(alpha) for the full law', () => {
    expect(renewalEntropyRate(1.5)).toBeCloseTo(renewalGapEntropy(1.5) / renewalMeanGap(1.5), 15);
  });
});
