import { describe, expect, it } from 'vitest';
import { bruteScan } from '../../helpers/bruteScan';
import { stickyChain } from '../../helpers/estimateFixtures';
import { batchPlan, longRunVariance } from '../../../src/core/estimate/batchMeans';
import { conditionalInformationSums, wellSampledLength } from '../../../src/core/estimate/conditionalInformation';
import { informationVariance } from '../../../src/core/estimate/informationVariance';

const N = 2400;
const x = stickyChain(N, 3);
const scan = bruteScan(x, 2, { maxN: 8, batchLength: 16, sampleStride: 64, matchWindow: 1200 });
const planAt = (positions: number) => batchPlan(scan.batchLength, scan.batchCount, positions, 12);

describe('informationVariance', () => {
  it('is the batch-means long-run variance of the conditional information at the plateau length', () => {
    // source: THEORY.md section 6 formula, evaluated on the same batch sums
    const r = informationVariance(scan.levels, planAt, 0.95, 2);
    expect(r.k).toBe(2);
    const plan = planAt(N - 1);
    const sizes = Array.from({ length: plan.count }, (_, g) => plan.end[g]! - plan.start[g]!);
    const lrv = longRunVariance(conditionalInformationSums(scan.levels, 2, plan), sizes, 0.95)!;
    expect(r.estimate).toBeCloseTo(lrv.variance, 14);
    expect(r.interval).toEqual([lrv.lower, lrv.upper]);
    expect(r.standardError).toBeCloseTo(lrv.variance * Math.sqrt(2 / (plan.count - 1)), 14);
  });

  it('uses the largest block length with 100 occurrences per block when there is no plateau', () => {
    // source: the stated rule (informationVariance.ts)
    const r = informationVariance(scan.levels, planAt, 0.95, null);
    expect(r.k).toBe(Math.max(1, wellSampledLength(scan.levels, 100)));
  });
});
