import type { SampledPathsSummary } from '../core';

/**
 * One block length's column of a per-position table of sampled paths, as a plain array with NaN
 * where the value is missing (null, or a row shorter than n), which is what the core statistics take.
 * @param rows per sampled position, column n - 1 holds block length n
 * @param n block length (1-based)
 */
export function pathColumn(rows: readonly (readonly (number | null)[])[] | undefined, count: number, n: number): Float64Array {
  const out = new Float64Array(count).fill(Number.NaN);
  if (rows === undefined) return out;
  for (let i = 0; i < count; i++) {
    const v = rows[i]?.[n - 1];
    if (v !== null && v !== undefined) out[i] = v;
  }
  return out;
}

/** The largest n at which some sampled position has an observed (or censored-bound) value; 0 when none. */
export function lastPathLength(paths: SampledPathsSummary): number {
  let last = 0;
  const tables = [paths.logReturn, paths.logCensoredBound ?? []];
  for (const rows of tables) {
    for (const row of rows) {
      for (let j = row.length - 1; j >= last; j--) {
        if (row[j] !== null && row[j] !== undefined) {
          last = j + 1;
          break;
        }
      }
    }
  }
  return last;
}
