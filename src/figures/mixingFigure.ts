import type { DecayFit, DiagnosticsSummary } from '../core';
import type { CurvePoint } from './curvePath';
import type { Figure, FigureSize, LegendEntry, LineMark, PointMark, ReadoutStop } from './figureModel';
import { lineMark } from './lineMark';
import { round2 } from './linearAxis';
import { logAxis } from './logAxis';
import { plotArea } from './plotArea';
import { readoutNumber } from './readoutFormat';
import { legendEntry } from './seriesStyle';
import { figureOf } from './figureOf';

export const MIXING_STYLES = {
  beta: { colour: 'cobalt', dash: '', width: 1.5, marker: 'circle' },
  exponential: { colour: 'amber', dash: '7 3', width: 2, marker: null },
  power: { colour: 'teal', dash: '2 3', width: 2, marker: null },
  floor: { colour: 'ink', dash: '10 4 2 4', width: 1.4, marker: null },
} as const;

/** Value of a fitted decay at gap k. */
export function decayValue(fit: DecayFit, k: number): number | null {
  if (fit.scale === null) return null;
  return fit.kind === 'exponential' ? fit.C * Math.exp(-k / fit.scale) : fit.C * Math.pow(k, -fit.scale);
}

function fitLabel(fit: DecayFit): string {
  const what = fit.kind === 'exponential' ? `C e^(−k/τ), τ = ${readoutNumber(fit.scale)}` : `C k^(−p), p = ${readoutNumber(fit.scale)}`;
  return `${fit.kind === 'exponential' ? 'Exponential' : 'Power-law'} fit ${what}, R² ${readoutNumber(fit.rSquared)} (k = ${fit.gapRange[0]}–${fit.gapRange[1]})`;
}

/**
 * Estimated beta(k) against the gap k, both on log axes (a power law is a straight line there), with
 * the exponential and power-law fits drawn over the gaps they were fitted on, and the noise floor
 * (the estimate expected under independence).
 */
export function mixingFigure(diagnostics: DiagnosticsSummary | undefined, size: FigureSize): Figure {
  const b = diagnostics?.beta ?? null;
  if (diagnostics === undefined) return { kind: 'unavailable', message: 'This result has no diagnostics (saved before they were added): run the analysis again to see them.' };
  if (b === null || b.gaps.length === 0) return { kind: 'unavailable', message: 'The sequence is too short to estimate beta-mixing coefficients.' };
  const plot = plotArea(size);
  const kMax = b.gaps[b.gaps.length - 1] ?? 1;
  const positive = [...b.beta, ...b.noiseFloor].filter((v) => v > 0);
  const lo = positive.length > 0 ? Math.min(...positive) : 1e-4;
  const hi = positive.length > 0 ? Math.max(...positive) : 1;
  const { scale: x, axis: xAxis } = logAxis([1, Math.max(10, kMax)], [plot.left, plot.left + plot.width], { label: 'Gap k (symbols)', unit: 'log scale' });
  const { scale: y, axis: yAxis } = logAxis([lo, Math.min(1, Math.max(hi, lo * 10))], [plot.top + plot.height, plot.top], { label: 'β(k)', unit: 'log scale' });
  const log10 = (v: number | null | undefined): number | null => (v !== null && v !== undefined && v > 0 ? Math.log10(v) : null);
  const lines: LineMark[] = [];
  const floorPoints: CurvePoint[] = b.gaps.map((k, i) => ({ x: Math.log10(k), y: log10(b.noiseFloor[i]) }));
  lines.push(lineMark('noise-floor', 'Noise floor: expected estimate under independence', MIXING_STYLES.floor, floorPoints, x, y));
  for (const fit of [b.exponential, b.power]) {
    if (fit === null || fit.scale === null) continue;
    const pts: CurvePoint[] = b.gaps.filter((k) => k >= fit.gapRange[0] && k <= fit.gapRange[1]).map((k) => ({ x: Math.log10(k), y: log10(decayValue(fit, k)) }));
    lines.push(lineMark(fit.kind, fitLabel(fit), MIXING_STYLES[fit.kind], pts, x, y));
  }
  const [yLow] = y.domain() as [number, number];
  const points: PointMark[] = [
    {
      id: 'beta',
      label: `Estimated β(k), block length m = ${b.blockLength}`,
      style: MIXING_STYLES.beta,
      points: b.gaps.flatMap((k, i) => {
        const v = log10(b.beta[i]);
        return v === null || v < yLow ? [] : [{ x: round2(x(Math.log10(k))), y: round2(y(v)) }];
      }),
      data: b.gaps.flatMap((k, i) => {
        const v = log10(b.beta[i]);
        return v === null || v < yLow ? [] : [{ x: Math.log10(k), x2: null, y: v, lower: null, upper: null }];
      }),
    },
  ];
  const legend: LegendEntry[] = [legendEntry('beta', points[0]?.label ?? '', 'points', MIXING_STYLES.beta)];
  for (const l of lines) legend.push(legendEntry(l.id, l.label, 'line', l.style));
  const readout: ReadoutStop[] = b.gaps.map((k, i) => ({
    n: i,
    x: round2(x(Math.log10(k))),
    heading: { id: 'k', label: 'Gap k', value: String(k) },
    rows: [
      { id: 'beta', label: 'β(k)', value: readoutNumber(b.beta[i] ?? null) },
      { id: 'floor', label: 'Noise floor', value: readoutNumber(b.noiseFloor[i] ?? null) },
      { id: 'exponential', label: 'Exponential fit', value: readoutNumber(b.exponential === null ? null : decayValue(b.exponential, k)) },
      { id: 'power', label: 'Power-law fit', value: readoutNumber(b.power === null ? null : decayValue(b.power, k)) },
    ],
  }));
  return figureOf({
    title: 'Decay of dependence β(k)',
    description:
      `Plug-in estimate of the beta-mixing coefficient between blocks of length ${b.blockLength} separated by gap k, on log axes, ` +
      'with the fitted exponential and power-law decays and the noise floor. Values are log10 in the CSV.',
    size,
    plot,
    x: xAxis,
    y: yAxis,
    lines,
    points,
    legend,
    readout,
    notes: [b.note],
  });
}
