import type { DecayFit } from './decayFits';

/** How the estimated dependence compares with the block lengths the analysis uses. */
export type MixingVerdict = 'fast' | 'slow' | 'too-slow' | 'unknown';

/** The reading in plain words. */
export interface MixingReading {
  readonly verdict: MixingVerdict;
  /** One or two plain sentences. */
  readonly text: string;
  /** Always shown: what a finite sample cannot show. */
  readonly caveat: string;
}

/** Facts the reading is drawn from. */
export interface MixingFacts {
  /** Block length m of the beta estimate, gaps tried [first, last]. */
  readonly blockLength: number;
  readonly gapRange: readonly [number, number];
  /** Number of leading gaps where beta is above its signal threshold (SIGNAL_FACTOR x noise floor). */
  readonly gapsAboveFloor: number;
  /** First gap at which beta falls below the threshold, or null when it never does. */
  readonly belowFloorFrom: number | null;
  readonly exponential: DecayFit | null;
  readonly power: DecayFit | null;
  /** Top of the block lengths the estimate uses (trusted range or plug-in order). */
  readonly blockLengthsUsed: number;
  /** ACF lags outside the band, and the number expected by chance. */
  readonly acfOutside: number | null;
  readonly acfExpectedOutside: number | null;
}

/** Dependence that is gone within this many symbols counts as short-range even when n is smaller. */
export const SHORT_RANGE_GAP = 10;

/** The power law describes beta better when its residual SD on the log scale is this much smaller. */
const PREFER_POWER = 0.8;

export const MIXING_CAVEAT =
  'A finite sample cannot prove mixing: these are estimates over the gaps tried, with a bias from the ' +
  'number of cells; dependence beyond the largest gap, or finer than the block length shows, is not seen.';

/**
 * The reading (our rule, stated):
 * - 'fast' when beta falls below its noise threshold within the reach L = max(block lengths the
 *   analysis uses, SHORT_RANGE_GAP) (belowFloorFrom <= L), or the exponential fit is the better one
 *   and 3 tau <= L: by then the dependence is e^-3 of its start, so blocks that far apart are
 *   nearly independent;
 * - 'too-slow' when the power law is the better fit with rate p <= 1: the coefficients are not
 *   summable, which the central limit theorems for dependent data need (Bradley, Probab. Surveys 2
 *   (2005), from memory), so the Gaussian band may fail at every n;
 * - 'slow' otherwise when there is signal (decay, but beyond the block lengths used, or a power law
 *   with p > 1): the Gaussian band is approached slowly and coverage may fall short;
 * - 'unknown' when there are too few gaps above the noise to fit and beta never falls below it.
 */
export function mixingReading(f: MixingFacts): MixingReading {
  const n = f.blockLengthsUsed;
  const reach = Math.max(n, SHORT_RANGE_GAP);
  const exp = f.exponential;
  const pow = f.power;
  const powerBetter = pow !== null && pow.scale !== null && (exp === null || pow.residualSd < PREFER_POWER * exp.residualSd);
  const rate = pow?.scale ?? 0;
  const acf =
    f.acfOutside !== null && f.acfExpectedOutside !== null && f.acfOutside > 2 * f.acfExpectedOutside + 2
      ? ` The information increments are correlated (${f.acfOutside} lags outside the band, about ${f.acfExpectedOutside.toFixed(1)} expected by chance), so their long-run variance differs from the plain variance.`
      : '';
  let verdict: MixingVerdict;
  let text: string;
  if (f.blockLength === 0) {
    verdict = 'unknown';
    text = 'The sequence is too short to estimate the dependence between blocks.';
  } else if (f.gapsAboveFloor === 0 && f.belowFloorFrom !== null) {
    verdict = 'fast';
    text = `No dependence between blocks of length ${f.blockLength} shows above the noise floor at any gap from ${f.gapRange[0]}: dependence decays fast enough for the Gaussian band at these n (up to ${n}).`;
  } else if (powerBetter && rate <= 1) {
    verdict = 'too-slow';
    text = `beta(k) falls like a power law k^-${rate.toFixed(2)}, too slowly to be summable: too slow to trust the Gaussian band at these n.`;
  } else if (f.belowFloorFrom !== null && f.belowFloorFrom <= reach) {
    verdict = 'fast';
    text = `beta(k) falls below its noise floor by gap ${f.belowFloorFrom}, a short range (block lengths used up to ${n}): dependence decays fast enough for the Gaussian band at these n.`;
  } else if (!powerBetter && exp !== null && exp.scale !== null && 3 * exp.scale <= reach) {
    verdict = 'fast';
    text = `beta(k) decays exponentially with tau = ${exp.scale.toFixed(2)} symbols, a short range (block lengths used up to ${n}): dependence decays fast enough for the Gaussian band at these n.`;
  } else if (exp === null && pow === null && f.belowFloorFrom === null) {
    verdict = 'unknown';
    text = `Too few gaps with beta(k) above its noise floor to fit a decay, yet it does not fall below the floor by gap ${f.gapRange[1]}: the decay cannot be judged from these data.`;
  } else {
    verdict = 'slow';
    text = powerBetter
      ? `beta(k) falls like a power law k^-${rate.toFixed(2)}: summable but slow, so the Gaussian band is approached slowly at these n (up to ${n}); read its coverage with caution.`
      : `beta(k) still stands above its noise floor at gap ${f.belowFloorFrom ?? f.gapRange[1]}, beyond the block lengths used (up to ${n}): dependence decays slowly for these n; read the Gaussian band with caution.`;
  }
  return { verdict, text: text + acf, caveat: MIXING_CAVEAT };
}
