import { describe, expect, it } from 'vitest';
import { symbolizationSummary } from '../../../src/core/symbolize/symbolizationSummary';
import { DEFAULT_READING, restoreReading } from '../../../src/ui/store/inputSlice';
import { previewOptionsFor, readerOptionsFor, symbolizeSpecOf } from '../../../src/ui/view/inputOptions';
import { symbolizationView } from '../../../src/ui/view/symbolizationView';

describe('symbolization in the reading choices', () => {
  const quantile = { ...DEFAULT_READING, symbolizeKind: 'quantile' as const, symbolizeParameter: '4', csvColumn: 'level' };

  it('adds the parsed spec and missing policy to numeric formats only', () => {
    expect(readerOptionsFor('a.csv', '', { ...quantile, format: 'csv' })).toEqual({ format: 'csv', column: 'level', hasHeader: true, symbolize: { kind: 'quantile', cells: 4 }, missing: 'skip' });
    expect(readerOptionsFor('a.txt', '', { ...quantile, format: 'numbers', missing: 'split' })).toEqual({ format: 'numbers', symbolize: { kind: 'quantile', cells: 4 }, missing: 'split' });
    expect(readerOptionsFor('a.txt', '', { ...quantile, format: 'tokens' })).toEqual({ format: 'tokens' });
  });

  it("'auto' with a symbolization reads a CSV file's column, anything else one number per line", () => {
    expect(readerOptionsFor('a.csv', 'x,level\n1,2\n', { ...quantile, format: 'auto' }).format).toBe('csv');
    expect(readerOptionsFor('a.txt', '1.5\n2\n', { ...quantile, format: 'auto' }).format).toBe('numbers');
    expect(previewOptionsFor({ ...quantile, format: 'auto' })).toMatchObject({ format: 'auto', symbolize: { kind: 'quantile', cells: 4 }, missing: 'skip' });
  });

  it('a bad parameter throws the parser message; none gives no spec', () => {
    expect(() => symbolizeSpecOf({ symbolizeKind: 'ordinal', symbolizeParameter: '9' })).toThrow(/order D must be between 2 and 8/);
    expect(symbolizeSpecOf({ symbolizeKind: 'none', symbolizeParameter: 'x' })).toBeNull();
    expect(symbolizeSpecOf({ symbolizeKind: 'ordinal', symbolizeParameter: '4:2' })).toEqual({ kind: 'ordinal', order: 4, delay: 2 });
  });

  it('restoreReading keeps a saved symbolization and drops invalid fields', () => {
    expect(restoreReading({ format: 'numbers', symbolizeKind: 'ordinal', symbolizeParameter: '3', missing: 'split' })).toEqual({
      ...DEFAULT_READING,
      format: 'numbers',
      symbolizeKind: 'ordinal',
      symbolizeParameter: '3',
      missing: 'split',
    });
    expect(restoreReading({ symbolizeKind: 'median', symbolizeParameter: 4, missing: 'zero' })).toEqual(DEFAULT_READING);
  });
});

describe('symbolizationView', () => {
  it('prints the spec, the cut points, the missing values and each cell with its share', () => {
    const values = Float64Array.from([0.3, 5, -1, 2.5, 7, 1, 4, 6]);
    const summary = symbolizationSummary({ values, segments: [{ name: 'series', start: 0, length: 8 }], missing: 2, missingPolicy: 'skip', firstMissingLine: 3 }, { kind: 'quantile', cells: 4 });
    const v = symbolizationView(summary, 'in the whole file');
    expect(v.specLine).toBe('Symbolization quantile:4: 8 values in the whole file give 8 symbols.');
    expect(v.cutsLine).toMatch(/^Cut points in the whole file: 1, 4, 6 \(a value equal to a cut point goes to the cell above\)/);
    expect(v.missingLine).toBe('2 missing values in the whole file, skipped.');
    expect(v.cells.map((c) => c.label)).toEqual(['q1', 'q2', 'q3', 'q4']);
    expect(v.cells[0]?.count).toBe('2');
  });
});
