import type { EntropyUnit, LengthRow } from '../result/analysisResult';
import type { LevelStats } from '../returns/levelStats';
import { millerMadowBlockEntropy, plugInBlockEntropy } from './blockEntropy';
import { censoringCorrectedMoments } from './censoringCorrection';
import { histogramQuantile } from './histogramQuantile';
import { entropyFactor } from './units';

/** Probabilities of the quantiles reported in LengthRow.quantilesLogReturn. */
export const LENGTH_QUANTILES: readonly number[] = [0.05, 0.25, 0.5, 0.75, 0.95];

/** Mean and unbiased (n-1) variance from a count, a sum and a sum of squares; nulls when undefined. */
export function meanAndVariance(count: number, sum: number, sumSquares: number): { mean: number | null; variance: number | null } {
  if (count <= 0) return { mean: null, variance: null };
  const mean = sum / count;
  if (count < 2) return { mean, variance: null };
  // Sums of squares of log R are at most a few thousand times the variance, so the one-pass form
  // loses at most about 12 of 16 digits: enough here.
  const variance = Math.max(0, (sumSquares - count * mean * mean) / (count - 1));
  return { mean, variance };
}

/**
 * One row of the per-n table (see lengthTable.ts for what each field means) from its own level and
 * the level before it: the conditional entropy H_n - H_(n-1) is the only field that looks back, so
 * rows can be built one at a time while the scan runs and still equal lengthTable's rows exactly.
 * @param previous the level n - 1, or null for n = 1 (H_0 = 0)
 * @param unit output unit of entropies; default 'nat'
 */
export function lengthRowOfLevel(level: LevelStats, previous: LevelStats | null, unit: EntropyUnit = 'nat'): LengthRow {
  const f = entropyFactor(unit);
  const { n, positions, observed } = level;
  const plain = meanAndVariance(observed, level.sumLog, level.sumLog2);
  const forward = meanAndVariance(level.forwardObserved, level.forwardSumLog, level.forwardSumLog2);
  const corrected = censoringCorrectedMoments(level);
  // log(R * count / M) = log(R * count) - log M: the shift leaves the variance unchanged.
  const rc = meanAndVariance(observed, level.sumLogRc, level.sumLogRc2);
  const hPlain = plugInBlockEntropy(level);
  const hMm = millerMadowBlockEntropy(level);
  const previousMillerMadow = previous === null ? 0 : millerMadowBlockEntropy(previous);
  return {
    n,
    positions,
    observed,
    censored: positions - observed,
    forwardObserved: level.forwardObserved,
    forwardMeanLogReturn: forward.mean,
    meanLogReturn: plain.mean,
    varLogReturn: plain.variance,
    quantilesLogReturn: LENGTH_QUANTILES.map((p) => histogramQuantile(level.histogram, p)),
    ratePerSymbol: plain.mean === null ? null : (plain.mean / n) * f,
    blockEntropy: hPlain * f,
    blockEntropyMillerMadow: hMm * f,
    conditionalEntropy: (hMm - previousMillerMadow) * f,
    meanInformation: hPlain * f,
    distinctBlocks: level.distinctBlocks,
    singletons: level.singletons,
    meanLogRFreq: rc.mean === null ? null : rc.mean - Math.log(positions),
    varLogRFreq: rc.variance,
    censoredFraction: positions > 0 ? (positions - observed) / positions : 0,
    meanLogReturnCorrected: corrected.mean,
    varLogReturnCorrected: corrected.variance,
  };
}
