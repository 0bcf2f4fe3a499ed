import type { EntropyUnit, Interval } from '../result/analysisResult';

/** Nats in one bit: log(2). */
export const NATS_PER_BIT = Math.LN2;

/** Factor that turns an entropy in nats into the given unit (1 for nats, 1/log 2 for bits). */
export function entropyFactor(unit: EntropyUnit): number {
  return unit === 'bit' ? 1 / NATS_PER_BIT : 1;
}

/** An entropy (nats) in the given unit. */
export function entropyFromNats(valueNats: number, unit: EntropyUnit): number {
  return valueNats * entropyFactor(unit);
}

/** A variance of information (nats^2) in the given unit squared. */
export function varianceFromNats(valueNats2: number, unit: EntropyUnit): number {
  const f = entropyFactor(unit);
  return valueNats2 * f * f;
}

/** Label of an entropy rate per symbol, e.g. 'nat/symbol'. */
export function rateUnitLabel(unit: EntropyUnit): string {
  return `${unit}/symbol`;
}

/** Label of a rate per second, e.g. 'bit/s'. */
export function perSecondUnitLabel(unit: EntropyUnit): string {
  return `${unit}/s`;
}

/** Label of sigma^2, e.g. 'nat^2/symbol'. */
export function varianceUnitLabel(unit: EntropyUnit): string {
  return `${unit}^2/symbol`;
}

/**
 * A per-symbol interval turned into a per-second one: divide by the seconds per symbol.
 * @param intervalSeconds seconds per symbol, > 0
 */
export function perSecond(interval: Interval, intervalSeconds: number): Interval {
  if (!(intervalSeconds > 0) || !Number.isFinite(intervalSeconds)) {
    throw new RangeError(`intervalSeconds must be a positive finite number; got ${intervalSeconds}`);
  }
  return {
    estimate: interval.estimate / intervalSeconds,
    ci95: [interval.ci95[0] / intervalSeconds, interval.ci95[1] / intervalSeconds],
  };
}
