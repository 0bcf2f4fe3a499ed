import { describe, expect, it } from 'vitest';
import { chooseEntropyHeadline, type HeadlineCandidates } from '../../../src/core/estimate/entropyHeadline';
import type { EstimatorResult } from '../../../src/core/estimate/estimatorResult';
import type { PluginConditionalResult } from '../../../src/core/estimate/pluginConditional';

const none: EstimatorResult = { estimate: null, standardError: null, interval: null, lengthsUsed: null, note: '' };
const est = (estimate: number, se: number, n: [number, number] = [5, 6]): EstimatorResult => ({
  estimate,
  standardError: se,
  interval: [estimate - 2 * se, estimate + 2 * se],
  lengthsUsed: n,
  note: '',
});
const plugin = (estimate: number, converged: boolean, k = 4): PluginConditionalResult => ({
  ...est(estimate, 0.001, [k, k]),
  k,
  wellSampled: 6,
  step: converged ? 0.0001 : 0.01,
  stepStandardError: 0.001,
  converged,
});
const candidates = (over: Partial<HeadlineCandidates>): HeadlineCandidates => ({
  returnSlope: none,
  pluginConditional: { ...none, k: 0, wellSampled: 0, step: null, stepStandardError: null, converged: false },
  returnMean: none,
  matchLength: none,
  ...over,
});

describe('chooseEntropyHeadline', () => {
  it('prefers the plug-in when the conditional entropies have reached a plateau', () => {
    // source: the stated rule (entropyHeadline.ts)
    const c = chooseEntropyHeadline(candidates({ returnSlope: est(0.69, 0.002), pluginConditional: plugin(0.693, true) }), 'nat/symbol');
    expect(c.method).toBe('plugin-conditional');
    expect(c.warnings).toEqual([]);
    expect(c.reason).toContain('plateau at k = 4');
  });

  it('takes the return slope over a converged plug-in when sigma^2 is negligible', () => {
    // source: the stated rule (entropyHeadline.ts): telescoping information sums void the plug-in's batch-means error
    const c = chooseEntropyHeadline(
      candidates({ returnSlope: est(0.481, 0.002), pluginConditional: plugin(0.4812, true), sigma2Negligible: true }),
      'nat/symbol',
    );
    expect(c.method).toBe('return-slope');
    expect(c.reason).toContain('sigma^2 is negligible');
    const withoutSlope = chooseEntropyHeadline(candidates({ pluginConditional: plugin(0.4812, true), sigma2Negligible: true }), 'nat/symbol');
    expect(withoutSlope.method).toBe('plugin-conditional');
  });

  it('prefers the plug-in at its top k over a slope confined to small n when its last step is below the early drift', () => {
    // source: the stated rule (entropyHeadline.ts, rule 2); the drift at small n is THEORY.md section 3's fair-coin table
    const flatTop: PluginConditionalResult = { ...plugin(1.2734, false, 3), step: 0.004, stepStandardError: 0.0007 };
    const early = chooseEntropyHeadline(candidates({ returnSlope: est(1.363, 0.003, [2, 3]), pluginConditional: flatTop }), 'nat/symbol');
    expect(early.method).toBe('plugin-conditional');
    expect(early.reason).toContain('still drifts');
    const settled = chooseEntropyHeadline(candidates({ returnSlope: est(1.27, 0.003, [7, 8]), pluginConditional: flatTop }), 'nat/symbol');
    expect(settled.method).toBe('return-slope');
    const falling: PluginConditionalResult = { ...flatTop, step: 0.2, stepStandardError: 0.001 };
    expect(chooseEntropyHeadline(candidates({ returnSlope: est(1.363, 0.003, [2, 3]), pluginConditional: falling }), 'nat/symbol').method).toBe('return-slope');
  });

  it('keeps the plug-in when its last step is below a quarter of its error and the slope lies well below it', () => {
    // source: the stated rule (entropyHeadline.ts, rule 2): step 0.0002 < 0.25 * 0.001, yet 4 step errors
    // from zero; 0.512 - 0.502 = 0.010 > 2 * hypot(0.003, 0.001) = 0.0063
    const smallStep: PluginConditionalResult = { ...plugin(0.512, false, 9), step: 0.0002, stepStandardError: 0.00005 };
    const c = chooseEntropyHeadline(candidates({ returnSlope: est(0.502, 0.003, [9, 10]), pluginConditional: smallStep }), 'nat/symbol');
    expect(c.method).toBe('plugin-conditional');
    expect(c.reason).toContain('barely moves its interval');
    expect(c.warnings.map((w) => w.code)).toEqual(['estimators-disagree']);
    const pick = (slope: EstimatorResult, plug: PluginConditionalResult) =>
      chooseEntropyHeadline(candidates({ returnSlope: slope, pluginConditional: plug }), 'nat/symbol').method;
    // a visible step (0.0003 > 0.00025), a slope within two errors (0.512 - 0.508 = 0.004), a slope above
    expect(pick(est(0.502, 0.003, [9, 10]), { ...smallStep, step: 0.0003 })).toBe('return-slope');
    expect(pick(est(0.508, 0.003, [9, 10]), smallStep)).toBe('return-slope');
    expect(pick(est(0.522, 0.003, [9, 10]), smallStep)).toBe('return-slope');
  });

  it('warns when a return slope disagrees with a converged plug-in by more than three standard errors', () => {
    // source: the stated rule: |0.68 - 0.693| = 0.013 > 3 * hypot(0.002, 0.001) = 0.0067
    const c = chooseEntropyHeadline(candidates({ returnSlope: est(0.68, 0.002), pluginConditional: plugin(0.693, true) }), 'nat/symbol');
    expect(c.warnings.map((w) => w.code)).toEqual(['estimators-disagree']);
  });

  it('takes the return slope when the block entropies are still falling', () => {
    // source: the stated rule
    const c = chooseEntropyHeadline(candidates({ returnSlope: est(0.5, 0.01), pluginConditional: plugin(0.52, false) }), 'bit/symbol');
    expect(c.method).toBe('return-slope');
    expect(c.reason).toContain('still falling');
    expect(c.reason).toContain('bit/symbol');
  });

  it('falls back to the plug-in, then the mean return, then match lengths, each with a warning', () => {
    // source: the stated rule
    expect(chooseEntropyHeadline(candidates({ pluginConditional: plugin(0.5, false) }), 'nat').method).toBe('plugin-conditional');
    const mean = chooseEntropyHeadline(candidates({ returnMean: est(0.4, 0.01) }), 'nat');
    expect([mean.method, mean.warnings[0]!.code]).toEqual(['return-mean', 'headline-fallback']);
    expect(chooseEntropyHeadline(candidates({ matchLength: est(0.6, 0.01) }), 'nat').method).toBe('match-length');
    const nothing = chooseEntropyHeadline(candidates({}), 'nat');
    expect([nothing.method, nothing.warnings[0]!.code]).toEqual(['none', 'no-estimate']);
  });
});
