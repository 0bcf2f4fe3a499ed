import { captionLines, type FigureCaption } from './figureCaption';
import type { FigureModel, LegendEntry } from './figureModel';
import { markerPath } from './markerPath';
import { BAND_OPACITY, PALETTE } from './palette';
import { xmlText } from './xmlText';

/**
 * Styles of a standalone figure, the same look as the workbench's charts.css: a system font stack,
 * so the file names no font to fetch and renders the same offline.
 */
const STYLE = [
  "svg{font-family:system-ui,-apple-system,'Segoe UI',Roboto,'Helvetica Neue',Arial,sans-serif;font-size:12.5px;font-variant-numeric:tabular-nums}",
  '.grid line{stroke:#e4e8ee;stroke-width:1}',
  '.span{opacity:0.07}',
  '.axis line{stroke:#4d5869;stroke-width:1}',
  '.axis text,.legend text{fill:#1b2330}',
  '.axis-title{font-size:13.5px;font-weight:600}',
  '.title{font-size:15px;font-weight:600;fill:#1b2330}',
  '.caption text{font-size:11px;fill:#4d5869}',
].join('');

const TITLE_HEIGHT = 24;
const LEGEND_ROW = 20;
const CAPTION_ROW = 15;
/** Rough width of one character at 12.5px, to flow legend entries into rows without measuring text. */
const CHAR_WIDTH = 6.6;
const SWATCH = 34;

/** Fixed number formatting: at most two decimals, no exponent, no negative zero. */
function f(v: number): string {
  const r = Math.round(v * 100) / 100;
  return Object.is(r, -0) ? '0' : String(r);
}

function axisTitle(label: string, unit: string): string {
  return unit === '' ? label : `${label} (${unit})`;
}

function swatch(entry: LegendEntry, x: number, y: number): string {
  const colour = PALETTE[entry.colour];
  const out: string[] = [];
  if (entry.kind === 'span') out.push(`<rect x="${f(x + 1)}" y="${f(y + 1)}" width="32" height="12" fill="${colour}" opacity="0.08" stroke="${colour}" stroke-opacity="0.35"/>`);
  if (entry.kind === 'band') out.push(`<rect x="${f(x + 1)}" y="${f(y + 2)}" width="32" height="10" fill="${colour}" opacity="${f(entry.opacity ?? BAND_OPACITY)}"/>`);
  const style = entry.style;
  if (style !== null && entry.kind !== 'span') {
    const dash = style.dash === '' ? '' : ` stroke-dasharray="${style.dash}"`;
    out.push(`<line x1="${f(x + 2)}" y1="${f(y + 7)}" x2="${f(x + 32)}" y2="${f(y + 7)}" stroke="${PALETTE[style.colour]}" stroke-width="${f(Math.max(style.width, 1.2))}"${dash}/>`);
  }
  if (style !== null && style.marker !== null) out.push(`<path d="${markerPath(style.marker, x + 17, y + 7)}" fill="${PALETTE[style.colour]}" stroke="#fff" stroke-width="0.8"/>`);
  return out.join('');
}

/** Legend entries flowed left to right into rows of the figure's width; returns markup and height. */
function legendBlock(entries: readonly LegendEntry[], left: number, top: number, width: number): { markup: string; height: number } {
  if (entries.length === 0) return { markup: '', height: 0 };
  const parts: string[] = [];
  let x = left;
  let row = 0;
  for (const e of entries) {
    const w = SWATCH + 6 + e.label.length * CHAR_WIDTH + 18;
    if (x > left && x + w > left + width) {
      row++;
      x = left;
    }
    const y = top + row * LEGEND_ROW;
    parts.push(`<g data-mark="legend">${swatch(e, x, y)}<text x="${f(x + SWATCH + 6)}" y="${f(y + 7)}" dy="0.32em">${xmlText(e.label)}</text></g>`);
    x += w;
  }
  return { markup: `<g class="legend">${parts.join('')}</g>`, height: (row + 1) * LEGEND_ROW };
}

/**
 * A figure model as a standalone SVG document: title, the plot (grid, spans, bands, every sample
 * path as an SVG path, lines, markers, axes), the legend and a caption naming the input, its
 * SHA-256, the settings and the program, all below the plot. Every text is escaped for XML; ids
 * and numbers are fixed, so the same model and caption give the same bytes. `idPrefix` goes before
 * every id (default none), so that several figures can sit in one HTML page without clashing ids.
 */
export function figureSvg(model: FigureModel, caption: FigureCaption, idPrefix = ''): string {
  const { size, x, y } = model;
  // The plot keeps the model's own coordinates, shifted down by the title.
  const plot = model.plot;
  const bottom = plot.top + plot.height;
  const right = plot.left + plot.width;
  const legend = legendBlock(model.legend, plot.left, TITLE_HEIGHT + size.height + 4, size.width - plot.left - 8);
  const lines = [...model.notes, ...captionLines(caption)];
  const captionTop = TITLE_HEIGHT + size.height + 4 + legend.height + 8;
  const width = size.width;
  const height = Math.ceil(captionTop + lines.length * CAPTION_ROW + 6);

  const out: string[] = [];
  out.push('<?xml version="1.0" encoding="UTF-8"?>');
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" role="img" aria-labelledby="${idPrefix}figure-title ${idPrefix}figure-desc">`,
  );
  out.push(`<title id="${idPrefix}figure-title">${xmlText(model.title)}</title>`);
  out.push(`<desc id="${idPrefix}figure-desc">${xmlText(`${model.description} ${captionLines(caption).join('. ')}.`)}</desc>`);
  out.push(`<style>${STYLE}</style>`);
  out.push(`<defs><clipPath id="${idPrefix}plot-clip"><rect x="${f(plot.left)}" y="${f(plot.top)}" width="${f(plot.width)}" height="${f(plot.height)}"/></clipPath></defs>`);
  out.push(`<rect width="${width}" height="${height}" fill="#fff"/>`);
  out.push(`<text class="title" x="${f(plot.left)}" y="17">${xmlText(model.title)}</text>`);
  out.push(`<g transform="translate(0 ${TITLE_HEIGHT})">`);
  out.push(`<g class="grid">${y.ticks.map((t) => `<line x1="${f(plot.left)}" x2="${f(right)}" y1="${f(t.position)}" y2="${f(t.position)}"/>`).join('')}</g>`);
  for (const s of model.spans) {
    out.push(`<rect class="span" x="${f(s.from)}" y="${f(plot.top)}" width="${f(s.to - s.from)}" height="${f(plot.height)}" fill="${PALETTE.ink}" data-mark="span"/>`);
  }
  out.push(`<g clip-path="url(#${idPrefix}plot-clip)">`);
  for (const b of model.bands) out.push(`<path d="${b.path}" fill="${PALETTE[b.colour]}" opacity="${f(b.opacity)}" data-mark="band"/>`);
  const layer = model.pathLayer;
  if (layer !== null) {
    out.push(`<g stroke="${PALETTE[layer.style.colour]}" stroke-width="${f(layer.style.width)}" fill="none" opacity="0.7" data-mark="paths">`);
    for (const d of layer.paths) if (d !== '') out.push(`<path d="${d}"/>`);
    out.push('</g>');
  }
  for (const l of model.lines) {
    if (l.path === '') continue;
    const dash = l.style.dash === '' ? '' : ` stroke-dasharray="${l.style.dash}"`;
    out.push(`<path d="${l.path}" fill="none" stroke="${PALETTE[l.style.colour]}" stroke-width="${f(l.style.width)}"${dash} stroke-linejoin="round" data-mark="line"/>`);
  }
  for (const l of model.lines) {
    if (l.style.marker === null || l.vertices.length === 0) continue;
    const shape = l.style.marker;
    out.push(`<g fill="${PALETTE[l.style.colour]}" stroke="#fff" stroke-width="0.8" data-mark="markers">`);
    for (const q of l.vertices) out.push(`<path d="${markerPath(shape, q.x, q.y, 7)}"/>`);
    out.push('</g>');
  }
  for (const p of model.points) {
    if (p.style.marker === null) continue;
    const shape = p.style.marker;
    out.push(`<g fill="${PALETTE[p.style.colour]}" stroke="#fff" stroke-width="0.8" data-mark="points">`);
    for (const q of p.points) out.push(`<path d="${markerPath(shape, q.x, q.y, 8)}"/>`);
    out.push('</g>');
  }
  out.push('</g>');
  out.push('<g class="axis">');
  out.push(`<line x1="${f(plot.left)}" x2="${f(right)}" y1="${f(bottom)}" y2="${f(bottom)}"/>`);
  out.push(`<line x1="${f(plot.left)}" x2="${f(plot.left)}" y1="${f(plot.top)}" y2="${f(bottom)}"/>`);
  for (const t of x.ticks) {
    out.push(`<line x1="${f(t.position)}" x2="${f(t.position)}" y1="${f(bottom)}" y2="${f(bottom + 5)}"/>`);
    out.push(`<text x="${f(t.position)}" y="${f(bottom + 18)}" text-anchor="middle">${xmlText(t.label)}</text>`);
  }
  for (const t of y.ticks) {
    out.push(`<line x1="${f(plot.left - 5)}" x2="${f(plot.left)}" y1="${f(t.position)}" y2="${f(t.position)}"/>`);
    out.push(`<text x="${f(plot.left - 8)}" y="${f(t.position)}" dy="0.32em" text-anchor="end">${xmlText(t.label)}</text>`);
  }
  out.push(`<text class="axis-title" x="${f(plot.left + plot.width / 2)}" y="${f(size.height - 8)}" text-anchor="middle">${xmlText(axisTitle(x.label, x.unit))}</text>`);
  out.push(
    `<text class="axis-title" transform="translate(16 ${f(plot.top + plot.height / 2)}) rotate(-90)" text-anchor="middle">${xmlText(axisTitle(y.label, y.unit))}</text>`,
  );
  out.push('</g>');
  out.push('</g>');
  out.push(legend.markup);
  out.push(
    `<g class="caption">${lines.map((line, i) => `<text x="${f(plot.left)}" y="${f(captionTop + i * CAPTION_ROW + 10)}">${xmlText(line)}</text>`).join('')}</g>`,
  );
  out.push('</svg>');
  return out.join('\n') + '\n';
}
