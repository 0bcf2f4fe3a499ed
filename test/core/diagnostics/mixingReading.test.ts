import { describe, expect, test } from 'vitest';
import type { DecayFit } from '../../../src/core/diagnostics/decayFits';
import { mixingReading, type MixingFacts } from '../../../src/core/diagnostics/mixingReading';

// The reading is a stated rule (mixingReading.ts), not an estimate: these tests pin its branches.
const fit = (kind: 'exponential' | 'power', scale: number, residualSd: number, gapRange: readonly [number, number] = [1, 40]): DecayFit => ({
  kind,
  C: 0.3,
  scale,
  rSquared: 0.9,
  residualSd,
  points: 10,
  gapRange,
});
const base: MixingFacts = {
  blockLength: 4,
  gapRange: [1, 1024],
  gapsAboveFloor: 10,
  belowFloorFrom: null,
  exponential: null,
  power: null,
  tailPower: null,
  batchLength: 6144,
  intervalBatches: 32,
  acfOutside: 2,
  acfExpectedOutside: 2.5,
};

describe('mixingReading', () => {
  test('a power law with rate at most 1 on the later gaps is too slow', () => {
    const r = mixingReading({
      ...base,
      exponential: fit('exponential', 100, 0.4),
      power: fit('power', 0.5, 0.1),
      tailPower: fit('power', 0.7, 0.1, [31, 867]),
    });
    expect(r.verdict).toBe('too-slow');
    expect(r.text).toContain('k^-0.70 over gaps 31 to 867');
    expect(r.text).toContain('too slow to trust the Gaussian band');
  });
  test('a clearly better power law with rate above 1 on the later gaps is slow, even when beta soon falls below the floor', () => {
    const facts = { ...base, belowFloorFrom: 31, exponential: fit('exponential', 10, 0.35), power: fit('power', 0.85, 0.04), tailPower: fit('power', 1.12, 0.05, [5, 24]) };
    const r = mixingReading(facts);
    expect(r.verdict).toBe('slow');
    expect(r.text).toContain('summable but slow');
  });
  test('a clearly better exponential with tau at most a tenth of the batch is fast, whatever the power fits say', () => {
    const r = mixingReading({ ...base, belowFloorFrom: 16, exponential: fit('exponential', 3.59, 0.01), power: fit('power', 1.2, 0.4), tailPower: fit('power', 0.9, 0.2) });
    expect(r.verdict).toBe('fast');
    expect(r.text).toContain('tau = 3.6 symbols');
    expect(r.text).toContain('32 batches of 6144 symbols');
    // The same decay against batches of 30 symbols is not short.
    expect(mixingReading({ ...base, batchLength: 30, exponential: fit('exponential', 3.59, 0.01), power: fit('power', 2, 0.4), tailPower: fit('power', 2.5, 0.2) }).verdict).toBe('slow');
  });
  test('an exponential that is not clearly better does not decide alone', () => {
    // Residual SD 0.3 vs 0.4: not below half of the power law's, so the tail rate p <= 1 decides.
    expect(mixingReading({ ...base, exponential: fit('exponential', 3, 0.3), power: fit('power', 0.9, 0.4), tailPower: fit('power', 0.9, 0.2) }).verdict).toBe('too-slow');
  });
  test('falling below the floor within a tenth of the batch is fast when no power law is clearly better', () => {
    expect(mixingReading({ ...base, gapsAboveFloor: 2, belowFloorFrom: 3 }).verdict).toBe('fast');
    expect(mixingReading({ ...base, gapsAboveFloor: 2, belowFloorFrom: 3, batchLength: 20 }).verdict).not.toBe('fast');
  });
  test('nothing above the floor is fast; no fit and no fall below the floor is unknown; correlated increments are mentioned', () => {
    expect(mixingReading({ ...base, gapsAboveFloor: 0, belowFloorFrom: 1 }).verdict).toBe('fast');
    const r = mixingReading({ ...base, gapsAboveFloor: 2, acfOutside: 20 });
    expect(r.verdict).toBe('unknown');
    expect(r.text).toContain('20 lags outside the band');
  });
});
