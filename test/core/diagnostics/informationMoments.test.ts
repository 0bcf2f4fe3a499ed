import { describe, expect, test } from 'vitest';
import { informationMoments } from '../../../src/core/diagnostics/informationMoments';
import { iidSource } from '../../../src/core/sources/iidSource';
import { uniformStream } from '../../../src/core/sources/seededRandom';

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
