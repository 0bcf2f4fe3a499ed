import { describe, expect, it } from 'vitest';
import {
  entropyFromNats,
  perSecond,
  perSecondUnitLabel,
  rateUnitLabel,
  varianceFromNats,
  varianceUnitLabel,
} from '../../../src/core/estimate/units';

describe('units', () => {
  it('turns nats into bits by dividing by log 2, and variances by (log 2)^2', () => {
    // source: 1 bit = log 2 nats (definition); THEORY.md section 2: 0.394668712115 nats = 0.569386593762 bits
    expect(entropyFromNats(0.394668712115, 'bit')).toBeCloseTo(0.569386593762, 11);
    expect(entropyFromNats(1.5, 'nat')).toBe(1.5);
    expect(varianceFromNats(Math.LN2 ** 2, 'bit')).toBeCloseTo(1, 14);
  });

  it('divides rates and their intervals by the seconds per symbol', () => {
    // source: by hand: 2 nats per symbol at 0.5 s per symbol = 4 nats per second
    expect(perSecond({ estimate: 2, ci95: [1, 3] }, 0.5)).toEqual({ estimate: 4, ci95: [2, 6] });
    expect(() => perSecond({ estimate: 2, ci95: [1, 3] }, 0)).toThrow(RangeError);
  });

  it('labels units', () => {
    // source: API contract
    expect([rateUnitLabel('bit'), perSecondUnitLabel('nat'), varianceUnitLabel('bit')]).toEqual(['bit/symbol', 'nat/s', 'bit^2/symbol']);
  });
});
