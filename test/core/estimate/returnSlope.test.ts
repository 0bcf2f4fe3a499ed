import { describe, expect, it } from 'vitest';
import { bruteScan } from '../../helpers/bruteScan';
import { batchStandardError, randomSymbols, slopeOf } from '../../helpers/estimateFixtures';
import { batchPlan } from '../../../src/core/estimate/batchMeans';
import { levelBatchMoments } from '../../../src/core/estimate/levelBatchMoments';
import { returnSlope } from '../../../src/core/estimate/returnSlope';

const x = randomSymbols(2000, 3, 7);
const scan = bruteScan(x, 3, { maxN: 6, batchLength: 16, sampleStride: 16, matchWindow: 1000 });
const plan = batchPlan(scan.batchLength, scan.batchCount, scan.levels[5]!.positions, 8);
const moments = [3, 4, 5, 6].map((n) => levelBatchMoments(scan.levels[n - 1]!, plan));

describe('returnSlope', () => {
  it('is the least-squares slope of the corrected means, with the batch-means error of the per-batch slopes', () => {
    // source: least squares by hand; batch means SE (Schmeiser 1982) weighted by the top level's observed returns
    const r = returnSlope(moments, 0.95);
    const ns = moments.map((m) => m.n);
    expect(r.estimate).toBeCloseTo(slopeOf(ns, moments.map((m) => m.mean!)), 12);
    expect(r.lengthsUsed).toEqual([3, 6]);
    const per = Array.from({ length: plan.count }, (_, g) => slopeOf(ns, moments.map((m) => m.batchMean[g]!)));
    expect(r.standardError).toBeCloseTo(batchStandardError(per, Array.from(moments[3]!.batchObserved)), 12);
    expect(r.interval![1] - r.estimate!).toBeCloseTo(r.estimate! - r.interval![0], 12);
  });

  it('needs two levels', () => {
    // source: API contract
    expect(returnSlope(moments.slice(0, 1), 0.95).estimate).toBeNull();
  });
});
