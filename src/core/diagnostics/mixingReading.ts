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
  /** Fits over the leading gaps above the threshold. */
  readonly exponential: DecayFit | null;
  readonly power: DecayFit | null;
  /** Power law over the later of those gaps, floor removed (fitTailPowerDecay). */
  readonly tailPower: DecayFit | null;
  /** Symbols in one batch of the confidence intervals (the shortest), and the number of batches. */
  readonly batchLength: number;
  readonly intervalBatches: number;
  /** ACF lags outside the band, and the number expected by chance. */
  readonly acfOutside: number | null;
  readonly acfExpectedOutside: number | null;
}

/** Dependence counts as short against the interval batches when its range is at most this share of a batch. */
export const SHORT_AGAINST_BATCH = 0.1;

/** The exponential is clearly the better description when its residual SD on the log scale is below
 * this share of the power law's (and the other way round for the power law). */
const CLEARLY_BETTER = 0.5;

export const MIXING_CAVEAT =
  'A finite sample cannot prove mixing: these are estimates over the gaps tried, with a bias from the ' +
  'number of cells; dependence beyond the largest gap, or finer than the block length shows, is not seen.';

/**
 * The reading (our rule, stated). The limit theorems behind the Gaussian band assume mixing, in
 * practice exponential (phi- or beta-mixing with summable, often geometric, coefficients; Bradley,
 * Probab. Surveys 2 (2005), from memory); the batch-means intervals further need the dependence to be
 * short against the batches they use (Schmeiser, Oper. Res. 30 (1982)). So, with B = symbols per
 * interval batch:
 * - 'fast' when no gap shows dependence above the threshold; or the exponential fit is clearly the
 *   better one (residual SD below CLEARLY_BETTER of the power law's) and tau <= SHORT_AGAINST_BATCH
 *   x B (then beta at lag B is below e^-10 of its start);
 * - 'too-slow' when the power law on the later gaps, floor removed (fitTailPowerDecay), has rate
 *   p <= 1 and the exponential is not clearly better: the coefficients are not summable, which the
 *   central limit theorems for dependent data need, so the band may fail at every n;
 * - 'slow' when the power law is clearly the better fit with p > 1 on the later gaps (summable but
 *   slow; that beta then falls below the floor only says where N hides it, not where it ends);
 * - 'fast' when beta falls below the threshold by a gap k0 <= SHORT_AGAINST_BATCH x B and neither
 *   fit says otherwise;
 * - 'slow' otherwise when there is signal: an exponential whose tau is not short against B, or
 *   dependence still above the threshold at the last gap: the Gaussian band is approached slowly
 *   and coverage may fall short;
 * - 'unknown' when there are too few gaps above the noise to fit and beta never falls below it.
 * The earlier rule ('fast' only when 3 tau <= max(block lengths used, 10)) read the eight-state
 * demo chain (tau = 3.6, batches of 6144 symbols) as slow, though its decay is exactly what the
 * limit theorems assume; the block length bounds nothing about the dependence the batches face.
 */
export function mixingReading(f: MixingFacts): MixingReading {
  const B = f.batchLength;
  const shortRange = SHORT_AGAINST_BATCH * B;
  const batches = `the ${f.intervalBatches} batches of ${B} symbols the intervals use`;
  const exp = f.exponential;
  const pow = f.power;
  const tail = f.tailPower;
  const expTau = exp?.scale ?? null;
  const expClearlyBetter = exp !== null && expTau !== null && (pow === null || exp.residualSd < CLEARLY_BETTER * pow.residualSd);
  const tailRate = tail?.scale ?? null;
  const powerClearlyBetter = pow !== null && pow.scale !== null && (exp === null || pow.residualSd < CLEARLY_BETTER * exp.residualSd);
  const notSummable = !expClearlyBetter && tail !== null && (tailRate === null || tailRate <= 1);
  const acf =
    f.acfOutside !== null && f.acfExpectedOutside !== null && f.acfOutside > 2 * f.acfExpectedOutside + 2
      ? ` The information increments are correlated (${f.acfOutside} lags outside the band, about ${f.acfExpectedOutside.toFixed(1)} expected by chance), so their long-run variance differs from the plain variance.`
      : '';
  const tailWords = tail === null ? '' : ` over gaps ${tail.gapRange[0]} to ${tail.gapRange[1]} (noise floor removed)`;
  let verdict: MixingVerdict;
  let text: string;
  if (f.blockLength === 0) {
    verdict = 'unknown';
    text = 'The sequence is too short to estimate the dependence between blocks.';
  } else if (f.gapsAboveFloor === 0 && f.belowFloorFrom !== null) {
    verdict = 'fast';
    text = `No dependence between blocks of length ${f.blockLength} shows above the noise floor at any gap from ${f.gapRange[0]}: the mixing the limit theorems assume looks plausible, and dependence is far shorter than ${batches}.`;
  } else if (expClearlyBetter && expTau !== null && expTau <= shortRange) {
    verdict = 'fast';
    text = `beta(k) decays exponentially (tau = ${expTau.toFixed(1)} symbols), far shorter than ${batches}: the mixing the limit theorems assume looks plausible.`;
  } else if (notSummable) {
    verdict = 'too-slow';
    text = `beta(k) falls like a power law k^-${(tailRate ?? 0).toFixed(2)}${tailWords}, too slowly to be summable: too slow to trust the Gaussian band at these n.`;
  } else if (powerClearlyBetter && tailRate !== null) {
    verdict = 'slow';
    text = `beta(k) falls like a power law k^-${tailRate.toFixed(2)}${tailWords}: summable but slow, so the Gaussian band is approached slowly (${batches}); read its coverage with caution.`;
  } else if (f.belowFloorFrom !== null && f.belowFloorFrom <= shortRange) {
    verdict = 'fast';
    text = `beta(k) falls below its noise floor by gap ${f.belowFloorFrom}, far shorter than ${batches}: the mixing the limit theorems assume looks plausible.`;
  } else if (exp === null && pow === null && f.belowFloorFrom === null) {
    verdict = 'unknown';
    text = `Too few gaps with beta(k) above its noise floor to fit a decay, yet it does not fall below the floor by gap ${f.gapRange[1]}: the decay cannot be judged from these data.`;
  } else {
    verdict = 'slow';
    if (!expClearlyBetter && tailRate !== null) {
      text = `beta(k) falls like a power law k^-${tailRate.toFixed(2)}${tailWords}: summable but slow, so the Gaussian band is approached slowly (${batches}); read its coverage with caution.`;
    } else if (expTau !== null) {
      text = `beta(k) decays exponentially but with tau = ${expTau.toFixed(1)} symbols, not short against ${batches}: read the Gaussian band with caution.`;
    } else {
      text = `beta(k) still stands above its noise floor at gap ${f.belowFloorFrom ?? f.gapRange[1]}, not short against ${batches}: read the Gaussian band with caution.`;
    }
  }
  return { verdict, text: text + acf, caveat: MIXING_CAVEAT };
}
