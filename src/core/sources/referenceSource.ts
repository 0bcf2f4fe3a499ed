import type { Sequence } from '../sequence/sequence';

/** What is known exactly about a reference process; all entropies in nats per symbol. */
export interface SourceFacts {
  /** Exact entropy rate h in nats per symbol, or null when none is known. */
  readonly entropyRate: number | null;
  /** Exact sigma^2 = lim Var(-log mu(X_1..X_n))/n in nats^2 per symbol, or null when none is claimed. */
  readonly sigma2: number | null;
  /** Plain words: how the sequence is generated and how exact the stated numbers are. */
  readonly description: string;
  /**
   * Whether (log R_n - n h)/(sigma sqrt n) should look Gaussian: false where sigma^2 = 0 (the
   * exponential return-time law takes over) or where the central limit theorem visibly fails.
   */
  readonly gaussianLimit: boolean;
}

/** A generated sequence together with what the generator knows about each symbol. */
export interface DetailedSample {
  readonly sequence: Sequence;
  /**
   * information[t] = -log P(x_t | x_0..x_{t-1}, and the generator's hidden start state where it has
   * one, as the continued-fraction source does), nats. For the Markov, i.i.d. and Parry sources the
   * sum over t < n is exactly -log mu(x_0..x_{n-1}); its mean per symbol tends to h.
   */
  readonly information: Float64Array;
  /** Soft problems met while generating (for example digits clamped to the largest symbol value). */
  readonly warnings: readonly string[];
}

/** A stationary process with known (or honestly unknown) h and sigma^2 that can make data from a seed. */
export interface ReferenceSource {
  /** Stable identifier; for parsed sources the canonical spec string (see parseSourceSpec). */
  readonly id: string;
  /** Short human-readable name. */
  readonly label: string;
  readonly facts: SourceFacts;
  /**
   * A stationary sample path of the given length (symbols), the same for the same seed.
   * @param length number of symbols, a non-negative safe integer
   * @param seed any safe integer; different seeds give independent-looking streams
   */
  generate(length: number, seed: number): Sequence;
  /** Same path as generate(length, seed) plus the exact per-symbol information, where available. */
  generateDetailed?(length: number, seed: number): DetailedSample;
}

/**
 * sigma^2 values below this (relative to max(1, h^2)) are rounding noise of an exact zero, as for
 * uniform laws and maximal-entropy measures; the sources report them as 0.
 */
export const SIGMA2_ZERO_TOLERANCE = 1e-12;

/** sigma^2 with rounding noise around an exact zero replaced by 0. */
export function snapSigma2(sigma2: number, entropyRate: number): number {
  return sigma2 < SIGMA2_ZERO_TOLERANCE * Math.max(1, entropyRate * entropyRate) ? 0 : sigma2;
}
