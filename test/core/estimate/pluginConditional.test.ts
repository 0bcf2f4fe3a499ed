import { describe, expect, it } from 'vitest';
import { bruteScan } from '../../helpers/bruteScan';
import { batchStandardError, randomSymbols, stickyChain } from '../../helpers/estimateFixtures';
import { batchPlan } from '../../../src/core/estimate/batchMeans';
import { millerMadowBlockEntropy } from '../../../src/core/estimate/blockEntropy';
import { conditionalInformationSums } from '../../../src/core/estimate/conditionalInformation';
import { pluginConditional } from '../../../src/core/estimate/pluginConditional';

const N = 2400;
const x = stickyChain(N, 3);
const scan = bruteScan(x, 2, { maxN: 8, batchLength: 16, sampleStride: 64, matchWindow: 1200 });
const planAt = (positions: number) => batchPlan(scan.batchLength, scan.batchCount, positions, 12);

describe('pluginConditional', () => {
  it('reports the Miller-Madow difference H_k - H_(k-1) at its k, a plateau only with a flat step into k', () => {
    // source: Miller 1955 correction and the stated plateau rule (pluginConditional.ts)
    const r = pluginConditional(scan.levels, planAt, 0.95);
    const k = r.k;
    expect(k).toBeGreaterThanOrEqual(1);
    expect(k).toBeLessThanOrEqual(Math.max(1, r.wellSampled));
    const hk = millerMadowBlockEntropy(scan.levels[k - 1]!) - (k > 1 ? millerMadowBlockEntropy(scan.levels[k - 2]!) : 0);
    expect(r.estimate).toBeCloseTo(hk, 12);
    expect(r.lengthsUsed).toEqual([k, k]);
    if (r.converged) {
      expect(k).toBeLessThan(r.wellSampled);
      expect(Math.abs(r.step!)).toBeLessThanOrEqual(2 * r.stepStandardError!);
    }
  });

  it('takes its standard error from the batch means of the conditional information at k', () => {
    // source: batch means (Schmeiser 1982) of Y_p = log c_(k-1)(p) - log c_k(p), by hand
    const r = pluginConditional(scan.levels, planAt, 0.95);
    const plan = planAt(N - r.k + 1);
    const sums = conditionalInformationSums(scan.levels, r.k, plan);
    const sizes = Array.from({ length: plan.count }, (_, g) => plan.end[g]! - plan.start[g]!);
    expect(r.standardError).toBeCloseTo(batchStandardError(sizes.map((L, g) => sums[g]! / L), sizes), 12);
  });

  it('falls back to k = 1, not converged, when single symbols are undersampled', () => {
    // source: the stated rule: 200 symbols over 64 letters give about 3 occurrences each (< 20)
    const y = randomSymbols(200, 64, 4);
    const s = bruteScan(y, 64, { maxN: 3, batchLength: 4, sampleStride: 8, matchWindow: 100 });
    const r = pluginConditional(s.levels, (p) => batchPlan(s.batchLength, s.batchCount, p, 8), 0.95);
    expect(r.wellSampled).toBe(0);
    expect(r.k).toBe(1);
    expect(r.converged).toBe(false);
    expect(r.note).toContain('undersampled');
  });
});
