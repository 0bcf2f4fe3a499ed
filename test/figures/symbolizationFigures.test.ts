import { describe, expect, it } from 'vitest';
import { symbolizationSummary } from '../../src/core/symbolize/symbolizationSummary';
import { symbolizationHistogramFigure, symbolizationSeriesFigure } from '../../src/figures/symbolizationFigures';
import { symbolizationText } from '../../src/figures/symbolizationText';
import { figureCaption } from '../../src/figures/figureCaption';

// A small hand-made series; the figure models are checked by snapshot (numbers rounded by the models).
const values = Float64Array.from([0.3, 5, -1, 2.5, 7, 1, 4, 6, 2, 3]);
const summary = symbolizationSummary({ values, segments: [{ name: 'series', start: 0, length: values.length }], missing: 0, missingPolicy: 'skip', firstMissingLine: 0 }, { kind: 'quantile', cells: 4 }, { bins: 5, buckets: 5 });
const size = { width: 480, height: 260 };

describe('symbolization figures', () => {
  it('the series figure draws the series and one horizontal line per cut point', () => {
    const f = symbolizationSeriesFigure(summary, size);
    if (f.kind !== 'figure') throw new Error(f.message);
    expect(f.model.lines.map((l) => l.id)).toEqual(['series', 'cuts']);
    const cuts = f.model.lines[1];
    expect(cuts?.data.map((d) => d.y)).toEqual(summary.record.cutPoints);
    expect((cuts?.path.match(/M/g) ?? []).length).toBe(3);
    expect(f.model).toMatchSnapshot();
  });

  it('the histogram figure draws the bins and one vertical line per cut point', () => {
    const f = symbolizationHistogramFigure(summary, size);
    if (f.kind !== 'figure') throw new Error(f.message);
    expect(f.model.bands[0]?.data.reduce((s, d) => s + (d.y ?? 0), 0)).toBe(values.length);
    expect(f.model.lines[1]?.data.map((d) => d.x)).toEqual(summary.record.cutPoints);
    expect(f.model).toMatchSnapshot();
  });

  it('ordinal patterns have no cut lines', () => {
    const ordinal = symbolizationSummary({ values, segments: [{ name: 'series', start: 0, length: values.length }], missing: 0, missingPolicy: 'skip', firstMissingLine: 0 }, { kind: 'ordinal', order: 3, delay: 1 });
    const f = symbolizationHistogramFigure(ordinal, size);
    if (f.kind !== 'figure') throw new Error(f.message);
    expect(f.model.lines.map((l) => l.id)).toEqual(['bars']);
  });
});

describe('symbolizationText', () => {
  it('names the spec, the cut points and the missing-value policy, and goes into the caption', () => {
    const record = { spec: 'quantile:4', cutPoints: [0.5, 1, 2], cells: [], values: 10, missing: 3, missingPolicy: 'split' as const, segments: 2, segmentsDropped: 0 };
    expect(symbolizationText(record)).toBe('quantile:4, cut points 0.5, 1, 2; 3 missing values: series split into 2 segments, analysed apart');
    const caption = figureCaption({
      input: { name: 'x.csv', symbols: 10, alphabetSize: 4, sha256: null, format: 'csv', symbolization: record },
      settings: { maxN: 5, unit: 'nat', confidence: 0.95, maxCensoredFraction: 0.01, intervalSeconds: null },
      program: { name: 'returnrate', version: 'test' },
    });
    expect(caption.settings).toContain('symbolized quantile:4, cut points 0.5, 1, 2');
  });
});
