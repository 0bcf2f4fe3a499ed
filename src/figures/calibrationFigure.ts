import type { CalibrationResult, ReplicateRecord } from '../core';
import type { CurvePoint } from './curvePath';
import type { Figure, FigureSize, LegendEntry, PointMark, SeriesStyle } from './figureModel';
import { lineMark } from './lineMark';
import { linearAxis, round2 } from './linearAxis';
import { plotArea } from './plotArea';
import { readoutNumber } from './readoutFormat';
import { legendEntry } from './seriesStyle';
import { figureOf } from './figureOf';

/** Looks of the calibration figure; covering and missing intervals differ by dash as well as colour. */
export const CALIBRATION_STYLES = {
  covering: { colour: 'cobalt', dash: '', width: 1.4, marker: null },
  missing: { colour: 'amber', dash: '4 2', width: 1.8, marker: null },
  estimates: { colour: 'cobalt', dash: '', width: 1, marker: 'circle' },
  exact: { colour: 'ink', dash: '10 4 2 4', width: 1.6, marker: null },
  mean: { colour: 'teal', dash: '2 3', width: 2, marker: null },
} as const satisfies Record<string, SeriesStyle>;

export type CalibratedQuantity = 'entropy' | 'sigma2';

interface Row {
  readonly estimate: number;
  readonly interval: readonly [number, number] | null;
}

function rowsOf(records: readonly ReplicateRecord[], which: CalibratedQuantity): Row[] {
  const out: Row[] = [];
  for (const r of records) {
    const estimate = which === 'entropy' ? r.entropy : r.sigma2;
    if (estimate === null) continue;
    out.push({ estimate, interval: which === 'entropy' ? r.entropyInterval : r.sigma2Interval });
  }
  return out.sort((a, b) => a.estimate - b.estimate);
}

/**
 * The surrogate estimates of h (or sigma^2) sorted from low to high, one row each, with their
 * intervals (those that miss the fitted chain's exact value drawn apart) and vertical lines at the
 * exact value and at the mean of the estimates: the gap between the two lines is the bias, the
 * share of intervals crossing the exact line the coverage.
 */
export function calibrationFigure(cal: CalibrationResult, size: FigureSize, which: CalibratedQuantity = 'entropy'): Figure {
  const rows = rowsOf(cal.records, which);
  const summary = which === 'entropy' ? cal.summary.entropy : cal.summary.sigma2;
  const name = which === 'entropy' ? 'h' : 'σ²';
  if (rows.length === 0) return { kind: 'unavailable', message: `No surrogate has given an estimate of ${name} yet.` };
  const exact = summary.exact;
  const values = [exact];
  for (const r of rows) {
    values.push(r.estimate);
    if (r.interval !== null) values.push(r.interval[0], r.interval[1]);
  }
  const unit = which === 'entropy' ? `${cal.settings.unit}/symbol` : `${cal.settings.unit}²/symbol`;
  const plot = plotArea(size);
  const { scale: x, axis: xAxis } = linearAxis([Math.min(...values), Math.max(...values)], [plot.left, plot.left + plot.width], {
    label: `Surrogate estimate of ${name}`,
    unit,
  });
  const { scale: y, axis: yAxis } = linearAxis([0.5, rows.length + 0.5], [plot.top + plot.height, plot.top], {
    label: 'Surrogate, by estimate',
    unit: '',
    integer: true,
  }, false);
  const covering: CurvePoint[] = [];
  const missing: CurvePoint[] = [];
  rows.forEach((r, i) => {
    if (r.interval === null) return;
    const target = r.interval[0] <= exact && exact <= r.interval[1] ? covering : missing;
    target.push({ x: r.interval[0], y: i + 1 }, { x: r.interval[1], y: i + 1 }, { x: r.interval[1], y: null });
  });
  const top = rows.length + 0.5;
  const lines = [
    lineMark('covering', 'Interval containing the exact value', CALIBRATION_STYLES.covering, covering, x, y),
    lineMark('missing', 'Interval missing the exact value', CALIBRATION_STYLES.missing, missing, x, y),
    lineMark('exact', `Exact ${name} of the fitted chain`, CALIBRATION_STYLES.exact, [{ x: exact, y: 0.5 }, { x: exact, y: top }], x, y),
  ];
  if (summary.mean !== null) {
    lines.push(lineMark('mean', 'Mean of the estimates', CALIBRATION_STYLES.mean, [{ x: summary.mean, y: 0.5 }, { x: summary.mean, y: top }], x, y));
  }
  const points: PointMark = {
    id: 'estimates',
    label: 'Estimate',
    style: CALIBRATION_STYLES.estimates,
    points: rows.map((r, i) => ({ x: round2(x(r.estimate)), y: round2(y(i + 1)) })),
    data: rows.map((r, i) => ({ x: r.estimate, x2: null, y: i + 1, lower: r.interval?.[0] ?? null, upper: r.interval?.[1] ?? null })),
  };
  const legend: LegendEntry[] = [
    legendEntry(points.id, points.label, 'points', points.style),
    ...lines.filter((l) => l.path !== '').map((l) => legendEntry(l.id, l.label, 'line', l.style)),
  ];
  const coverage = summary.coverage === null ? 'no intervals' : `${summary.covered} of ${summary.intervals} intervals contain it`;
  return figureOf({
    title: `Surrogate estimates of ${name} at N = ${cal.input.symbols}`,
    description:
      `${rows.length} estimates of ${name} from surrogates of the fitted order-${cal.model.order} Markov chain, sorted, with their intervals; ` +
      `exact value ${readoutNumber(exact)}, mean ${readoutNumber(summary.mean)}; ${coverage}.`,
    size,
    plot,
    x: xAxis,
    y: yAxis,
    lines,
    points: [points],
    legend,
  });
}
