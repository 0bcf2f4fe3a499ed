import type { LevelStats } from '../returns/levelStats';

/**
 * Plug-in (maximum-likelihood) n-block entropy in nats over the N-n+1 overlapping blocks:
 * H_n = log M - (1/M) sum_blocks c log c, with M = positions. It equals the mean empirical
 * information -log(count/M) over positions.
 */
export function plugInBlockEntropy(level: LevelStats): number {
  const M = level.positions;
  return M > 0 ? Math.log(M) - level.sumCountLogCount / M : 0;
}

/**
 * Miller-Madow corrected n-block entropy in nats: plug-in + (m - 1)/(2M), m = distinct blocks seen.
 * The term removes the first-order downward bias of the plug-in estimate (Miller 1955; Paninski,
 * Neural Comput. 15 (2003) 1191-1253). Overlapping blocks are not independent draws, so the
 * correction is a heuristic here; it is accurate when every block is seen many times.
 */
export function millerMadowBlockEntropy(level: LevelStats): number {
  const M = level.positions;
  return M > 0 ? plugInBlockEntropy(level) + (level.distinctBlocks - 1) / (2 * M) : 0;
}
