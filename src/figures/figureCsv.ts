import { csvRecord } from './csvField';
import { captionLines, type FigureCaption } from './figureCaption';
import type { DataRow, FigureModel } from './figureModel';

/** Numbers exactly as JavaScript prints them (shortest text that reads back to the same double). */
function num(v: number | null): string {
  return v === null ? '' : String(v);
}

/** Comment text on one line: a file or symbol name with a line break must not end the comment. */
function oneLine(text: string): string {
  return text.replace(/[\r\n]+/g, ' ');
}

function column(name: string, unit: string): string {
  return unit === '' ? name : `${name} [${unit}]`;
}

/**
 * The numbers behind a figure as CSV: `#` comment lines naming the figure, the axes with their
 * units and the caption (input, SHA-256, settings, program), then one header row and one row per
 * plotted value in data units: every point of every line, every defined point of every band
 * (lower and upper), every point mark and every point of every sampled path. A line that only
 * traces the edges of a band with the same id is not repeated. Records end in CRLF (RFC 4180).
 */
export function figureCsv(figureId: string, model: FigureModel, caption: FigureCaption): string {
  const xUnit = model.x.unit;
  const yUnit = model.y.unit;
  const head = [
    `returnrate figure data: ${figureId}`,
    `title: ${model.title}`,
    `x: ${model.x.label}${xUnit === '' ? ' (no unit)' : ` in ${xUnit}`}; x_end: right edge of a histogram bin`,
    `y, y_lower, y_upper: ${model.y.label}${yUnit === '' ? ' (no unit)' : ` in ${yUnit}`}`,
    ...captionLines(caption),
  ];
  let out = head.map((h) => `# ${oneLine(h)}\r\n`).join('');
  out += csvRecord(['mark', 'series', 'label', column('x', xUnit), column('x_end', xUnit), column('y', yUnit), column('y_lower', yUnit), column('y_upper', yUnit)]);
  const rows = (mark: string, series: string, label: string, data: readonly DataRow[]): void => {
    for (const r of data) out += csvRecord([mark, series, label, num(r.x), num(r.x2), num(r.y), num(r.lower), num(r.upper)]);
  };
  const bandIds = new Set(model.bands.map((b) => b.id));
  for (const b of model.bands) rows('band', b.id, b.label, b.data);
  const layer = model.pathLayer;
  if (layer !== null) layer.data.forEach((d, i) => rows('path', `${layer.id}-${i + 1}`, layer.label, d));
  for (const l of model.lines) if (!bandIds.has(l.id)) rows('line', l.id, l.label, l.data);
  for (const p of model.points) rows('points', p.id, p.label, p.data);
  return out;
}

/** Rows figureCsv writes for a model (header and comments not counted). */
export function figureCsvRowCount(model: FigureModel): number {
  const bandIds = new Set(model.bands.map((b) => b.id));
  let count = 0;
  for (const b of model.bands) count += b.data.length;
  if (model.pathLayer !== null) for (const d of model.pathLayer.data) count += d.length;
  for (const l of model.lines) if (!bandIds.has(l.id)) count += l.data.length;
  for (const p of model.points) count += p.data.length;
  return count;
}
