import { andersonDarlingNormal, type AndersonDarlingResult } from './andersonDarlingNormal';
import { kolmogorovSmirnovNormal, type KolmogorovSmirnovResult } from './kolmogorovSmirnovNormal';

/** Shown beside every p-value computed from return-time fluctuations. */
export const DEPENDENCE_CAVEAT =
  'Positions whose blocks overlap, or whose return windows overlap, give dependent values; both tests assume independent values, so these p-values are only indicative.';

/** Kolmogorov-Smirnov and Anderson-Darling tests of one sample against N(0,1). */
export interface NormalFitTests {
  readonly size: number;
  readonly kolmogorovSmirnov: KolmogorovSmirnovResult;
  readonly andersonDarling: AndersonDarlingResult;
  /** Plain-language warning that the p-values assume independence (DEPENDENCE_CAVEAT). */
  readonly caveat: string;
}

/**
 * Both goodness-of-fit tests of normalized fluctuations against N(0,1). The tests' null is an
 * i.i.d. sample; sampled return times are dependent, hence the caveat.
 * @param sample finite values (not modified), e.g. NormalizedFluctuations.values
 * @throws RangeError when the sample is empty or not finite
 */
export function normalFitTests(sample: ArrayLike<number>): NormalFitTests {
  const kolmogorovSmirnov = kolmogorovSmirnovNormal(sample);
  const andersonDarling = andersonDarlingNormal(sample);
  return { size: kolmogorovSmirnov.size, kolmogorovSmirnov, andersonDarling, caveat: DEPENDENCE_CAVEAT };
}
