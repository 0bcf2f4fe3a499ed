import normalCdf from '@stdlib/stats-base-dists-normal-cdf';
import { kolmogorovSmirnovPValue, type KolmogorovMethod } from './kolmogorovSmirnovPValue';
import { sortedFinite } from './sortedFinite';

/** One-sample Kolmogorov-Smirnov test of a sample against N(0,1). */
export interface KolmogorovSmirnovResult {
  /** D = sup_x |F_m(x) - Phi(x)|. */
  readonly statistic: number;
  /** Two-sided p-value, P(D_m >= D) for an i.i.d. N(0,1) sample. */
  readonly pValue: number;
  readonly method: KolmogorovMethod;
  /** Sample size m. */
  readonly size: number;
}

/**
 * Kolmogorov-Smirnov statistic of a sample against the fully specified N(0,1):
 * D = max_i max(i/m - Phi(x_(i)), Phi(x_(i)) - (i-1)/m) over the order statistics, with the
 * p-value of kolmogorovSmirnovPValue (Marsaglia, Tsang & Wang 2003).
 * @param sample finite values (not modified)
 * @throws RangeError when the sample is empty or not finite
 */
export function kolmogorovSmirnovNormal(sample: ArrayLike<number>): KolmogorovSmirnovResult {
  const x = sortedFinite(sample);
  const m = x.length;
  let d = 0;
  for (let i = 0; i < m; i++) {
    const f = normalCdf(x[i], 0, 1);
    d = Math.max(d, (i + 1) / m - f, f - i / m);
  }
  const { pValue, method } = kolmogorovSmirnovPValue(d, m);
  return { statistic: d, pValue, method, size: m };
}
