import { describe, expect, test } from 'vitest';
import { informationMoments, TAIL_SHARE_LIMIT } from '../../../src/core/diagnostics/informationMoments';
import { continuedFractionSource } from '../../../src/core/sources/continuedFractionSource';
import { iidSource } from '../../../src/core/sources/iidSource';
import { uniformStream } from '../../../src/core/sources/seededRandom';

/** Gauss-Kuzmin p(x) = -log2(1 - 1/(x+1)^2) (THEORY.md section 4 [pub]), for real x >= 1. */
function gk(x: number): number {
  return -Math.log1p(-1 / ((x + 1) * (x + 1))) / Math.LN2;
}

/**
 * E[(-log p(a_1))^r] under the Gauss-Kuzmin law [calc: the series sum_k p(k) (-log p(k))^r]: the
 * terms k <= K directly, the tail by Euler-Maclaurin (integral over k > K by Simpson's rule in
 * u = log k, plus half the term at K, minus the term at K counted twice).
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

/** Draws from p(k) = (ln 2)^2 (1/ln^2 k - 1/ln^2 (k+1)), k >= 2, by inversion: P(a >= k) = (ln 2 / ln k)^2, so
 * a = floor(2^(1/sqrt(U))). Draws beyond 2^50 are given fresh symbols (they never repeat in a sample). */
function heavyTokens(N: number, seed: number): { symbols: Int32Array; alphabetSize: number } {
  const u = uniformStream(seed);
  const ids = new Map<number, number>();
  const symbols = new Int32Array(N);
  for (let t = 0; t < N; t++) {
    const e = 1 / Math.sqrt(u.nextPositive());
    const a = e > 50 ? -t - 1 : Math.floor(Math.pow(2, e));
    let id = ids.get(a);
    if (id === undefined) {
      id = ids.size;
      ids.set(a, id);
    }
    symbols[t] = id;
  }
  return { symbols, alphabetSize: ids.size };
}

describe('informationMoments', () => {
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

  test('the constructed law p(k) ~ 1/(k log^3 k) has information of infinite variance', () => {
    // Partial sums S(K) = sum_{k<=K} p(k) log^2 p(k) grow without bound: p(k) ~ 2 (ln 2)^2 / (k ln^3 k)
    // and -log p(k) ~ ln k, so the terms behave like 2 (ln 2)^2 / (k ln k), whose sum diverges like
    // 2 (ln 2)^2 ln ln K (integral test). Check the growth between K = 1e3 and 1e6 against that.
    const p = (k: number): number => Math.LN2 ** 2 * (1 / Math.log(k) ** 2 - 1 / Math.log(k + 1) ** 2);
    let s = 0;
    let s3 = 0;
    for (let k = 2; k <= 1_000_000; k++) {
      const q = p(k);
      s += q * Math.log(q) ** 2;
      if (k === 1000) s3 = s;
    }
    const predicted = 2 * Math.LN2 ** 2 * Math.log(Math.log(1e6) / Math.log(1e3));
    expect(s - s3).toBeGreaterThan(0.8 * predicted);
  });

  test('the heavy-tail warning fires on that law at every size tried', () => {
    for (const N of [20_000, 200_000]) {
      const { symbols, alphabetSize } = heavyTokens(N, 7);
      const m = informationMoments(symbols, alphabetSize);
      expect(m?.heavyTail).toBe(true);
    }
  });

  test('a small alphabet has no singletons and no warning; moments are exact sums over symbols', () => {
    const seq = iidSource([0.6, 0.4]).generate(10_000, 1);
    const m = informationMoments(seq.symbols, 2);
    expect(m?.seenOnce).toBe(0);
    expect(m?.heavyTail).toBe(false);
    const p = (seq.counts[0] ?? Number.NaN) / 10_000;
    const i0 = -Math.log(p);
    const i1 = -Math.log(1 - p);
    expect(m?.raw[2]).toBeCloseTo(p * i0 ** 3 + (1 - p) * i1 ** 3, 12);
  });

  test('batch-means standard errors agree with the i.i.d. formula on i.i.d. data, for small and large alphabets', () => {
    // For independent positions the long-run variance of I^r is its plain variance, so the SE of the
    // mean is sqrt((E[I^2r] - E[I^r]^2) / N) (common practice, no source). With 32 batches the
    // batch-means SE has a relative error of about 1/sqrt(2 x 31) = 13%: allow 4 of those (50%).
    for (const [A, N] of [
      [3, 64_000],
      [5000, 640_000],
    ] as const) {
      const law = new Array<number>(A).fill(0).map((_, i) => (i + 1) / ((A * (A + 1)) / 2));
      const seq = iidSource(law).generate(N, 13);
      const m = informationMoments(seq.symbols, A);
      expect(m).not.toBeNull();
      if (m === null) continue;
      for (const r of [1, 2]) {
        // E[I^2r] from the same plug-in law (raw moments up to 4 are reported).
        const plainVar = (m.raw[2 * r - 1] ?? Number.NaN) - (m.raw[r - 1] ?? Number.NaN) ** 2;
        const iidSe = Math.sqrt(plainVar / N);
        expect(Math.abs((m.rawStandardError[r - 1] ?? Number.NaN) / iidSe - 1)).toBeLessThan(0.5);
      }
    }
  });
});
