import type { AnalysisWarning } from '../result/analysisResult';
import type { LevelStats } from '../returns/levelStats';
import { unseenTailBias } from './censoringCorrection';

/** How the bottom of the range is chosen (see trustedRange). */
export type LowerRule = 'top-two' | 'top-three' | 'upper-half';

export interface TrustedRangeOptions {
  /** Largest censored fraction (nearer-history view) allowed in the range, in [0, 1). */
  readonly maxCensoredFraction: number;
  /** Fewest observed returns a level needs; default 100. */
  readonly minObserved?: number;
  /** Rule for the bottom of the range; default 'top-two'. */
  readonly lowerRule?: LowerRule;
  /** Standard error of the (corrected) mean of log R_n, for the unseen-tail check; without it the
   * check is skipped. */
  readonly meanStandardError?: (level: LevelStats) => number | null;
  /** Largest unseen-tail bias allowed, as a share of that standard error; default 0.25. */
  readonly maxTailShare?: number;
}

export interface TrustedRange {
  /** Lowest and highest trusted block length; 0 and 0 when no level qualifies. */
  readonly lo: number;
  readonly hi: number;
  readonly reason: string;
  readonly warnings: readonly AnalysisWarning[];
}

/** Default for TrustedRangeOptions.minObserved. */
export const MIN_OBSERVED_RETURNS = 100;

/**
 * The block lengths on which the return-time estimators rely.
 *
 * Top n_hi: the largest n such that every level 1..n has a censored fraction (1 - observed/positions)
 * of at most maxCensoredFraction, at least minObserved observed returns, and (when a standard error
 * is supplied) an unseen-tail bias (censoringCorrection.ts, unseenTailBias) of at most maxTailShare
 * standard errors of the mean of log R_n. Censoring removes the largest returns; the estimators
 * undo it by inverse-probability weights, but returns longer than the data are lost for good. How
 * much that matters depends on the spread of log R_n, not on the censored fraction alone: at 0.6%
 * censoring, N = 1e5, Bernoulli(0.3) at n = 12 loses 0.34% of its law beyond N and its mean log R
 * drops by 0.02 nat (1.5 standard errors; simulation), while a fair coin at 1.5% loses almost
 * nothing. Hence the second, spread-aware check.
 *
 * Bottom n_lo: E log R_n - n h tends to (H_n - n h) - gamma, and for exponentially mixing sources the
 * remaining deviation shrinks geometrically in n (Kim, Osaka J. Math. 49 (2012) 1-20). A
 * least-squares slope over [n_lo, n_hi] inherits about (deviation at n_lo)/(n_hi - n_lo) as bias
 * while its standard error also falls like 1/(n_hi - n_lo), so the bias in units of the standard
 * error depends on n_lo alone and is smallest with n_lo as high as possible: 'top-two' (default)
 * takes n_lo = n_hi - 1. 'top-three' takes n_hi - 2 and 'upper-half' the upper half of [1, n_hi].
 * Coverage of nominal 95% intervals of the slope at N = 1e5 (scripts/coverage-study.ts; 200
 * replicates, 100 for upper-half): fair coin 0.975 / 0.95 / 0.00, golden mean 0.94 / 0.925 / 0.00,
 * three-state chain 0.96 / 0.89 / 0.92 for top-two / top-three / upper-half.
 */
export function trustedRange(levels: readonly LevelStats[], options: TrustedRangeOptions): TrustedRange {
  const cap = options.maxCensoredFraction;
  if (!(cap >= 0 && cap < 1)) throw new RangeError(`maxCensoredFraction must be in [0, 1); got ${cap}`);
  const minObserved = options.minObserved ?? MIN_OBSERVED_RETURNS;
  if (!(minObserved >= 1)) throw new RangeError(`minObserved must be >= 1; got ${minObserved}`);
  const rule = options.lowerRule ?? 'top-two';
  const tailShare = options.maxTailShare ?? 0.25;
  const warnings: AnalysisWarning[] = [];

  let hi = 0;
  let stop = '';
  let tooFew = false;
  for (const level of levels) {
    const censored = level.positions > 0 ? 1 - level.observed / level.positions : 1;
    if (censored > cap) {
      stop = `at n = ${level.n} ${(100 * censored).toFixed(2)}% of positions are censored (limit ${(100 * cap).toFixed(2)}%)`;
      break;
    }
    if (level.observed < minObserved) {
      stop = `at n = ${level.n} only ${level.observed} returns are observed (need ${minObserved})`;
      tooFew = true;
      break;
    }
    if (options.meanStandardError !== undefined) {
      const se = options.meanStandardError(level);
      const bias = unseenTailBias(level);
      if (se !== null && bias !== null && bias > tailShare * se) {
        stop =
          `at n = ${level.n} returns longer than the data could shift the mean of log R by ${bias.toPrecision(2)} nat, ` +
          `more than ${tailShare} of its standard error ${se.toPrecision(2)}`;
        break;
      }
    }
    hi = level.n;
  }
  if (stop === '' && levels.length > 0) stop = `the scan ended at n = ${levels[levels.length - 1].n}`;

  if (tooFew && hi < 2) {
    warnings.push({ code: 'too-few-returns', message: `Too few returns for the return-time estimators: ${stop}.` });
  }
  if (hi === 0) {
    warnings.push({
      code: 'range-empty',
      message: `No block length qualifies for the return-time estimators: ${stop}. Use a longer sequence or allow more censoring.`,
    });
    return { lo: 0, hi: 0, reason: `Empty: ${stop}.`, warnings };
  }
  let lo: number;
  if (rule === 'top-two') lo = Math.max(1, hi - 1);
  else if (rule === 'top-three') lo = Math.max(1, hi - 2);
  else lo = Math.max(1, Math.ceil((hi + 1) / 2));
  if (hi - lo + 1 < 2) {
    warnings.push({
      code: 'range-short',
      message: `Only n = ${hi} qualifies for the return-time estimators (${stop}); a slope needs two block lengths.`,
    });
  }
  const lowWhy =
    rule === 'upper-half'
      ? 'the upper half of [1, n_hi]'
      : `the top ${rule === 'top-two' ? 'two' : 'three'} levels, where the offset E log R_n - n h has settled most (its deviation decays geometrically in n)`;
  const reason = `n from ${lo} to ${hi}: the top is the last n before ${stop}; the bottom keeps ${lowWhy}.`;
  return { lo, hi, reason, warnings };
}
