import { describe, expect, it } from 'vitest';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import { convergenceDataOfResult, convergenceFigure, convergenceFigureOfRows, partialConvergenceData } from '../../src/figures/convergenceFigure';
import type { FigureModel } from '../../src/figures/figureModel';
import { fakeResult, lengthRow } from '../ui/fixtures';

const SIZE = { width: 400, height: 300 };

function model(figure: ReturnType<typeof convergenceFigure>): FigureModel {
  if (figure.kind !== 'figure') throw new Error(figure.message);
  return figure.model;
}

const rows = [1, 2, 3].map((n) =>
  lengthRow(n, { quantilesLogReturn: [0.2 * n, 0.8 * n, n, 1.4 * n, 2 * n], blockEntropyMillerMadow: 2 * n, conditionalEntropy: 2 - 0.1 * n }),
);

describe('convergenceFigure', () => {
  it('reads out mean log R_n / n, quantile bands, H_n / n and the conditional entropy at each n (nats)', () => {
    const m = model(convergenceFigure(fakeResult({ lengths: rows }), SIZE));
    // lengthRow sets the corrected mean log R_n to 1.5 n, so the rate is 1.5 at every n; quantiles are (0.2, 0.8, 1, 1.4, 2) n.
    expect(m.readout.map((s) => s.rows.map((r) => r.value))).toEqual([
      ['1.500', '0.8000 to 1.400', '0.2000 to 2.000', '2.000', '1.900'],
      ['1.500', '0.8000 to 1.400', '0.2000 to 2.000', '2.000', '1.800'],
      ['1.500', '0.8000 to 1.400', '0.2000 to 2.000', '2.000', '1.700'],
    ]);
    expect(m.x.label).toBe('Block length n');
    expect(m.y).toMatchObject({ label: 'log R_n / n', unit: 'nat/symbol' });
    expect(m.x.ticks.map((t) => t.value)).toEqual([1, 2, 3]);
  });

  it('converts to bits for a result in bits: rate 1.5 nats is 1.5 / log 2 = 2.164 bits', () => {
    const m = model(convergenceFigure(fakeResult({ lengths: rows, settings: { ...DEFAULT_SETTINGS, unit: 'bit' } }), SIZE));
    expect(m.readout[0]?.rows[0]?.value).toBe('2.164');
    expect(m.y.unit).toBe('bit/symbol');
  });

  it('draws the paths as log R_n / n with gaps, in SVG below the segment limit', () => {
    // fakeResult's paths: [0.1, 0.2, null] and [0.3, null, null]: one segment in all.
    const m = model(convergenceFigure(fakeResult({ lengths: rows }), SIZE));
    expect(m.pathLayer).toMatchObject({ segments: 1, render: 'svg' });
    expect(m.pathLayer?.paths[1]).toMatch(/^M[\d.]+,[\d.]+Z$/);
    expect(model(convergenceFigure(fakeResult({ lengths: rows }), SIZE, { showPaths: false })).pathLayer).toBeNull();
  });

  it('adds the exact h and the estimate as reference lines and marks the trusted range', () => {
    const m = model(convergenceFigure(fakeResult({ lengths: rows, reference: { source: 's', entropyRate: 1.25, sigma2: 0.2 } }), SIZE));
    expect(m.lines.map((l) => l.id)).toEqual(['mean', 'plugin', 'conditional', 'estimate', 'exact']);
    expect(m.legend.map((e) => e.label)).toContain('Exact h = 1.250');
    expect(m.spans).toHaveLength(1);
    expect(m.spans[0]?.label).toBe('Trusted n = 2–3');
    // Every series differs from the others by dash or marker, not only by colour.
    const cues = m.lines.map((l) => `${l.style.dash}|${l.style.marker}`);
    expect(new Set(cues).size).toBe(cues.length);
  });

  it('matches its snapshot (pixels rounded to 0.01)', () => {
    expect(convergenceFigure(fakeResult({ lengths: rows, reference: { source: 's', entropyRate: 1.25, sigma2: 0.2 } }), SIZE)).toMatchSnapshot();
  });

  it('says why there is no figure for a result without block lengths', () => {
    expect(convergenceFigure(fakeResult({ lengths: [] }), SIZE)).toEqual({ kind: 'unavailable', message: 'The result has no block lengths to plot.' });
  });
});

describe('convergenceFigureOfRows', () => {
  it('draws a result\'s data exactly as convergenceFigure does', () => {
    const result = fakeResult({ lengths: rows, reference: { source: 's', entropyRate: 1.25, sigma2: 0.2 } });
    expect(convergenceFigureOfRows(convergenceDataOfResult(result), SIZE)).toEqual(convergenceFigure(result, SIZE));
  });

  it('draws partial rows on an n axis up to the run\'s maxN, with no paths, estimate or trusted range, and says they are partial', () => {
    const m = model(convergenceFigureOfRows(partialConvergenceData(rows.slice(0, 2), 'nat', 10), SIZE));
    // the axis runs from n = 1 at the plot's left edge to n = 10 at its right: n = 2 sits 1/9 of the way
    expect(m.x.ticks[m.x.ticks.length - 1]?.value).toBe(10);
    expect(m.readout[0]?.x).toBeCloseTo(m.plot.left, 2);
    expect(m.readout[1]?.x).toBeCloseTo(m.plot.left + m.plot.width / 9, 1);
    expect(m.readout.map((r) => r.n)).toEqual([1, 2]);
    // same per-n values as the full figure's first two stops
    const full = model(convergenceFigure(fakeResult({ lengths: rows }), SIZE));
    expect(m.readout.map((r) => r.rows.map((v) => v.value))).toEqual(full.readout.slice(0, 2).map((r) => r.rows.map((v) => v.value)));
    expect(m.lines.map((l) => l.id)).toEqual(['mean', 'plugin', 'conditional']);
    expect(m.pathLayer).toBeNull();
    expect(m.spans).toEqual([]);
    expect(m.title).toBe('Convergence of log R_n / n (partial: n = 1..2)');
    expect(m.notes).toEqual([]);
  });

  it('says why there is no figure before the first row arrives', () => {
    expect(convergenceFigureOfRows(partialConvergenceData([], 'nat', 10), SIZE)).toEqual({ kind: 'unavailable', message: 'No block length has finished yet.' });
  });
});
