import { describe, expect, it } from 'vitest';
import { leastSquaresSlope } from '../../../src/core/estimate/leastSquaresSlope';

describe('leastSquaresSlope', () => {
  it('recovers the slope of an exact line and skips non-finite points', () => {
    // source: by hand, y = 3 - 0.5 x
    expect(leastSquaresSlope([1, 2, 3, 4], [2.5, 2, 1.5, 1])).toBeCloseTo(-0.5, 14);
    expect(leastSquaresSlope([1, 2, 3, 4], [2.5, Number.NaN, 1.5, 1])).toBeCloseTo(-0.5, 14);
  });

  it('matches the closed form sum (x - xbar)(y - ybar) / sum (x - xbar)^2 on scattered points', () => {
    // source: by hand: x = 1, 2, 3; y = 1, 3, 2: sxy = (-1)(-1) + 0 + (1)(0) = 1, sxx = 2, slope 1/2
    expect(leastSquaresSlope([1, 2, 3], [1, 3, 2])).toBeCloseTo(0.5, 14);
  });

  it('is NaN with fewer than two usable points', () => {
    // source: API contract
    expect(leastSquaresSlope([1], [1])).toBeNaN();
    expect(leastSquaresSlope([1, 2], [1, Number.NaN])).toBeNaN();
  });
});
