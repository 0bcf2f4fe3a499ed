/**
 * What the return-time engine records about one block length n. Everything an estimator needs is a
 * sum over positions, so levels from different runs or chunks can later be merged exactly.
 *
 * Two views of the return time at position i (0 <= i <= N-n):
 * - forward: R_n(i) = min{ j >= 1 : x[i+j..i+j+n) = x[i..i+n) }, censored when no later occurrence
 *   exists (we only know R_n(i) > N-n-i).
 * - "nearer history" (the estimator view): positions in the first half (i < floor((N-n+1)/2)) use the
 *   forward return, the rest the backward return i - (previous occurrence). Forward and backward
 *   return times have the same law under any stationary measure (shift argument; see THEORY.md
 *   section 7), and a rule that depends on the position only cannot select on R, so this view is
 *   unbiased while it is censored only when R exceeds about N/2 instead of N-n-i.
 */
export interface LevelStats {
  /** Block length. */
  readonly n: number;
  /** Number of n-blocks in the sequence: N - n + 1. */
  readonly positions: number;
  /** Distinct n-blocks (classes), singletons included. */
  readonly distinctBlocks: number;
  /** n-blocks that occur exactly once. */
  readonly singletons: number;
  /** sum over distinct blocks of c log c, c = count; plug-in H_n = log(positions) - sumCountLogCount/positions. */
  readonly sumCountLogCount: number;

  /** Forward returns: number observed (not censored). */
  readonly forwardObserved: number;
  /** Forward returns: sum and sum of squares of log R over observed positions. */
  readonly forwardSumLog: number;
  readonly forwardSumLog2: number;

  /** Nearer-history returns: number observed; the rest (positions - observed) are censored. */
  readonly observed: number;
  /** Nearer-history returns: sum and sum of squares of log R over observed positions. */
  readonly sumLog: number;
  readonly sumLog2: number;
  /** Nearer-history returns: sum and sum of squares of log(R * count) over observed positions, for the
   * exponential law of R_n * mu(A_n) (subtract log(positions) to get log of R times the frequency). */
  readonly sumLogRc: number;
  readonly sumLogRc2: number;
  /** Nearer-history log R on a fixed grid: bin k holds log R in [k, k+1)/HISTOGRAM_BINS_PER_NAT. */
  readonly histogram: Float64Array;

  /**
   * Match lengths (sliding window, Kontoyiannis, Algoet, Suhov & Wyner 1998): number of positions i in
   * [window, N - maxN) whose n-block also starts somewhere in [i - window, i - 1]. Summed over n this
   * gives sum_i Lambda_i minus the window count.
   */
  readonly matchCount: number;

  /** Per batch of consecutive positions (batch b holds positions [b, b+1) * batchLength): */
  /** nearer-history observed count, sum of log R, sum of (log R)^2; */
  readonly batchObserved: Float64Array;
  readonly batchSumLog: Float64Array;
  readonly batchSumLog2: Float64Array;
  /** sum over the batch's positions of log(count of the position's n-block) (0 for singletons). */
  readonly batchSumLogCount: Float64Array;
}

/** Resolution of LevelStats.histogram. */
export const HISTOGRAM_BINS_PER_NAT = 64;

/** Returns of a systematic sample of positions (every stride-th position), for path plots. */
export interface SampledPaths {
  /** Sampled positions, increasing. */
  readonly positions: Int32Array;
  /** Row-major [sample][n-1]: forward R_n, or -(lower bound + 1) when censored, or 0 when the
   * position has no n-block (it lies past N - n). */
  readonly forward: Float64Array;
  /** Same layout: count of the position's n-block in the whole sequence (1 when unique, 0 past the end). */
  readonly counts: Float64Array;
  readonly maxN: number;
}

export interface ReturnScan {
  /** Sequence length N. */
  readonly length: number;
  readonly alphabetSize: number;
  /** Largest block length processed (may be less than requested when every block became unique). */
  readonly maxN: number;
  /** Levels n = 1..maxN in order. */
  readonly levels: readonly LevelStats[];
  /** Positions per batch (a power of two) and number of batches. */
  readonly batchLength: number;
  readonly batchCount: number;
  /** Window used for match lengths. */
  readonly matchWindow: number;
  /** Positions that take part in the match-length sums: [matchWindow, N - maxN). */
  readonly matchPositions: number;
  readonly paths: SampledPaths;
  /** True when the scan stopped because every block had become unique before maxN. */
  readonly exhausted: boolean;
  /** Forward return of every position 0..N-n at ScanOptions.captureLevel n: R, or -(lower bound + 1)
   * when censored; null when no level was captured. */
  readonly captured: Int32Array | null;
}
