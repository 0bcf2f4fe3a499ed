/**
 * The serializable outcome of comparing two sequences by waiting times: plain data, versioned, the
 * same for the workbench and the command line (`compare --json`). Add fields freely; never rename.
 * Entropies are in the settings' unit, log W in nats.
 */
import type { AnalysisSettings, AnalysisWarning } from '../result/analysisResult';

export const COMPARISON_SCHEMA = 'returnrate.comparison/1';

/** What is recorded about each of the two inputs. */
export interface ComparisonInput {
  readonly name: string;
  readonly symbols: number;
  /** Distinct symbols used by this input. */
  readonly alphabetSize: number;
  /** Hex SHA-256 of the bytes read; null for a generated sequence. */
  readonly sha256: string | null;
  /** Reader format or 'generated'. */
  readonly format: string;
}

/** One row per block length n: the waiting times of A's n-blocks in B. */
export interface ComparisonRow {
  readonly n: number;
  /** Positions of A with an n-block. */
  readonly positions: number;
  /** Positions whose block occurs in B. */
  readonly observed: number;
  /** Positions whose block never occurs in their B segment. */
  readonly censored: number;
  readonly censoredFraction: number;
  /** Mean log W_n over all positions, censored ones counted at their least possible value
   * log(|B_g| - n + 2) (B_g the position's B segment), nats: a lower bound when censored > 0;
   * null with fewer than two positions. */
  readonly meanLogWait: number | null;
  /** Variance of log W_n with the same convention, nats^2. */
  readonly varLogWait: number | null;
  /** meanLogWait / n in the output unit. */
  readonly ratePerSymbol: number | null;
}

/** A rate with its interval (output unit). */
export interface RateEstimate {
  /** null when the data do not allow an estimate (see note). */
  readonly estimate: number | null;
  readonly ci95: readonly [number, number] | null;
  readonly standardError: number | null;
  /** Block lengths used, [from, to]; null when not applicable. */
  readonly lengthsUsed: readonly [number, number] | null;
  /** What was done, or why nothing could be, in one or two sentences. */
  readonly note: string;
}

/** Exact values when both inputs come from reference chains (output unit). */
export interface ComparisonExact {
  readonly source: string;
  readonly crossEntropy: number;
  readonly entropyA: number;
  readonly relativeEntropy: number;
  readonly sigma2Cross: number | null;
}

/** Normalized fluctuations (log W_n - n H) / (sigma sqrt n) of sampled positions, for the Q-Q view. */
export interface ComparisonFluctuations {
  readonly n: number;
  /** H and sigma used, nats; 'exact' when the pair's closed forms are known. */
  readonly centreRateNats: number;
  readonly sigmaNats: number;
  readonly basis: 'exact' | 'estimate';
  readonly positions: readonly number[];
  readonly values: readonly number[];
  /** Sampled positions whose block never occurs in B (left out). */
  readonly censored: number;
}

export interface ComparisonResult {
  readonly schema: typeof COMPARISON_SCHEMA;
  readonly program: { readonly name: 'returnrate'; readonly version: string };
  readonly inputA: ComparisonInput;
  readonly inputB: ComparisonInput;
  readonly settings: AnalysisSettings;
  /** Size of the alphabet shared by both, and the symbols only one of them uses. */
  readonly alphabet: { readonly size: number; readonly missingInB: readonly string[]; readonly missingInA: readonly string[] };
  /** Segment pairs K: A's g-th segment waits in B's g-th segment; the intervals are batch means over them. */
  readonly pairs: number;
  readonly lengths: readonly ComparisonRow[];
  /** Cross entropy rate H(P_A, Q_B): slope of mean log W_n against n. */
  readonly crossEntropy: RateEstimate;
  /** Entropy rate of A from the return-time analysis of A alone (its headline). */
  readonly entropyA: RateEstimate & { readonly method: string };
  /** Relative entropy rate D(P_A || Q_B) = cross entropy - h(A). */
  readonly relativeEntropy: RateEstimate;
  /** Variance rate of the cross information (slope of Var log W_n against n); no interval. */
  readonly sigma2Cross: { readonly estimate: number | null; readonly note: string };
  readonly unit: string;
  readonly confidence: number;
  readonly exact: ComparisonExact | null;
  readonly fluctuations: ComparisonFluctuations | null;
  readonly trustedRange: { readonly lo: number; readonly hi: number; readonly reason: string } | null;
  readonly warnings: readonly AnalysisWarning[];
}
