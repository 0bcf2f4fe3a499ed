/** What every entropy-rate estimator returns, in nats per symbol (converted to the output unit later). */
export interface EstimatorResult {
  /** Point estimate; null when the method cannot be applied to these data. */
  readonly estimate: number | null;
  readonly standardError: number | null;
  /** Confidence interval at the requested level, or null. */
  readonly interval: readonly [number, number] | null;
  /** Block lengths used, [from, to]. */
  readonly lengthsUsed: readonly [number, number] | null;
  /** One or two plain sentences: what was done, or why nothing could be. */
  readonly note: string;
}

/** An estimator result that says why the method does not apply. */
export function notApplicable(note: string): EstimatorResult {
  return { estimate: null, standardError: null, interval: null, lengthsUsed: null, note };
}
