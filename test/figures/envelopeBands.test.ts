import { describe, expect, it } from 'vitest';
import {
  DEFAULT_ENVELOPE_OPTIONS,
  envelopeOptionProblems,
  errorTermHalfWidth,
  gaussianHalfWidth,
  iteratedLogHalfWidth,
} from '../../src/figures/envelopeBands';

describe('envelope half-widths', () => {
  it('iteratedLogHalfWidth is sigma sqrt(2 n log log n), worked by hand', () => {
    // n = 3: log 3 = 1.0986122887, log log 3 = 0.0940478276, 2*3*that = 0.5642869656, sqrt = 0.7511903.
    expect(iteratedLogHalfWidth(3, 1)).toBeCloseTo(0.7511903, 6);
    // n = 10: log 10 = 2.302585093, log log 10 = 0.834032445, 20*that = 16.6806489, sqrt = 4.0841950; sigma 0.5 halves it.
    expect(iteratedLogHalfWidth(10, 0.5)).toBeCloseTo(2.0420975, 6);
  });

  it('iteratedLogHalfWidth is undefined below n = 3, where log log n <= 0', () => {
    expect(iteratedLogHalfWidth(1, 1)).toBeNull();
    expect(iteratedLogHalfWidth(2, 1)).toBeNull();
  });

  it('gaussianHalfWidth is z sigma sqrt(n) and errorTermHalfWidth is C n^(1/2 - delta), by hand', () => {
    expect(gaussianHalfWidth(9, 0.5, 2)).toBe(3); // 2 * 0.5 * 3
    expect(errorTermHalfWidth(16, 2, 0.25)).toBeCloseTo(4, 12); // 2 * 16^(1/4)
    expect(errorTermHalfWidth(50, 1.5, 0.5)).toBe(1.5); // exponent 0: constant C
  });

  it('envelopeOptionProblems accepts the defaults and names each bad value', () => {
    expect(envelopeOptionProblems(DEFAULT_ENVELOPE_OPTIONS)).toEqual({});
    const problems = envelopeOptionProblems({ z: 0, delta: 0.9, errorC: Number.NaN });
    expect(problems.z).toBe('z must be a number above 0 and at most 10; got 0.');
    expect(problems.delta).toBe('δ must be a number from 0 to 0.5; got 0.9.');
    expect(problems.errorC).toBe('C must be a number above 0 and at most 1000; got NaN.');
    expect(envelopeOptionProblems({ z: 1, delta: -0.1, errorC: 1 })).toEqual({ delta: 'δ must be a number from 0 to 0.5; got -0.1.' });
  });
});
