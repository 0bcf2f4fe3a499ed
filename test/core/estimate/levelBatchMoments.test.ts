import { describe, expect, it } from 'vitest';
import { bruteScan } from '../../helpers/bruteScan';
import { nearerReturns, randomSymbols } from '../../helpers/estimateFixtures';
import { batchPlan } from '../../../src/core/estimate/batchMeans';
import { groupCensoringOffsets } from '../../../src/core/estimate/censoringCorrection';
import { levelBatchMoments } from '../../../src/core/estimate/levelBatchMoments';

describe('levelBatchMoments', () => {
  it('gives each coarse batch its raw mean and variance of observed log R plus its censoring offsets', () => {
    // source: direct sums over the batch's positions of the nearer-history returns (levelStats.ts)
    const x = randomSymbols(2000, 3, 7);
    const scan = bruteScan(x, 3, { maxN: 6, batchLength: 16, sampleStride: 16, matchWindow: 1000 });
    const plan = batchPlan(scan.batchLength, scan.batchCount, scan.levels[5]!.positions, 8);
    for (const n of [3, 6]) {
      const level = scan.levels[n - 1]!;
      const m = levelBatchMoments(level, plan);
      const R = nearerReturns(x, n);
      const { meanOffset, varianceOffset } = groupCensoringOffsets(level, plan.start, plan.end);
      for (let g = 0; g < plan.count; g++) {
        const logs: number[] = [];
        for (let i = plan.start[g]!; i < plan.end[g]!; i++) if (R[i]! > 0) logs.push(Math.log(R[i]!));
        const mean = logs.reduce((s, v) => s + v, 0) / logs.length;
        const variance = logs.reduce((s, v) => s + (v - mean) ** 2, 0) / (logs.length - 1);
        expect(m.batchObserved[g]).toBe(logs.length);
        expect(m.batchMean[g]).toBeCloseTo(mean + meanOffset[g]!, 10);
        expect(m.batchVariance[g]).toBeCloseTo(variance + varianceOffset[g]!, 10);
      }
    }
  });
});
