import { varianceFromNats, type AnalysisResult } from '../core';
import type { CurvePoint } from './curvePath';
import { lineMark } from './lineMark';
import type { Figure, FigureSize, LegendEntry, LineMark, PointMark, ReadoutStop } from './figureModel';
import { linearAxis, round2 } from './linearAxis';
import { plotArea } from './plotArea';
import { readoutNumber } from './readoutFormat';
import { legendEntry, STYLES } from './seriesStyle';
import { trustedSpan } from './trustedSpan';
import { figureOf } from './figureOf';

/** Where a straight line of a given slope is anchored: it passes through (meanN, meanVariance). */
export interface FittedLine {
  readonly slope: number;
  readonly intercept: number;
  readonly from: number;
  readonly to: number;
}

/**
 * The least-squares line of Var(log R_n) against n over n = from..to, with the slope the core
 * reported. The core (varianceGrowth.ts via slopeOverLevels.ts) regresses the censoring-corrected
 * variances on n, so the least-squares intercept is mean(v) − slope · mean(n) over the same levels
 * (normal equations of simple regression; common practice, no source).
 * @param variances per n (index n − 1), output unit squared; null where missing
 */
export function fittedVarianceLine(variances: readonly (number | null)[], slope: number, from: number, to: number): FittedLine | null {
  let count = 0;
  let sumN = 0;
  let sumV = 0;
  for (let n = from; n <= to; n++) {
    const v = variances[n - 1];
    if (v === null || v === undefined || !Number.isFinite(v)) return null;
    count++;
    sumN += n;
    sumV += v;
  }
  if (count === 0 || !Number.isFinite(slope)) return null;
  return { slope, intercept: sumV / count - (slope * sumN) / count, from, to };
}

/**
 * Var(log R_n) against n (censoring-corrected, in the result's unit squared), the fitted line whose
 * slope is the variance-growth estimate of sigma^2 (solid over the levels fitted, dotted beyond),
 * and for comparison lines through the same centre with slope equal to the headline sigma^2 and,
 * for generated input, the exact sigma^2.
 */
export function varianceGrowthFigure(result: AnalysisResult, size: FigureSize): Figure {
  const rows = result.lengths;
  const unit = result.settings.unit;
  const variances = rows.map((r) => {
    const v = r.varLogReturnCorrected ?? r.varLogReturn;
    return v === null ? null : varianceFromNats(v, unit);
  });
  if (variances.every((v) => v === null)) return { kind: 'unavailable', message: 'No block length has two or more observed returns, so there is no variance to plot.' };
  const maxN = rows[rows.length - 1]?.n ?? 1;
  const growth = result.sigma2.alternatives['variance-growth'];
  const notes: string[] = [];
  let fit: FittedLine | null = null;
  if (growth?.estimate != null && growth.lengthsUsed !== null) {
    fit = fittedVarianceLine(variances, growth.estimate, growth.lengthsUsed[0], growth.lengthsUsed[1]);
  }
  if (fit === null) notes.push(`No fitted line: ${growth?.note ?? 'the result has no variance-growth estimate.'}`);
  const line = (slope: number, anchor: FittedLine): CurvePoint[] => {
    const centre = (anchor.from + anchor.to) / 2;
    const atCentre = anchor.intercept + anchor.slope * centre;
    return [
      { x: 1, y: atCentre + slope * (1 - centre) },
      { x: maxN, y: atCentre + slope * (maxN - centre) },
    ];
  };

  const values: number[] = [0];
  for (const v of variances) if (v !== null) values.push(v);
  const headline = Number.isFinite(result.sigma2.estimate) ? result.sigma2.estimate : null;
  const exact = result.reference?.sigma2 ?? null;
  const extra: { id: string; label: string; pts: CurvePoint[]; style: (typeof STYLES)[keyof typeof STYLES] }[] = [];
  if (fit !== null) {
    extra.push({ id: 'fit-extended', label: 'Fitted line, extended', pts: line(fit.slope, fit), style: STYLES.fittedExtension });
    if (headline !== null) extra.push({ id: 'headline', label: `Slope σ̂² = ${readoutNumber(headline)} (headline)`, pts: line(headline, fit), style: STYLES.headlineSlope });
    if (exact !== null) extra.push({ id: 'exact', label: `Slope exact σ² = ${readoutNumber(exact)}`, pts: line(exact, fit), style: STYLES.exact });
  }
  // Lines through the centre can run far off for a steep slope; the axis follows the data, the renderer clips.
  const fitted: CurvePoint[] =
    fit === null
      ? []
      : [
          { x: fit.from, y: fit.intercept + fit.slope * fit.from },
          { x: fit.to, y: fit.intercept + fit.slope * fit.to },
        ];
  for (const p of fitted) if (p.y !== null) values.push(p.y);

  const plot = plotArea(size);
  const sq = `${unit}²`;
  const { scale: x, axis: xAxis } = linearAxis([1, maxN], [plot.left, plot.left + plot.width], { label: 'Block length n', unit: '', integer: true }, false);
  const { scale: y, axis: yAxis } = linearAxis([Math.min(...values), Math.max(...values) * 1.05], [plot.top + plot.height, plot.top], {
    label: 'Var(log R_n)',
    unit: sq,
  });

  const lines: LineMark[] = extra.map((e) => lineMark(e.id, e.label, e.style, e.pts, x, y));
  if (fit !== null) {
    const range = fit.from === fit.to ? `n = ${fit.from}` : `n = ${fit.from}–${fit.to}`;
    lines.push(lineMark('fit', `Fitted over ${range}: slope ${readoutNumber(fit.slope)} ${unit}²/symbol`, STYLES.fittedLine, fitted, x, y));
  }
  const points: PointMark[] = [
    {
      id: 'variance',
      label: 'Var(log R_n), censoring corrected',
      style: STYLES.variancePoints,
      points: rows.flatMap((r, i) => {
        const v = variances[i];
        return v === null || v === undefined ? [] : [{ x: round2(x(r.n)), y: round2(y(v)) }];
      }),
      data: rows.flatMap((r, i) => {
        const v = variances[i];
        return v === null || v === undefined ? [] : [{ x: r.n, x2: null, y: v, lower: null, upper: null }];
      }),
    },
  ];
  const spans = trustedSpan(result, x);
  const legend: LegendEntry[] = [legendEntry('variance', points[0]?.label ?? '', 'points', STYLES.variancePoints)];
  for (const l of [...lines].reverse()) legend.push(legendEntry(l.id, l.label, 'line', l.style));
  for (const s of spans) legend.push(legendEntry(s.id, s.label, 'span', null, 'ink'));

  const readout: ReadoutStop[] = rows.map((r, i) => ({
    n: r.n,
    x: round2(x(r.n)),
    rows: [
      { id: 'variance', label: 'Var(log R_n)', value: readoutNumber(variances[i] ?? null) },
      { id: 'fit', label: 'Fitted line', value: fit === null ? '—' : readoutNumber(fit.intercept + fit.slope * r.n) },
    ],
  }));
  return figureOf({
    title: 'Growth of Var(log R_n)',
    description: `Variance of log R_n against block length n in ${sq}, with the fitted line whose slope estimates σ².`,
    size,
    plot,
    x: xAxis,
    y: yAxis,
    spans,
    lines,
    points,
    legend,
    readout,
    notes,
  });
}
