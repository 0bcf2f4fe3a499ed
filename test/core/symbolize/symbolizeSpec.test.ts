import { describe, expect, it } from 'vitest';
import { formatSymbolizeSpec, parseSymbolizeSpec } from '../../../src/core/symbolize/symbolizeSpec';

describe('parseSymbolizeSpec', () => {
  it('reads the three forms and writes them back canonically', () => {
    expect(parseSymbolizeSpec('quantile:4')).toEqual({ kind: 'quantile', cells: 4 });
    expect(parseSymbolizeSpec(' threshold: -1, 0.5 ,2e1')).toEqual({ kind: 'threshold', cuts: [-1, 0.5, 20] });
    expect(parseSymbolizeSpec('ordinal:3')).toEqual({ kind: 'ordinal', order: 3, delay: 1 });
    expect(parseSymbolizeSpec('Ordinal:4:2')).toEqual({ kind: 'ordinal', order: 4, delay: 2 });
    for (const text of ['quantile:4', 'threshold:-1,0.5,20', 'ordinal:4:2']) expect(formatSymbolizeSpec(parseSymbolizeSpec(text))).toBe(text);
  });

  it.each([
    ['quantile:1', /K must be between 2/],
    ['quantile:', /number of cells/],
    ['quantile:2.5', /whole number/],
    ['threshold:1,1', /increase strictly, but 1 follows 1/],
    ['threshold:2,1', /increase strictly/],
    ['threshold:1,x', /'x' is not a finite/],
    ['threshold:inf', /not a finite/],
    ['threshold:', /at least one cut point/],
    ['ordinal:1', /between 2 and 8, got 1/],
    ['ordinal:9', /between 2 and 8, got 9/],
    ['ordinal:3:0', /TAU must be at least 1/],
    ['ordinal:3:1:1', /ordinal:D or ordinal:D:TAU/],
    ['median', /unknown symbolization 'median'/],
  ])('refuses %s with a clear message', (text, message) => {
    expect(() => parseSymbolizeSpec(text)).toThrow(RangeError);
    expect(() => parseSymbolizeSpec(text)).toThrow(message);
  });
});
