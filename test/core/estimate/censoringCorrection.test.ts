import { describe, expect, it } from 'vitest';
import {
  censoringCorrectedMoments,
  groupCensoringOffsets,
  observableCount,
  unseenTailBias,
} from '../../../src/core/estimate/censoringCorrection';
import type { LevelStats } from '../../../src/core/returns/levelStats';

/** Thresholds of the nearer-history view, straight from levelStats.ts: forward in the first half. */
function threshold(M: number, i: number): number {
  return i < Math.floor(M / 2) ? M - 1 - i : i;
}

/** A level whose observed returns are given directly (only the fields the correction reads matter). */
function levelWith(M: number, returns: readonly number[]): LevelStats {
  const histogram = new Float64Array(Math.floor(64 * Math.log(Math.max(M, 2))) + 2);
  let sumLog = 0;
  let sumLog2 = 0;
  for (const r of returns) {
    const l = Math.log(r);
    sumLog += l;
    sumLog2 += l * l;
    histogram[Math.min(Math.floor(l * 64), histogram.length - 1)]!++;
  }
  const z = new Float64Array(1);
  return {
    n: 1, positions: M, distinctBlocks: 1, singletons: 0, sumCountLogCount: 0,
    forwardObserved: 0, forwardSumLog: 0, forwardSumLog2: 0,
    observed: returns.length, sumLog, sumLog2, sumLogRc: 0, sumLogRc2: 0, histogram, matchCount: 0,
    batchObserved: z, batchSumLog: z, batchSumLog2: z, batchSumLogCount: z,
  };
}

describe('observableCount', () => {
  it('counts the positions whose nearer-history threshold is at least t, for whole levels and for ranges', () => {
    // source: brute count over positions of the rule in src/core/returns/levelStats.ts
    for (const M of [1, 2, 7, 10, 33]) {
      for (let t = 1; t <= M + 1; t++) {
        for (const [s, e] of [[0, M], [0, 3], [2, 9], [Math.floor(M / 2), M], [5, 40]] as const) {
          let direct = 0;
          for (let i = Math.max(0, s); i < Math.min(e, M); i++) if (threshold(M, i) >= t) direct++;
          expect(observableCount(M, t, s, e), `M=${M} t=${t} [${s},${e})`).toBe(direct);
        }
      }
    }
  });
});

describe('censoringCorrectedMoments', () => {
  it('equals the plain mean when no histogram bin reaches above M/2', () => {
    // source: nothing below floor(M/2) + 1 can be censored (levelStats.ts), so the weights are all 1
    const level = levelWith(10_000, [1, 2, 3, 50, 700, 4000, 4900]);
    const m = censoringCorrectedMoments(level);
    const logs = [1, 2, 3, 50, 700, 4000, 4900].map(Math.log);
    const mean = logs.reduce((s, v) => s + v, 0) / logs.length;
    expect(m.mean).toBeCloseTo(mean, 12);
    expect(m.restored).toBe(7);
    expect(unseenTailBias(level, m)).toBeCloseTo(Math.max(0, 1 - 7 / 10_000) * (Math.log(10_000) + 1 - mean), 12);
  });

  it('weights a return above M/2 by M / (number of positions where it is observable), within its 1/64-nat bin', () => {
    // source: Horvitz & Thompson (1952) weights; R = 9000 of M = 10000 is observable at about 2(M - R) positions
    const M = 10_000;
    const level = levelWith(M, [10, 9000]);
    const m = censoringCorrectedMoments(level);
    const k = Math.floor(Math.log(9000) * 64);
    const lo = Math.ceil(Math.exp(k / 64));
    const hi = Math.ceil(Math.exp((k + 1) / 64)) - 1;
    const wLow = M / observableCount(M, lo);
    const wHigh = M / observableCount(M, hi);
    expect(m.restored).toBeGreaterThanOrEqual(1 + wLow);
    expect(m.restored).toBeLessThanOrEqual(1 + wHigh);
    // the restored mass sits at log R in [log lo, log hi], so the mean lies between these two mixtures
    const w = m.restored - 1;
    expect(m.mean!).toBeGreaterThanOrEqual((Math.log(10) + w * Math.log(lo)) / (1 + w) - 1e-12);
    expect(m.mean!).toBeLessThanOrEqual((Math.log(10) + w * Math.log(hi)) / (1 + w) + 1e-12);
  });
});

describe('groupCensoringOffsets', () => {
  it('is zero for every group when no return can be censored', () => {
    // source: with all weights 1 every group expects the same observed law
    const level = levelWith(1000, [1, 2, 3, 4, 100, 400]);
    const { meanOffset, varianceOffset } = groupCensoringOffsets(level, [0, 250, 500, 750], [250, 500, 750, 1000]);
    for (let g = 0; g < 4; g++) {
      expect(meanOffset[g]).toBeCloseTo(0, 12);
      expect(varianceOffset[g]).toBeCloseTo(0, 12);
    }
  });

  it('raises the mean of groups near the middle, where long returns are censored, more than at the ends', () => {
    // source: thresholds are about M at the ends and M/2 in the middle (levelStats.ts)
    const level = levelWith(1000, [1, 2, 3, 4, 100, 400, 600, 700, 800, 900]);
    const { meanOffset } = groupCensoringOffsets(level, [0, 400, 900], [100, 600, 1000]);
    expect(meanOffset[1]!).toBeGreaterThan(meanOffset[0]!);
    expect(meanOffset[1]!).toBeGreaterThan(meanOffset[2]!);
  });
});
