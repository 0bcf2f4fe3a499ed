import { describe, expect, it } from 'vitest';
import { bruteScan } from '../../helpers/bruteScan';
import { batchStandardError, randomSymbols, slopeOf } from '../../helpers/estimateFixtures';
import { batchPlan } from '../../../src/core/estimate/batchMeans';
import { levelBatchMoments } from '../../../src/core/estimate/levelBatchMoments';
import { varianceGrowth } from '../../../src/core/estimate/varianceGrowth';

describe('varianceGrowth', () => {
  it('is the least-squares slope of Var(log R_n) against n, with the batch-means error of per-batch slopes', () => {
    // source: THEORY.md section 3 heuristic Var log R_n ~ n sigma^2 + const; slope and SE by hand
    const x = randomSymbols(2000, 3, 23);
    const scan = bruteScan(x, 3, { maxN: 6, batchLength: 16, sampleStride: 16, matchWindow: 1000 });
    const plan = batchPlan(scan.batchLength, scan.batchCount, scan.levels[5]!.positions, 8);
    const moments = [4, 5, 6].map((n) => levelBatchMoments(scan.levels[n - 1]!, plan));
    const r = varianceGrowth(moments, 0.95);
    const ns = [4, 5, 6];
    expect(r.estimate).toBeCloseTo(slopeOf(ns, moments.map((m) => m.variance!)), 12);
    const per = Array.from({ length: plan.count }, (_, g) => slopeOf(ns, moments.map((m) => m.batchVariance[g]!)));
    expect(r.standardError).toBeCloseTo(batchStandardError(per, Array.from(moments[2]!.batchObserved)), 12);
    expect(varianceGrowth(moments.slice(0, 1), 0.95).estimate).toBeNull();
  });
});
