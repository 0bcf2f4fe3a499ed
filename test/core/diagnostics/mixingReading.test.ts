import { describe, expect, test } from 'vitest';
import type { DecayFit } from '../../../src/core/diagnostics/decayFits';
import { mixingReading, type MixingFacts } from '../../../src/core/diagnostics/mixingReading';

// The reading is a stated rule (mixingReading.ts), not an estimate: these tests pin its branches.
const fit = (kind: 'exponential' | 'power', scale: number, residualSd: number): DecayFit => ({
  kind,
  C: 0.3,
  scale,
  rSquared: 0.9,
  residualSd,
  points: 10,
  gapRange: [1, 40],
});
const base: MixingFacts = {
  blockLength: 4,
  gapRange: [1, 1024],
  gapsAboveFloor: 10,
  belowFloorFrom: null,
  exponential: null,
  power: null,
  blockLengthsUsed: 12,
  acfOutside: 2,
  acfExpectedOutside: 2.5,
};

describe('mixingReading', () => {
  test('a power law with rate at most 1 is too slow', () => {
    const r = mixingReading({ ...base, exponential: fit('exponential', 100, 0.4), power: fit('power', 0.5, 0.1) });
    expect(r.verdict).toBe('too-slow');
    expect(r.text).toContain('too slow to trust the Gaussian band');
  });
  test('a power law with rate above 1 is slow', () => {
    expect(mixingReading({ ...base, exponential: fit('exponential', 100, 0.4), power: fit('power', 1.6, 0.1) }).verdict).toBe('slow');
  });
  test('falling below the floor within the reach is fast', () => {
    expect(mixingReading({ ...base, gapsAboveFloor: 5, belowFloorFrom: 6 }).verdict).toBe('fast');
  });
  test('an exponential with 3 tau inside the reach is fast, outside it slow', () => {
    expect(mixingReading({ ...base, exponential: fit('exponential', 3, 0.1), power: fit('power', 2, 0.3) }).verdict).toBe('fast');
    expect(mixingReading({ ...base, exponential: fit('exponential', 30, 0.1), power: fit('power', 2, 0.3) }).verdict).toBe('slow');
  });
  test('no fit and no fall below the floor is unknown; correlated increments are mentioned', () => {
    const r = mixingReading({ ...base, gapsAboveFloor: 2, acfOutside: 20 });
    expect(r.verdict).toBe('unknown');
    expect(r.text).toContain('20 lags outside the band');
  });
});
