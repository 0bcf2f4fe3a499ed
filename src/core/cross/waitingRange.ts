import { MIN_OBSERVED_RETURNS } from '../estimate/trustedRange';
import type { AnalysisWarning } from '../result/analysisResult';
import type { PairedLevel } from './pairedWaits';

export interface WaitingRange {
  /** Lowest and highest trusted block length; 0 and 0 when none qualifies. */
  readonly lo: number;
  readonly hi: number;
  readonly reason: string;
  readonly warnings: readonly AnalysisWarning[];
}

/**
 * The block lengths the waiting-time slope relies on, by the rule of the return-time engine's
 * trusted range (estimate/trustedRange.ts) applied to waits: the top n_hi is the largest n such that
 * every level 1..n has at most maxCensoredFraction of A's positions censored (their block is absent
 * from B) and at least 100 observed waits; the bottom is n_hi - (SLOPE_LEVELS - 1), since
 * E log W_n - n H(P, Q) settles to a constant as n grows (Kontoyiannis 1998: log W_n = -log Q(A_1^n)
 * + O(log n) almost surely, and for the sources tested here the remainder's mean converges), so the
 * top levels carry the least drift. Four levels rather than two: with 8 segment pairs that gave the
 * coverage closest to 0.95 in scripts/cross-coverage-study.ts (DEVELOPERS.md has the table). The
 * wider fit steadies the slope: for the chain pair the spread of (estimate - H) / SE (which should
 * be 1) was 1.8 to 2.7 with two levels and 1.5 to 1.7 with four (8 pairs, 1e5 symbols).
 */
/** Trusted levels the waiting-time slope is fitted over (the top ones). */
export const SLOPE_LEVELS = 4;

export function waitingRange(levels: readonly PairedLevel[], maxCensoredFraction: number): WaitingRange {
  if (!(maxCensoredFraction >= 0 && maxCensoredFraction < 1)) {
    throw new RangeError(`maxCensoredFraction must be in [0, 1); got ${maxCensoredFraction}`);
  }
  const warnings: AnalysisWarning[] = [];
  let hi = 0;
  let stop = '';
  for (const level of levels) {
    const censored = level.positions > 0 ? level.censored / level.positions : 1;
    if (censored > maxCensoredFraction) {
      stop =
        `at n = ${level.n} ${(100 * censored).toFixed(2)}% of A's blocks never appear in B ` +
        `(limit ${(100 * maxCensoredFraction).toFixed(2)}%)`;
      break;
    }
    if (level.observed < MIN_OBSERVED_RETURNS) {
      stop = `at n = ${level.n} only ${level.observed} waits are observed (need ${MIN_OBSERVED_RETURNS})`;
      break;
    }
    hi = level.n;
  }
  if (stop === '' && levels.length > 0) stop = `the scan ended at n = ${levels[levels.length - 1].n}`;
  if (hi === 0) {
    warnings.push({
      code: 'range-empty',
      message: `No block length qualifies for the waiting-time slope: ${stop}. Use a longer B or allow more censoring.`,
    });
    return { lo: 0, hi: 0, reason: `Empty: ${stop}.`, warnings };
  }
  const lo = Math.max(1, hi - SLOPE_LEVELS + 1);
  if (lo === hi) {
    warnings.push({
      code: 'range-short',
      message: `Only n = ${hi} qualifies for the waiting-time slope (${stop}); a slope needs two block lengths.`,
    });
  }
  return {
    lo,
    hi,
    reason: `n from ${lo} to ${hi}: the top is the last n before ${stop}; the bottom keeps the top ${SLOPE_LEVELS} levels (or all there are), where E log W_n - n H has settled most.`,
    warnings,
  };
}
