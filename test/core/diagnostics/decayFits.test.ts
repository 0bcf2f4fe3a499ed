import { describe, expect, test } from 'vitest';
import { fitExponentialDecay, fitPowerDecay, fitTailPowerDecay, gapsAboveFloor } from '../../../src/core/diagnostics/decayFits';
import { mixingGaps } from '../../../src/core/diagnostics/betaMixing';

describe('decay fits', () => {
  test('recover C and tau from an exact exponential', () => {
    // Closed form beta(k) = 0.3 exp(-k / 4): the log is a straight line in k.
    const gaps = mixingGaps(40);
    const beta = gaps.map((k) => 0.3 * Math.exp(-k / 4));
    const fit = fitExponentialDecay(gaps, beta);
    expect(fit).not.toBeNull();
    expect(fit?.scale).toBeCloseTo(4, 10);
    expect(fit?.C).toBeCloseTo(0.3, 10);
    expect(fit?.rSquared).toBeCloseTo(1, 12);
    expect(fit?.residualSd).toBeLessThan(1e-10);
    // A power law fitted to the same points is visibly worse.
    const pow = fitPowerDecay(gaps, beta);
    expect(pow?.residualSd).toBeGreaterThan(0.1);
  });

  test('recover C and the rate p from an exact power law', () => {
    // Closed form beta(k) = 0.5 k^-1.5: the log is a straight line in log k.
    const gaps = mixingGaps(500);
    const beta = gaps.map((k) => 0.5 * Math.pow(k, -1.5));
    const fit = fitPowerDecay(gaps, beta);
    expect(fit?.scale).toBeCloseTo(1.5, 10);
    expect(fit?.C).toBeCloseTo(0.5, 10);
    expect(fit?.rSquared).toBeCloseTo(1, 12);
    expect(fit?.gapRange).toEqual([1, gaps[gaps.length - 1]]);
  });

  test('fit only the leading gaps above the threshold, and need three of them', () => {
    const beta = [0.1, 0.05, 0.02, 0.001, 0.02];
    const threshold = [0.01, 0.01, 0.01, 0.01, 0.01];
    expect(gapsAboveFloor(beta, threshold)).toBe(3);
    expect(fitExponentialDecay([1, 2, 3, 4, 5], beta, 2)).toBeNull();
    expect(fitExponentialDecay([1, 2, 3, 4, 5], beta, 3)?.points).toBe(3);
  });

  test('a flat coefficient gives no tau and no rate (null)', () => {
    const gaps = [1, 2, 3, 4];
    const beta = [0.1, 0.1, 0.1, 0.1];
    expect(fitExponentialDecay(gaps, beta)?.scale).toBeNull();
    expect(fitPowerDecay(gaps, beta)?.scale).toBeNull();
  });

  test('the tail power law removes the floor and uses the later half of the gaps on the log scale', () => {
    // Closed form beta(k) = 0.2 k^-1.5 plus a constant floor 0.001: the excess is an exact power law.
    const gaps = mixingGaps(64);
    const floor = gaps.map(() => 0.001);
    const beta = gaps.map((k) => 0.2 * Math.pow(k, -1.5) + 0.001);
    const tail = fitTailPowerDecay(gaps, beta, floor);
    expect(tail?.scale).toBeCloseTo(1.5, 10);
    // Gaps up to 60; sqrt(1 * 60) = 7.7: the later half starts at gap 8.
    expect(tail?.gapRange).toEqual([8, 60]);
    // Without removing the floor the same points look flatter.
    expect(fitPowerDecay(gaps.slice(7), beta.slice(7))?.scale).toBeLessThan(1.4);
    // At least three points: over gaps 1..3 the later half is all three.
    expect(fitTailPowerDecay(gaps, beta, floor, 3)?.gapRange).toEqual([1, 3]);
    expect(fitTailPowerDecay(gaps, beta, floor, 2)).toBeNull();
  });
});
