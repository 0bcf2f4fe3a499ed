import { entropyFromNats, type AnalysisResult, type EntropyUnit, type LengthRow } from '../core';
import { bandPath, type BandPoint, type CurvePoint } from './curvePath';
import { bandRows } from './dataRows';
import { lineMark } from './lineMark';
import type { Figure, FigureSize, LegendEntry, LineMark, ReadoutStop } from './figureModel';
import { linearAxis, round2 } from './linearAxis';
import { BAND_OPACITY } from './palette';
import { pathCurves, pathLayer } from './pathLayer';
import { plotArea } from './plotArea';
import { readoutNumber } from './readoutFormat';
import { legendEntry, STYLES } from './seriesStyle';
import { trustedSpan } from './trustedSpan';

/** Indices into LengthRow.quantilesLogReturn (probabilities 0.05, 0.25, 0.5, 0.75, 0.95). */
const Q05 = 0;
const Q25 = 1;
const Q75 = 3;
const Q95 = 4;

export interface ConvergenceOptions {
  /** Draw the sampled paths log R_n(x) / n (default true). */
  readonly showPaths?: boolean;
}

/** What the convergence figure draws: per-n rows and, for a finished result, its paths, estimate,
 * exact value and trusted range. */
export interface ConvergenceData {
  readonly rows: readonly LengthRow[];
  /** Unit of the rows' entropies. */
  readonly unit: EntropyUnit;
  /** Right end of the n axis: the last row's n for a result, the run's maxN while rows arrive. */
  readonly maxN: number;
  /** Sampled paths (log R in nats), or null when there are none yet. */
  readonly paths: AnalysisResult['paths'] | null;
  readonly estimate: number | null;
  readonly exact: number | null;
  readonly trustedRange: AnalysisResult['trustedRange'];
  /** True for the rows of a run still going or cancelled: the title says so. */
  readonly partial: boolean;
}

/** A finished result as convergence data. */
export function convergenceDataOfResult(result: AnalysisResult): ConvergenceData {
  const rows = result.lengths;
  return {
    rows,
    unit: result.settings.unit,
    maxN: rows[rows.length - 1]?.n ?? 1,
    paths: result.paths,
    estimate: Number.isFinite(result.entropy.estimate) ? result.entropy.estimate : null,
    exact: result.reference?.entropyRate ?? null,
    trustedRange: result.trustedRange,
    partial: false,
  };
}

/** Rows of a run still going (or cancelled): no paths, estimate or trusted range yet, axis up to maxN. */
export function partialConvergenceData(rows: readonly LengthRow[], unit: EntropyUnit, maxN: number): ConvergenceData {
  return { rows, unit, maxN: Math.max(maxN, rows[rows.length - 1]?.n ?? 1), paths: null, estimate: null, exact: null, trustedRange: null, partial: true };
}

/**
 * log R_n(x) / n against n: the sampled paths, the mean and the 25–75% and 5–95% bands of
 * log R_n / n from the per-n histograms, the plug-in H_n / n and conditional H_n − H_(n−1), the
 * headline estimate and, for generated input, the exact h. All in the result's unit per symbol
 * (paths and quantiles are stored in nats and converted here).
 */
export function convergenceFigure(result: AnalysisResult, size: FigureSize, options: ConvergenceOptions = {}): Figure {
  if (result.lengths.length === 0) return { kind: 'unavailable', message: 'The result has no block lengths to plot.' };
  return convergenceFigureOfRows(convergenceDataOfResult(result), size, options);
}

/** The convergence figure from rows (a result's, or the partial rows of a running run). */
export function convergenceFigureOfRows(data: ConvergenceData, size: FigureSize, options: ConvergenceOptions = {}): Figure {
  const { rows, unit, maxN, exact, estimate } = data;
  if (rows.length === 0) return { kind: 'unavailable', message: 'No block length has finished yet.' };
  const toUnit = (nats: number | null): number | null => (nats === null ? null : entropyFromNats(nats, unit));
  const rate = (nats: number | null, n: number): number | null => (nats === null ? null : (toUnit(nats) as number) / n);

  const mean: CurvePoint[] = rows.map((r) => ({ x: r.n, y: rate(r.meanLogReturnCorrected ?? r.meanLogReturn, r.n) }));
  const plugin: CurvePoint[] = rows.map((r) => ({ x: r.n, y: r.blockEntropyMillerMadow / r.n }));
  const conditional: CurvePoint[] = rows.map((r) => ({ x: r.n, y: r.conditionalEntropy }));
  const quantile = (r: LengthRow, k: number): number | null => rate(r.quantilesLogReturn[k] ?? null, r.n);
  const inner: BandPoint[] = rows.map((r) => ({ x: r.n, lower: quantile(r, Q25), upper: quantile(r, Q75) }));
  const outer: BandPoint[] = rows.map((r) => ({ x: r.n, lower: quantile(r, Q05), upper: quantile(r, Q95) }));
  const showPaths = options.showPaths ?? true;
  const curves = showPaths && data.paths !== null ? pathCurves(data.paths, (n, v) => entropyFromNats(v, unit) / n, maxN) : [];

  // The y range covers the summaries and bands; single paths far outside are clipped by the renderer.
  const values: number[] = [0];
  for (const c of [mean, plugin, conditional]) for (const p of c) if (p.y !== null && Number.isFinite(p.y)) values.push(p.y);
  for (const b of outer) for (const v of [b.lower, b.upper]) if (v !== null && Number.isFinite(v)) values.push(v);
  if (exact !== null) values.push(exact);
  if (estimate !== null) values.push(estimate);
  const plot = plotArea(size);
  const rateUnit = `${unit}/symbol`;
  const { scale: x, axis: xAxis } = linearAxis([1, maxN], [plot.left, plot.left + plot.width], { label: 'Block length n', unit: '', integer: true }, false);
  // Every plotted quantity is >= 0 in theory (R_n >= 1); tiny negative conditional entropies from
  // the Miller-Madow correction should not stretch the axis below zero.
  const top = Math.max(...values);
  const low = Math.min(...values) < -0.02 * top ? Math.min(...values) : 0;
  const { scale: y, axis: yAxis } = linearAxis([low, top], [plot.top + plot.height, plot.top], {
    label: 'log R_n / n',
    unit: rateUnit,
  });

  const lines: LineMark[] = [
    lineMark('mean', 'Mean log R_n / n', STYLES.mean, mean, x, y),
    lineMark('plugin', 'Plug-in H_n / n', STYLES.pluginRate, plugin, x, y),
    lineMark('conditional', 'Conditional H_n − H_(n−1)', STYLES.conditional, conditional, x, y),
  ];
  const flat = (v: number): CurvePoint[] => [
    { x: 1, y: v },
    { x: maxN, y: v },
  ];
  if (estimate !== null) lines.push(lineMark('estimate', `Estimate ĥ = ${readoutNumber(estimate)}`, STYLES.estimate, flat(estimate), x, y));
  if (exact !== null) lines.push(lineMark('exact', `Exact h = ${readoutNumber(exact)}`, STYLES.exact, flat(exact), x, y));
  const bands = [
    { id: 'band-outer', label: '5–95% of log R_n / n', colour: 'cobalt' as const, opacity: BAND_OPACITY, path: bandPath(outer, x, y), data: bandRows(outer) },
    { id: 'band-inner', label: '25–75% of log R_n / n', colour: 'cobalt' as const, opacity: BAND_OPACITY * 1.8, path: bandPath(inner, x, y), data: bandRows(inner) },
  ];
  const layer = pathLayer(curves, x, y, STYLES.samplePath, `Sampled positions (${curves.length})`);
  const spans = trustedSpan(data, x);

  const legend: LegendEntry[] = [];
  if (layer !== null) legend.push(legendEntry(layer.id, layer.label, 'paths', layer.style));
  for (const b of bands) legend.push(legendEntry(b.id, b.label, 'band', null, b.colour, b.opacity));
  for (const l of lines) legend.push(legendEntry(l.id, l.label, 'line', l.style));
  for (const s of spans) legend.push(legendEntry(s.id, s.label, 'span', null, 'ink'));

  const readout: ReadoutStop[] = rows.map((r, i) => ({
    n: r.n,
    x: round2(x(r.n)),
    rows: [
      { id: 'mean', label: 'Mean log R_n / n', value: readoutNumber(mean[i]?.y ?? null) },
      { id: 'band-inner', label: '25–75%', value: `${readoutNumber(inner[i]?.lower ?? null)} to ${readoutNumber(inner[i]?.upper ?? null)}` },
      { id: 'band-outer', label: '5–95%', value: `${readoutNumber(outer[i]?.lower ?? null)} to ${readoutNumber(outer[i]?.upper ?? null)}` },
      { id: 'plugin', label: 'Plug-in H_n / n', value: readoutNumber(plugin[i]?.y ?? null) },
      { id: 'conditional', label: 'H_n − H_(n−1)', value: readoutNumber(conditional[i]?.y ?? null) },
    ],
  }));

  const notes: string[] = [];
  if (showPaths && data.paths !== null && curves.length === 0) notes.push('No sampled paths in this result (a large saved result keeps only its summaries).');
  return {
    kind: 'figure',
    model: {
      title: data.partial ? `Convergence of log R_n / n (partial: n = 1..${rows[rows.length - 1]?.n ?? 0})` : 'Convergence of log R_n / n',
      description: `log R_n(x) / n against block length n in ${rateUnit}, for ${curves.length} sampled positions, with the mean, quantile bands, plug-in and conditional block entropies${exact === null ? '' : ' and the exact entropy rate'}.`,
      size,
      plot,
      x: xAxis,
      y: yAxis,
      spans,
      bands,
      pathLayer: layer,
      lines,
      points: [],
      legend,
      readout,
      notes,
    },
  };
}
