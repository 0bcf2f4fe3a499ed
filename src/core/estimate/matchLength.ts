import type { ReturnScan } from '../returns/levelStats';
import { notApplicable, type EstimatorResult } from './estimatorResult';

/** Match-length estimate with the truncation flag the analysis turns into a warning. */
export interface MatchLengthResult extends EstimatorResult {
  /** True when some match reached maxN, so Lambda was cut at maxN + 1 and the estimate is high. */
  readonly truncated: boolean;
}

/**
 * Sliding-window match-length estimate of Kontoyiannis, Algoet, Suhov & Wyner, IEEE Trans. IT 44
 * (1998) 1319-1327: with window W and Lambda_i = 1 + the longest l such that x[i..i+l) also starts
 * somewhere in [i-W, i-1], h = [ (1/m) sum_i Lambda_i / log W ]^-1 = log W / mean Lambda, nats,
 * over the m = scan.matchPositions positions in [W, N - maxN). Since Lambda_i - 1 counts the block
 * lengths n at which position i matches, sum_i Lambda_i = m + sum_n matchCount_n. Its bias decays
 * only like 1/log W, so it is a cross-check, not a headline. The engine keeps no per-batch match
 * counts, so no interval is given.
 */
export function matchLength(scan: ReturnScan): MatchLengthResult {
  const m = scan.matchPositions;
  const W = scan.matchWindow;
  if (m <= 0 || W < 2 || scan.levels.length === 0) {
    return { ...notApplicable('Too few positions after the match window (need N - maxN > window).'), truncated: false };
  }
  let sum = m;
  for (const level of scan.levels) sum += level.matchCount;
  const meanLambda = sum / m;
  const truncated = scan.levels[scan.levels.length - 1].matchCount > 0;
  return {
    estimate: Math.log(W) / meanLambda,
    standardError: null,
    interval: null,
    lengthsUsed: [1, scan.levels.length],
    note:
      `log W / mean Lambda with window W = ${W} over ${m} positions (mean Lambda ${meanLambda.toPrecision(4)}); no interval.` +
      (truncated ? ' Some matches reached maxN, so Lambda is cut short and the estimate is too high.' : ''),
    truncated,
  };
}
