import { normalQuantilePlot, type ComparisonResult } from '../core';
import type { CurvePoint } from './curvePath';
import type { Figure, FigureSize, LegendEntry, LineMark, ReadoutStop } from './figureModel';
import { fluctuationQuantileFigure, type FluctuationStatistics } from './fluctuationFigure';
import { lineMark } from './lineMark';
import { linearAxis, round2 } from './linearAxis';
import { plotArea } from './plotArea';
import { readoutNumber } from './readoutFormat';
import { legendEntry, STYLES } from './seriesStyle';
import { trustedSpan } from './trustedSpan';

/** Label of the normalized waiting-time fluctuation. */
export const WAITING_FLUCTUATION_LABEL = '(log W_n − n Ĥ) / (σ̂ √n)';

/**
 * Convergence of a comparison: mean log W_n / n against n (in the result's unit; a lower bound where
 * waits are censored), the cross entropy estimate (slope over the trusted range) as a level line,
 * and the exact cross entropy rate when both inputs came from reference chains.
 */
export function comparisonConvergenceFigure(result: ComparisonResult, size: FigureSize): Figure {
  const rows = result.lengths;
  const rates: CurvePoint[] = rows.map((r) => ({ x: r.n, y: r.ratePerSymbol }));
  const values = rates.flatMap((p) => (p.y === null ? [] : [p.y]));
  if (values.length === 0) return { kind: 'unavailable', message: 'No block length has a waiting time to plot.' };
  const maxN = rows[rows.length - 1]?.n ?? 1;
  const estimate = result.crossEntropy.estimate;
  const exact = result.exact?.crossEntropy ?? null;
  if (estimate !== null) values.push(estimate);
  if (exact !== null) values.push(exact);
  const plot = plotArea(size);
  const { scale: x, axis: xAxis } = linearAxis([1, maxN], [plot.left, plot.left + plot.width], { label: 'Block length n', unit: '', integer: true }, false);
  const { scale: y, axis: yAxis } = linearAxis([Math.min(0, ...values), Math.max(...values) * 1.05], [plot.top + plot.height, plot.top], {
    label: 'Mean log W_n / n',
    unit: result.unit,
  });
  const lines: LineMark[] = [lineMark('mean', 'Mean log W_n / n (censored waits at their bound)', STYLES.mean, rates, x, y)];
  if (estimate !== null) {
    lines.push(
      lineMark('estimate', `Cross entropy estimate ${readoutNumber(estimate)}`, STYLES.estimate, [
        { x: 1, y: estimate },
        { x: maxN, y: estimate },
      ], x, y),
    );
  }
  if (exact !== null) {
    lines.push(
      lineMark('exact', `Exact cross entropy ${readoutNumber(exact)}`, STYLES.exact, [
        { x: 1, y: exact },
        { x: maxN, y: exact },
      ], x, y),
    );
  }
  const spans = trustedSpan(result, x);
  const legend: LegendEntry[] = lines.map((l) => legendEntry(l.id, l.label, 'line', l.style));
  for (const s of spans) legend.push(legendEntry(s.id, s.label, 'span', null, 'ink'));
  const readout: ReadoutStop[] = rows.map((r) => ({
    n: r.n,
    x: round2(x(r.n)),
    rows: [
      { id: 'mean', label: 'Mean log W_n / n', value: readoutNumber(r.ratePerSymbol) },
      { id: 'censored', label: 'Censored waits', value: `${r.censored} of ${r.positions}` },
    ],
  }));
  return {
    kind: 'figure',
    model: {
      title: 'Convergence of mean log W_n / n',
      description: `Mean log of the waiting times of A's n-blocks in B, divided by n, in ${result.unit}, with the cross entropy estimate${exact === null ? '' : ' and the exact value'}.`,
      size,
      plot,
      x: xAxis,
      y: yAxis,
      spans,
      bands: [],
      pathLayer: null,
      lines,
      points: [],
      legend,
      readout,
      notes: [],
    },
  };
}

/**
 * Normal Q-Q plot of the comparison's normalized waiting-time fluctuations (log W_n − n H)/(σ √n)
 * at the top of the trusted range, drawn by the return-time view's Q-Q figure with its own labels.
 */
export function comparisonQuantileFigure(result: ComparisonResult, size: FigureSize): Figure {
  const fl = result.fluctuations;
  if (fl === null || fl.values.length < 3) {
    return { kind: 'unavailable', message: 'No fluctuations to show: the comparison has no trusted block length with a positive σ̂² and at least three sampled waits.' };
  }
  const statistics: FluctuationStatistics = {
    n: fl.n,
    gap: 1,
    hNats: fl.centreRateNats,
    sigmaNats: fl.sigmaNats,
    sampled: fl.positions.length + fl.censored,
    fluctuations: null,
    tests: null,
    quantiles: normalQuantilePlot(fl.values, { maxPoints: 400, level: 0.95 }),
    histogram: null,
    negligible: false,
    problem: null,
  };
  const figure = fluctuationQuantileFigure(statistics, size);
  if (figure.kind !== 'figure') return figure;
  const basis = fl.basis === 'exact' ? 'exact H and σ of the pair' : 'estimated Ĥ and σ̂';
  return {
    kind: 'figure',
    model: {
      ...figure.model,
      title: `Waiting-time fluctuations against N(0,1) at n = ${fl.n}`,
      description: `Sorted ${WAITING_FLUCTUATION_LABEL} of ${fl.values.length} sampled positions of A (${basis}) against N(0,1) quantiles, with the pointwise 95% band and the identity line.`,
      y: { ...figure.model.y, label: WAITING_FLUCTUATION_LABEL },
      notes: [`Centred and scaled with the ${basis}; ${fl.censored} sampled position${fl.censored === 1 ? '' : 's'} never found in B ${fl.censored === 1 ? 'is' : 'are'} left out.`],
    },
  };
}
