import { describe, expect, it } from 'vitest';
import { EULER_GAMMA, exponentialLaw, LOG_EXPONENTIAL_VARIANCE } from '../../../src/core/estimate/exponentialLaw';
import type { LengthRow } from '../../../src/core/result/analysisResult';

describe('exponentialLaw', () => {
  it('compares the row with mean -gamma and variance pi^2/6 of log Exp(1)', () => {
    // source: THEORY.md section 3: -gamma = -0.577215664901533, pi^2/6 = 1.64493406684823 (DLMF 5.4.12, 5.15)
    expect(EULER_GAMMA).toBeCloseTo(0.577215664901533, 15);
    expect(LOG_EXPONENTIAL_VARIANCE).toBeCloseTo(1.64493406684823, 14);
    const row = { n: 12, meanLogRFreq: -0.6, varLogRFreq: 1.7 } as LengthRow;
    expect(exponentialLaw(row)).toEqual({ n: 12, meanLogRFreq: -0.6, expectedMean: -EULER_GAMMA, varLogRFreq: 1.7, expectedVar: LOG_EXPONENTIAL_VARIANCE });
    expect(exponentialLaw({ ...row, meanLogRFreq: null })).toBeNull();
  });
});
