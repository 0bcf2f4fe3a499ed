import type { SymbolArray } from '../sequence/sequence';

/** Largest count table for the k-blocks (entries); larger k is lowered to fit. */
export const MAX_INFORMATION_TABLE = 1 << 22;
/** At most this many positions enter the autocorrelation; longer sequences use evenly spaced segments.
 * 2^18 (was 2^19) keeps the diagnostics under about 10% of an analysis at N = 1e6; the white-noise
 * band is then +-0.0038 instead of +-0.0027. */
export const MAX_ACF_POSITIONS = 1 << 18;
/** Number of evenly spaced contiguous segments when the sequence is longer than MAX_ACF_POSITIONS. */
export const ACF_SEGMENTS = 8;
/** Largest lag. */
export const MAX_ACF_LAG = 50;
/** Two-sided 97.5% standard normal quantile (THEORY.md section 5). */
const Z975 = 1.959963984540054;

/** Autocorrelation of the information increments. */
export interface InformationAutocorrelation {
  /** Block length k of the conditional information (conditioning on the k - 1 symbols before). */
  readonly order: number;
  /** Lags 1..L. */
  readonly lags: readonly number[];
  /** Sample autocorrelation at each lag. */
  readonly acf: readonly number[];
  /** Half-width of the white-noise band, 1.96 / sqrt(n). */
  readonly band: number;
  /** Positions used (n). */
  readonly positions: number;
  /** Contiguous segments the positions come from. */
  readonly segments: number;
  /** Mean of the increments (nats): the plug-in conditional entropy over the positions used. */
  readonly meanNats: number;
  /** Lags outside the band, and how many a white-noise sequence would put there (5% of the lags). */
  readonly outside: number;
  readonly expectedOutside: number;
}

/** Largest k' <= k with A^k' <= MAX_INFORMATION_TABLE (at least 1). */
export function informationOrderFor(alphabetSize: number, k: number): number {
  let order = Math.max(1, k);
  while (order > 1 && Math.pow(alphabetSize, order) > MAX_INFORMATION_TABLE) order--;
  return order;
}

/**
 * Sample autocorrelation function of the information increments
 * Y_p = log c_{k-1}(p) - log c_k(p) = -log p^(x_{p+k-1} | x_p..x_{p+k-2}), the per-position plug-in
 * conditional information at block length k (the same Y whose long-run variance is sigma^2 in
 * informationVariance.ts; counts over the whole sequence, c_0 = N). The centred ACF
 * r(l) = sum_t d_t d_{t+l} / sum_t d_t^2 (d = Y - mean, sums within segments, divisor n at every lag)
 * with the white-noise band +-1.96/sqrt(n) (Bartlett's formula; Box & Jenkins, Time Series
 * Analysis, 1970, from memory). If the increments were independent, about 5% of the lags would fall
 * outside the band by chance.
 * Cost: one counting pass over N, then at most MAX_ACF_POSITIONS x MAX_ACF_LAG products.
 * @param k block length (>= 1); lowered so that A^k fits MAX_INFORMATION_TABLE
 */
export function informationAutocorrelation(
  symbols: SymbolArray,
  alphabetSize: number,
  k: number,
  maxLag = MAX_ACF_LAG,
): InformationAutocorrelation | null {
  const N = symbols.length;
  if (!Number.isInteger(k) || k < 1) throw new RangeError(`k must be an integer >= 1; got ${k}`);
  const order = informationOrderFor(alphabetSize, k);
  const P = N - order + 1;
  if (P < 16) return null;
  const A = alphabetSize;
  const size = Math.pow(A, order);
  const high = (size / A) | 0;
  const countK = new Float64Array(size);
  let code = 0;
  for (let j = 0; j < order - 1; j++) code = code * A + symbols[j];
  for (let p = 0; p < P; p++) {
    code = ((code % high) * A + symbols[p + order - 1]) | 0;
    countK[code]++;
  }
  // (k-1)-block counts over N - k + 2 positions: prefixes of the k-blocks plus the last (k-1)-block.
  const countPrefix = new Float64Array(high);
  for (let c = 0; c < size; c++) countPrefix[Math.floor(c / A)] += countK[c];
  if (order > 1) {
    let last = 0;
    for (let j = N - order + 1; j < N; j++) last = last * A + symbols[j];
    countPrefix[last]++;
  } else {
    countPrefix[0] = N;
  }
  const segments = P > MAX_ACF_POSITIONS ? ACF_SEGMENTS : 1;
  const segmentLength = Math.min(P, Math.floor(MAX_ACF_POSITIONS / segments));
  const n = segments * segmentLength;
  const lagCount = Math.max(1, Math.min(maxLag, Math.floor(segmentLength / 4)));
  const y = new Float64Array(n);
  // Logs of the counts once per table entry rather than twice per position.
  const logK = new Float64Array(size);
  for (let c = 0; c < size; c++) logK[c] = countK[c] > 0 ? Math.log(countK[c]) : 0;
  const logPrefix = new Float64Array(high);
  for (let c = 0; c < high; c++) logPrefix[c] = countPrefix[c] > 0 ? Math.log(countPrefix[c]) : 0;
  for (let s = 0; s < segments; s++) {
    const start = segments === 1 ? 0 : Math.floor((s * (P - segmentLength)) / (segments - 1));
    let c = 0;
    for (let j = 0; j < order - 1; j++) c = c * A + symbols[start + j];
    for (let i = 0; i < segmentLength; i++) {
      c = (c % high) * A + symbols[start + i + order - 1];
      y[s * segmentLength + i] = logPrefix[Math.floor(c / A)] - logK[c];
    }
  }
  let mean = 0;
  for (let i = 0; i < n; i++) mean += y[i];
  mean /= n;
  let c0 = 0;
  for (let i = 0; i < n; i++) {
    y[i] -= mean;
    c0 += y[i] * y[i];
  }
  const lags: number[] = [];
  const acf: number[] = [];
  const band = Z975 / Math.sqrt(n);
  let outside = 0;
  // Four lags per pass over y (each y[i] read once for all four): the same sums, less memory traffic.
  const sums = new Float64Array(lagCount + 4);
  for (let l = 1; l <= lagCount; l += 4) {
    let s0 = 0;
    let s1 = 0;
    let s2 = 0;
    let s3 = 0;
    for (let s = 0; s < segments; s++) {
      const base = s * segmentLength;
      const end = base + segmentLength;
      // Positions where all four lags stay inside the segment, then the tail lag by lag.
      const full = end - (l + 3);
      let i = base;
      for (; i < full; i++) {
        const v = y[i];
        s0 += v * y[i + l];
        s1 += v * y[i + l + 1];
        s2 += v * y[i + l + 2];
        s3 += v * y[i + l + 3];
      }
      for (; i < end - l; i++) {
        const v = y[i];
        s0 += v * y[i + l];
        if (i + l + 1 < end) s1 += v * y[i + l + 1];
        if (i + l + 2 < end) s2 += v * y[i + l + 2];
      }
    }
    sums[l] = s0;
    sums[l + 1] = s1;
    sums[l + 2] = s2;
    sums[l + 3] = s3;
  }
  for (let l = 1; l <= lagCount; l++) {
    const r = c0 > 0 ? sums[l] / c0 : 0;
    lags.push(l);
    acf.push(r);
    if (Math.abs(r) > band) outside++;
  }
  return { order, lags, acf, band, positions: n, segments, meanNats: mean, outside, expectedOutside: 0.05 * lagCount };
}
