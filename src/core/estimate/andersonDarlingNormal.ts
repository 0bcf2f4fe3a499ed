import normalCdf from '@stdlib/stats-base-dists-normal-cdf';
import { andersonDarlingPValue } from './andersonDarlingPValue';
import { sortedFinite } from './sortedFinite';

/** Anderson-Darling test of a sample against the fully specified N(0,1). */
export interface AndersonDarlingResult {
  /** A^2. */
  readonly statistic: number;
  /** P(A_m^2 >= A^2) for an i.i.d. N(0,1) sample (Marsaglia & Marsaglia 2004). */
  readonly pValue: number;
  /** Sample size m. */
  readonly size: number;
}

/**
 * Anderson-Darling statistic against N(0,1), nothing estimated from the data:
 * A^2 = -m - (1/m) sum_i (2i - 1) [log Phi(x_(i)) + log(1 - Phi(x_(m+1-i)))]
 * (Anderson & Darling, J. Am. Stat. Assoc. 49 (1954) 765-769; the form used by Marsaglia &
 * Marsaglia, J. Stat. Softw. 9(2) (2004)). 1 - Phi(x) is taken as Phi(-x) so that the upper tail
 * keeps its digits. A value so extreme that Phi underflows to 0 gives A^2 = Infinity, p = 0.
 * @param sample finite values (not modified)
 * @throws RangeError when the sample is empty or not finite
 */
export function andersonDarlingNormal(sample: ArrayLike<number>): AndersonDarlingResult {
  const x = sortedFinite(sample);
  const m = x.length;
  let sum = 0;
  for (let i = 0; i < m; i++) {
    sum += (2 * i + 1) * (Math.log(normalCdf(x[i], 0, 1)) + Math.log(normalCdf(-x[m - 1 - i], 0, 1)));
  }
  const statistic = -m - sum / m;
  return { statistic, pValue: andersonDarlingPValue(statistic, m), size: m };
}
