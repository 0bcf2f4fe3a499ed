import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { uniformInt } from 'pure-rand/distribution/uniformInt';

/** I.i.d. uniform symbols 0..alphabet-1 from a fixed seed (pure-rand xoroshiro128+). */
export function randomSymbols(N: number, alphabet: number, seed: number): Uint8Array {
  const rng = xoroshiro128plus(seed);
  const x = new Uint8Array(N);
  for (let i = 0; i < N; i++) x[i] = uniformInt(rng, 0, alphabet - 1);
  return x;
}

/** The two-state chain P = [[0.9, 0.1], [0.4, 0.6]] started in state 0 (small unit-test fixture). */
export function stickyChain(N: number, seed: number): Uint8Array {
  const rng = xoroshiro128plus(seed);
  const x = new Uint8Array(N);
  let s = 0;
  for (let i = 0; i < N; i++) {
    x[i] = s;
    const u = uniformFloat64(rng);
    s = s === 0 ? (u < 0.1 ? 1 : 0) : u < 0.4 ? 0 : 1;
  }
  return x;
}

/** Count of the k-block starting at every position, by a string tally (k = 0 gives N everywhere). */
export function blockCountsAt(x: Uint8Array, k: number): number[] {
  if (k === 0) return new Array<number>(x.length).fill(x.length);
  const keys: string[] = [];
  const tally = new Map<string, number>();
  for (let i = 0; i + k <= x.length; i++) {
    const key = Array.from(x.subarray(i, i + k)).join(',');
    keys.push(key);
    tally.set(key, (tally.get(key) ?? 0) + 1);
  }
  return keys.map((key) => tally.get(key)!);
}

/** Nearer-history return of every n-block position (0 = censored), from the definition in levelStats.ts. */
export function nearerReturns(x: Uint8Array, n: number): number[] {
  const M = x.length - n + 1;
  const half = Math.floor(M / 2);
  const same = (i: number, j: number): boolean => {
    for (let t = 0; t < n; t++) if (x[i + t] !== x[j + t]) return false;
    return true;
  };
  const out: number[] = [];
  for (let i = 0; i < M; i++) {
    let r = 0;
    if (i < half) {
      for (let j = i + 1; j < M && r === 0; j++) if (same(i, j)) r = j - i;
    } else {
      for (let j = i - 1; j >= 0 && r === 0; j--) if (same(i, j)) r = i - j;
    }
    out.push(r);
  }
  return out;
}

/** Least-squares slope by the textbook formula, for checks. */
export function slopeOf(xs: readonly number[], ys: readonly number[]): number {
  const xb = xs.reduce((s, v) => s + v, 0) / xs.length;
  const yb = ys.reduce((s, v) => s + v, 0) / ys.length;
  let sxy = 0;
  let sxx = 0;
  xs.forEach((v, i) => {
    sxy += (v - xb) * (ys[i]! - yb);
    sxx += (v - xb) ** 2;
  });
  return sxy / sxx;
}

/** Weighted batch-means standard error sqrt(a/(a-1) sum w^2 (v - vbar)^2) / sum w (Schmeiser 1982). */
export function batchStandardError(values: readonly number[], weights: readonly number[]): number {
  const a = values.length;
  const sw = weights.reduce((s, v) => s + v, 0);
  const vbar = values.reduce((s, v, g) => s + weights[g]! * v, 0) / sw;
  return Math.sqrt((a / (a - 1)) * values.reduce((s, v, g) => s + weights[g]! ** 2 * (v - vbar) ** 2, 0)) / sw;
}
