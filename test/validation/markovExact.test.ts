import { describe, expect, it } from 'vitest';
import {
  markovEntropyRate,
  markovFunctionalMoments,
  markovVarentropyRate,
  stationaryDistribution,
} from '../../src/core/sources/markovEntropy';
import { iidSource } from '../../src/core/sources/iidSource';
import { goldenMeanSource, parryMatrix } from '../../src/core/sources/parrySource';
import { TWO_STATE, THREE_STATE } from '../helpers/referenceChains';

/** Relative agreement with a 12-digit value from THEORY.md: the printed digits limit it to ~1e-11. */
const PRINTED = 1e-11;

/**
 * Spectral radius of the positive matrix M_t(i,j) = P_ij^(1-t) by power iteration, for
 * Lambda(t) = log rho(M_t) (THEORY.md section 2: h = Lambda'(0), sigma^2 = Lambda''(0)). Written
 * here independently of the fundamental-matrix code under test.
 */
function logSpectralRadius(p: number[][], t: number): number {
  const n = p.length;
  let v = new Array<number>(n).fill(1);
  let rho = 0;
  for (let iteration = 0; iteration < 100_000; iteration++) {
    const w = new Array<number>(n).fill(0);
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const pij = p[i]![j]!;
        if (pij > 0) w[i]! += Math.pow(pij, 1 - t) * v[j]!;
      }
    }
    const norm = w.reduce((a, b) => a + b, 0);
    const next = w.map((x) => x / norm);
    const change = Math.max(...next.map((x, i) => Math.abs(x - v[i]! / v.reduce((a, b) => a + b, 0))));
    rho = norm / v.reduce((a, b) => a + b, 0);
    v = next;
    if (change < 1e-16 && iteration > 10) break;
  }
  return Math.log(rho);
}

/**
 * Lambda'(0) and Lambda''(0) by central differences with one Richardson step (error O(eps^4)).
 * Error budget with eps = 1e-3: truncation ~eps^4 |Lambda^(6)| ~ 1e-11; rounding: Lambda is known
 * to ~1e-16 absolute (power iteration to full precision, rho near 1), amplified by 16/eps^2 in the
 * second difference, ~2e-9. Tolerances below: 1e-9 for h, 1e-7 for sigma^2 (50x the budget).
 */
function derivativesAtZero(p: number[][]): { first: number; second: number } {
  const eps = 1e-3;
  const lam = (t: number): number => logSpectralRadius(p, t);
  const l0 = lam(0);
  const d1 = (e: number): number => (lam(e) - lam(-e)) / (2 * e);
  const d2 = (e: number): number => (lam(e) - 2 * l0 + lam(-e)) / (e * e);
  return {
    first: (4 * d1(eps / 2) - d1(eps)) / 3,
    second: (4 * d2(eps / 2) - d2(eps)) / 3,
  };
}

/** Binary entropy in nats. */
function binaryEntropy(a: number): number {
  return -a * Math.log(a) - (1 - a) * Math.log(1 - a);
}

/**
 * Exact Var(-log mu[X_1..X_n]) for a stationary chain by a transfer recursion over the last state:
 * for each state j, the probability of all paths ending in j and the sums of S and S^2 weighted by
 * that probability, S = -log mu(path). Exact up to rounding (no sampling).
 */
function exactInformationVariance(p: number[][], pi: ArrayLike<number>, n: number): number {
  const k = p.length;
  let m0 = Array.from({ length: k }, (_, j) => pi[j]!);
  let m1 = m0.map((x) => -x * Math.log(x));
  let m2 = m0.map((x) => x * Math.log(x) * Math.log(x));
  for (let step = 1; step < n; step++) {
    const n0 = new Array<number>(k).fill(0);
    const n1 = new Array<number>(k).fill(0);
    const n2 = new Array<number>(k).fill(0);
    for (let i = 0; i < k; i++) {
      for (let j = 0; j < k; j++) {
        const q = p[i]![j]!;
        if (q === 0) continue;
        const f = -Math.log(q);
        n0[j]! += q * m0[i]!;
        n1[j]! += q * (m1[i]! + f * m0[i]!);
        n2[j]! += q * (m2[i]! + 2 * f * m1[i]! + f * f * m0[i]!);
      }
    }
    m0 = n0;
    m1 = n1;
    m2 = n2;
  }
  const mean = m1.reduce((a, b) => a + b, 0);
  return m2.reduce((a, b) => a + b, 0) - mean * mean;
}

describe('two-state chain [[0.9, 0.1], [0.4, 0.6]]', () => {
  it('has pi = (0.8, 0.2), h and sigma^2 as in THEORY.md section 2', () => {
    const pi = stationaryDistribution(TWO_STATE);
    // pi: closed form b/(a+b), a/(a+b) with a = 0.1, b = 0.4 (THEORY.md section 2 [calc])
    expect(pi[0]).toBeCloseTo(0.8, 14);
    expect(pi[1]).toBeCloseTo(0.2, 14);
    // closed form h = -sum pi P log P (THEORY.md section 2 [calc])
    expect(markovEntropyRate(TWO_STATE)).toBeCloseTo(0.394668712115, 11);
    // closed form: fundamental-matrix sigma^2 (THEORY.md section 2 [calc])
    expect(markovVarentropyRate(TWO_STATE)).toBeCloseTo(0.606682202706, 11);
  });

  it('agrees with the two-state closed form of THEORY.md section 2', () => {
    const a = 0.1;
    const b = 0.4;
    const la = Math.log((1 - a) / a);
    const lb = Math.log((1 - b) / b);
    const d = (binaryEntropy(b) - binaryEntropy(a)) / (a + b);
    const h = (b * binaryEntropy(a) + a * binaryEntropy(b)) / (a + b);
    const sigma2 = (a * b * ((1 - a) * (la + d) ** 2 + (1 - b) * (lb - d) ** 2)) / (a + b);
    expect(Math.abs(markovEntropyRate(TWO_STATE) - h)).toBeLessThan(1e-14);
    expect(Math.abs(markovVarentropyRate(TWO_STATE) - sigma2)).toBeLessThan(1e-14);
  });

  it('agrees with Lambda\'(0) and Lambda\'\'(0) of the tilted matrix P_ij^(1-t)', () => {
    const { first, second } = derivativesAtZero(TWO_STATE);
    expect(Math.abs(first - markovEntropyRate(TWO_STATE))).toBeLessThan(1e-9);
    expect(Math.abs(second - markovVarentropyRate(TWO_STATE))).toBeLessThan(1e-7);
  });

  it('gives the exact finite-n variances of -log mu[X_1..X_n] of THEORY.md section 2', () => {
    const pi = stationaryDistribution(TWO_STATE);
    // closed form: transfer recursion, values from THEORY.md section 2 [calc]
    const table: [number, number][] = [
      [1, 0.307489928908],
      [2, 0.836697331074],
      [5, 2.58895348872],
      [10, 5.61298278812],
      [100, 60.214078395714],
      [1000, 606.228060831031],
    ];
    for (const [n, value] of table) {
      const v = exactInformationVariance(TWO_STATE, pi, n);
      expect(Math.abs(v - value) / value).toBeLessThan(PRINTED);
    }
  });

  it('shows Var(-log mu[X_1..X_n]) = n sigma^2 - 0.45410 + o(1)', () => {
    const pi = stationaryDistribution(TWO_STATE);
    const sigma2 = markovVarentropyRate(TWO_STATE);
    const offsets = [100, 1000, 2000].map((n) => n * sigma2 - exactInformationVariance(TWO_STATE, pi, n));
    // The constant 0.45410 of THEORY.md section 2 [calc]; o(1) decays geometrically (second
    // eigenvalue 0.5), so by n = 100 the offset has settled to rounding (~1e-12 of n sigma^2).
    for (const offset of offsets) expect(offset).toBeCloseTo(0.4541, 4);
    expect(Math.abs(offsets[2]! - offsets[1]!)).toBeLessThan(1e-8);
  });

  it('gives sigma^2 via the generic functional variance with F = -log P', () => {
    const f = TWO_STATE.map((row) => row.map((p) => -Math.log(p)));
    const { mean, variance } = markovFunctionalMoments(TWO_STATE, f);
    expect(mean).toBeCloseTo(markovEntropyRate(TWO_STATE), 14);
    expect(variance).toBeCloseTo(markovVarentropyRate(TWO_STATE), 14);
  });
});

describe('three-state chain of THEORY.md section 2', () => {
  it('has pi, h and sigma^2 as in THEORY.md', () => {
    const pi = stationaryDistribution(THREE_STATE);
    // closed form: balance equations, THEORY.md section 2 [calc] (pi = (8/35, 13/35, 2/5))
    expect(pi[0]).toBeCloseTo(0.228571428571, 11);
    expect(pi[1]).toBeCloseTo(0.371428571429, 11);
    expect(pi[2]).toBeCloseTo(0.4, 11);
    // closed form: -sum pi P log P and the fundamental-matrix sigma^2, THEORY.md section 2 [calc]
    expect(markovEntropyRate(THREE_STATE)).toBeCloseTo(0.909034310233, 11);
    expect(markovVarentropyRate(THREE_STATE)).toBeCloseTo(0.408273233087, 11);
  });

  it('agrees with the derivatives of the tilted spectral radius', () => {
    const { first, second } = derivativesAtZero(THREE_STATE);
    expect(Math.abs(first - markovEntropyRate(THREE_STATE))).toBeLessThan(1e-9);
    expect(Math.abs(second - markovVarentropyRate(THREE_STATE))).toBeLessThan(1e-7);
  });

  it('has exact finite-n variances that grow like n sigma^2 plus a constant', () => {
    const pi = stationaryDistribution(THREE_STATE);
    const sigma2 = markovVarentropyRate(THREE_STATE);
    const v400 = exactInformationVariance(THREE_STATE, pi, 400);
    const v800 = exactInformationVariance(THREE_STATE, pi, 800);
    // The slope between two large n is sigma^2 up to geometrically small terms and rounding.
    expect(Math.abs((v800 - v400) / 400 - sigma2)).toBeLessThan(1e-9);
  });
});

describe('Bernoulli(0.3)', () => {
  it('has h and sigma^2 of THEORY.md section 2', () => {
    const facts = iidSource([0.7, 0.3]).facts;
    // closed form H(p) and p(1-p) log^2(p/(1-p)), THEORY.md section 2 [calc]
    expect(facts.entropyRate).toBeCloseTo(0.610864302055, 11);
    expect(facts.sigma2).toBeCloseTo(0.150761869486, 11);
    expect(facts.gaussianLimit).toBe(true);
  });

  it('matches a Markov chain with identical rows', () => {
    const rows = [
      [0.7, 0.3],
      [0.7, 0.3],
    ];
    expect(markovEntropyRate(rows)).toBeCloseTo(0.610864302055, 11);
    expect(markovVarentropyRate(rows)).toBeCloseTo(0.150761869486, 11);
  });
});

describe('golden-mean shift with its Parry measure', () => {
  const phi = (1 + Math.sqrt(5)) / 2;

  it('has P = [[1/phi, 1/phi^2], [1, 0]] and pi = ((5+sqrt5)/10, (5-sqrt5)/10)', () => {
    const p = parryMatrix([
      [1, 1],
      [1, 0],
    ]);
    // closed form, THEORY.md section 4 (Parry 1964, from memory)
    expect(p[0]![0]).toBeCloseTo(1 / phi, 14);
    expect(p[0]![1]).toBeCloseTo(1 / (phi * phi), 14);
    expect(p[1]![0]).toBe(1);
    expect(p[1]![1]).toBe(0);
    const pi = stationaryDistribution(p);
    expect(pi[0]).toBeCloseTo((5 + Math.sqrt(5)) / 10, 14);
    expect(pi[1]).toBeCloseTo((5 - Math.sqrt(5)) / 10, 14);
  });

  it('has h = log phi and sigma^2 = 0 both as stated and as computed from its matrix', () => {
    const facts = goldenMeanSource().facts;
    // closed form log phi = 0.481211825060, THEORY.md section 4
    expect(facts.entropyRate).toBeCloseTo(0.48121182506, 11);
    expect(facts.entropyRate).toBeCloseTo(Math.log(phi), 14);
    expect(facts.sigma2).toBe(0);
    expect(facts.gaussianLimit).toBe(false);
    const p = parryMatrix([
      [1, 1],
      [1, 0],
    ]);
    expect(markovEntropyRate(p)).toBeCloseTo(Math.log(phi), 13);
    expect(markovVarentropyRate(p)).toBeLessThan(1e-13);
  });
});
