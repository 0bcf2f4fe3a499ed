import { describe, expect, test } from 'vitest';
import { analyzeSequence } from '../../src/core/analyze';
import { estimateBetaMixing } from '../../src/core/diagnostics/betaMixing';
import { mixingDiagnostics, type DiagnosticsSummary } from '../../src/core/diagnostics/mixingDiagnostics';
import type { SymbolArray } from '../../src/core/sequence/sequence';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import { iidSource } from '../../src/core/sources/iidSource';
import { renewalSource } from '../../src/core/sources/renewalSource';
import { DEFAULT_DEMO } from '../../src/ui/store/inputSlice';
import { demoScenario, hilltopWindMatrix } from '../../workers/demoScenarios';
import { informationMoments, TAIL_SHARE_LIMIT } from '../../src/core/diagnostics/informationMoments';
import { continuedFractionSource } from '../../src/core/sources/continuedFractionSource';
import { markovSource } from '../../src/core/sources/markovSource';

// Diagnostics against values from outside the project: the exact beta-mixing coefficients of a
// two-state chain from its transition matrix, and the moments of the one-digit information under
// the Gauss-Kuzmin law.

type M2 = readonly [readonly [number, number], readonly [number, number]];

/** k-step matrix of a 2x2 transition matrix by repeated multiplication. */
function power2(P: M2, k: number): M2 {
  let M: M2 = [
    [1, 0],
    [0, 1],
  ];
  for (let i = 0; i < k; i++) {
    M = [
      [M[0][0] * P[0][0] + M[0][1] * P[1][0], M[0][0] * P[0][1] + M[0][1] * P[1][1]],
      [M[1][0] * P[0][0] + M[1][1] * P[1][0], M[1][0] * P[0][1] + M[1][1] * P[1][1]],
    ];
  }
  return M;
}

/** Gauss-Kuzmin p(x) = -log2(1 - 1/(x+1)^2) (THEORY.md section 4 [pub]), for real x >= 1. */
function gk(x: number): number {
  return -Math.log1p(-1 / ((x + 1) * (x + 1))) / Math.LN2;
}

/**
 * E[(-log p(a_1))^r] under the Gauss-Kuzmin law [calc: the series sum_k p(k) (-log p(k))^r]: the
 * terms k <= K directly, the tail by the first Euler-Maclaurin correction,
 * sum_{k>K} f(k) = integral_K^inf f(x) dx - f(K)/2 + O(f'(K)), the integral by Simpson's rule in
 * u = log x.
 */
function gaussKuzminMoment(r: number): number {
  const K = 200_000;
  let sum = 0;
  for (let k = 1; k <= K; k++) {
    const p = gk(k);
    sum += p * Math.pow(-Math.log(p), r);
  }
  const f = (u: number): number => {
    const x = Math.exp(u);
    const p = gk(x);
    return p * Math.pow(-Math.log(p), r) * x;
  };
  const a = Math.log(K);
  const b = a + 60;
  const steps = 20_000;
  const h = (b - a) / steps;
  let s = f(a) + f(b);
  for (let i = 1; i < steps; i++) s += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  const pK = gk(K);
  return sum + (s * h) / 3 - 0.5 * pK * Math.pow(-Math.log(pK), r);
}

describe('diagnostics against exact values', () => {
  test('matches the exact beta(k) of a two-state chain at block length 1', () => {
    // beta(k) = (1/2) sum_x sum_y pi_x |P^k_xy - pi_y|: the absolute-regularity coefficient of
    // sigma(X_0) and sigma(X_k) (Bradley, Probab. Surveys 2 (2005) 107-144, section 2; for a Markov
    // chain the past and future sigma-fields reduce to X_0 and X_k by the Markov property, from
    // memory). Our gap k puts the second 1-block at t + k, so P^(k) is the k-step matrix.
    const P: M2 = [
      [0.9, 0.1],
      [0.4, 0.6],
    ];
    const pi = [0.8, 0.2] as const; // THEORY.md section 2 [calc]
    const gaps = [1, 2, 3, 4, 5, 6, 8, 10];
    const seq = markovSource(P.map((row) => [...row])).generate(1_000_000, 2026);
    // Every pair counted (the default caps pairs at 2^18 with a stride).
    const est = estimateBetaMixing(seq.symbols, 2, { blockLength: 1, gaps, maxPairs: 1_000_000 });
    expect(est).not.toBeNull();
    if (est === null) return;
    expect(est.blockLength).toBe(1);
    expect(est.stride).toBe(1);
    gaps.forEach((k, i) => {
      const Pk = power2(P, k);
      let exact = 0;
      for (const x of [0, 1] as const) for (const y of [0, 1] as const) exact += 0.5 * pi[x] * Math.abs(Pk[x][y] - pi[y]);
      // The noise floor is sqrt(2/pi) times the standard deviation of the cell errors under
      // independence, serial dependence included (Bartlett's variance, betaMixing.ts), so 6 floors
      // = 4.8 sd; the variance of pairs of this chain is inflated by at most (1 + 0.5)/(1 - 0.5) = 3
      // (second eigenvalue 0.5), so even an uninflated floor would leave 2.8 inflated sd.
      expect(Math.abs((est.beta[i] ?? Number.NaN) - exact)).toBeLessThan(6 * (est.noiseFloor[i] ?? Number.NaN));
    });
  });

  test('raw moments of continued-fraction digits: orders 1-3 match the Gauss-Kuzmin series within 4 SE plus the unseen-tail allowance, orders 4-6 are flagged unresolved', () => {
    const seq = continuedFractionSource().generate(1_000_000, 41);
    const m = informationMoments(seq.symbols, seq.alphabet.length);
    expect(m).not.toBeNull();
    if (m === null) return;
    // The first moment is the one-digit entropy H(a_1) = 2.37924676906 nats (THEORY.md section 4 [calc]).
    expect(gaussKuzminMoment(1)).toBeCloseTo(2.37924676906, 9);
    const logN = Math.log(1_000_000);
    for (let r = 1; r <= 6; r++) {
      const exact = gaussKuzminMoment(r);
      if (r <= 3) {
        // 4 batch-means standard errors (a z-score of 4 has a two-sided chance of 6e-5) plus the
        // Good-Turing allowance for the unseen tail, (f1/N)(log N)^r: digits never drawn carry about
        // f1/N of the mass (Good, Biometrika 40 (1953)), each with information above log N, and the
        // batch-means SE cannot see them.
        const allowance = m.unseenMass * Math.pow(logN, r);
        expect(Math.abs((m.raw[r - 1] ?? Number.NaN) - exact)).toBeLessThan(4 * (m.rawStandardError[r - 1] ?? Number.NaN) + allowance);
      } else {
        // Orders 4..6 are dominated by the unresolved tail: flagged, and below the series.
        expect(m.resolved[r - 1]).toBe(false);
        expect(m.raw[r - 1]).toBeLessThan(exact);
      }
    }
    expect(m.resolved.slice(0, 2)).toEqual([true, true]);
    expect(m.heavyTail).toBe(false);
    expect(m.tailShare).toBeLessThan(TAIL_SHARE_LIMIT);
  });

  test('the noise floor is the mean estimate over two independent copies of a persistent chain (beta exactly 0)', () => {
    // The first block from one run of the demo's eight-state wind chain, the second from an
    // independent run of the same chain: the pairs are independent, so beta = 0 exactly (the joint
    // law is the product of the marginals; definition of the coefficient) and the mean estimate is
    // the floor, while each marginal series keeps its serial dependence. The floor's variance is
    // Bartlett's (J. R. Stat. Soc. Suppl. 98 (1935); from memory), betaMixing.ts. Check: the mean of
    // estimate / floor over independent replicates is 1 within 4 standard errors of that mean
    // (common practice, no source); the floor that treats the pairs as independent is rejected.
    const chain = markovSource(hilltopWindMatrix());
    const ratio: number[] = [];
    const uncorrected: number[] = [];
    for (let r = 0; r < 20; r++) {
      const x = chain.generate(200_000, 500 + 2 * r).symbols;
      const y = chain.generate(200_000, 501 + 2 * r).symbols;
      const est = estimateBetaMixing(x, 8, { partner: y, gaps: [1] });
      expect(est).not.toBeNull();
      if (est === null) return;
      const b = est.beta[0] ?? Number.NaN;
      const f = est.noiseFloor[0] ?? Number.NaN;
      ratio.push(b / f);
      uncorrected.push((b / f) * est.floorInflation);
    }
    const meanSe = (v: readonly number[]): [number, number] => {
      const mean = v.reduce((a, b) => a + b, 0) / v.length;
      const sd = Math.sqrt(v.reduce((a, b) => a + (b - mean) ** 2, 0) / (v.length - 1));
      return [mean, sd / Math.sqrt(v.length)];
    };
    const [mean, se] = meanSe(ratio);
    expect(Math.abs(mean - 1)).toBeLessThan(4 * se);
    const [meanPlain, sePlain] = meanSe(uncorrected);
    expect(meanPlain - 1).toBeGreaterThan(4 * sePlain);
  });
});

// The readings of five sources whose mixing is known from outside the project: i.i.d. (independent);
// finite ergodic Markov chains (geometrically beta-mixing, Bradley, Probab. Surveys 2 (2005), from
// memory); the renewal chains with gap tail exponent alpha, beta(k) of order k^-(alpha - 1) (from the
// renewal structure, from memory): summable for alpha = 2.5 (intervals covered at 0.925 in the
// coverage study, DEVELOPERS.md), not summable for alpha = 1.5. Fixed seeds; batches N / 32 as in an
// analysis without a shorter trusted range.
describe('the mixing reading of reference sources', () => {
  test('the default demo (hill-top wind, eight-state chain, 2e5 symbols) reads fast: exponential, short against the batches', () => {
    const scenario = demoScenario(DEFAULT_DEMO.id);
    const seq = scenario.source.generate(DEFAULT_DEMO.length, DEFAULT_DEMO.seed);
    const result = analyzeSequence(seq, { name: scenario.title, sha256: null, format: 'generated' }, DEFAULT_SETTINGS);
    const d = result.diagnostics;
    expect(d?.reading.verdict).toBe('fast');
    expect(d?.reading.text).toContain('decays exponentially');
    expect(d?.reading.text).toContain(`batches of ${Math.floor(result.scan.batchCount / result.scan.intervalBatches) * result.scan.batchLength} symbols`);
    // The second-largest eigenvalue modulus of the chain bounds the decay rate of beta; the fitted
    // tau is a few symbols (3.6 at this seed), far below a tenth of the batch.
    expect(d?.beta?.exponential?.scale).toBeLessThan(10);
  });

  const reading = (symbols: SymbolArray, alphabet: number): DiagnosticsSummary => mixingDiagnostics(symbols, alphabet, { informationOrder: 2 });

  test('the renewal chain with tail exponent 2.5 reads slow: a summable power law on the later gaps', () => {
    const d = reading(renewalSource(2.5).generate(1_000_000, 8).symbols, 2);
    expect(d.reading.verdict).toBe('slow');
    expect(d.beta?.tailPower?.scale).toBeGreaterThan(1);
  });

  test('the renewal chain with tail exponent 1.5 reads too slow', () => {
    const d = reading(renewalSource(1.5).generate(1_000_000, 8).symbols, 2);
    expect(d.reading.verdict).toBe('too-slow');
    expect(d.beta?.tailPower?.scale).toBeLessThanOrEqual(1);
  });

  test('an i.i.d. source and the two-state chain read fast', () => {
    expect(reading(iidSource([0.7, 0.3]).generate(1_000_000, 8).symbols, 2).reading.verdict).toBe('fast');
    const two = reading(
      markovSource([
        [0.9, 0.1],
        [0.4, 0.6],
      ]).generate(1_000_000, 8).symbols,
      2,
    );
    expect(two.reading.verdict).toBe('fast');
    expect(two.reading.text).toContain('decays exponentially');
  });
});
