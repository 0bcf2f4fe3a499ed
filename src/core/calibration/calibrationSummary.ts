import normalQuantile from '@stdlib/stats-base-dists-normal-quantile';
import type { ReplicateRecord } from './surrogateStudy';

/** How one estimator behaved over the surrogates, against the model's exact value (output unit). */
export interface EstimatorCalibration {
  /** Exact value of the fitted model. */
  readonly exact: number;
  /** Replicates that gave an estimate. */
  readonly replicates: number;
  readonly mean: number | null;
  /** mean - exact, and its standard error SD / sqrt(replicates). */
  readonly bias: number | null;
  readonly biasStandardError: number | null;
  /** Sample standard deviation of the estimates (n - 1 in the denominator). */
  readonly spread: number | null;
  /** Replicates that gave an interval, and how many of those contain the exact value. */
  readonly intervals: number;
  readonly covered: number;
  /** covered / intervals, with its binomial standard error sqrt(c (1 - c) / intervals). */
  readonly coverage: number | null;
  readonly coverageStandardError: number | null;
}

/** The user's headline shifted by the surrogates' bias. */
export interface CorrectedEstimate {
  readonly estimate: number;
  readonly interval: readonly [number, number];
  readonly label: string;
}

export interface CalibrationSummary {
  /** Records merged (duplicates of one replicate index counted once). */
  readonly replicates: number;
  readonly entropy: EstimatorCalibration;
  readonly sigma2: EstimatorCalibration;
  /** Headline method of the surrogate analyses, with how often each was chosen. */
  readonly methods: Readonly<Record<string, number>>;
  /** null when the user's estimate, its interval or the bias is missing. */
  readonly correctedEntropy: CorrectedEstimate | null;
}

/** The user's own headline (output unit). */
export interface UserEstimate {
  readonly estimate: number | null;
  readonly interval: readonly [number, number] | null;
}

function calibrate(
  exact: number,
  values: readonly (number | null)[],
  intervals: readonly (readonly [number, number] | null)[],
): EstimatorCalibration {
  const xs = values.filter((v): v is number => v !== null && Number.isFinite(v));
  const m = xs.length;
  let mean: number | null = null;
  let spread: number | null = null;
  if (m > 0) {
    let s = 0;
    for (const x of xs) s += x;
    mean = s / m;
    if (m > 1) {
      let q = 0;
      for (const x of xs) q += (x - mean) * (x - mean);
      spread = Math.sqrt(q / (m - 1));
    }
  }
  let withInterval = 0;
  let covered = 0;
  for (const ci of intervals) {
    if (ci === null) continue;
    withInterval++;
    if (ci[0] <= exact && exact <= ci[1]) covered++;
  }
  const coverage = withInterval > 0 ? covered / withInterval : null;
  return {
    exact,
    replicates: m,
    mean,
    bias: mean === null ? null : mean - exact,
    biasStandardError: spread === null ? null : spread / Math.sqrt(m),
    spread,
    intervals: withInterval,
    covered,
    coverage,
    coverageStandardError: coverage === null ? null : Math.sqrt((coverage * (1 - coverage)) / withInterval),
  };
}

/**
 * Merges per-replicate records (from any number of workers, in any order; a replicate index seen
 * twice counts once) into bias, spread and coverage against the model's exact values, and the user's
 * estimate corrected by the bias. The corrected interval is centred on user - bias with half-width
 * sqrt(w^2 + (z SE_bias)^2), w the half-width of the user's own interval and z the normal quantile
 * of the same confidence: the two errors are independent (the surrogates do not use the data's
 * noise beyond the fitted model), so their variances add (common practice, no source).
 * @param exact the model's h and sigma^2 in the output unit
 * @param confidence level of the user's interval, in (0, 1)
 */
export function calibrationSummary(
  records: readonly ReplicateRecord[],
  exact: { readonly entropy: number; readonly sigma2: number },
  user: UserEstimate,
  confidence: number,
  order: number,
): CalibrationSummary {
  if (!(confidence > 0 && confidence < 1)) throw new RangeError(`confidence must be in (0, 1); got ${confidence}`);
  const byIndex = new Map<number, ReplicateRecord>();
  for (const r of records) if (!byIndex.has(r.replicate)) byIndex.set(r.replicate, r);
  const merged = [...byIndex.values()].sort((a, b) => a.replicate - b.replicate);
  const entropy = calibrate(
    exact.entropy,
    merged.map((r) => r.entropy),
    merged.map((r) => r.entropyInterval),
  );
  const sigma2 = calibrate(
    exact.sigma2,
    merged.map((r) => r.sigma2),
    merged.map((r) => r.sigma2Interval),
  );
  const methods: Record<string, number> = {};
  for (const r of merged) methods[r.entropyMethod] = (methods[r.entropyMethod] ?? 0) + 1;
  let correctedEntropy: CorrectedEstimate | null = null;
  if (user.estimate !== null && Number.isFinite(user.estimate) && user.interval !== null && entropy.bias !== null && entropy.biasStandardError !== null) {
    const z = normalQuantile((1 + confidence) / 2, 0, 1);
    const w = (user.interval[1] - user.interval[0]) / 2;
    const half = Math.sqrt(w * w + (z * entropy.biasStandardError) ** 2);
    const estimate = user.estimate - entropy.bias;
    correctedEntropy = {
      estimate,
      interval: [estimate - half, estimate + half],
      label: `corrected by Markov surrogates of order ${order}; valid to the extent the data resemble the fitted chain`,
    };
  }
  return { replicates: merged.length, entropy, sigma2, methods, correctedEntropy };
}
