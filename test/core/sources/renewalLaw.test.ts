import { describe, expect, it } from 'vitest';
import { markovEntropyRate, markovVarentropyRate } from '../../../src/core/sources/markovEntropy';
import {
  renewalEntropyRate,
  renewalGapEntropy,
  renewalGapProbability,
  renewalInformationVariance,
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
    const rows = ageChain(q);
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

/** Age chain of a gap law q on 1..K (see the entropy-rate test above). */
function ageChain(q: readonly number[]): number[][] {
  const k = q.length;
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
  return rows;
}

describe('renewalInformationVariance', () => {
  it('uses the renewal-reward formula, which equals the age chain sigma^2 for a truncated gap law', () => {
    // The age chain is a Markov chain whose path and the symbols determine each other, so both have
    // the same sigma^2; the chain's comes from its fundamental matrix (markovVarentropyRate, Kemeny &
    // Snell), an independent method. Formula: E[(Y - hT)^2]/E[T], Y = -log q(T).
    for (const alpha of [1.5, 2.5]) {
      const k = 60;
      const p = Array.from({ length: k }, (_, i) => renewalGapProbability(alpha, i + 1));
      const mass = p.reduce((a, b) => a + b, 0);
      const q = p.map((x) => x / mass);
      let entropy = 0;
      let mean = 0;
      for (let m = 1; m <= k; m++) {
        entropy -= q[m - 1]! * Math.log(q[m - 1]!);
        mean += m * q[m - 1]!;
      }
      const h = entropy / mean;
      let reward = 0;
      for (let m = 1; m <= k; m++) reward += q[m - 1]! * (-Math.log(q[m - 1]!) - h * m) ** 2;
      expect(markovVarentropyRate(ageChain(q))).toBeCloseTo(reward / mean, 9);
    }
  });

  it('agrees with a direct sum over 2 10^6 gaps plus the leading tail term', () => {
    // Beyond M the terms are p(m)(-log p(m) - h m)^2 ~ alpha h^2 m^(1-alpha), whose sum is about
    // alpha h^2 M^(2-alpha)/(alpha-2); what that leaves out is smaller by a factor of order log(M)/(h M).
    for (const alpha of [2.5, 3, 4]) {
      const h = renewalEntropyRate(alpha);
      const M = 2_000_000;
      let direct = 0;
      for (let m = M; m >= 1; m--) {
        const p = renewalGapProbability(alpha, m);
        direct += p * (-Math.log(p) - h * m) ** 2;
      }
      const tail = (alpha * h * h * M ** (2 - alpha)) / (alpha - 2);
      const expected = (direct + tail) / renewalMeanGap(alpha);
      expect(Math.abs(renewalInformationVariance(alpha)! - expected) / expected).toBeLessThan(1e-6);
    }
  });

  it('claims nothing below alpha = 2.1, where the gap variance is infinite or its tail too slow', () => {
    expect(renewalInformationVariance(1.5)).toBeNull();
    expect(renewalInformationVariance(2)).toBeNull();
    expect(renewalInformationVariance(2.1)).not.toBeNull();
  });
});
