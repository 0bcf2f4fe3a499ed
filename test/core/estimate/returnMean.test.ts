import { describe, expect, it } from 'vitest';
import { bruteScan } from '../../helpers/bruteScan';
import { batchStandardError, randomSymbols } from '../../helpers/estimateFixtures';
import { batchPlan } from '../../../src/core/estimate/batchMeans';
import { levelBatchMoments } from '../../../src/core/estimate/levelBatchMoments';
import { returnMean } from '../../../src/core/estimate/returnMean';

describe('returnMean', () => {
  it('is the corrected mean log R_n / n, with the batch-means error of the per-batch values / n', () => {
    // source: definition (Ornstein & Weiss 1993 estimator); batch means SE by hand (Schmeiser 1982)
    const x = randomSymbols(1500, 2, 17);
    const scan = bruteScan(x, 2, { maxN: 8, batchLength: 8, sampleStride: 16, matchWindow: 700 });
    const plan = batchPlan(scan.batchLength, scan.batchCount, scan.levels[7]!.positions, 10);
    const top = levelBatchMoments(scan.levels[7]!, plan);
    const r = returnMean(top, 0.9);
    expect(r.estimate).toBeCloseTo(top.mean! / 8, 14);
    expect(r.lengthsUsed).toEqual([8, 8]);
    const values = Array.from(top.batchMean, (v) => v / 8);
    expect(r.standardError).toBeCloseTo(batchStandardError(values, Array.from(top.batchObserved)), 12);
  });

  it('does not apply without a level', () => {
    // source: API contract
    expect(returnMean(null, 0.9).estimate).toBeNull();
  });
});
