import { describe, expect, it } from 'vitest';
import { parseHtml, byId, hasId } from '../helpers/markupDocument';
import { exportFigures } from '../../src/figures/exportFigures';
import { reportHtml } from '../../src/figures/reportHtml';
import { extrasFixture, HOSTILE_NAME } from '../helpers/sessionExtrasFixtures';

const DATE = '2026-12-01T23:59:00Z';
const { result, calibration } = extrasFixture();

describe('report with a calibration', () => {
  const html = reportHtml(result, { date: DATE, calibration });
  const doc = parseHtml(html);

  it('adds the calibration section with its figure: seven inline figures, ids unique, no script', () => {
    expect(html).not.toMatch(/<script/i);
    for (const tag of ['script', 'img', 'link', 'iframe']) expect(doc.getElementsByTagName(tag).length).toBe(0);
    const svgs = Array.from(doc.getElementsByTagName('svg'));
    // The six views of the result, then the calibration figure.
    expect(svgs.length).toBe(exportFigures(result).length + 1);
    expect(svgs[6]!.getElementsByTagName('title')[0]?.textContent).toBe(`Surrogate estimates of h at N = ${result.input.symbols}`);
    expect(doc.getElementsByTagName('figcaption').length).toBe(7);
    const ids = Array.from(doc.getElementsByTagName('*'))
      .map((e) => e.getAttribute('id'))
      .filter((id): id is string => id !== null && id !== '');
    expect(new Set(ids).size).toBe(ids.length);
    // Without a calibration the report is the one it always was.
    expect(reportHtml(result, { date: DATE })).toBe(reportHtml(result, { date: DATE, calibration: null }));
    expect(reportHtml(result, { date: DATE })).not.toContain('id="calibration"');
  });

  it('gives the calibration’s own numbers: order, R, seed, exact h and σ², bias ± SE, spread, coverage ± SE, corrected h', () => {
    const facts = byId(doc, 'calibration-facts');
    expect(facts.getAttribute('data-order')).toBe(String(calibration.model.order));
    expect(facts.getAttribute('data-replicates')).toBe('10');
    expect(facts.getAttribute('data-seed')).toBe('5');
    expect(facts.textContent).toContain(`${calibration.model.order} (BIC, chosen among orders 0 to ${calibration.model.maxOrder}`);
    expect(facts.textContent).toContain(calibration.model.rule);
    const exact = byId(doc, 'calibration-exact').getElementsByTagName('span');
    expect(exact[0]!.getAttribute('data-value')).toBe(String(calibration.model.entropyRate));
    expect(exact[1]!.getAttribute('data-value')).toBe(String(calibration.model.sigma2));
    for (const [id, c] of [
      ['calibration-h', calibration.summary.entropy],
      ['calibration-sigma2', calibration.summary.sigma2],
    ] as const) {
      const cells = Array.from(byId(doc, id).getElementsByTagName('td'));
      expect(cells[0]!.getAttribute('data-value')).toBe(String(c.exact));
      expect(cells[2]!.getAttribute('data-value')).toBe(c.bias === null ? null : String(c.bias));
      expect(cells[2]!.getAttribute('data-se')).toBe(c.biasStandardError === null ? null : String(c.biasStandardError));
      expect(cells[3]!.getAttribute('data-value')).toBe(c.spread === null ? null : String(c.spread));
      expect(cells[4]!.getAttribute('data-value')).toBe(c.coverage === null ? null : String(c.coverage));
      expect(cells[4]!.getAttribute('data-se')).toBe(c.coverageStandardError === null ? null : String(c.coverageStandardError));
      if (c.coverage !== null) expect(cells[4]!.textContent).toContain(`(${c.covered} of ${c.intervals})`);
    }
    const h = calibration.summary.entropy;
    expect(h.bias).not.toBeNull();
    const corrected = calibration.summary.correctedEntropy!;
    const p = byId(doc, 'calibration-corrected');
    expect(p.getAttribute('data-value')).toBe(String(corrected.estimate));
    expect(p.getAttribute('data-low')).toBe(String(corrected.interval[0]));
    expect(p.getAttribute('data-high')).toBe(String(corrected.interval[1]));
    expect(p.textContent).toContain(corrected.label);
    expect(hasId(doc, 'calibration-partial')).toBe(false);
    expect(hasId(doc, 'calibration-stale')).toBe(false);
  });

  it('the hostile input name is text in the figure caption, never markup', () => {
    const svg = byId(doc, 'figure-calibration').getElementsByTagName('svg')[0]!;
    const texts = Array.from(svg.getElementsByTagName('text')).map((t) => t.textContent ?? '');
    expect(texts.some((t) => t.startsWith('Input: wind "gusts", <script>alert(1)</script>'))).toBe(true);
    expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(HOSTILE_NAME).toContain('<script>');
  });

  it('marks a partial calibration and one that belongs to another analysis', () => {
    const partial = parseHtml(reportHtml(result, { calibration: { ...calibration, partial: true, replicatesRequested: 40 } }));
    expect(byId(partial, 'calibration-partial').textContent).toBe('Partial: 10 of 40 replicates finished before the calibration was stopped.');
    const other = { ...calibration, input: { ...calibration.input, name: '<other>.txt' } };
    const stale = parseHtml(reportHtml(result, { calibration: other }));
    expect(byId(stale, 'calibration-stale').textContent).toContain('belongs to another analysis (input “<other>.txt”');
    expect(byId(stale, 'calibration-corrected').textContent).toContain('(stale)');
  });
});
