import { DOMParser } from '@xmldom/xmldom';
import { describe, expect, it } from 'vitest';
import { analyzeSequence } from '../../src/core/analyze';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import { renewalSource } from '../../src/core/sources/renewalSource';
import { autocorrelationFigure } from '../../src/figures/autocorrelationFigure';
import { exportDiagnosticFigures } from '../../src/figures/exportDiagnosticFigures';
import { figureCsv, figureCsvRowCount } from '../../src/figures/figureCsv';
import { figureSvg } from '../../src/figures/figureSvg';
import { decayValue, mixingFigure } from '../../src/figures/mixingFigure';
import { reportHtml } from '../../src/figures/reportHtml';

// A renewal chain (tail exponent 1.5, slow mixing) so both fits exist; only the figures' structure
// and their agreement with the diagnostics they draw are checked here.
const sequence = renewalSource(1.5).generate(100_000, 9);
const result = analyzeSequence(sequence, { name: 'renewal.txt', sha256: null, format: 'generated' }, { ...DEFAULT_SETTINGS, maxN: 20 });
const SIZE = { width: 640, height: 400 };

describe('diagnostics figures', () => {
  it('mixingFigure draws every beta(k), the noise floor and both fits at their fitted values', () => {
    const d = result.diagnostics;
    const b = d?.beta;
    expect(b).toBeTruthy();
    if (!d || !b) return;
    const f = mixingFigure(d, SIZE);
    expect(f.kind).toBe('figure');
    if (f.kind !== 'figure') return;
    const ids = f.model.lines.map((l) => l.id);
    expect(ids).toEqual(['noise-floor', 'exponential', 'power']);
    expect(f.model.points[0]?.data.length).toBe(b.gaps.length);
    const power = f.model.lines.find((l) => l.id === 'power');
    const fit = b.power;
    expect(fit).not.toBeNull();
    if (!power || !fit) return;
    // Data rows hold log10 values at log10 k.
    for (const row of power.data) expect(row.y).toBeCloseTo(Math.log10(decayValue(fit, 10 ** row.x) ?? Number.NaN), 9);
    expect(f.model.notes[0]).toContain('Block length m =');
  });

  it('autocorrelationFigure shows one point per lag and the +-1.96/sqrt(n) band', () => {
    const a = result.diagnostics?.autocorrelation;
    const f = autocorrelationFigure(result.diagnostics, SIZE);
    expect(f.kind).toBe('figure');
    if (f.kind !== 'figure' || !a) return;
    expect(f.model.points[0]?.data.map((r) => r.x)).toEqual(a.lags);
    expect(f.model.bands[0]?.data[0]?.upper).toBeCloseTo(a.band, 12);
  });

  it('both export as well-formed SVG and as CSV with one row per plotted value', () => {
    for (const { id, figure, caption } of exportDiagnosticFigures(result)) {
      expect(figure.kind).toBe('figure');
      if (figure.kind !== 'figure') continue;
      const errors: string[] = [];
      new DOMParser({ onError: (level, message) => errors.push(`${level}: ${message}`) }).parseFromString(figureSvg(figure.model, caption), 'image/svg+xml');
      expect(errors).toEqual([]);
      const csv = figureCsv(id, figure.model, caption);
      const dataLines = csv.split('\n').filter((l) => l !== '' && !l.startsWith('#'));
      expect(dataLines.length - 1).toBe(figureCsvRowCount(figure.model));
    }
  });

  it('a result without diagnostics gives a plain reason instead of a figure', () => {
    expect(mixingFigure(undefined, SIZE).kind).toBe('unavailable');
    expect(autocorrelationFigure(undefined, SIZE).kind).toBe('unavailable');
  });

  it('the report has a diagnostics section with the reading in words and the moments table', () => {
    const html = reportHtml(result);
    expect(html).toContain('<section id="diagnostics"><h2>Mixing diagnostics</h2>');
    expect(html).toContain(`data-verdict="${result.diagnostics?.reading.verdict ?? ''}"`);
    expect(html).toContain('cannot prove mixing');
    expect(html).toContain('id="information-moments"');
  });
});
