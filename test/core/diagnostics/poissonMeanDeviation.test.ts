import { describe, expect, test } from 'vitest';
import { poissonMeanDeviation } from '../../../src/core/diagnostics/poissonMeanDeviation';

/** E|X - lambda| by summing the Poisson probabilities directly (the definition). */
function bySum(lambda: number): number {
  let p = Math.exp(-lambda);
  let total = 0;
  for (let x = 0; x < 2000; x++) {
    total += Math.abs(x - lambda) * p;
    p *= lambda / (x + 1);
  }
  return total;
}

describe('poissonMeanDeviation', () => {
  test('equals the direct sum of |x - lambda| P(x) below the normal switch', () => {
    for (const lambda of [0.01, 0.5, 1, 2.5, 7, 12.3, 29.9]) expect(poissonMeanDeviation(lambda)).toBeCloseTo(bySum(lambda), 12);
  });
  test('uses sqrt(2 lambda / pi) from 30 on, within 0.5% of the exact value', () => {
    for (const lambda of [30, 100, 400]) expect(Math.abs(poissonMeanDeviation(lambda) / bySum(lambda) - 1)).toBeLessThan(0.005);
  });
  test('is 0 at 0 and rejects negative means', () => {
    expect(poissonMeanDeviation(0)).toBe(0);
    expect(() => poissonMeanDeviation(-1)).toThrow(RangeError);
  });
});
