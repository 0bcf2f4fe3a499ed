import { describe, expect, it } from 'vitest';
import { symbolizationWarning } from '../../../src/core/symbolize/symbolizationWarning';

// The cases are worked by hand: a constant series puts every value in one cell (quantile: all cut
// points equal the value and a value equal to a cut goes up), so one symbol remains.

const values = (...xs: number[]): Float64Array => Float64Array.from(xs);

describe('symbolizationWarning', () => {
  it('explains a constant series under two quantile cells (one cut point)', () => {
    expect(symbolizationWarning(values(3, 3, 3), { kind: 'quantile', cells: 2 }, ['q2'])).toEqual({
      code: 'constant-series',
      message: "all 3 values equal 3 (zero range): the quantile cut point equals 3, and a value equal to a cut goes to the cell above, so the sequence has the one symbol 'q2' and an entropy rate of 0",
    });
  });

  it('explains a constant series under thresholds', () => {
    expect(symbolizationWarning(values(-1, -1), { kind: 'threshold', cuts: [0] }, ['<0'])?.message).toBe(
      "all 2 values equal -1 (zero range): every value falls in the same cell, so the sequence has the one symbol '<0' and an entropy rate of 0",
    );
  });

  it('names a single occupied cell of a series that is not constant', () => {
    expect(symbolizationWarning(values(1, 2, 3), { kind: 'threshold', cuts: [5] }, ['<5'])).toEqual({ code: 'one-symbol', message: "every value falls in the same cell, so the sequence has the one symbol '<5' and an entropy rate of 0" });
    expect(symbolizationWarning(values(1, 2, 3, 4), { kind: 'ordinal', order: 2, delay: 1 }, ['01'])?.message).toMatch(/^every window has the same pattern, so .*'01'/);
  });

  it('counts quantile cells left empty by ties, and says nothing when all are used', () => {
    expect(symbolizationWarning(values(1, 1, 1, 2), { kind: 'quantile', cells: 3 }, ['q2', 'q3'])?.code).toBe('empty-cells');
    expect(symbolizationWarning(values(1, 2, 3, 4), { kind: 'quantile', cells: 2 }, ['q1', 'q2'])).toBeNull();
  });
});
