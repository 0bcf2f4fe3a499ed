/**
 * sigma^2 = lim Var(-log mu(X_1..X_n))/n against exact values, with the real engine and the reference
 * sources. Tolerance: 4 standard errors as reported by the estimator (batch-means long-run variance
 * over 32 batches, SE = sigma^2 sqrt(2/31)); seeds fixed and not chosen.
 */
import { describe, expect, it } from 'vitest';
import { analyzeSequence } from '../../src/core/analyze';
import { EULER_GAMMA, LOG_EXPONENTIAL_VARIANCE } from '../../src/core/estimate/exponentialLaw';
import { DEFAULT_SETTINGS, type AnalysisResult } from '../../src/core/result/analysisResult';
import { continuedFractionSource } from '../../src/core/sources/continuedFractionSource';
import { fairCoinSource } from '../../src/core/sources/fairCoinSource';
import { iidSource } from '../../src/core/sources/iidSource';
import { markovSource } from '../../src/core/sources/markovSource';
import { goldenMeanSource } from '../../src/core/sources/parrySource';
import type { ReferenceSource } from '../../src/core/sources/referenceSource';

const K = 4;

function analyze(source: ReferenceSource, N: number, seed: number, maxN = 24): AnalysisResult {
  return analyzeSequence(source.generate(N, seed), { name: source.id, sha256: null, format: 'generated' }, { ...DEFAULT_SETTINGS, maxN });
}

function expectWithin(result: AnalysisResult, exact: number): void {
  const { estimate, standardError } = result.sigma2;
  expect(standardError).not.toBeNull();
  expect(Math.abs(estimate - exact)).toBeLessThanOrEqual(K * standardError!);
}

const H = (p: number) => -p * Math.log(p) - (1 - p) * Math.log(1 - p);

/** sigma^2 of a Markov chain by the fundamental-matrix formula of THEORY.md section 2 (Kemeny-Snell Z). */
function markovSigma2(P: readonly (readonly number[])[]): { h: number; sigma2: number } {
  const n = P.length;
  // stationary law: solve pi (I - P) = 0 with sum pi = 1 (replace the last equation)
  const A = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === n - 1 ? 1 : (i === j ? 1 : 0) - P[j]![i]!)));
  const pi = solve(A, Array.from({ length: n }, (_, i) => (i === n - 1 ? 1 : 0)));
  const f = P.map((row) => row.map((p) => (p > 0 ? -Math.log(p) : 0)));
  const g = P.map((row, i) => row.reduce((s, p, j) => s + p * f[i]![j]!, 0));
  const h = pi.reduce((s, p, i) => s + p * g[i]!, 0);
  // u = Z (g - h 1), Z = (I - P + 1 pi)^-1, i.e. solve (I - P + 1 pi) u = g - h
  const B = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? 1 : 0) - P[i]![j]! + pi[j]!));
  const u = solve(B, g.map((v) => v - h));
  let s2 = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) s2 += pi[i]! * P[i]![j]! * (f[i]![j]! + u[j]!) ** 2;
    s2 -= pi[i]! * (u[i]! + h) ** 2;
  }
  return { h, sigma2: s2 };
}

/** Gaussian elimination with partial pivoting (small dense systems). */
function solve(A: number[][], b: number[]): number[] {
  const n = b.length;
  const M = A.map((row, i) => [...row, b[i]!]);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(M[r]![c]!) > Math.abs(M[p]![c]!)) p = r;
    [M[c], M[p]] = [M[p]!, M[c]!];
    for (let r = 0; r < n; r++) {
      if (r === c) continue;
      const factor = M[r]![c]! / M[c]![c]!;
      for (let k = c; k <= n; k++) M[r]![k]! -= factor * M[c]![k]!;
    }
  }
  return M.map((row, i) => row[n]! / row[i]!);
}

describe('sigma^2 of finite-state sources', () => {
  it('two-state chain [[0.9, 0.1], [0.4, 0.6]]: the closed form 0.606682202706 is within 4 standard errors', () => {
    const a = 0.1;
    const b = 0.4;
    const La = Math.log((1 - a) / a);
    const Lb = Math.log((1 - b) / b);
    const D = (H(b) - H(a)) / (a + b);
    // source: THEORY.md section 2 two-state closed form [calc]; agrees with the general formula (Kemeny-Snell)
    const exact = (a * b * ((1 - a) * (La + D) ** 2 + (1 - b) * (Lb - D) ** 2)) / (a + b);
    expect(exact).toBeCloseTo(0.606682202706, 11);
    expect(markovSigma2([[0.9, 0.1], [0.4, 0.6]]).sigma2).toBeCloseTo(exact, 11);
    const result = analyze(markovSource([[0.9, 0.1], [0.4, 0.6]]), 500_000, 11, 16);
    expectWithin(result, exact);
    expect(result.sigma2.negligible).toBe(false);
    expect(result.exponentialLaw).toBeNull();
  });

  it('three-state chain: the fundamental-matrix value 0.408273233087 is within 4 standard errors', () => {
    const P = [
      [0.5, 0.3, 0.2],
      [0.2, 0.6, 0.2],
      [0.1, 0.2, 0.7],
    ];
    // source: THEORY.md section 2 [calc]: h = 0.909034310233, sigma^2 = 0.408273233087 (Kontoyiannis & Verdu 2014 form)
    const { h, sigma2 } = markovSigma2(P);
    expect(h).toBeCloseTo(0.909034310233, 11);
    expect(sigma2).toBeCloseTo(0.408273233087, 11);
    expectWithin(analyze(markovSource(P), 300_000, 12, 12), sigma2);
  });

  it('Bernoulli(0.3): p(1-p) log^2(p/(1-p)) = 0.150761869486 is within 4 standard errors', () => {
    // source: THEORY.md section 2 [calc], variance of -log p(X) for i.i.d. X
    const exact = 0.3 * 0.7 * Math.log(0.3 / 0.7) ** 2;
    expect(exact).toBeCloseTo(0.150761869486, 11);
    expectWithin(analyze(iidSource([0.7, 0.3]), 300_000, 13, 16), exact);
  });
});

describe('sigma^2 of continued-fraction digits', () => {
  it('the pressure value 3.44858814952674 is within 4 standard errors', () => {
    // source: THEORY.md section 4 [calc]: second derivative of the pressure (consistent with Hensley 1994)
    expectWithin(analyze(continuedFractionSource(), 300_000, 14, 4), 3.44858814952674);
  });
});

describe('sources with sigma^2 = 0', () => {
  it('fair coin: sigma^2 is negligible, and the exponential law is reported at the top of the range instead', () => {
    // source: sigma^2 = 0 for the fair coin (every n-block has mass 2^-n); log Exp(1) has mean -gamma, variance pi^2/6
    const result = analyze(fairCoinSource(), 200_000, 15, 20);
    expect(result.sigma2.negligible).toBe(true);
    expect(result.warnings.map((w) => w.code)).toContain('sigma2-negligible');
    expect(result.exponentialLaw).not.toBeNull();
    expect(result.exponentialLaw!.n).toBe(result.trustedRange!.hi);
    expect(result.exponentialLaw!.expectedMean).toBe(-EULER_GAMMA);
    expect(result.exponentialLaw!.expectedVar).toBe(LOG_EXPONENTIAL_VARIANCE);
  });

  it('golden-mean shift: sigma^2 is negligible too', () => {
    // source: THEORY.md section 4: sigma^2 = 0 for the Parry measure (Parry 1964 [mem])
    expect(analyze(goldenMeanSource(), 200_000, 16, 24).sigma2.negligible).toBe(true);
  });
});
