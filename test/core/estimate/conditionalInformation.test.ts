import { describe, expect, it } from 'vitest';
import { bruteScan } from '../../helpers/bruteScan';
import { blockCountsAt, stickyChain } from '../../helpers/estimateFixtures';
import { batchPlan } from '../../../src/core/estimate/batchMeans';
import { batchSizes, conditionalInformationSums, wellSampledLength } from '../../../src/core/estimate/conditionalInformation';

const N = 2400;
const x = stickyChain(N, 3);
const scan = bruteScan(x, 2, { maxN: 8, batchLength: 16, sampleStride: 64, matchWindow: 1200 });
const planAt = (positions: number) => batchPlan(scan.batchLength, scan.batchCount, positions, 12);

describe('conditionalInformationSums', () => {
  it('sums log c_(k-1)(p) - log c_k(p) over the positions of each coarse batch (c_0 = N)', () => {
    // source: definition of the empirical conditional information, from a direct block tally
    for (const k of [1, 2, 5]) {
      const plan = planAt(N - k + 1);
      const sums = conditionalInformationSums(scan.levels, k, plan);
      const before = blockCountsAt(x, k - 1);
      const here = blockCountsAt(x, k);
      for (let g = 0; g < plan.count; g++) {
        let s = 0;
        for (let p = plan.start[g]!; p < plan.end[g]!; p++) s += Math.log(before[p]!) - Math.log(here[p]!);
        expect(sums[g]).toBeCloseTo(s, 9);
      }
      expect(Array.from(batchSizes(plan))).toEqual(Array.from({ length: plan.count }, (_, g) => plan.end[g]! - plan.start[g]!));
    }
  });
});

describe('wellSampledLength', () => {
  it('is the last k before the mean count or the singleton share fails, counting from k = 1', () => {
    // source: the stated rule, checked against the levels' own counts
    const k = wellSampledLength(scan.levels, 20, 0.001);
    for (let n = 1; n <= k; n++) {
      const l = scan.levels[n - 1]!;
      expect(l.positions / l.distinctBlocks).toBeGreaterThanOrEqual(20);
      expect(l.singletons).toBeLessThanOrEqual(0.001 * l.positions);
    }
    const next = scan.levels[k];
    if (next !== undefined) expect(next.positions / next.distinctBlocks < 20 || next.singletons > 0.001 * next.positions).toBe(true);
    expect(wellSampledLength(scan.levels, 1e9)).toBe(0);
  });
});
