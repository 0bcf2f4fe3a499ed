/**
 * The gap law of the renewal source: gaps T >= 1 between successive 1s with P(T >= m) = m^-alpha
 * (a discrete Pareto law; the run of 0s before each 1 has length L = T - 1). Mean and entropy of T
 * are sums over all m, evaluated as a direct sum up to M plus an Euler-Maclaurin tail (Abramowitz &
 * Stegun 23.1.30, from memory), accurate to about 1e-15 relative.
 */

/** Terms summed directly before the Euler-Maclaurin tail takes over. */
const DIRECT_TERMS = 4096;
/** Simpson panels for the tail integral on a logarithmic scale. */
const TAIL_PANELS = 4000;

/** Checks the tail exponent alpha of the gap law: finite, 1 < alpha <= 100. */
export function checkTailExponent(alpha: number): void {
  if (!Number.isFinite(alpha) || !(alpha > 1) || alpha > 100) {
    throw new RangeError(`tail exponent must be a number in (1, 100], got ${alpha}`);
  }
}

/** P(T = m) = m^-alpha - (m+1)^-alpha, without cancellation for large m; m may be real (for the tail). */
export function renewalGapProbability(alpha: number, m: number): number {
  return -Math.pow(m, -alpha) * Math.expm1(-alpha * Math.log1p(1 / m));
}

/** Neumaier's compensated sum (Neumaier 1974, from memory). */
class CompensatedSum {
  private sum = 0;
  private carry = 0;
  add(x: number): void {
    const t = this.sum + x;
    this.carry += Math.abs(this.sum) >= Math.abs(x) ? this.sum - t + x : x - t + this.sum;
    this.sum = t;
  }
  value(): number {
    return this.sum + this.carry;
  }
}

/**
 * E[T] = sum_{m>=1} m^-alpha = zeta(alpha): the mean distance between successive 1s.
 * @throws RangeError unless 1 < alpha <= 100
 */
export function renewalMeanGap(alpha: number): number {
  checkTailExponent(alpha);
  const sum = new CompensatedSum();
  for (let m = DIRECT_TERMS - 1; m >= 1; m--) sum.add(Math.pow(m, -alpha));
  const big = DIRECT_TERMS;
  // Euler-Maclaurin for f(x) = x^-alpha: integral + f/2 - f'/12 + f'''/720 at x = M.
  sum.add(Math.pow(big, 1 - alpha) / (alpha - 1));
  sum.add(Math.pow(big, -alpha) / 2);
  sum.add((alpha * Math.pow(big, -alpha - 1)) / 12);
  sum.add((-alpha * (alpha + 1) * (alpha + 2) * Math.pow(big, -alpha - 3)) / 720);
  return sum.value();
}

function entropyTerm(alpha: number, m: number): number {
  const p = renewalGapProbability(alpha, m);
  return p > 0 ? -p * Math.log(p) : 0;
}

/**
 * H(T) = -sum_m P(T = m) log P(T = m), nats.
 * @throws RangeError unless 1 < alpha <= 100
 */
export function renewalGapEntropy(alpha: number): number {
  checkTailExponent(alpha);
  const sum = new CompensatedSum();
  for (let m = DIRECT_TERMS - 1; m >= 1; m--) sum.add(entropyTerm(alpha, m));
  const big = DIRECT_TERMS;
  // Tail integral of f from M to infinity with x = M e^y, by Simpson's rule on y in [0, Y]; the
  // integrand decays like e^(-alpha y), so Y = 80/alpha leaves less than e^-80 of it.
  const yMax = 80 / alpha;
  const h = yMax / TAIL_PANELS;
  let integral = 0;
  for (let k = 0; k <= TAIL_PANELS; k++) {
    const x = big * Math.exp(k * h);
    const weight = k === 0 || k === TAIL_PANELS ? 1 : k % 2 === 1 ? 4 : 2;
    integral += weight * entropyTerm(alpha, x) * x;
  }
  sum.add((integral * h) / 3);
  sum.add(entropyTerm(alpha, big) / 2);
  // f'(M) by a central difference; the term is about f(M) / M, so its error is negligible.
  sum.add(-(entropyTerm(alpha, big + 1) - entropyTerm(alpha, big - 1)) / 2 / 12);
  return sum.value();
}

/**
 * Entropy rate of the stationary renewal process, nats per symbol: h = H(T) / E[T]. The 1s form an
 * induced (return-time) system whose entropy is H(T) (the gaps are i.i.d.), and Abramov's formula
 * divides by the mean return time (Abramov 1959, from memory).
 * @throws RangeError unless 1 < alpha <= 100
 */
export function renewalEntropyRate(alpha: number): number {
  return renewalGapEntropy(alpha) / renewalMeanGap(alpha);
}

/** Smallest tail exponent for which renewalInformationVariance is claimed: below it the tail integral
 * e^{-(alpha-2) y} would need y beyond what doubles reach (x = M e^y < 1e300) to fall below e^-68. */
export const VARIANCE_ALPHA_MIN = 2.1;

/**
 * sigma^2 of the stationary renewal process, nats^2 per symbol:
 * sigma^2 = E[(Y - h T)^2] / E[T] with Y = -log P(T) the information of one gap, h = E[Y]/E[T].
 * The information of a long stretch is, up to boundary terms, the sum of Y over its gaps, a
 * renewal-reward process; its central limit theorem has exactly this variance when E[T^2] is finite
 * (alpha > 2) (Smith 1955, renewal-reward CLT; see Asmussen, Applied Probability and Queues, 2003,
 * VI.3, from memory). Evaluated like renewalGapEntropy: direct sum to M plus a Simpson tail integral
 * on a logarithmic scale and Euler-Maclaurin end corrections.
 * @returns null for alpha < VARIANCE_ALPHA_MIN (the gap variance is infinite for alpha <= 2, and the
 * tail converges too slowly to evaluate just above 2)
 */
export function renewalInformationVariance(alpha: number): number | null {
  checkTailExponent(alpha);
  if (alpha < VARIANCE_ALPHA_MIN) return null;
  const h = renewalEntropyRate(alpha);
  const term = (m: number): number => {
    const p = renewalGapProbability(alpha, m);
    if (!(p > 0)) return 0;
    const d = -Math.log(p) - h * m;
    return p * d * d;
  };
  const sum = new CompensatedSum();
  for (let m = DIRECT_TERMS - 1; m >= 1; m--) sum.add(term(m));
  const big = DIRECT_TERMS;
  // x f(x) decays like e^{-(alpha-2) y} with x = M e^y; stop where that is below e^-68.
  const yMax = Math.min(68 / (alpha - 2), 680);
  const panels = 2 * Math.ceil((TAIL_PANELS * yMax) / 80 / 2);
  const step = yMax / panels;
  let integral = 0;
  for (let k = 0; k <= panels; k++) {
    const x = big * Math.exp(k * step);
    const weight = k === 0 || k === panels ? 1 : k % 2 === 1 ? 4 : 2;
    integral += weight * term(x) * x;
  }
  sum.add((integral * step) / 3);
  sum.add(term(big) / 2);
  sum.add(-(term(big + 1) - term(big - 1)) / 2 / 12);
  return sum.value() / renewalMeanGap(alpha);
}
