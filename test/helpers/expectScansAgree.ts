import { expect } from 'vitest';
import type { ReturnScan } from '../../src/core/returns/levelStats';

/**
 * Asserts that the fast engine's scan and the oracle's (bruteScan) agree: whether they ran out of
 * positions, the match positions, the forward-return paths, and every LevelStats field up to maxN.
 * Counts must be equal; the log sums may differ by the engine's table logarithm, accurate to 5e-12
 * per value (src/core/returns/logOfPositive.ts), so sums of a few hundred stay far inside 1e-6.
 */
export function expectScansAgree(fast: ReturnScan, slow: ReturnScan, maxN: number): void {
  expect(fast.exhausted).toBe(slow.exhausted);
  expect(fast.matchPositions).toBe(slow.matchPositions);
  expect(Array.from(fast.paths.forward)).toEqual(Array.from(slow.paths.forward));
  expect(Array.from(fast.paths.counts)).toEqual(Array.from(slow.paths.counts));
  for (let n = 1; n <= maxN; n++) {
    const s = slow.levels[n - 1]!;
    const f = fast.levels[n - 1]!;
    for (const key of ['positions', 'distinctBlocks', 'singletons', 'forwardObserved', 'observed', 'matchCount'] as const) {
      expect(f[key], `${key} at n = ${n}`).toBe(s[key]);
    }
    for (const key of ['sumCountLogCount', 'forwardSumLog', 'forwardSumLog2', 'sumLog', 'sumLog2', 'sumLogRc', 'sumLogRc2'] as const) {
      expect(Math.abs(f[key] - s[key]), `${key} at n = ${n}`).toBeLessThan(1e-6);
    }
    expect(Array.from(f.histogram)).toEqual(Array.from(s.histogram));
    expect(Array.from(f.batchObserved)).toEqual(Array.from(s.batchObserved));
  }
}
