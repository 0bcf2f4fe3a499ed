import { describe, expect, it } from 'vitest';
import { previewHead } from '../../../src/core/sequence/previewHead';
import { downsampleMinMax } from '../../../src/core/symbolize/downsampleMinMax';
import { symbolizationSummary } from '../../../src/core/symbolize/symbolizationSummary';
import { valueHistogram } from '../../../src/core/symbolize/valueHistogram';

const utf8 = (text: string): Uint8Array => new TextEncoder().encode(text);

describe('valueHistogram', () => {
  it('counts values in equal-width bins, the maximum in the last bin', () => {
    // By hand: range [0, 4], 4 bins of width 1.
    const h = valueHistogram(Float64Array.from([0, 0.5, 1, 2.5, 4, 3.99]), 4);
    expect(Array.from(h.edges)).toEqual([0, 1, 2, 3, 4]);
    expect(Array.from(h.counts)).toEqual([2, 1, 1, 2]);
  });

  it('puts equal values into one bin around them', () => {
    const h = valueHistogram(Float64Array.from([2, 2, 2]), 10);
    expect(Array.from(h.edges)).toEqual([1.5, 2.5]);
    expect(Array.from(h.counts)).toEqual([3]);
  });
});

describe('downsampleMinMax', () => {
  it('keeps the min and max of each run of consecutive values', () => {
    // 7 values in 3 buckets: starts floor(b*7/3) = 0, 2, 4, 7 (by hand).
    const d = downsampleMinMax(Float64Array.from([1, 5, -2, 3, 9, 0, 4]), 3);
    expect(Array.from(d.starts)).toEqual([0, 2, 4, 7]);
    expect(Array.from(d.min)).toEqual([1, -2, 0]);
    expect(Array.from(d.max)).toEqual([5, 3, 9]);
  });

  it('has one value per bucket when the series is shorter than the buckets', () => {
    const d = downsampleMinMax(Float64Array.from([3, 1]), 600);
    expect(Array.from(d.starts)).toEqual([0, 1, 2]);
    expect(Array.from(d.min)).toEqual([3, 1]);
  });
});

describe('symbolizationSummary', () => {
  it('gathers cut points, cell counts, histogram and segment starts', () => {
    const values = Float64Array.from([0.3, 5, -1, 2.5, 7, 1, 4, 6]);
    const s = symbolizationSummary(
      { values, segments: [{ name: 'a', start: 0, length: 3 }, { name: 'b', start: 3, length: 5 }], missing: 1, missingPolicy: 'split', firstMissingLine: 4 },
      { kind: 'quantile', cells: 4 },
      { bins: 4, buckets: 4 },
    );
    // Cut points by the stated rule (see symbolizeSeries.test.ts): 1, 4, 6.
    expect(s.record.cutPoints).toEqual([1, 4, 6]);
    expect(s.cells.map((c) => c.count)).toEqual([2, 2, 2, 2]);
    expect(Array.from(s.histogram.counts).reduce((a, b) => a + b, 0)).toBe(8);
    expect(s.segmentStarts).toEqual([3]);
    expect(s.series.min.length).toBe(4);
  });
});

describe('previewHead with a symbolization', () => {
  it('reads the head as numbers and adds the summary; auto reads one number per line', () => {
    const head = utf8('1.5\n2\nNA\n0.5\n4\n');
    const p = previewHead(head, head.length, 'levels.txt', { format: 'auto', symbolize: { kind: 'threshold', cuts: [1] } });
    expect(p.format).toBe('numbers');
    expect(p.symbolsInHead).toBe(4);
    expect(p.symbolization?.record.cells).toEqual([
      { label: '<1', count: 1 },
      { label: '>=1', count: 3 },
    ]);
    expect(p.issues.map((i) => i.code)).toEqual(['reader-warning']);
  });

  it('reports a bad number as a read error with its position', () => {
    const head = utf8('1\nlow\n');
    const p = previewHead(head, head.length, 'levels.txt', { format: 'numbers', symbolize: { kind: 'quantile', cells: 2 } });
    expect(p.symbolization).toBeUndefined();
    expect(p.issues).toEqual([{ code: 'read-error', message: expect.stringMatching(/^line 2, column 1, byte 2: 'low' is not a number/) as unknown }]);
  });
});
