/** How a Kolmogorov-Smirnov p-value was computed. */
export type KolmogorovMethod = 'exact' | 'tail' | 'asymptotic';

/** A two-sided one-sample Kolmogorov-Smirnov p-value, P(D_n >= d) under the null. */
export interface KolmogorovPValue {
  readonly pValue: number;
  /**
   * 'exact': Marsaglia, Tsang & Wang's matrix method; 'tail': their closed-form right tail
   * (n d^2 large); 'asymptotic': Kolmogorov's limit law at Stephens' corrected argument.
   */
  readonly method: KolmogorovMethod;
}

/**
 * Largest k = floor(n d) + 1 for which the exact matrix method runs: its cost grows like
 * (2k - 1)^3 log n. k <= 100 covers every n below about 2600 (outside the closed-form tail,
 * k - 1 < n d <= sqrt(3.76 n)); above that the asymptotic form is accurate to about 1e-4.
 */
const EXACT_MAX_K = 100;
const SCALE = 1e140;
const INV_SCALE = 1e-140;
const SCALE_EXPONENT = 140;

/**
 * Survival function of Kolmogorov's limit law, P(K > x) for K = sup |Brownian bridge|:
 * 2 sum_{k>=1} (-1)^{k-1} exp(-2 k^2 x^2) for x >= 1, and 1 - (sqrt(2 pi)/x) sum_{k>=1}
 * exp(-(2k-1)^2 pi^2 / (8 x^2)) below (the two classical series, Kolmogorov 1933; both in
 * Marsaglia, Tsang & Wang, J. Stat. Softw. 8(18) (2003), section 1). Each converges to double
 * precision in a few terms on its side of x = 1.
 */
export function kolmogorovLimitSurvival(x: number): number {
  if (Number.isNaN(x)) throw new RangeError(`x must be a number; got ${x}`);
  if (x <= 0) return 1;
  if (x >= 1) {
    let sum = 0;
    for (let k = 1; k <= 100; k++) {
      const term = Math.exp(-2 * k * k * x * x);
      sum += k % 2 === 1 ? term : -term;
      if (term < 1e-17) break;
    }
    return Math.min(1, 2 * sum);
  }
  const c = (Math.PI * Math.PI) / (8 * x * x);
  let sum = 0;
  for (let k = 1; k <= 100; k++) {
    const j = 2 * k - 1;
    const term = Math.exp(-j * j * c);
    sum += term;
    if (term < 1e-17 * sum) break;
  }
  return Math.max(0, 1 - (Math.sqrt(2 * Math.PI) / x) * sum);
}

/** out = a * b for m x m row-major matrices. */
function multiply(a: Float64Array, b: Float64Array, m: number, out: Float64Array): void {
  for (let i = 0; i < m; i++) {
    for (let j = 0; j < m; j++) {
      let s = 0;
      for (let k = 0; k < m; k++) s += a[i * m + k] * b[k * m + j];
      out[i * m + j] = s;
    }
  }
}

/**
 * H^power with a separate decimal exponent, rescaling by 1e-140 when the centre entry grows past
 * 1e140 (the scheme of Marsaglia, Tsang & Wang 2003, function mPower). Returns [matrix, exponent].
 */
function matrixPower(h: Float64Array, m: number, power: number): [Float64Array, number] {
  if (power === 1) return [h.slice(), 0];
  const [half, halfExp] = matrixPower(h, m, Math.floor(power / 2));
  let v = new Float64Array(m * m);
  multiply(half, half, m, v);
  let e = 2 * halfExp;
  if (power % 2 === 1) {
    const w = new Float64Array(m * m);
    multiply(h, v, m, w);
    v = w;
  }
  const centre = Math.floor(m / 2) * m + Math.floor(m / 2);
  if (v[centre] > SCALE) {
    for (let i = 0; i < m * m; i++) v[i] *= INV_SCALE;
    e += SCALE_EXPONENT;
  }
  return [v, e];
}

/**
 * P(D_n < d) by Marsaglia, Tsang & Wang, "Evaluating Kolmogorov's distribution", J. Stat. Softw.
 * 8(18) (2003): the (k-1, k-1) entry of the n-th power of a (2k-1)-square matrix times n!/n^n,
 * with k = floor(n d) + 1 (Durbin's matrix formulation), accurate to about 13 digits.
 */
function exactCdf(d: number, n: number): number {
  const k = Math.floor(n * d) + 1;
  const m = 2 * k - 1;
  const hh = k - n * d;
  const h = new Float64Array(m * m);
  for (let i = 0; i < m; i++) {
    for (let j = 0; j < m; j++) h[i * m + j] = i - j + 1 < 0 ? 0 : 1;
  }
  for (let i = 0; i < m; i++) {
    h[i * m] -= Math.pow(hh, i + 1);
    h[(m - 1) * m + i] -= Math.pow(hh, m - i);
  }
  h[(m - 1) * m] += 2 * hh - 1 > 0 ? Math.pow(2 * hh - 1, m) : 0;
  for (let i = 0; i < m; i++) {
    for (let j = 0; j < m; j++) {
      if (i - j + 1 > 0) {
        for (let g = 1; g <= i - j + 1; g++) h[i * m + j] /= g;
      }
    }
  }
  const [q, qExp] = matrixPower(h, m, n);
  let s = q[(k - 1) * m + (k - 1)];
  let e = qExp;
  for (let i = 1; i <= n; i++) {
    s = (s * i) / n;
    if (s < INV_SCALE) {
      s *= SCALE;
      e -= SCALE_EXPONENT;
    }
  }
  return s * Math.pow(10, e);
}

/**
 * Two-sided p-value P(D_n >= d) of the one-sample Kolmogorov-Smirnov statistic for a continuous,
 * fully specified null.
 * - When n d^2 > 7.24, or n d^2 > 3.76 with n > 99: the closed-form right tail
 *   2 exp(-(2.000071 + 0.331/sqrt(n) + 1.409/n) n d^2) given by Marsaglia, Tsang & Wang (2003)
 *   for that region (7-digit accuracy there, and no cancellation for tiny p).
 * - Else when k = floor(n d) + 1 <= 100: their exact matrix method.
 * - Else (only for n above about 2600): Kolmogorov's limit law at Stephens' argument
 *   (sqrt(n) + 0.12 + 0.11/sqrt(n)) d (Stephens, J. R. Stat. Soc. B 32 (1970) 115-122, from
 *   memory; also Numerical Recipes, 3rd ed., section 14.3.3).
 * @param d the statistic, sup |F_n - F|
 * @param n sample size (positive integer)
 */
export function kolmogorovSmirnovPValue(d: number, n: number): KolmogorovPValue {
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`n must be a positive integer; got ${n}`);
  if (!(d >= 0 && d <= 1)) throw new RangeError(`d must be in [0, 1]; got ${d}`);
  if (d <= 0.5 / n) return { pValue: 1, method: 'exact' }; // D_n >= 1/(2n) always
  if (d >= 1) return { pValue: 0, method: 'exact' };
  const s = d * d * n;
  if (s > 7.24 || (s > 3.76 && n > 99)) {
    const p = 2 * Math.exp(-(2.000071 + 0.331 / Math.sqrt(n) + 1.409 / n) * s);
    return { pValue: Math.min(1, Math.max(0, p)), method: 'tail' };
  }
  if (Math.floor(n * d) + 1 <= EXACT_MAX_K) {
    const p = 1 - exactCdf(d, n);
    return { pValue: Math.min(1, Math.max(0, p)), method: 'exact' };
  }
  const root = Math.sqrt(n);
  return { pValue: kolmogorovLimitSurvival((root + 0.12 + 0.11 / root) * d), method: 'asymptotic' };
}
