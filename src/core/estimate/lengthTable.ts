import type { EntropyUnit, LengthRow } from '../result/analysisResult';
import type { LevelStats } from '../returns/levelStats';
import { lengthRowOfLevel } from './lengthRowOfLevel';

// Kept here for the modules that import them from the table.
export { LENGTH_QUANTILES, meanAndVariance } from './lengthRowOfLevel';

/**
 * The per-n table: one row per level, log R in nats, entropies in `unit`.
 *
 * - means and variances of log R over observed (uncensored) positions, nearer-history view, and the
 *   forward-only mean for comparison; `meanLogReturnCorrected` undoes censoring (see
 *   censoringCorrection.ts) and is the value the return-time estimators use;
 * - quantiles of log R from the 1/64-nat histogram (linear inside bins);
 * - plug-in H_n and its Miller-Madow correction (Miller 1955), conditional H_n - H_(n-1) from the
 *   corrected values with H_0 = 0; the mean empirical information over positions equals plug-in H_n;
 * - mean and variance of log(R * count/M) over observed positions, whose Exp(1) limit (Kac 1947;
 *   Kim, Osaka J. Math. 49 (2012)) has mean -gamma and variance pi^2/6.
 * @param unit output unit of entropies; default 'nat'
 */
export function lengthTable(levels: readonly LevelStats[], unit: EntropyUnit = 'nat'): LengthRow[] {
  // One code path with the rows built level by level while a scan runs (lengthRowOfLevel).
  return levels.map((level, i) => lengthRowOfLevel(level, i > 0 ? levels[i - 1] : null, unit));
}
