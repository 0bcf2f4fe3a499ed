import { describe, expect, it } from 'vitest';
import { lengthRowsView, lengthTableView } from '../../../src/ui/view/lengthTableView';
import { fakeResult, lengthRow } from '../fixtures';

describe('lengthTableView', () => {
  it('marks the rows inside the trusted range and formats each column', () => {
    const view = lengthTableView(fakeResult());
    expect(view.rows.map((r) => [r.n, r.inTrustedRange])).toEqual([
      [1, false],
      [2, true],
      [3, true],
    ]);
    expect(view.rows[1]).toMatchObject({ positions: '999', censored: '1.0%', meanLogReturn: '3.000', distinctBlocks: '4' });
  });

  it('marks no row when there is no trusted range, and prefers the censoring-corrected mean log R', () => {
    const view = lengthTableView(fakeResult({ trustedRange: null, lengths: [lengthRow(1, { meanLogReturnCorrected: null, meanLogReturn: 0.5 })] }));
    expect(view.rows.map((r) => r.inTrustedRange)).toEqual([false]);
    expect(view.rows[0]?.meanLogReturn).toBe('0.500');
  });

  it('builds the same rows from rows alone; partial rows (no trusted range yet) mark none', () => {
    const result = fakeResult();
    expect(lengthRowsView(result.lengths, result.trustedRange, result.settings.unit)).toEqual(lengthTableView(result));
    const partial = lengthRowsView(result.lengths.slice(0, 2), null, 'bit');
    expect(partial.unit).toBe('bit');
    expect(partial.rows.map((r) => [r.n, r.inTrustedRange])).toEqual([
      [1, false],
      [2, false],
    ]);
  });
});
