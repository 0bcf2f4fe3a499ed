import { describe, expect, it } from 'vitest';
import { markovCrossFacts } from '../../../src/core/sources/markovCrossEntropy';
import { markovEntropyRate, markovVarentropyRate } from '../../../src/core/sources/markovEntropy';
import { TWO_STATE } from '../../helpers/referenceChains';

const Q_TWO: number[][] = [
  [0.7, 0.3],
  [0.5, 0.5],
];

/** log of the Perron root of the 2x2 matrix M_t(i,j) = P_ij Q_ij^(-t): (tr + sqrt(tr^2 - 4 det)) / 2. */
function lambda(p: number[][], q: number[][], t: number): number {
  const m = (i: number, j: number): number => p[i]![j]! * Math.pow(q[i]![j]!, -t);
  const tr = m(0, 0) + m(1, 1);
  const det = m(0, 0) * m(1, 1) - m(0, 1) * m(1, 0);
  return Math.log((tr + Math.sqrt(tr * tr - 4 * det)) / 2);
}

describe('markovCrossFacts', () => {
  it('gives the cross and relative entropy rates of the worked pair by the published formula', () => {
    // H(P,Q) = -sum_i pi_i sum_j P_ij log Q_ij and D = sum_i pi_i sum_j P_ij log(P_ij/Q_ij)
    // (Rached, Alajaji & Campbell, IEEE Trans. IT 50 (2004)); pi = (0.8, 0.2) from THEORY.md section 2.
    const cross = -(0.8 * (0.9 * Math.log(0.7) + 0.1 * Math.log(0.3)) + 0.2 * (0.4 * Math.log(0.5) + 0.6 * Math.log(0.5)));
    const d =
      0.8 * (0.9 * Math.log(0.9 / 0.7) + 0.1 * Math.log(0.1 / 0.3)) + 0.2 * (0.4 * Math.log(0.4 / 0.5) + 0.6 * Math.log(0.6 / 0.5));
    const facts = markovCrossFacts(TWO_STATE, Q_TWO);
    expect(facts.crossEntropyRate).toBeCloseTo(cross, 13);
    expect(facts.relativeEntropyRate).toBeCloseTo(d, 13);
    // h of P from THEORY.md section 2 [calc]: 0.394668712115.
    expect(facts.entropyRate).toBeCloseTo(0.394668712115, 11);
    expect(facts.crossEntropyRate - facts.entropyRate).toBeCloseTo(facts.relativeEntropyRate, 13);
  });

  it('matches Lambda\'(0) and Lambda\'\'(0) of the tilted matrix P_ij Q_ij^(-t) (independent route)', () => {
    // Lambda(t) = lim (1/n) log E_P exp(-t log Q(X_1..X_n)) is the log Perron root of M_t (from memory:
    // the Markov-chain moment generating function via Perron-Frobenius); its derivatives at 0 are
    // the mean rate and the variance rate of -log Q(X_1..X_n). Central differences, step 1e-3.
    const e = 1e-3;
    const d1 = (lambda(TWO_STATE, Q_TWO, e) - lambda(TWO_STATE, Q_TWO, -e)) / (2 * e);
    const d2 = (lambda(TWO_STATE, Q_TWO, e) - 2 * lambda(TWO_STATE, Q_TWO, 0) + lambda(TWO_STATE, Q_TWO, -e)) / (e * e);
    const facts = markovCrossFacts(TWO_STATE, Q_TWO);
    expect(facts.crossEntropyRate).toBeCloseTo(d1, 6);
    expect(facts.crossSigma2).not.toBeNull();
    expect(facts.crossSigma2!).toBeCloseTo(d2, 5);
  });

  it('reduces to h and the varentropy rate when Q = P, with D = 0', () => {
    const facts = markovCrossFacts(TWO_STATE, TWO_STATE);
    expect(facts.relativeEntropyRate).toBe(0);
    expect(facts.crossEntropyRate).toBeCloseTo(markovEntropyRate(TWO_STATE), 13);
    // THEORY.md section 2 [calc]: sigma^2 = 0.606682202706.
    expect(facts.crossSigma2!).toBeCloseTo(0.606682202706, 10);
    expect(facts.crossSigma2!).toBeCloseTo(markovVarentropyRate(TWO_STATE), 12);
  });

  it('gives the i.i.d. closed forms for Bernoulli(0.3) against Bernoulli(0.5) and Bernoulli(0.6)', () => {
    // i.i.d. P = (0.7, 0.3) against Q: H = -0.7 log q0 - 0.3 log q1, sigma^2 = Var_P(-log Q(X)) =
    // 0.3 * 0.7 * log^2(q1/q0) (variance of a two-valued variable; common practice, no source).
    const p = [
      [0.7, 0.3],
      [0.7, 0.3],
    ];
    const half = markovCrossFacts(p, [
      [0.5, 0.5],
      [0.5, 0.5],
    ]);
    expect(half.crossEntropyRate).toBeCloseTo(Math.LN2, 14);
    // h(Bernoulli(0.3)) = 0.610864302055 (THEORY.md section 2 [calc]).
    expect(half.relativeEntropyRate).toBeCloseTo(Math.LN2 - 0.610864302055, 11);
    expect(half.crossSigma2!).toBeCloseTo(0, 14);
    const q = markovCrossFacts(p, [
      [0.4, 0.6],
      [0.4, 0.6],
    ]);
    expect(q.crossEntropyRate).toBeCloseTo(-0.7 * Math.log(0.4) - 0.3 * Math.log(0.6), 14);
    expect(q.crossSigma2!).toBeCloseTo(0.21 * Math.log(0.6 / 0.4) ** 2, 13);
  });

  it('is infinite when P takes a step that Q forbids, and rejects mismatched sizes', () => {
    const facts = markovCrossFacts(TWO_STATE, [
      [1, 0],
      [0.5, 0.5],
    ]);
    expect(facts.crossEntropyRate).toBe(Infinity);
    expect(facts.relativeEntropyRate).toBe(Infinity);
    expect(facts.crossSigma2).toBeNull();
    expect(() => markovCrossFacts(TWO_STATE, [[1]])).toThrow(/2 and 1 states/);
  });
});
