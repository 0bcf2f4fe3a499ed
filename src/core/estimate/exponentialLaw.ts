import type { ExponentialLawSummary, LengthRow } from '../result/analysisResult';

/** Euler's constant gamma: -gamma is the mean of log E for E ~ Exp(1) (DLMF 5.4.12, 5.9.18). */
export const EULER_GAMMA = 0.5772156649015329;

/** Variance of log E for E ~ Exp(1): pi^2/6 (the trigamma function at 1, DLMF 5.15.1). */
export const LOG_EXPONENTIAL_VARIANCE = (Math.PI * Math.PI) / 6;

/**
 * How close R_n times the empirical block frequency is to the Exp(1) law at one block length: mean
 * and variance of log(R_n * count/M) against -gamma and pi^2/6. The limit law holds for well-mixing
 * sources (Hirata; Galves & Schmitt; Abadi; THEORY.md section 1), and the mean approaches -gamma
 * exponentially fast (Kim, Osaka J. Math. 49 (2012) 1-20).
 * @returns null when the row has no observed returns
 */
export function exponentialLaw(row: LengthRow): ExponentialLawSummary | null {
  if (row.meanLogRFreq === null || row.varLogRFreq === null) return null;
  return {
    n: row.n,
    meanLogRFreq: row.meanLogRFreq,
    expectedMean: -EULER_GAMMA,
    varLogRFreq: row.varLogRFreq,
    expectedVar: LOG_EXPONENTIAL_VARIANCE,
  };
}
