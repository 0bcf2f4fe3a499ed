/**
 * Half-widths of the bands around log R_n − n h that the envelope figure draws, all in nats.
 *
 * - Gaussian: z sigma sqrt(n), from the central limit theorem for log R_n (Kontoyiannis 1998,
 *   "Asymptotic recurrence and waiting times for stationary processes", J. Theoret. Probab. 11).
 * - Iterated logarithm: sigma sqrt(2 n log log n), the law of the iterated logarithm (Khinchin
 *   1924, Kolmogorov 1929; for log R_n, Kontoyiannis 1998); defined for n >= 3, where
 *   log log n > 0.
 * - Error term: C n^(1/2 − delta), the order of the remainder in the almost-sure approximation of
 *   log R_n − n h by sigma times a Brownian motion (Kontoyiannis 1998; from memory). C and delta
 *   are the user's: the theory gives their existence, not their values.
 */

/** z sigma sqrt(n). */
export function gaussianHalfWidth(n: number, sigma: number, z: number): number {
  return z * sigma * Math.sqrt(n);
}

/** sigma sqrt(2 n log log n) for n >= 3; null below, where log log n is not positive. */
export function iteratedLogHalfWidth(n: number, sigma: number): number | null {
  if (n < 3) return null;
  return sigma * Math.sqrt(2 * n * Math.log(Math.log(n)));
}

/** C n^(1/2 − delta). */
export function errorTermHalfWidth(n: number, C: number, delta: number): number {
  return C * Math.pow(n, 0.5 - delta);
}

export interface EnvelopeOptions {
  /** Multiplier of the Gaussian band, > 0 (1.96 for 95% at each n). */
  readonly z: number;
  /** Exponent reduction of the error term, 0 <= delta <= 1/2. */
  readonly delta: number;
  /** Constant of the error term, nats, > 0. */
  readonly errorC: number;
}

export const DEFAULT_ENVELOPE_OPTIONS: EnvelopeOptions = { z: 1.96, delta: 0.1, errorC: 1 };

export type EnvelopeField = keyof EnvelopeOptions;

/** Plain messages for each bad option (empty when all are usable). */
export function envelopeOptionProblems(options: EnvelopeOptions): Partial<Record<EnvelopeField, string>> {
  const problems: Partial<Record<EnvelopeField, string>> = {};
  if (!(Number.isFinite(options.z) && options.z > 0 && options.z <= 10)) problems.z = `z must be a number above 0 and at most 10; got ${String(options.z)}.`;
  if (!(Number.isFinite(options.delta) && options.delta >= 0 && options.delta <= 0.5)) {
    problems.delta = `δ must be a number from 0 to 0.5; got ${String(options.delta)}.`;
  }
  if (!(Number.isFinite(options.errorC) && options.errorC > 0 && options.errorC <= 1000)) {
    problems.errorC = `C must be a number above 0 and at most 1000; got ${String(options.errorC)}.`;
  }
  return problems;
}
