import { entropyFromNats, type AnalysisResult } from '../core';
import { bandPath, curvePath, type BandPoint, type CurvePoint } from './curvePath';
import { bandRows } from './dataRows';
import { lineMark } from './lineMark';
import { envelopeExceedance, type BandWidths, type ExceedanceRow } from './envelopeExceedance';
import { errorTermHalfWidth, gaussianHalfWidth, iteratedLogHalfWidth, type EnvelopeOptions } from './envelopeBands';
import type { Figure, FigureModel, FigureSize, LegendEntry, LineMark, ReadoutStop } from './figureModel';
import { linearAxis, round2 } from './linearAxis';
import { BAND_OPACITY } from './palette';
import { pathCurves, pathLayer } from './pathLayer';
import { plotArea } from './plotArea';
import { parameterText, readoutNumber, readoutPercent } from './readoutFormat';
import { legendEntry, STYLES } from './seriesStyle';
import { trustedSpan } from './trustedSpan';

/**
 * Sampled paths of log R_n(x) − n ĥ against n with the bands ±z σ̂ sqrt(n), ±σ̂ sqrt(2 n log log n)
 * and ±C n^(1/2 − δ) (envelopeBands.ts), and per n the share of paths outside each band.
 * Computed in nats from the result's estimates; drawn in the result's unit.
 * @param options validated envelope options (envelopeOptionProblems is empty)
 */
/** h and sigma of a result in nats, the band half-widths per n and the share of paths outside each band. */
export interface EnvelopeStatistics {
  readonly hNats: number | null;
  readonly sigmaNats: number | null;
  readonly maxN: number;
  readonly widths: readonly BandWidths[];
  readonly exceedance: readonly ExceedanceRow[];
  /** Why there is nothing to show, or null. */
  readonly problem: string | null;
}

/** The size-independent part of the envelope figure (also shown as a table). */
export function envelopeStatistics(result: AnalysisResult, options: EnvelopeOptions): EnvelopeStatistics {
  const unit = result.settings.unit;
  const f = entropyFromNats(1, unit);
  const hNats = Number.isFinite(result.entropy.estimate) ? result.entropy.estimate / f : null;
  const sigma2Nats = Number.isFinite(result.sigma2.estimate) ? Math.max(0, result.sigma2.estimate) / (f * f) : null;
  const sigmaNats = sigma2Nats === null ? null : Math.sqrt(sigma2Nats);
  const maxN = result.lengths.length > 0 ? (result.lengths[result.lengths.length - 1]?.n ?? 0) : (result.paths.logReturn[0]?.length ?? 0);
  const none = (problem: string): EnvelopeStatistics => ({ hNats, sigmaNats, maxN, widths: [], exceedance: [], problem });
  if (hNats === null) return none('The result has no entropy estimate, so there is no n ĥ to subtract.');
  if (result.paths.logReturn.length === 0) return none('This result has no sampled paths (a large saved result keeps only its summaries): run the analysis again to see them.');
  if (maxN < 1) return none('The result has no block lengths to plot.');
  const widths: BandWidths[] = [];
  for (let n = 1; n <= maxN; n++) {
    widths.push({
      gaussian: sigmaNats === null ? null : gaussianHalfWidth(n, sigmaNats, options.z),
      iteratedLog: sigmaNats === null ? null : iteratedLogHalfWidth(n, sigmaNats),
      errorTerm: errorTermHalfWidth(n, options.errorC, options.delta),
    });
  }
  return { hNats, sigmaNats, maxN, widths, exceedance: envelopeExceedance(result.paths.logReturn, hNats, widths), problem: null };
}

/**
 * Sampled paths of log R_n(x) − n ĥ against n with the bands ±z σ̂ sqrt(n), ±σ̂ sqrt(2 n log log n)
 * and ±C n^(1/2 − δ) (envelopeBands.ts). Computed in nats from the result's estimates; drawn in
 * the result's unit. The read-out gives per n the share of paths outside each band.
 * @param options validated envelope options (envelopeOptionProblems is empty)
 * @param statistics envelopeStatistics(result, options), when the caller has it already
 */
export function envelopeFigure(
  result: AnalysisResult,
  size: FigureSize,
  options: EnvelopeOptions,
  statistics: EnvelopeStatistics = envelopeStatistics(result, options),
): Figure {
  const { hNats, sigmaNats, maxN, widths, exceedance, problem } = statistics;
  if (problem !== null || hNats === null) return { kind: 'unavailable', message: problem ?? 'No entropy estimate.' };
  const unit = result.settings.unit;
  const f = entropyFromNats(1, unit);
  // Show n up to the last level where some path still has a value (at least 3, where the
  // iterated-logarithm envelope starts): beyond it every path is censored and nothing is compared.
  let lastUsed = 0;
  for (const row of exceedance) if (row.used > 0) lastUsed = row.n;
  const shownN = Math.min(maxN, Math.max(3, lastUsed));
  const curves = pathCurves(result.paths, (n, v) => (v - n * hNats) * f, shownN);
  const band = (key: keyof BandWidths): BandPoint[] =>
    widths.slice(0, shownN).map((w, i) => {
      const half = w[key];
      return { x: i + 1, lower: half === null ? null : -half * f, upper: half === null ? null : half * f };
    });
  const gaussian = band('gaussian');
  const lil = band('iteratedLog');
  const error = band('errorTerm');

  const values: number[] = [0];
  for (const c of curves) for (const p of c) if (p.y !== null && Number.isFinite(p.y)) values.push(p.y);
  for (const b of [gaussian, lil, error]) for (const p of b) if (p.upper !== null) values.push(p.upper, p.lower as number);
  const plot = plotArea(size);
  const { scale: x, axis: xAxis } = linearAxis([1, shownN], [plot.left, plot.left + plot.width], { label: 'Block length n', unit: '', integer: true }, false);
  const { scale: y, axis: yAxis } = linearAxis([Math.min(...values), Math.max(...values)], [plot.top + plot.height, plot.top], {
    label: 'log R_n − n ĥ',
    unit,
  });
  // Envelopes drawn as two curves (upper and lower) in one path; only the Gaussian band is filled.
  const edges = (b: BandPoint[]): string =>
    [curvePath(b.map((p) => ({ x: p.x, y: p.upper })), x, y), curvePath(b.map((p) => ({ x: p.x, y: p.lower })), x, y)].filter((s) => s !== '').join('');
  const zText = parameterText(options.z);
  const lines: LineMark[] = [lineMark('zero', 'Zero', STYLES.zero, flat(0, shownN), x, y)];
  const bands = [];
  if (sigmaNats !== null) {
    bands.push({ id: 'gaussian', label: `±${zText} σ̂ √n`, colour: 'cobalt' as const, opacity: BAND_OPACITY, path: bandPath(gaussian, x, y), data: bandRows(gaussian) });
    lines.push({ id: 'gaussian', label: `±${zText} σ̂ √n`, style: STYLES.gaussianBand, path: edges(gaussian), vertices: [], data: bandRows(gaussian) });
    lines.push({ id: 'iteratedLog', label: '±σ̂ √(2 n log log n)', style: STYLES.lilEnvelope, path: edges(lil), vertices: [], data: bandRows(lil) });
  }
  const errorLabel = `±${parameterText(options.errorC)} n^(1/2 − ${parameterText(options.delta)})`;
  lines.push({ id: 'errorTerm', label: errorLabel, style: STYLES.errorTerm, path: edges(error), vertices: [], data: bandRows(error) });
  const layer = pathLayer(curves, x, y, STYLES.samplePath, `Sampled positions (${curves.length})`);
  const spans = trustedSpan(result, x);

  const legend: LegendEntry[] = [];
  if (layer !== null) legend.push(legendEntry(layer.id, layer.label, 'paths', layer.style));
  for (const l of lines) if (l.id !== 'zero') legend.push(legendEntry(l.id, l.label, l.id === 'gaussian' ? 'band' : 'line', l.style, undefined, l.id === 'gaussian' ? BAND_OPACITY : null));
  for (const s of spans) legend.push(legendEntry(s.id, s.label, 'span', null, 'ink'));

  const readout: ReadoutStop[] = exceedance.slice(0, shownN).map((row, i) => ({
    n: row.n,
    x: round2(x(row.n)),
    rows: [
      { id: 'paths', label: 'Paths used / left out', value: `${row.used} / ${row.leftOut}` },
      { id: 'gaussian', label: `±${zText} σ̂ √n`, value: halfText(gaussian[i], row.outside.gaussian) },
      { id: 'iteratedLog', label: '±σ̂ √(2 n log log n)', value: halfText(lil[i], row.outside.iteratedLog) },
      { id: 'errorTerm', label: errorLabel, value: halfText(error[i], row.outside.errorTerm) },
    ],
  }));

  const notes: string[] = [];
  if (sigmaNats === null) notes.push('The result has no σ̂², so only the error-term band is drawn.');
  const model: FigureModel = {
    title: 'Deviation of log R_n from n ĥ',
    description: `log R_n(x) − n ĥ against block length n in ${unit}, for ${curves.length} sampled positions, with Gaussian, iterated-logarithm and error-term bands.`,
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
  };
  return { kind: 'figure', model };
}

function flat(v: number, maxN: number): CurvePoint[] {
  return [
    { x: 1, y: v },
    { x: maxN, y: v },
  ];
}

function halfText(p: BandPoint | undefined, outside: number | null): string {
  if (p === undefined || p.upper === null) return 'not defined';
  return `±${readoutNumber(p.upper)}, ${readoutPercent(outside)} outside`;
}
