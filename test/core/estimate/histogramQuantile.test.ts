import { describe, expect, it } from 'vitest';
import { histogramQuantile } from '../../../src/core/estimate/histogramQuantile';

describe('histogramQuantile', () => {
  it('interpolates linearly inside the bin where the cumulative count reaches p * total', () => {
    // source: by hand: counts [2, 0, 6, 2] (bins of 1/64 nat), total 10
    const h = Float64Array.from([2, 0, 6, 2]);
    expect(histogramQuantile(h, 0.5)).toBeCloseTo((2 + 3 / 6) / 64, 14); // 5 of 10: 3 into bin 2's 6
    expect(histogramQuantile(h, 0.2)).toBeCloseTo(1 / 64, 14); // exactly the end of bin 0
    expect(histogramQuantile(h, 1)).toBeCloseTo(4 / 64, 14);
    expect(histogramQuantile(h, 0)).toBeCloseTo(0, 14);
  });

  it('returns null for an empty histogram and rejects p outside [0, 1]', () => {
    // source: API contract
    expect(histogramQuantile(new Float64Array(5), 0.5)).toBeNull();
    expect(() => histogramQuantile(new Float64Array(5), 1.5)).toThrow(RangeError);
  });
});
