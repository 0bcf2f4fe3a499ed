/**
 * The serializable outcome of one analysis: plain data, versioned, the same for the workbench, the
 * command line (`--json`) and saved sessions. Add fields freely; never rename the ones here.
 */
import type { SymbolCount } from './alphabetSummary';
import type { SymbolizationRecord } from '../symbolize/symbolizationRecord';
import type { DiagnosticsSummary } from '../diagnostics/mixingDiagnostics';

export const ANALYSIS_SCHEMA = 'returnrate.analysis/1';
/** Several analyses of one input (e.g. one per FASTA record): { schema, records: AnalysisResult[] }. */
export const ANALYSIS_SET_SCHEMA = 'returnrate.analysis-set/1';

export type EntropyUnit = 'nat' | 'bit';

export interface AnalysisSettings {
  /** Largest block length to process. */
  readonly maxN: number;
  /** Unit of entropies in the output (the core computes in nats and converts at the end). */
  readonly unit: EntropyUnit;
  /** Seconds per symbol; when set, rates are also given per second. */
  readonly intervalSeconds: number | null;
  /** Largest fraction of censored positions (nearer-history view) allowed inside the trusted range. */
  readonly maxCensoredFraction: number;
  /** Two-sided confidence level of every interval. */
  readonly confidence: number;
}

export const DEFAULT_SETTINGS: AnalysisSettings = {
  maxN: 40,
  unit: 'nat',
  intervalSeconds: null,
  maxCensoredFraction: 0.01,
  confidence: 0.95,
};

export interface InputSummary {
  readonly name: string;
  readonly symbols: number;
  readonly alphabetSize: number;
  /** Hex SHA-256 of the input bytes as read (null when the sequence was generated in memory). */
  readonly sha256: string | null;
  /** Reader format, e.g. 'chars', 'tokens', 'fasta', 'csv', 'bytes', or 'generated'. */
  readonly format: string;
  /** The alphabet with counts, most frequent first, at most ALPHABET_LISTED symbols (absent when
   * the analysis was built from a scan alone). */
  readonly alphabet?: readonly SymbolCount[];
  /** Symbols of the alphabet not listed in `alphabet`. */
  readonly alphabetUnlisted?: number;
  /** Present when the input was a real-valued series turned into symbols (src/core/symbolize). */
  readonly symbolization?: SymbolizationRecord;
}

/** One row of the per-n table; log R in nats, entropies in the output unit. */
export interface LengthRow {
  readonly n: number;
  readonly positions: number;
  readonly observed: number;
  readonly censored: number;
  /** Forward returns only (observed ones). */
  readonly forwardObserved: number;
  readonly forwardMeanLogReturn: number | null;
  /** Nearer-history view (the one the estimators use), over observed positions. */
  readonly meanLogReturn: number | null;
  readonly varLogReturn: number | null;
  /** Quantiles of log R (nats) at 0.05, 0.25, 0.5, 0.75, 0.95, from the fixed-grid histogram. */
  readonly quantilesLogReturn: readonly (number | null)[];
  /** mean log R_n / n in the output unit. */
  readonly ratePerSymbol: number | null;
  /** Plug-in block entropy H_n, plain and Miller-Madow corrected, output unit. */
  readonly blockEntropy: number;
  readonly blockEntropyMillerMadow: number;
  /** H_n - H_(n-1) (Miller-Madow corrected), output unit; H_0 = 0. */
  readonly conditionalEntropy: number;
  /** Mean empirical information -log(count/(N-n+1)) over positions, output unit. */
  readonly meanInformation: number;
  readonly distinctBlocks: number;
  readonly singletons: number;
  /** Mean and variance of log(R_n * empirical frequency) over observed positions (nats);
   * Exp(1) limit: mean -gamma, variance pi^2/6. */
  readonly meanLogRFreq: number | null;
  readonly varLogRFreq: number | null;
  /** Censored / positions, nearer-history view. */
  readonly censoredFraction: number;
  /** Mean and variance of log R (nats) with censoring undone by inverse-probability weights
   * (src/core/estimate/censoringCorrection.ts); the return-time estimators use these. */
  readonly meanLogReturnCorrected: number | null;
  readonly varLogReturnCorrected: number | null;
}

export interface Interval {
  readonly estimate: number;
  readonly ci95: readonly [number, number];
}

export interface EntropyEstimate extends Interval {
  readonly unit: string;
  /** Which estimator gave the headline, e.g. 'return-slope'. */
  readonly method: string;
  /** Why this method and this range, in one or two plain sentences. */
  readonly reason: string;
  readonly lengthsUsed: readonly [number, number];
  /** Per second, when a sampling interval was given. */
  readonly perSecond: Interval | null;
  readonly alternatives: Readonly<Record<string, AlternativeEstimate>>;
  /** Standard error of the headline estimate (batch means), output unit; null if unknown. */
  readonly standardError: number | null;
  /** Confidence level of ci95 (the settings' confidence; the name ci95 is historical). */
  readonly confidence: number;
  /** Unit of perSecond, e.g. 'bit/s'; null without a sampling interval. */
  readonly perSecondUnit: string | null;
}

export interface AlternativeEstimate {
  readonly estimate: number | null;
  readonly ci95: readonly [number, number] | null;
  readonly label: string;
  readonly note: string;
  /** Standard error (output unit), null when the method has none. */
  readonly standardError: number | null;
  /** Block lengths the estimate uses, [from, to]; null when not applicable. */
  readonly lengthsUsed: readonly [number, number] | null;
}

export interface Sigma2Estimate extends Interval {
  readonly method: string;
  /** True when the Gaussian term n sigma^2 is negligible against the Exp(1) term at every n used. */
  readonly negligible: boolean;
  readonly alternatives: Readonly<Record<string, AlternativeEstimate>>;
  /** Unit of sigma^2, e.g. 'nat^2/symbol'. */
  readonly unit: string;
  /** Why this method and its parameters, in plain words. */
  readonly reason: string;
  /** Standard error (batch-means, output unit squared), null when unknown. */
  readonly standardError: number | null;
}

export interface ExponentialLawSummary {
  /** Block length at which it is reported (the top of the trusted range). */
  readonly n: number;
  readonly meanLogRFreq: number;
  readonly expectedMean: number;
  readonly varLogRFreq: number;
  readonly expectedVar: number;
}

export interface AnalysisWarning {
  readonly code: string;
  readonly message: string;
}

/** Per sampled position (row) and block length n (column n - 1), all in nats. */
export interface SampledPathsSummary {
  readonly positions: readonly number[];
  /** log R_n; null when censored or when the position has no n-block. */
  readonly logReturn: readonly (readonly (number | null)[])[];
  /** For a censored return, log of its lower bound N - n - i (R_n > that); null otherwise or when the
   * bound is 0. Absent in results saved before it was added. */
  readonly logCensoredBound?: readonly (readonly (number | null)[])[];
  /** log of the number of occurrences of the position's n-block in the sequence (0 when unique);
   * null past the end. Absent in results saved before it was added. */
  readonly logCount?: readonly (readonly (number | null)[])[];
}

export interface AnalysisResult {
  readonly schema: typeof ANALYSIS_SCHEMA;
  readonly program: { readonly name: 'returnrate'; readonly version: string };
  readonly input: InputSummary;
  readonly settings: AnalysisSettings;
  readonly lengths: readonly LengthRow[];
  readonly entropy: EntropyEstimate;
  readonly sigma2: Sigma2Estimate;
  readonly exponentialLaw: ExponentialLawSummary | null;
  /** Sampled forward paths (every stride-th position), per position and n = 1..maxN, in nats. */
  readonly paths: SampledPathsSummary;
  /** Reference source facts when the input was generated from one, in the output unit. */
  readonly reference: { readonly source: string; readonly entropyRate: number | null; readonly sigma2: number | null } | null;
  readonly warnings: readonly AnalysisWarning[];
  /** The block lengths the return-time estimators trust, and why. */
  readonly trustedRange: { readonly lo: number; readonly hi: number; readonly reason: string } | null;
  /** How the engine ran: block lengths, batches for the error bars, match window. */
  readonly scan: {
    readonly maxN: number;
    readonly exhausted: boolean;
    readonly batchLength: number;
    readonly batchCount: number;
    /** Coarse batches used for the confidence intervals. */
    readonly intervalBatches: number;
    readonly matchWindow: number;
  };
  /** Mixing diagnostics and one-symbol information moments (src/core/diagnostics); absent in results
   * saved before they were added and in results built from a scan alone. */
  readonly diagnostics?: DiagnosticsSummary;
}
