import { describe, expect, it } from 'vitest';
import { parseHtml, byId } from '../helpers/markupDocument';
import { analyzeSequence } from '../../src/core/analyze';
import type { AnalysisResult } from '../../src/core/result/analysisResult';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import { markovSource } from '../../src/core/sources/markovSource';
import { exportFigures } from '../../src/figures/exportFigures';
import { looksPhysiological, reportHtml } from '../../src/figures/reportHtml';

const HOSTILE = '"><script>alert(1)</script><img src=x onerror=alert(2)> & more.txt';
const DATE = '2026-01-02T03:04:05Z';

// Two-state chain with invented parameters; only the report's contents are checked, no estimate.
const source = markovSource([
  [0.8, 0.2],
  [0.3, 0.7],
]);
const sequence = source.generate(20_000, 5);
function analyse(name: string): AnalysisResult {
  return analyzeSequence(sequence, { name, sha256: 'ab'.repeat(32), format: 'chars' }, { ...DEFAULT_SETTINGS, maxN: 16 });
}
const result = analyse('wind.txt');

describe('reportHtml', () => {
  const html = reportHtml(result, { date: DATE });
  const doc = parseHtml(html);

  it('is one HTML5 document with a charset, a title and no external resource', () => {
    expect(html.startsWith('<!DOCTYPE html>\n<html lang="en">')).toBe(true);
    expect(html).toContain('<meta charset="utf-8">');
    expect(doc.getElementsByTagName('title')[0]?.textContent).toBe('returnrate report: wind.txt');
    for (const tag of ['script', 'link', 'img', 'iframe', 'object']) expect(doc.getElementsByTagName(tag).length).toBe(0);
    // No fetch of anything: no URL other than the SVG namespace and in-page clip references.
    expect(html.replaceAll('http://www.w3.org/2000/svg', '')).not.toMatch(/https?:|@import|url\((?!#)/);
    expect(html).toContain('@media print');
  });

  it('holds all six figures as inline SVG with their titles, each with unique ids', () => {
    const figures = exportFigures(result);
    const svgs = Array.from(doc.getElementsByTagName('svg'));
    expect(svgs.length).toBe(6);
    expect(figures.every((f) => f.figure.kind === 'figure')).toBe(true);
    figures.forEach((f, i) => {
      const title = svgs[i]!.getElementsByTagName('title')[0]?.textContent;
      expect(title).toBe(f.figure.kind === 'figure' ? f.figure.model.title : '');
    });
    expect(doc.getElementsByTagName('figcaption').length).toBe(6);
    const ids = Array.from(doc.getElementsByTagName('*'))
      .map((e) => e.getAttribute('id'))
      .filter((id): id is string => id !== null && id !== '');
    expect(new Set(ids).size).toBe(ids.length);
  });

  it('gives the result’s own numbers in the estimate table', () => {
    const h = byId(doc, 'estimate-h');
    const cells = Array.from(h.getElementsByTagName('td'));
    expect(cells[0]!.getAttribute('data-value')).toBe(String(result.entropy.estimate));
    expect(cells[0]!.textContent).toBe(result.entropy.estimate.toFixed(4));
    expect(cells[1]!.getAttribute('data-low')).toBe(String(result.entropy.ci95[0]));
    expect(cells[1]!.getAttribute('data-high')).toBe(String(result.entropy.ci95[1]));
    const [lo, hi] = result.entropy.lengthsUsed;
    expect(cells[2]!.textContent).toBe(lo === hi ? `n = ${lo}` : `n = ${lo}..${hi}`);
    expect(cells[3]!.textContent).toContain(result.entropy.reason);
    const s = byId(doc, 'estimate-sigma2').getElementsByTagName('td')[0]!;
    expect(s.getAttribute('data-value')).toBe(String(result.sigma2.estimate));
    const rows = byId(doc, 'alternatives').getElementsByTagName('tr');
    expect(rows.length - 1).toBe(Object.keys(result.entropy.alternatives).length + Object.keys(result.sigma2.alternatives).length);
    expect(byId(doc, 'lengths-table').getElementsByTagName('tbody')[0]!.getElementsByTagName('tr').length).toBe(result.lengths.length);
  });

  it('shows the exact reference values when the input came from a reference source', () => {
    const withReference: AnalysisResult = { ...result, reference: { source: 'markov', entropyRate: 0.5, sigma2: 0.25 } };
    const text = byId(parseHtml(reportHtml(withReference)), 'reference').textContent ?? '';
    expect(text).toContain('h = 0.500000');
    expect(text).toContain('σ² = 0.250000');
    expect(html).not.toContain('id="reference"');
  });

  it('names the published methods with their citations and says it is not a diagnostic device', () => {
    const methods = byId(doc, 'methods').textContent ?? '';
    for (const cite of ['Ornstein & Weiss', 'Kontoyiannis, J. Theoret. Probab. 11 (1998)', 'Miller 1955', 'Kontoyiannis, Algoet, Suhov & Wyner', 'Schmeiser', 'Marsaglia, Tsang & Wang', 'Marsaglia & Marsaglia', 'Kaplan & Meier']) {
      expect(methods).toContain(cite);
    }
    expect(byId(doc, 'cautions').textContent).toContain('not a diagnostic device');
  });

  it('prints a hostile input name as text, never as markup', () => {
    const hostile = reportHtml(analyse(HOSTILE), { date: DATE });
    const d = parseHtml(hostile);
    expect(d.getElementsByTagName('script').length).toBe(0);
    expect(d.getElementsByTagName('img').length).toBe(0);
    expect(hostile).not.toMatch(/<script/i);
    expect(hostile).toContain('&quot;&gt;&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(byId(d, 'input-facts').getElementsByTagName('dd')[0]!.textContent).toBe(HOSTILE);
  });

  it('adds the clinical caution for a physiological-looking name only', () => {
    expect(looksPhysiological({ name: 'eeg-channel-3.txt', format: 'chars' })).toBe(true);
    expect(looksPhysiological({ name: 'Heart-Rate.csv', format: 'csv' })).toBe(true);
    expect(looksPhysiological({ name: 'wind.txt', format: 'chars' })).toBe(false);
    const eeg = reportHtml(analyse('eeg-channel-3.txt'));
    expect(eeg).toContain('not a clinical measurement');
    expect(byId(parseHtml(eeg), 'physiological-note').textContent).toContain('research estimate');
    expect(html).not.toContain('clinical measurement');
  });

  it('adds the caution for a physiological-looking column name, also when the file name says nothing', () => {
    for (const name of ['ECG lead II', 'eeg_fz', 'heart_rate', 'spike_times', 'pulse', 'EMG', 'neuron 12']) {
      expect(looksPhysiological({ name: 'session-4.csv', format: 'csv' }, [name]), name).toBe(true);
    }
    expect(looksPhysiological({ name: 'session-4.csv', format: 'csv' }, ['wind_sector', 'time'])).toBe(false);
    const plain = analyse('session-4.csv');
    expect(reportHtml(plain)).not.toContain('clinical measurement');
    expect(byId(parseHtml(reportHtml(plain, { columns: ['EEG Cz'] })), 'physiological-note').textContent).toContain('research estimate, not a clinical measurement');
  });

  it('gives the same bytes for the same result and date, and prints the date', () => {
    expect(reportHtml(result, { date: DATE })).toBe(html);
    expect(byId(doc, 'input-facts').textContent).toContain(DATE);
    expect(reportHtml(result)).not.toContain(DATE);
  });
});

describe('reportHtml with a symbolized input', () => {
  it('lists the symbolization among the settings and cites its method', () => {
    const symbolization = { spec: 'ordinal:3:1', cutPoints: [], cells: [{ label: '012', count: 5 }], values: 7, missing: 2, missingPolicy: 'skip' as const, segments: 1, segmentsDropped: 0 };
    const html = reportHtml({ ...result, input: { ...result.input, symbolization } }, { date: DATE });
    const doc = parseHtml(html);
    expect(byId(doc, 'settings').textContent).toContain('Symbolizationordinal:3:1; 2 missing values skipped');
    expect(byId(doc, 'methods').textContent).toContain('Bandt & Pompe, Phys. Rev. Lett. 88 (2002) 174102');
    expect(reportHtml(result, { date: DATE })).not.toContain('Symbolization');
  });
});
