import type { DiagnosticsSummary } from '../core';
import { bandPath, type BandPoint, type CurvePoint } from './curvePath';
import { bandRows } from './dataRows';
import type { BandMark, Figure, FigureSize, LegendEntry, PointMark, ReadoutStop } from './figureModel';
import { lineMark } from './lineMark';
import { linearAxis, round2 } from './linearAxis';
import { BAND_OPACITY } from './palette';
import { plotArea } from './plotArea';
import { readoutNumber } from './readoutFormat';
import { legendEntry, STYLES } from './seriesStyle';
import { figureOf } from './figureOf';

const ACF_STYLE = { colour: 'cobalt', dash: '', width: 1.5, marker: 'circle' } as const;

/**
 * The sample ACF of the information increments at lags 1..L with the white-noise band
 * ±1.96/√n and the zero line.
 */
export function autocorrelationFigure(diagnostics: DiagnosticsSummary | undefined, size: FigureSize): Figure {
  if (diagnostics === undefined) return { kind: 'unavailable', message: 'This result has no diagnostics (saved before they were added): run the analysis again to see them.' };
  const a = diagnostics.autocorrelation;
  if (a === null || a.lags.length === 0) return { kind: 'unavailable', message: 'The sequence is too short for the autocorrelation of the information increments.' };
  const plot = plotArea(size);
  const L = a.lags[a.lags.length - 1] ?? 1;
  const extent = Math.max(a.band * 2, ...a.acf.map((r) => Math.abs(r)));
  const { scale: x, axis: xAxis } = linearAxis([0, L + 1], [plot.left, plot.left + plot.width], { label: 'Lag', unit: 'symbols', integer: true });
  const { scale: y, axis: yAxis } = linearAxis([-extent, extent], [plot.top + plot.height, plot.top], { label: 'Autocorrelation', unit: '' });
  const band: BandPoint[] = [
    { x: 0, lower: -a.band, upper: a.band },
    { x: L + 1, lower: -a.band, upper: a.band },
  ];
  const bandMark: BandMark = {
    id: 'white-noise',
    label: `±1.96/√n, n = ${a.positions}`,
    colour: 'amber',
    opacity: BAND_OPACITY,
    path: bandPath(band, x, y),
    data: bandRows(band),
  };
  const zero: CurvePoint[] = [
    { x: 0, y: 0 },
    { x: L + 1, y: 0 },
  ];
  const zeroLine = lineMark('zero', 'Zero', STYLES.zero, zero, x, y);
  const points: PointMark[] = [
    {
      id: 'acf',
      label: `ACF of the information increments (k = ${a.order}); ${a.outside} of ${a.lags.length} lags outside the band, ${a.expectedOutside.toFixed(1)} expected by chance`,
      style: ACF_STYLE,
      points: a.lags.map((l, i) => ({ x: round2(x(l)), y: round2(y(a.acf[i] ?? 0)) })),
      data: a.lags.map((l, i) => ({ x: l, x2: null, y: a.acf[i] ?? null, lower: null, upper: null })),
    },
  ];
  const legend: LegendEntry[] = [
    legendEntry('acf', points[0]?.label ?? '', 'points', ACF_STYLE),
    legendEntry(bandMark.id, bandMark.label, 'band', null, bandMark.colour, bandMark.opacity),
  ];
  const readout: ReadoutStop[] = a.lags.map((l, i) => ({
    n: i,
    x: round2(x(l)),
    heading: { id: 'lag', label: 'Lag', value: String(l) },
    rows: [
      { id: 'acf', label: 'Autocorrelation', value: readoutNumber(a.acf[i] ?? null) },
      { id: 'band', label: 'Band half-width', value: readoutNumber(a.band) },
    ],
  }));
  return figureOf({
    title: 'Autocorrelation of the information increments',
    description: `Sample autocorrelation of Y_t = −log p̂(x_t | ${a.order - 1} previous symbols), centred, at lags 1–${L}, with the white-noise band ±1.96/√n.`,
    size,
    plot,
    x: xAxis,
    y: yAxis,
    bands: [bandMark],
    lines: [zeroLine],
    points,
    legend,
    readout,
    notes: [a.note],
  });
}
