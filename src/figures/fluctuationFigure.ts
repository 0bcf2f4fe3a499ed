import {
  normalFitTests,
  normalHistogram,
  normalizedFluctuations,
  normalQuantilePlot,
  type AnalysisResult,
  type NormalFitTests,
  type NormalHistogram,
  type NormalizedFluctuations,
  type NormalQuantilePlot,
} from '../core';
import { bandPath, curvePath, type BandPoint, type CurvePoint } from './curvePath';
import type { BandMark, DataRow, Figure, FigureSize, LegendEntry, LineMark, PointMark, SeriesStyle } from './figureModel';
import { bandRows, curveRows } from './dataRows';
import { lineMark } from './lineMark';
import { linearAxis, round2 } from './linearAxis';
import { BAND_OPACITY } from './palette';
import { pathColumn } from './pathColumn';
import { plotArea } from './plotArea';
import { readoutNumber } from './readoutFormat';
import { rateNats } from './rateNats';
import { legendEntry } from './seriesStyle';
import { figureOf } from './figureOf';

/** Fewest values for which the tests and pictures are worth showing (common practice, no source). */
export const MIN_FLUCTUATION_VALUES = 3;

/** Looks of the series of these two figures; each differs from its neighbours by dash or marker as well as colour. */
export const FLUCTUATION_STYLES = {
  quantilePoints: { colour: 'cobalt', dash: '', width: 1, marker: 'circle' },
  identity: { colour: 'ink', dash: '6 4', width: 1.4, marker: null },
  pointwiseBand: { colour: 'amber', dash: '', width: 1, marker: null },
  bars: { colour: 'cobalt', dash: '', width: 1.2, marker: null },
  gaussianCurve: { colour: 'amber', dash: '7 3', width: 2, marker: null },
} as const satisfies Record<string, SeriesStyle>;

/** Label of the normalized value on both figures. */
export const FLUCTUATION_LABEL = '(log R_n − n ĥ) / (σ̂ √n)';

/** Everything the fluctuation view shows at one block length, independent of the figure size. */
export interface FluctuationStatistics {
  readonly n: number;
  readonly gap: number;
  /** Headline h and sigma in nats (the unit of the sampled paths); null when the result has none. */
  readonly hNats: number | null;
  readonly sigmaNats: number | null;
  /** Sampled positions at this n. */
  readonly sampled: number;
  readonly fluctuations: NormalizedFluctuations | null;
  readonly tests: NormalFitTests | null;
  readonly quantiles: NormalQuantilePlot | null;
  readonly histogram: NormalHistogram | null;
  /** The result says sigma^2 is negligible (then the normalization divides by almost nothing). */
  readonly negligible: boolean;
  /** Why there is nothing to show, or null. */
  readonly problem: string | null;
}

/**
 * The normalized fluctuations (log R_n − n ĥ)/(σ̂ √n) of the sampled positions at block length n
 * (core normalizedFluctuations, thinned to positions at least `gap` apart), their KS and AD tests
 * against N(0,1), the Q-Q points with a pointwise 95% band, and a histogram with the N(0,1) counts.
 * ĥ and σ̂ are the result's headline estimates, turned back to nats.
 * @param n block length (integer >= 1)
 * @param gap least distance between kept positions (integer >= 1)
 */
export function fluctuationStatistics(result: AnalysisResult, n: number, gap: number): FluctuationStatistics {
  const { hNats, sigmaNats } = rateNats(result);
  const sampled = result.paths.positions.length;
  const negligible = result.sigma2.negligible;
  const base = { n, gap, hNats, sigmaNats, sampled, negligible, fluctuations: null, tests: null, quantiles: null, histogram: null };
  if (negligible) {
    return {
      ...base,
      problem:
        'σ̂² is negligible here (for example a fair coin or another source whose information per symbol hardly varies): log R_n − n ĥ is dominated by the exponential return law, not by a Gaussian term, so dividing by σ̂ √n would only blow up noise. The return law is shown instead.',
    };
  }
  if (hNats === null) return { ...base, problem: 'The result has no entropy estimate, so there is no n ĥ to subtract.' };
  if (sigmaNats === null) return { ...base, problem: 'The result has no positive σ̂², so the fluctuations cannot be normalized.' };
  if (sampled === 0) return { ...base, problem: 'This result has no sampled paths (a large saved result keeps only its summaries): run the analysis again to see them.' };
  const logReturn = pathColumn(result.paths.logReturn, sampled, n);
  const fluctuations = normalizedFluctuations(logReturn, result.paths.positions, n, hNats, sigmaNats, gap);
  const used = fluctuations.values.length;
  if (used < MIN_FLUCTUATION_VALUES) {
    return {
      ...base,
      fluctuations,
      problem: `At n = ${n} only ${used} sampled position${used === 1 ? ' has' : 's have'} an observed return (${fluctuations.missing} censored or past the end, ${fluctuations.thinned} thinned); at least ${MIN_FLUCTUATION_VALUES} are needed. Choose a smaller n or a smaller gap.`,
    };
  }
  return {
    ...base,
    fluctuations,
    tests: normalFitTests(fluctuations.values),
    quantiles: normalQuantilePlot(fluctuations.values, { maxPoints: 400, level: 0.95 }),
    histogram: normalHistogram(fluctuations.values),
    problem: null,
  };
}

function unavailable(statistics: FluctuationStatistics): Figure {
  return { kind: 'unavailable', message: statistics.problem ?? 'Nothing to show.' };
}

/**
 * Normal Q-Q plot of the fluctuations: sorted values against N(0,1) quantiles at Blom's positions,
 * the pointwise 95% band for the i-th order statistic of N(0,1) values, and the identity line.
 */
export function fluctuationQuantileFigure(statistics: FluctuationStatistics, size: FigureSize): Figure {
  const q = statistics.quantiles;
  if (statistics.problem !== null || q === null) return unavailable(statistics);
  const values: number[] = [];
  for (let i = 0; i < q.rank.length; i++) values.push(q.theoretical[i] ?? 0, q.sample[i] ?? 0, q.lower[i] ?? 0, q.upper[i] ?? 0);
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  const plot = plotArea(size);
  const { scale: x, axis: xAxis } = linearAxis([lo, hi], [plot.left, plot.left + plot.width], { label: 'N(0,1) quantile', unit: '' });
  // Both axes on x's rounded domain, so the identity line runs corner to corner.
  const { scale: y, axis: yAxis } = linearAxis(x.domain() as [number, number], [plot.top + plot.height, plot.top], { label: FLUCTUATION_LABEL, unit: '' }, false);
  const levelText = `${Math.round(q.level * 100)}%`;
  const bandPoints: BandPoint[] = Array.from(q.theoretical, (t, i) => ({ x: t, lower: q.lower[i] ?? null, upper: q.upper[i] ?? null }));
  const band: BandMark = {
    id: 'band',
    label: `Pointwise ${levelText} band for N(0,1)`,
    colour: FLUCTUATION_STYLES.pointwiseBand.colour,
    opacity: BAND_OPACITY * 1.5,
    path: bandPath(bandPoints, x, y),
    data: bandRows(bandPoints),
  };
  const [d0, d1] = x.domain() as [number, number];
  const identity = lineMark(
    'identity',
    'Identity: N(0,1) exactly',
    FLUCTUATION_STYLES.identity,
    [
      { x: d0, y: d0 },
      { x: d1, y: d1 },
    ],
    x,
    y,
  );
  const points: PointMark = {
    id: 'quantiles',
    label: q.rank.length < q.size ? `Sorted values (${q.rank.length} of ${q.size} drawn)` : `Sorted values (${q.size})`,
    style: FLUCTUATION_STYLES.quantilePoints,
    points: Array.from(q.theoretical, (t, i) => ({ x: round2(x(t)), y: round2(y(q.sample[i] ?? 0)) })),
    data: Array.from(q.theoretical, (t, i) => ({ x: t, x2: null, y: q.sample[i] ?? 0, lower: null, upper: null })),
  };
  const legend: LegendEntry[] = [
    legendEntry(points.id, points.label, 'points', points.style),
    legendEntry(band.id, band.label, 'band', null, band.colour),
    legendEntry(identity.id, identity.label, 'line', identity.style),
  ];
  return figureOf({
    title: `Q-Q plot against N(0,1) at n = ${statistics.n}`,
    description: `Sorted normalized fluctuations ${FLUCTUATION_LABEL} of ${q.size} sampled positions against N(0,1) quantiles, with the pointwise ${levelText} band and the identity line.`,
    size,
    plot,
    x: xAxis,
    y: yAxis,
    bands: [band],
    lines: [identity],
    points: [points],
    legend,
    readout: Array.from(q.theoretical, (t, i) => ({
      n: i,
      x: round2(x(t)),
      heading: { id: 'quantile', label: 'N(0,1) quantile', value: readoutNumber(t) },
      rows: [
        { id: 'value', label: `Sorted value (rank ${q.rank[i] ?? 0} of ${q.size})`, value: readoutNumber(q.sample[i] ?? null) },
        { id: 'band', label: `${levelText} band`, value: `${readoutNumber(q.lower[i] ?? null)} to ${readoutNumber(q.upper[i] ?? null)}` },
      ],
    })),
  });
}

/** SVG path of histogram bars: one closed rectangle per bin with a count above zero. */
export function barsPath(edges: ArrayLike<number>, counts: ArrayLike<number>, x: (v: number) => number, y: (v: number) => number): string {
  let d = '';
  const base = round2(y(0));
  for (let k = 0; k < counts.length; k++) {
    const c = counts[k] ?? 0;
    if (!(c > 0)) continue;
    const x0 = round2(x(edges[k] ?? 0));
    const x1 = round2(x(edges[k + 1] ?? 0));
    d += `M${x0},${base}V${round2(y(c))}H${x1}V${base}Z`;
  }
  return d;
}

/** The bins barsPath draws (count above zero) in data units: x..x2 is the bin, y its count. */
function barRows(edges: ArrayLike<number>, counts: ArrayLike<number>): DataRow[] {
  const out: DataRow[] = [];
  for (let k = 0; k < counts.length; k++) {
    const c = counts[k] ?? 0;
    if (c > 0) out.push({ x: edges[k] ?? 0, x2: edges[k + 1] ?? 0, y: c, lower: null, upper: null });
  }
  return out;
}

/** Histogram of the fluctuations (Freedman-Diaconis bins) with the N(0,1) density on the count scale. */
export function fluctuationHistogramFigure(statistics: FluctuationStatistics, size: FigureSize): Figure {
  const hist = statistics.histogram;
  if (statistics.problem !== null || hist === null) return unavailable(statistics);
  const bins = hist.counts.length;
  const xLo = Math.min(hist.edges[0] ?? 0, hist.curveX[0] ?? 0);
  const xHi = Math.max(hist.edges[bins] ?? 0, hist.curveX[hist.curveX.length - 1] ?? 0);
  const yHi = Math.max(...hist.counts, ...hist.curveY) * 1.05;
  const plot = plotArea(size);
  const { scale: x, axis: xAxis } = linearAxis([xLo, xHi], [plot.left, plot.left + plot.width], { label: FLUCTUATION_LABEL, unit: '' });
  const { scale: y, axis: yAxis } = linearAxis([0, yHi], [plot.top + plot.height, plot.top], { label: 'Count', unit: '' });
  const path = barsPath(hist.edges, hist.counts, x, y);
  const barLabel = `Counts in bins of width ${round2(hist.binWidth)} (${hist.size} values)`;
  const bars: BandMark = { id: 'bars', label: barLabel, colour: FLUCTUATION_STYLES.bars.colour, opacity: BAND_OPACITY * 2, path, data: barRows(hist.edges, hist.counts) };
  const outline: LineMark = { id: 'bars', label: barLabel, style: FLUCTUATION_STYLES.bars, path, vertices: [], data: barRows(hist.edges, hist.counts) };
  const curvePoints: CurvePoint[] = Array.from(hist.curveX, (v, i) => ({ x: v, y: hist.curveY[i] ?? null }));
  const curve: LineMark = { id: 'gaussian', label: 'N(0,1) on the count scale', style: FLUCTUATION_STYLES.gaussianCurve, path: curvePath(curvePoints, x, y), vertices: [], data: curveRows(curvePoints) };
  return figureOf({
    title: `Histogram against N(0,1) at n = ${statistics.n}`,
    description: `Histogram of ${hist.size} normalized fluctuations ${FLUCTUATION_LABEL} in ${bins} bins, with the N(0,1) density scaled to counts.`,
    size,
    plot,
    x: xAxis,
    y: yAxis,
    bands: [bars],
    lines: [outline, curve],
    legend: [legendEntry('bars', barLabel, 'band', FLUCTUATION_STYLES.bars), legendEntry(curve.id, curve.label, 'line', curve.style)],
    readout: Array.from(hist.counts, (c, k) => ({
      n: k,
      x: round2(x(((hist.edges[k] ?? 0) + (hist.edges[k + 1] ?? 0)) / 2)),
      heading: { id: 'bin', label: 'Bin', value: `${readoutNumber(hist.edges[k] ?? null)} to ${readoutNumber(hist.edges[k + 1] ?? null)}` },
      rows: [
        { id: 'count', label: 'Count', value: String(c) },
        { id: 'expected', label: 'Expected under N(0,1)', value: readoutNumber(hist.expected[k] ?? null) },
      ],
    })),
  });
}
