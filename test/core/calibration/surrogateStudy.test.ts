import { describe, expect, it } from 'vitest';
import { calibrateSequence, fitCalibrationModel } from '../../../src/core/calibration/calibrationResult';
import { replicateSeed, surrogateStudy } from '../../../src/core/calibration/surrogateStudy';
import { analyzeSequence } from '../../../src/core/analyze';
import { DEFAULT_SETTINGS } from '../../../src/core/result/analysisResult';
import { markovSource } from '../../../src/core/sources/markovSource';
import { TWO_STATE } from '../../helpers/referenceChains';

const N = 20000;
const R = 20;
const settings = { ...DEFAULT_SETTINGS, maxN: 24 };
const input = { name: 'two-state', sha256: null, format: 'generated' };

describe('surrogate study', () => {
  it('replicate seeds are distinct per index and per base seed', () => {
    const seeds = new Set<number>();
    for (const base of [1, 2, -3, 2 ** 40]) for (let i = 0; i < 50; i++) seeds.add(replicateSeed(base, i));
    expect(seeds.size).toBe(200);
    for (const s of seeds) expect(Number.isSafeInteger(s)).toBe(true);
    expect(() => replicateSeed(1, -1)).toThrow(RangeError);
  });

  it('records do not depend on how the replicates are split among workers', () => {
    const seq = markovSource(TWO_STATE).generate(5000, 3);
    const { model } = fitCalibrationModel(seq);
    const s = { ...settings, maxN: 16 };
    const all = surrogateStudy(model, seq.alphabet, 5000, s, 9, [0, 1, 2, 3]);
    const split = [...surrogateStudy(model, seq.alphabet, 5000, s, 9, [2, 3]), ...surrogateStudy(model, seq.alphabet, 5000, s, 9, [0, 1])];
    expect(split.sort((a, b) => a.replicate - b.replicate)).toEqual(all);
  });

  it('end to end at N = 2e4, R = 20: coverage with its binomial SE, bias within 4 SE of the directly computed mean difference', () => {
    const source = markovSource(TWO_STATE);
    const seq = source.generate(N, 1);
    const analysis = analyzeSequence(seq, input, settings);
    let seen = 0;
    const cal = calibrateSequence(seq, analysis, R, 7, { onReplicate: () => void seen++ });
    expect(seen).toBe(R);
    expect(cal.partial).toBe(false);
    expect(cal.model.order).toBe(1);
    const e = cal.summary.entropy;
    expect(e.replicates).toBe(R);
    expect(e.coverage).not.toBeNull();
    expect(e.coverageStandardError).toBeCloseTo(Math.sqrt((e.coverage! * (1 - e.coverage!)) / e.intervals), 14);
    // Directly: R fresh paths of the true chain (other seeds) analysed the same way; mean of
    // estimate - exact (exact from THEORY.md section 2 via markovSource). The fitted chain is close to
    // the true one, so the two biases agree within 4 combined standard errors.
    const direct: number[] = [];
    for (let i = 0; i < R; i++) {
      const r = analyzeSequence(source.generate(N, 1000 + i), input, settings, { pathSamples: 1 });
      direct.push(r.entropy.estimate - source.facts.entropyRate!);
    }
    const mean = direct.reduce((s, x) => s + x, 0) / R;
    const sd = Math.sqrt(direct.reduce((s, x) => s + (x - mean) ** 2, 0) / (R - 1));
    const se = Math.hypot(sd / Math.sqrt(R), e.biasStandardError!);
    expect(Math.abs(e.bias! - mean)).toBeLessThan(4 * se);
    // The corrected estimate is the user's minus the bias.
    expect(cal.summary.correctedEntropy!.estimate).toBeCloseTo(analysis.entropy.estimate - e.bias!, 14);
    expect(cal.summary.sigma2.replicates).toBe(R);
  });
});
