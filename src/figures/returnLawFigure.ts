import { returnLaw, type AnalysisResult, type ReturnLaw } from '../core';
import { bandPath, type BandPoint, type CurvePoint } from './curvePath';
import type { BandMark, Figure, FigureSize, LegendEntry, SeriesStyle } from './figureModel';
import { bandRows } from './dataRows';
import { lineMark } from './lineMark';
import { linearAxis, round2 } from './linearAxis';
import { logAxis } from './logAxis';
import { BAND_OPACITY } from './palette';
import { pathColumn } from './pathColumn';
import { plotArea } from './plotArea';
import { readoutNumber } from './readoutFormat';
import { legendEntry } from './seriesStyle';
import { figureOf } from './figureOf';

/** Two-sided 95% normal quantile for the pointwise Greenwood band (common practice, no source). */
const Z95 = 1.959964;

export const RETURN_LAW_STYLES = {
  survival: { colour: 'cobalt', dash: '', width: 2.2, marker: null },
  exponential: { colour: 'ink', dash: '10 4 2 4', width: 1.6, marker: null },
} as const satisfies Record<string, SeriesStyle>;

/** The return law at one block length, independent of the figure size. */
export interface ReturnLawStatistics {
  readonly n: number;
  /** M = N − n + 1, the positions at this block length. */
  readonly positions: number;
  readonly law: ReturnLaw | null;
  /** Remarks on what the data could not give (e.g. censoring bounds missing from an old result). */
  readonly notes: readonly string[];
  /** Why there is nothing to show, or null. */
  readonly problem: string | null;
}

/**
 * Kaplan-Meier survival of t = R_n × count/(N − n + 1) over the sampled positions at block length
 * n, with censored returns kept as right-censored (core returnLaw).
 * @param n block length (integer >= 1)
 */
export function returnLawStatistics(result: AnalysisResult, n: number): ReturnLawStatistics {
  const positions = result.input.symbols - n + 1;
  const none = (problem: string): ReturnLawStatistics => ({ n, positions, law: null, notes: [], problem });
  const paths = result.paths;
  const sampled = paths.positions.length;
  if (sampled === 0) return none('This result has no sampled paths (a large saved result keeps only its summaries): run the analysis again to see them.');
  if (paths.logCount === undefined) return none('This result was saved before block counts were kept with the sampled paths: run the analysis again to see the return law.');
  if (positions < 1) return none(`n = ${n} is longer than the sequence.`);
  const notes: string[] = [];
  if (paths.logCensoredBound === undefined) notes.push('This result has no censoring bounds, so censored returns are left out (which biases the law towards short returns).');
  const law = returnLaw(
    pathColumn(paths.logReturn, sampled, n),
    // A missing count (past the end) pairs with a missing return, which returnLaw counts as missing.
    Array.from(pathColumn(paths.logCount, sampled, n), (c) => (Number.isNaN(c) ? 0 : c)),
    pathColumn(paths.logCensoredBound, sampled, n),
    positions,
    { gridPoints: 201 },
  );
  if (law.size === 0) return { n, positions, law, notes, problem: `At n = ${n} no sampled position has a return or a censoring bound. Choose a smaller n.` };
  return { n, positions, law, notes, problem: null };
}

/**
 * P(t > s) by Kaplan-Meier with its pointwise 95% Greenwood band (S ± 1.96 SE, kept inside (0, 1]),
 * against the Exp(1) survival e^{−s}, on a logarithmic y axis where e^{−s} is a straight line.
 */
export function returnLawFigure(statistics: ReturnLawStatistics, size: FigureSize): Figure {
  const law = statistics.law;
  if (statistics.problem !== null || law === null) return { kind: 'unavailable', message: statistics.problem ?? 'Nothing to show.' };
  let floor = 1;
  for (let g = 0; g < law.s.length; g++) {
    const v = law.survival[g] ?? Number.NaN;
    if (v > 0 && v < floor) floor = v;
  }
  const tMax = law.s[law.s.length - 1] ?? 0;
  // Show e^(-s) down to the largest s as well, unless that stretches the axis more than two decades
  // below the curve's lowest step; lower parts are clipped by the renderer.
  floor = Math.min(floor, Math.max(Math.exp(-tMax), floor / 100));
  const plot = plotArea(size);
  const { scale: x, axis: xAxis } = linearAxis([0, tMax > 0 ? tMax : 1], [plot.left, plot.left + plot.width], { label: 's', unit: '' });
  const { scale: y, axis: yAxis } = logAxis([floor, 1], [plot.top + plot.height, plot.top], { label: 'P(t > s)', unit: 'log scale' });
  const [lowest] = y.domain() as [number, number];
  const log10 = (v: number | undefined): number | null => (v !== undefined && v > 0 ? Math.log10(v) : null);
  const survival: CurvePoint[] = [];
  const exponential: CurvePoint[] = [];
  const band: BandPoint[] = [];
  for (let g = 0; g < law.s.length; g++) {
    const s = law.s[g] ?? 0;
    const v = law.survival[g];
    const se = law.standardError[g] ?? 0;
    survival.push({ x: s, y: log10(v) });
    exponential.push({ x: s, y: -s / Math.LN10 });
    const ok = v !== undefined && v > 0;
    band.push({
      x: s,
      lower: ok ? Math.max(lowest, Math.log10(Math.max(v - Z95 * se, 10 ** lowest))) : null,
      upper: ok ? Math.min(0, Math.log10(v + Z95 * se)) : null,
    });
  }
  const bandMark: BandMark = {
    id: 'greenwood',
    label: 'Pointwise 95% band (Greenwood)',
    colour: RETURN_LAW_STYLES.survival.colour,
    opacity: BAND_OPACITY,
    path: bandPath(band, x, y),
    data: bandRows(band),
  };
  const km = lineMark('survival', `Kaplan-Meier P(t > s), ${law.size} samples (${law.censored} censored)`, RETURN_LAW_STYLES.survival, survival, x, y);
  const exp = lineMark('exponential', 'Exp(1): e^(−s)', RETURN_LAW_STYLES.exponential, exponential, x, y);
  const legend: LegendEntry[] = [
    legendEntry(km.id, km.label, 'line', km.style),
    legendEntry(bandMark.id, bandMark.label, 'band', null, bandMark.colour),
    legendEntry(exp.id, exp.label, 'line', exp.style),
  ];
  return figureOf({
    title: `Return law at n = ${statistics.n}`,
    description: `Kaplan-Meier survival of t = R_n × block frequency for ${law.size} sampled positions, with its pointwise 95% band, against the Exp(1) survival e^(−s), on a logarithmic scale.`,
    size,
    plot,
    x: xAxis,
    y: yAxis,
    bands: [bandMark],
    lines: [exp, km],
    legend,
    readout: Array.from(law.s, (sv, g) => ({
      n: g,
      x: round2(x(sv)),
      heading: { id: 's', label: 's', value: readoutNumber(sv) },
      rows: [
        { id: 'survival', label: 'Kaplan-Meier P(t > s)', value: readoutNumber(law.survival[g] ?? null) },
        { id: 'se', label: 'Standard error (Greenwood)', value: readoutNumber(law.standardError[g] ?? null) },
        { id: 'exponential', label: 'e^(−s)', value: readoutNumber(Math.exp(-sv)) },
      ],
    })),
    notes: statistics.notes,
  });
}
