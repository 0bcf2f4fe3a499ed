import type { SymbolizationSummary } from '../core';
import { curvePath, type CurvePoint } from './curvePath';
import { curveRows } from './dataRows';
import type { BandMark, DataRow, Figure, FigureSize, LineMark, SeriesStyle } from './figureModel';
import { barsPath } from './fluctuationFigure';
import { linearAxis, round2 } from './linearAxis';
import { BAND_OPACITY } from './palette';
import { plotArea } from './plotArea';
import { readoutNumber } from './readoutFormat';
import { legendEntry } from './seriesStyle';
import { figureOf } from './figureOf';

/** Looks of the preview figures: the series and bars in blue, cut points dashed amber. */
export const SYMBOLIZATION_STYLES = {
  series: { colour: 'cobalt', dash: '', width: 1, marker: null },
  bars: { colour: 'cobalt', dash: '', width: 1, marker: null },
  cut: { colour: 'amber', dash: '6 3', width: 1.6, marker: null },
} as const satisfies Record<string, SeriesStyle>;

/** The range the values and the cut points span. */
function valueDomain(summary: SymbolizationSummary): [number, number] {
  const { edges } = summary.histogram;
  const cuts = summary.record.cutPoints;
  return [Math.min(edges[0] ?? 0, ...cuts), Math.max(edges[edges.length - 1] ?? 0, ...cuts)];
}

function cutsLabel(summary: SymbolizationSummary): string {
  return `Cut points (${summary.record.cutPoints.length})`;
}

/**
 * The series as read, one bucket of consecutive values per pixel drawn from its min to its max, with
 * the cut points as horizontal lines.
 */
export function symbolizationSeriesFigure(summary: SymbolizationSummary, size: FigureSize): Figure {
  const { starts, min, max } = summary.series;
  const N = starts[starts.length - 1] ?? 0;
  const plot = plotArea(size);
  const { scale: x, axis: xAxis } = linearAxis([0, Math.max(1, N - 1)], [plot.left, plot.left + plot.width], { label: 'Value index (missing values left out)', unit: '', integer: true });
  const { scale: y, axis: yAxis } = linearAxis(valueDomain(summary), [plot.top + plot.height, plot.top], { label: 'Value', unit: '' });
  const points: CurvePoint[] = [];
  for (let b = 0; b < min.length; b++) {
    const at = starts[b] ?? 0;
    points.push({ x: at, y: min[b] ?? null });
    if (max[b] !== min[b]) points.push({ x: at, y: max[b] ?? null });
  }
  const line: LineMark = { id: 'series', label: `Series (${summary.record.values} values)`, style: SYMBOLIZATION_STYLES.series, path: curvePath(points, x, y), vertices: [], data: curveRows(points) };
  const [d0, d1] = xAxis.domain;
  const cuts = summary.record.cutPoints;
  const cutPath = cuts.map((c) => `M${round2(x(d0))},${round2(y(c))}H${round2(x(d1))}`).join('');
  const cutRows: DataRow[] = cuts.map((c) => ({ x: d0, x2: d1, y: c, lower: null, upper: null }));
  const lines = cuts.length === 0 ? [line] : [line, { id: 'cuts', label: cutsLabel(summary), style: SYMBOLIZATION_STYLES.cut, path: cutPath, vertices: [], data: cutRows }];
  return figureOf({
    title: 'Series before symbolization',
    description: `The ${summary.record.values} values in order (min and max per pixel)${cuts.length > 0 ? `, with the ${cuts.length} cut points as horizontal lines` : ''}.`,
    size,
    plot,
    x: xAxis,
    y: yAxis,
    lines,
    legend: lines.map((l) => legendEntry(l.id, l.label, 'line', l.style)),
    notes: summary.segmentStarts.length > 0 ? [`${summary.segmentStarts.length + 1} segments, cut at missing values`] : [],
  });
}

/** Histogram of the values (equal-width bins) with the cut points as vertical lines. */
export function symbolizationHistogramFigure(summary: SymbolizationSummary, size: FigureSize): Figure {
  const { edges, counts } = summary.histogram;
  const plot = plotArea(size);
  const { scale: x, axis: xAxis } = linearAxis(valueDomain(summary), [plot.left, plot.left + plot.width], { label: 'Value', unit: '' });
  const { scale: y, axis: yAxis } = linearAxis([0, Math.max(1, ...counts) * 1.05], [plot.top + plot.height, plot.top], { label: 'Count', unit: '' });
  const path = barsPath(edges, counts, x, y);
  const rows: DataRow[] = Array.from(counts, (c, k) => ({ x: edges[k] ?? 0, x2: edges[k + 1] ?? 0, y: c, lower: null, upper: null }));
  const barLabel = `Counts in ${counts.length} bins`;
  const bars: BandMark = { id: 'bars', label: barLabel, colour: SYMBOLIZATION_STYLES.bars.colour, opacity: BAND_OPACITY * 2, path, data: rows };
  const cuts = summary.record.cutPoints;
  const [y0, y1] = yAxis.domain;
  const cutLine: LineMark = {
    id: 'cuts',
    label: cutsLabel(summary),
    style: SYMBOLIZATION_STYLES.cut,
    path: cuts.map((c) => `M${round2(x(c))},${round2(y(y0))}V${round2(y(y1))}`).join(''),
    vertices: [],
    data: cuts.map((c) => ({ x: c, x2: null, y: null, lower: y0, upper: y1 })),
  };
  const outline: LineMark = { id: 'bars', label: barLabel, style: SYMBOLIZATION_STYLES.bars, path, vertices: [], data: rows };
  const lines = cuts.length === 0 ? [outline] : [outline, cutLine];
  return figureOf({
    title: 'Histogram of the values',
    description: `Histogram of ${summary.record.values} values in ${counts.length} equal-width bins${cuts.length > 0 ? `, with the ${cuts.length} cut points as vertical lines` : ''}.`,
    size,
    plot,
    x: xAxis,
    y: yAxis,
    bands: [bars],
    lines,
    legend: [legendEntry('bars', barLabel, 'band', SYMBOLIZATION_STYLES.bars), ...(cuts.length === 0 ? [] : [legendEntry('cuts', cutLine.label, 'line', cutLine.style)])],
    readout: Array.from(counts, (c, k) => ({
      n: k,
      x: round2(x(((edges[k] ?? 0) + (edges[k + 1] ?? 0)) / 2)),
      heading: { id: 'bin', label: 'Bin', value: `${readoutNumber(edges[k] ?? null)} to ${readoutNumber(edges[k + 1] ?? null)}` },
      rows: [{ id: 'count', label: 'Count', value: String(c) }],
    })),
  });
}
