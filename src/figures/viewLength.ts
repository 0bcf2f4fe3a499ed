import type { AnalysisResult } from '../core';
import { lastPathLength } from './pathColumn';

/** Block lengths a per-n view can show: 1 up to the last n where a sampled path still has a value. */
export function viewLengthRange(result: AnalysisResult): readonly [number, number] {
  return [1, Math.max(1, lastPathLength(result.paths))];
}

/**
 * The block length a per-n view starts at: the middle of the trusted range (or, without one, of the
 * lengths the headline estimate used), rounded down and kept inside viewLengthRange.
 */
export function defaultViewLength(result: AnalysisResult): number {
  const [lo, hi] = result.trustedRange === null ? result.entropy.lengthsUsed : [result.trustedRange.lo, result.trustedRange.hi];
  return clampViewLength(result, Math.floor((lo + hi) / 2));
}

/** The chosen block length (null: the default) kept inside viewLengthRange. */
export function clampViewLength(result: AnalysisResult, n: number | null): number {
  if (n === null || !Number.isFinite(n)) return defaultViewLength(result);
  const [lo, hi] = viewLengthRange(result);
  return Math.min(hi, Math.max(lo, Math.round(n)));
}
