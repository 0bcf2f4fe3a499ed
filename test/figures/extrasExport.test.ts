import { describe, expect, it } from 'vitest';
import { parseSvg, marks } from '../helpers/markupDocument';
import { normalQuantilePlot } from '../../src/core/estimate/normalQuantilePlot';
import { calibrationCaption, exportCalibrationFigure } from '../../src/figures/exportCalibrationFigure';
import { comparisonCaption, exportComparisonFigures } from '../../src/figures/exportComparisonFigures';
import { captionLines } from '../../src/figures/figureCaption';
import { figureCsv, figureCsvRowCount } from '../../src/figures/figureCsv';
import type { Figure, FigureModel } from '../../src/figures/figureModel';
import { figureSvg } from '../../src/figures/figureSvg';
import { exportFileName } from '../../src/export/exportFileName';
import { extrasFixture, HOSTILE_NAME, HOSTILE_NAME_B } from '../helpers/sessionExtrasFixtures';

const { result, calibration, comparison } = extrasFixture();

function modelOf(figure: Figure): FigureModel {
  if (figure.kind !== 'figure') throw new Error(figure.message);
  return figure.model;
}

/** Data rows of a CSV (after the # comments and the header), split naively: the fixture's series labels hold no commas or quotes. */
function dataRows(csv: string): string[][] {
  return csv
    .split('\r\n')
    .filter((l) => l !== '' && !l.startsWith('#'))
    .slice(1)
    .map((l) => l.split(','));
}

/** The SVG holds as many marks as the model asks for (lines with a path, markers, points, legend entries). */
function expectMarksOfModel(doc: Document, model: FigureModel): void {
  expect(marks(doc, 'line').length).toBe(model.lines.filter((l) => l.path !== '').length);
  expect(marks(doc, 'band').length).toBe(model.bands.length);
  const markers = model.lines.reduce((s, l) => s + (l.style.marker === null ? 0 : l.vertices.length), 0);
  expect(marks(doc, 'markers').reduce((s, g) => s + g.getElementsByTagName('path').length, 0)).toBe(markers);
  const points = model.points.reduce((s, p) => s + (p.style.marker === null ? 0 : p.points.length), 0);
  expect(marks(doc, 'points').reduce((s, g) => s + g.getElementsByTagName('path').length, 0)).toBe(points);
  expect(marks(doc, 'legend').length).toBe(model.legend.length);
}

describe('calibration figure export', () => {
  const { id, figure, caption } = exportCalibrationFigure(calibration, result);
  const model = modelOf(figure);

  it('the caption names the input, its SHA-256, the settings and the replicates and seed', () => {
    const lines = captionLines(caption);
    expect(lines).toContain(`Input: ${HOSTILE_NAME}`);
    expect(lines).toContain(`SHA-256: ${result.input.sha256}`);
    expect(lines.find((l) => l.startsWith('Settings: '))).toBe('Settings: max n 12, unit nat, confidence 0.95, max censored fraction 0.01');
    expect(lines).toContain(`View: calibration by Markov surrogates: 10 of 10 replicates, base seed 5, fitted order ${calibration.model.order} (BIC)`);
    // Without the result (or with another one) the calibration's own record gives the same input and settings.
    expect(calibrationCaption(calibration, null)).toEqual(caption);
  });

  it(`${id}: the SVG parses, holds no script, and its marks are the model's; one point per surrogate estimate`, () => {
    const svg = figureSvg(model, caption);
    expect(svg).not.toMatch(/<script/i);
    const doc = parseSvg(svg);
    expect(doc.getElementsByTagName('script').length).toBe(0);
    expectMarksOfModel(doc, model);
    const estimates = calibration.records.filter((r) => r.entropy !== null).length;
    expect(estimates).toBe(10);
    expect(marks(doc, 'points').reduce((s, g) => s + g.getElementsByTagName('path').length, 0)).toBe(estimates);
    const texts = Array.from(doc.getElementsByTagName('text')).map((t) => t.textContent);
    expect(texts.some((t) => t?.startsWith('Input: wind "gusts", <script>alert(1)</script>'))).toBe(true);
  });

  it('the CSV has one row per plotted value: estimates, interval ends, exact and mean lines', () => {
    const csv = figureCsv(id, model, caption);
    const rows = dataRows(csv);
    expect(rows).toHaveLength(figureCsvRowCount(model));
    const of = (series: string): string[][] => rows.filter((r) => r[1] === series);
    const estimates = calibration.records.filter((r) => r.entropy !== null);
    expect(of('estimates')).toHaveLength(estimates.length);
    // Sorted as plotted: x is the estimate, y its rank.
    expect(of('estimates').map((r) => Number(r[3]))).toEqual(estimates.map((r) => r.entropy!).sort((a, b) => a - b));
    const withInterval = estimates.filter((r) => r.entropyInterval !== null).length;
    // Each interval gives its two ends (the break between intervals is not a value).
    expect(of('covering').length + of('missing').length).toBe(2 * withInterval);
    expect(of('missing').length / 2).toBe(calibration.summary.entropy.intervals - calibration.summary.entropy.covered);
    expect(of('exact').map((r) => Number(r[3]))).toEqual([calibration.summary.entropy.exact, calibration.summary.entropy.exact]);
    expect(of('mean').map((r) => Number(r[3]))).toEqual([calibration.summary.entropy.mean, calibration.summary.entropy.mean]);
    expect(csv).toContain(`# View: calibration by Markov surrogates: 10 of 10 replicates, base seed 5`);
    expect(csv).toContain(`# SHA-256: ${result.input.sha256}`);
    // The file name keeps only safe characters.
    expect(exportFileName(caption.inputName, id, 'csv')).toMatch(/^[A-Za-z0-9._-]+$/);
  });
});

describe('comparison figure export', () => {
  const figures = exportComparisonFigures(comparison);

  it('the captions name both inputs with their SHA-256 and the segment pairs', () => {
    for (const f of figures) {
      const lines = captionLines(f.caption);
      expect(lines.slice(0, 4)).toEqual([
        `Input A: ${HOSTILE_NAME}`,
        `SHA-256 of A: ${comparison.inputA.sha256}`,
        `Input B: ${HOSTILE_NAME_B}`,
        `SHA-256 of B: ${comparison.inputB.sha256}`,
      ]);
      expect(lines.find((l) => l.startsWith('View: '))).toContain(`${comparison.pairs} segment pairs`);
      expect(exportFileName(f.caption.inputName, f.id, 'svg')).toMatch(/^[A-Za-z0-9._-]+_compare-(convergence|qq)\.svg$/);
    }
    expect(comparisonCaption('compare-qq', comparison).view).toMatch(/^n = \d+, centred with the estimated H and σ/);
  });

  for (const { id, figure, caption } of figures) {
    it(`${id}: the SVG parses with the model's marks and no script; the CSV rows are the plotted values`, () => {
      const model = modelOf(figure);
      const svg = figureSvg(model, caption);
      expect(svg).not.toMatch(/<script|<b>/i);
      const doc = parseSvg(svg);
      expectMarksOfModel(doc, model);
      const rows = dataRows(figureCsv(id, model, caption));
      expect(rows).toHaveLength(figureCsvRowCount(model));
      if (id === 'compare-convergence') {
        // One mean log W_n / n per block length of the comparison.
        expect(rows.filter((r) => r[1] === 'mean')).toHaveLength(comparison.lengths.length);
      } else {
        const plotted = model.points.reduce((s, p) => s + p.data.length, 0);
        expect(rows.filter((r) => r[0] === 'points')).toHaveLength(plotted);
        // The drawn points are those the Q-Q computation keeps (thinned to at most 400, as the figure asks).
        expect(plotted).toBe(normalQuantilePlot(comparison.fluctuations!.values, { maxPoints: 400, level: 0.95 }).sample.length);
      }
    });
  }
});
