import type { AnalysisWarning } from '../result/analysisResult';
import type { EstimatorResult } from './estimatorResult';
import type { PluginConditionalResult } from './pluginConditional';

/** Methods that can give the headline entropy rate. */
export type EntropyMethod = 'return-slope' | 'plugin-conditional' | 'return-mean' | 'match-length' | 'none';

export interface HeadlineChoice {
  readonly method: EntropyMethod;
  readonly reason: string;
  readonly warnings: readonly AnalysisWarning[];
}

export interface HeadlineCandidates {
  readonly returnSlope: EstimatorResult;
  readonly pluginConditional: PluginConditionalResult;
  readonly returnMean: EstimatorResult;
  readonly matchLength: EstimatorResult;
  /** sigma^2 is negligible at the trusted n (see analyze.ts): the information does not fluctuate at
   * scale sqrt(n). */
  readonly sigma2Negligible?: boolean;
}

/** Two estimates differ by more than `z` standard errors of their difference (errors taken as independent). */
function disagree(a: EstimatorResult, b: EstimatorResult, z: number): boolean {
  if (a.estimate === null || b.estimate === null || a.standardError === null || b.standardError === null) return false;
  const se = Math.hypot(a.standardError, b.standardError);
  return Math.abs(a.estimate - b.estimate) > z * se;
}

const fmt = (x: number): string => x.toPrecision(4);

/** Smallest bottom of the slope's range at which its offset drift counts as settled (see rule 2). */
export const SETTLED_FROM = 4;
/** Drift of E log R_n - n h per level below SETTLED_FROM, nats: fair coin, (-0.440413 + 0.185313)/3
 * from THEORY.md section 3's exact table. */
export const EARLY_SLOPE_DRIFT = 0.085;
/** A plug-in whose last step is below this share of its standard error has a negligible memory bias
 * (rule 2): a bias of b standard errors lowers the coverage of a 95% interval from 0.950 to 0.944 at
 * b = 0.25 and 0.921 at b = 0.5 (normal tails, common practice, no source); the remaining bias of
 * geometrically shrinking steps is a small multiple of the last step, so a quarter keeps it near 0.5. */
export const NEGLIGIBLE_STEP_SHARE = 0.25;

/**
 * Picks the least-biased entropy-rate estimate for these data, by a stated rule.
 *
 * Each method's bias has a known shape. The return-time slope carries the drift of the offset
 * E log R_n - n h, which decays geometrically in n (Kim 2012) but can still be large at the n a
 * given length allows (sticky chains: THEORY.md section 1); nothing inside the return data reveals
 * a drift that is straight in n. The plug-in conditional entropy h_k is biased upward by memory
 * longer than k-1 (h_k decreases to h) and downward by undersampling, which the well-sampled rule
 * and Miller-Madow keep small; its model bias is visible in the data as a non-zero step
 * h_(k-1) - h_k. So:
 * 1. if the conditional entropies have reached a plateau (last step within two standard errors of
 *    zero, k >= 2), the plug-in h_k has no visible bias of either kind and is the headline;
 * 2. otherwise the return-time slope (the default) is the headline, its bias vanishing
 *    exponentially in n while the plug-in's memory bias is seen to persist; but when that bias is
 *    visible yet small against the plug-in's own error (last step below NEGLIGIBLE_STEP_SHARE of its
 *    standard error) and the slope lies below the plug-in by more than two standard errors of their
 *    difference, the plug-in stays the headline: its interval is hardly shifted, while the slope
 *    carries an offset that has not settled over the few n the data allow (renewal chains with
 *    polynomial mixing; the coverage study in DEVELOPERS.md shows both sides of this rule); and when the slope's
 *    range starts below n = SETTLED_FROM the offset is still drifting fast (for a fair coin
 *    E log R_n - n h moves by -0.085 per level between n = 1 and 4, THEORY.md section 3 [calc]),
 *    so the plug-in at the largest well-sampled k is preferred when its last step h_(k-1) - h_k is
 *    smaller than that drift: for a mixing source the steps shrink geometrically, so the remaining
 *    memory bias is of the order of the last step;
 * 3. when neither applies, the plug-in at the largest well-sampled k, then the mean return,
 *    then match lengths, each with a warning.
 * A return slope that differs from a converged plug-in by more than three standard errors of the
 * difference is reported as a warning: the return-time offset has not settled at this length.
 *
 * Exception: when sigma^2 is negligible (a uniform law, a maximal-entropy measure) the sum of the
 * conditional information over a stretch of the sequence telescopes to boundary terms, so batch
 * means, which add one boundary term per batch, overstate the plug-in's error (its intervals covered
 * the exact h in 200 of 200 trials on the golden-mean shift at N = 1e5). log R_n keeps its Exp(1)
 * fluctuations there, which batch means do measure, so the return-time slope is the headline.
 */
export function chooseEntropyHeadline(c: HeadlineCandidates, unitName: string): HeadlineChoice {
  const warnings: AnalysisWarning[] = [];
  const p = c.pluginConditional;
  const slope = c.returnSlope;
  const stepText =
    p.step === null ? '' : `h_${p.k - 1} - h_${p.k} = ${fmt(p.step)}${p.stepStandardError === null ? '' : ` +- ${p.stepStandardError.toPrecision(2)}`} nats`;
  if (c.sigma2Negligible === true && slope.estimate !== null && slope.interval !== null) {
    return {
      method: 'return-slope',
      reason:
        `sigma^2 is negligible here, so the sums of the conditional information telescope and batch means overstate the ` +
        `plug-in's error; log R_n keeps its exponential-law fluctuations, which batch means measure. Slope of mean log R_n ` +
        `against n over n = ${slope.lengthsUsed?.[0]}..${slope.lengthsUsed?.[1]}. Reported in ${unitName}.`,
      warnings,
    };
  }
  if (p.converged && p.estimate !== null) {
    if (slope.estimate !== null && disagree(slope, p, 3)) {
      warnings.push({
        code: 'estimators-disagree',
        message:
          `The return-time slope (${fmt(slope.estimate)} nats) differs from the converged block-entropy estimate ` +
          `(${fmt(p.estimate)} nats) by more than three standard errors: the offset E log R_n - n h has not settled at ` +
          `n = ${slope.lengthsUsed?.[0]}..${slope.lengthsUsed?.[1]} (a sticky or slowly mixing source); a longer sequence would let larger n be used.`,
      });
    }
    return {
      method: 'plugin-conditional',
      reason:
        `The conditional block entropies have reached a plateau at k = ${p.k} (${stepText}), so the plug-in estimate shows no ` +
        `memory bias and, being well sampled, little sampling bias; the return-time slope can still carry a drifting offset. ` +
        `Reported in ${unitName}.`,
      warnings,
    };
  }
  const stepNegligible =
    p.estimate !== null && p.step !== null && p.standardError !== null && Math.abs(p.step) < NEGLIGIBLE_STEP_SHARE * p.standardError;
  if (stepNegligible && slope.estimate !== null && p.estimate !== null && disagree(slope, p, 2) && slope.estimate < p.estimate) {
    warnings.push({
      code: 'estimators-disagree',
      message:
        `The return-time slope (${fmt(slope.estimate)} nats) lies below the plug-in estimate (${fmt(p.estimate)} nats) by more ` +
        `than two standard errors while the plug-in's last step is negligible: the offset E log R_n - n h has not settled at ` +
        `n = ${slope.lengthsUsed?.[0]}..${slope.lengthsUsed?.[1]} (a slowly mixing source); a longer sequence would let larger n be used.`,
    });
    return {
      method: 'plugin-conditional',
      reason:
        `The conditional block entropies still fall at k = ${p.k} (${stepText}), but by less than ${NEGLIGIBLE_STEP_SHARE} of the ` +
        `plug-in's standard error (${fmt(p.standardError ?? 0)} nats): its remaining memory bias barely moves its interval, ` +
        `while the return-time slope, well below it, carries an offset that has not settled. Reported in ${unitName}.`,
      warnings,
    };
  }
  const slopeEarly = slope.lengthsUsed !== null && slope.lengthsUsed[0] < SETTLED_FROM;
  const smallLastStep = p.estimate !== null && p.step !== null && Math.abs(p.step) < EARLY_SLOPE_DRIFT;
  if (slope.estimate !== null && slopeEarly && smallLastStep) {
    return {
      method: 'plugin-conditional',
      reason:
        `The return-time slope could only use n = ${slope.lengthsUsed?.[0]}..${slope.lengthsUsed?.[1]}, where the offset ` +
        `E log R_n - n h still drifts by about ${EARLY_SLOPE_DRIFT} nats per level, while the conditional block entropies ` +
        `change by less than that at the largest well-sampled k = ${p.k} (${stepText}); the plug-in there is the less ` +
        `biased estimate. Reported in ${unitName}.`,
      warnings,
    };
  }
  if (slope.estimate !== null) {
    const why =
      p.estimate === null
        ? 'no block length is well sampled enough for the plug-in estimate'
        : p.step === null
          ? `the plug-in can only be computed at k = ${p.k}, so its memory bias cannot be judged`
          : `the conditional block entropies are still falling at k = ${p.k} (${stepText}), so the plug-in is biased upward`;
    return {
      method: 'return-slope',
      reason:
        `Slope of mean log R_n against n over n = ${slope.lengthsUsed?.[0]}..${slope.lengthsUsed?.[1]}: its bias decays ` +
        `exponentially in n, and ${why}. Reported in ${unitName}.`,
      warnings,
    };
  }
  if (p.estimate !== null) {
    warnings.push({
      code: 'headline-fallback',
      message: `Fewer than two block lengths are trusted for the return-time slope; the headline is the plug-in conditional entropy at k = ${p.k}, whose memory bias cannot be checked here.`,
    });
    return {
      method: 'plugin-conditional',
      reason: `No return-time slope is possible and the block entropies cannot be checked for a plateau; the plug-in at the largest well-sampled k = ${p.k} is the least-biased estimate left. Reported in ${unitName}.`,
      warnings,
    };
  }
  if (c.returnMean.estimate !== null) {
    warnings.push({
      code: 'headline-fallback',
      message: 'Only one block length has returns to use; the headline is mean log R_n / n, biased by about -0.58/n.',
    });
    return { method: 'return-mean', reason: `Only the mean return at one block length is available. Reported in ${unitName}.`, warnings };
  }
  if (c.matchLength.estimate !== null) {
    warnings.push({ code: 'headline-fallback', message: 'Only the match-length estimate is available; its bias decays like 1/log(window).' });
    return { method: 'match-length', reason: `Only match lengths are available. Reported in ${unitName}.`, warnings };
  }
  warnings.push({ code: 'no-estimate', message: 'No estimator applies to these data.' });
  return { method: 'none', reason: 'No estimator applies to these data.', warnings };
}
