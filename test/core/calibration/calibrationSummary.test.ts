import { describe, expect, it } from 'vitest';
import { calibrationSummary } from '../../../src/core/calibration/calibrationSummary';
import type { ReplicateRecord } from '../../../src/core/calibration/surrogateStudy';

function record(replicate: number, entropy: number | null, ci: [number, number] | null, sigma2: number | null = null): ReplicateRecord {
  return { replicate, seed: replicate, entropy, entropyInterval: ci, entropyMethod: 'plugin-conditional', sigma2, sigma2Interval: null };
}

describe('calibrationSummary', () => {
  it('bias, spread, coverage and the corrected estimate, by hand', () => {
    const records = [
      record(0, 0.9, [0.8, 0.95]),
      record(1, 1.0, [0.9, 1.1]),
      record(2, 1.1, [0.95, 1.2]),
      record(3, 1.2, [1.0, 1.3], 2),
      record(3, 5.0, [4, 6]), // the same replicate again (from a second worker): counted once
      record(4, null, null), // no estimate: left out
    ];
    const s = calibrationSummary(records, { entropy: 1.0, sigma2: 1.5 }, { estimate: 2.0, interval: [1.8, 2.2] }, 0.95, 1);
    expect(s.replicates).toBe(5);
    expect(s.entropy.replicates).toBe(4);
    // mean (0.9 + 1.0 + 1.1 + 1.2)/4 = 1.05, bias 0.05
    expect(s.entropy.mean).toBeCloseTo(1.05, 14);
    expect(s.entropy.bias).toBeCloseTo(0.05, 14);
    // deviations -0.15 -0.05 0.05 0.15: squares sum to 0.05; SD = sqrt(0.05/3) = 0.129099444874
    expect(s.entropy.spread).toBeCloseTo(0.129099444874, 11);
    // SE = SD / 2 = 0.0645497224368
    expect(s.entropy.biasStandardError).toBeCloseTo(0.0645497224368, 11);
    // 1.0 lies in [0.9,1.1], [0.95,1.2], [1.0,1.3] but not in [0.8,0.95]: 3 of 4
    expect(s.entropy.intervals).toBe(4);
    expect(s.entropy.covered).toBe(3);
    expect(s.entropy.coverage).toBe(0.75);
    // sqrt(0.75 * 0.25 / 4) = 0.216506350946
    expect(s.entropy.coverageStandardError).toBeCloseTo(0.216506350946, 11);
    // corrected: 2.0 - 0.05 = 1.95; half-width sqrt(0.2^2 + (1.959963984540 * 0.0645497224368)^2)
    // = sqrt(0.04 + 0.0160060784) = 0.236656034 (z: normal quantile at 0.975, from memory)
    const c = s.correctedEntropy!;
    expect(c.estimate).toBeCloseTo(1.95, 14);
    expect(c.interval[0]).toBeCloseTo(1.95 - 0.236656034, 8);
    expect(c.interval[1]).toBeCloseTo(1.95 + 0.236656034, 8);
    expect(c.label).toMatch(/corrected by Markov surrogates of order 1; valid to the extent the data resemble the fitted chain/);
    // sigma^2: one estimate, no spread, no intervals
    expect(s.sigma2.replicates).toBe(1);
    expect(s.sigma2.bias).toBeCloseTo(0.5, 14);
    expect(s.sigma2.spread).toBeNull();
    expect(s.sigma2.coverage).toBeNull();
    expect(s.methods).toEqual({ 'plugin-conditional': 5 });
  });

  it('gives no corrected estimate without the user interval', () => {
    const s = calibrationSummary([record(0, 1, null), record(1, 2, null)], { entropy: 1, sigma2: 1 }, { estimate: 1, interval: null }, 0.95, 0);
    expect(s.correctedEntropy).toBeNull();
    expect(s.entropy.intervals).toBe(0);
    expect(s.entropy.coverage).toBeNull();
  });

  it('refuses a confidence outside (0, 1)', () => {
    expect(() => calibrationSummary([], { entropy: 1, sigma2: 1 }, { estimate: null, interval: null }, 1, 0)).toThrow(RangeError);
  });
});
