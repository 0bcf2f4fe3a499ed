import { describe, expect, it } from 'vitest';
import { parseSvg, marks } from '../helpers/markupDocument';
import { analyzeSequence } from '../../src/core/analyze';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import { markovSource } from '../../src/core/sources/markovSource';
import { exportFigures } from '../../src/figures/exportFigures';
import { figureCaption } from '../../src/figures/figureCaption';
import { figureCsv, figureCsvRowCount } from '../../src/figures/figureCsv';
import type { FigureModel } from '../../src/figures/figureModel';
import { figureSvg } from '../../src/figures/figureSvg';
import { xmlText } from '../../src/figures/xmlText';

const HOSTILE = '"><script>alert(1)</script>, \'x\'\nnext & more.txt';

// Two-state chain with invented parameters; only the export's shape is checked, no estimate.
const source = markovSource([
  [0.8, 0.2],
  [0.3, 0.7],
]);
const result = analyzeSequence(source.generate(20_000, 5), { name: HOSTILE, sha256: 'ab'.repeat(32), format: 'chars' }, { ...DEFAULT_SETTINGS, maxN: 16 });
const figures = exportFigures(result);

/** Marks a model asks for: drawn paths of sample paths, lines, markers and points. */
function expected(model: FigureModel): { paths: number; lines: number; markers: number; points: number; bands: number } {
  return {
    paths: model.pathLayer?.paths.filter((d) => d !== '').length ?? 0,
    lines: model.lines.filter((l) => l.path !== '').length,
    markers: model.lines.reduce((s, l) => s + (l.style.marker === null ? 0 : l.vertices.length), 0),
    points: model.points.reduce((s, p) => s + (p.style.marker === null ? 0 : p.points.length), 0),
    bands: model.bands.length,
  };
}

describe('xmlText', () => {
  it('escapes the five XML specials and replaces characters XML 1.0 forbids (W3C XML 1.0, 2.2 and 2.4)', () => {
    expect(xmlText(`<a href="x">&'</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;&amp;&apos;&lt;/a&gt;');
    expect(xmlText('a\u0001b\tc')).toBe('a\ufffdb\tc');
  });
});

describe('figureSvg', () => {
  it('every view of a result is drawn', () => {
    expect(figures.map((f) => [f.id, f.figure.kind])).toEqual([
      ['convergence', 'figure'],
      ['envelopes', 'figure'],
      ['variance-growth', 'figure'],
      ['fluctuations-qq', 'figure'],
      ['fluctuations-histogram', 'figure'],
      ['return-law', 'figure'],
    ]);
  });

  for (const { id, figure, caption } of figures) {
    it(`${id}: parses as XML, is standalone and holds as many marks as the model`, () => {
      if (figure.kind !== 'figure') throw new Error(figure.message);
      const svg = figureSvg(figure.model, caption);
      const doc = parseSvg(svg);
      const root = doc.documentElement;
      expect(root.namespaceURI).toBe('http://www.w3.org/2000/svg');
      expect(root.getAttribute('viewBox')).toBe(`0 0 ${root.getAttribute('width')} ${root.getAttribute('height')}`);
      expect(svg).not.toMatch(/@import|@font-face|href=|url\((?!#plot-clip\))/);
      expect(doc.getElementsByTagName('title')[0]?.textContent).toBe(figure.model.title);
      const e = expected(figure.model);
      const pathGroup = marks(doc, 'paths')[0];
      expect(pathGroup === undefined ? 0 : pathGroup.getElementsByTagName('path').length).toBe(e.paths);
      expect(marks(doc, 'line').length).toBe(e.lines);
      expect(marks(doc, 'band').length).toBe(e.bands);
      expect(marks(doc, 'markers').reduce((s, g) => s + g.getElementsByTagName('path').length, 0)).toBe(e.markers);
      expect(marks(doc, 'points').reduce((s, g) => s + g.getElementsByTagName('path').length, 0)).toBe(e.points);
      expect(marks(doc, 'legend').length).toBe(figure.model.legend.length);
    });
  }

  it('a hostile input name comes out as text in the caption, never as markup', () => {
    const { figure, caption } = figures[0]!;
    if (figure.kind !== 'figure') throw new Error('no figure');
    const svg = figureSvg(figure.model, caption);
    expect(svg).not.toContain('<script>');
    const doc = parseSvg(svg);
    expect(doc.getElementsByTagName('script').length).toBe(0);
    const texts = Array.from(doc.getElementsByTagName('text')).map((t) => t.textContent);
    expect(texts).toContain(`Input: ${HOSTILE}`);
    expect(texts).toContain(`SHA-256: ${'ab'.repeat(32)}`);
  });

  it('is deterministic: the same model and caption give the same string, a second build too', () => {
    const again = exportFigures(result);
    for (let i = 0; i < figures.length; i++) {
      const a = figures[i]!;
      const b = again[i]!;
      if (a.figure.kind !== 'figure' || b.figure.kind !== 'figure') throw new Error('no figure');
      expect(figureSvg(b.figure.model, b.caption)).toBe(figureSvg(a.figure.model, a.caption));
    }
  });
});

/** Records of an RFC 4180 text (quoted fields may hold commas, quotes and line breaks). */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let field = '';
  let row: string[] = [];
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (c === '"') quoted = false;
      else field += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') {
      row.push(field);
      field = '';
    } else if (c === '\r' && text[i + 1] === '\n') {
      row.push(field);
      rows.push(row);
      row = [];
      field = '';
      i++;
    } else field += c;
  }
  return rows;
}

describe('figureCsv', () => {
  for (const { id, figure, caption } of figures) {
    it(`${id}: one row per plotted value, with units in the header`, () => {
      if (figure.kind !== 'figure') throw new Error(figure.message);
      const csv = figureCsv(id, figure.model, caption);
      const lines = csv.split('\r\n');
      const comments = lines.filter((l) => l.startsWith('#'));
      expect(comments[0]).toBe(`# returnrate figure data: ${id}`);
      const records = parseCsv(csv.split('\r\n').filter((l) => !l.startsWith('#')).join('\r\n'));
      const [header, ...rows] = records;
      expect(header?.slice(0, 3)).toEqual(['mark', 'series', 'label']);
      if (figure.model.y.unit !== '') expect(header?.[5]).toBe(`y [${figure.model.y.unit}]`);
      expect(rows.length).toBe(figureCsvRowCount(figure.model));
      for (const r of rows) expect(r.length).toBe(header?.length);
    });
  }

  it('convergence: the mean series has one row per drawn marker, with the value in data units', () => {
    const { figure, caption } = figures[0]!;
    if (figure.kind !== 'figure') throw new Error('no figure');
    const rows = parseCsv(figureCsv('convergence', figure.model, caption).replace(/^#.*\r\n/gm, '')).slice(1);
    const mean = rows.filter((r) => r[0] === 'line' && r[1] === 'mean');
    const line = figure.model.lines.find((l) => l.id === 'mean');
    expect(mean.length).toBe(line?.vertices.length);
    // log R_n / n at n = 1 from the result's own row, in its unit (nat): meanLogReturn / 1.
    const first = result.lengths[0]!;
    expect(Number(mean[0]?.[5])).toBe((first.meanLogReturnCorrected ?? first.meanLogReturn ?? NaN) / 1);
  });

  it('a hostile input name in the comments stays on one comment line and cannot start a record', () => {
    const { figure } = figures[0]!;
    if (figure.kind !== 'figure') throw new Error('no figure');
    const csv = figureCsv('convergence', figure.model, figureCaption(result));
    const input = csv.split('\r\n').find((l) => l.startsWith('# Input: '));
    expect(input).toBe(`# Input: ${HOSTILE.replace('\n', ' ')}`);
  });
});
