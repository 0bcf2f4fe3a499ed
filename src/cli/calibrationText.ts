import type { CalibrationResult, EstimatorCalibration } from '../core';

const fmt = (x: number | null, digits = 4): string => (x === null || !Number.isFinite(x) ? '-' : x.toFixed(digits));
const signed = (x: number | null, digits = 4): string => (x === null || !Number.isFinite(x) ? '-' : `${x >= 0 ? '+' : ''}${x.toFixed(digits)}`);

function estimatorLines(name: string, c: EstimatorCalibration, unit: string, level: number): string[] {
  const coverage = c.coverage === null ? '-' : `${fmt(c.coverage, 3)} ± ${fmt(c.coverageStandardError, 3)} (${c.covered} of ${c.intervals})`;
  return [
    `${name}: exact value of the fitted chain ${fmt(c.exact, 6)} ${unit}`,
    `  surrogate estimates: mean ${fmt(c.mean, 6)}, bias ${signed(c.bias, 6)} ± ${fmt(c.biasStandardError, 6)} (SE), spread (SD) ${fmt(c.spread, 6)}`,
    `  coverage of the ${level}% interval: ${coverage}`,
  ];
}

/** The calibration block printed after the summary by `returnrate analyze --calibrate R`. */
export function calibrationText(cal: CalibrationResult, unit: string, sigma2Unit: string): string {
  const { model, summary } = cal;
  const level = Math.round(cal.settings.confidence * 100);
  const lines: string[] = [];
  lines.push('');
  lines.push(
    `calibration at N = ${cal.input.symbols.toLocaleString('en-US')}: ${summary.replicates} of ${cal.replicatesRequested} surrogates` +
      `${cal.partial ? ' (partial)' : ''}, base seed ${cal.baseSeed}`,
  );
  const scores = model.scores.map((s) => `k=${s.order}: ${s.bic.toFixed(1)}`).join(', ');
  lines.push(`  fitted Markov chain of order ${model.order} (BIC over k = 0..${model.maxOrder}; cap: ${model.capReason})`);
  lines.push(`  BIC ${scores}`);
  lines.push(
    `  ${model.states} contexts${model.transientStates > 0 ? `, ${model.transientStates} transient` : ''}` +
      `${model.droppedTransitions > 0 ? `, ${model.droppedTransitions} end-of-data transition(s) dropped` : ''}` +
      `${model.period > 1 ? `, period ${model.period}` : ''}`,
  );
  lines.push(...estimatorLines('h', summary.entropy, unit, level));
  lines.push(...estimatorLines('sigma^2', summary.sigma2, sigma2Unit, level));
  const methods = Object.entries(summary.methods).map(([m, n]) => `${m} ${n}`).join(', ');
  lines.push(`  headline method in the surrogates: ${methods}`);
  const c = summary.correctedEntropy;
  if (c !== null) {
    lines.push(`h corrected = ${fmt(c.estimate)} ${unit}   ${level}% interval [${fmt(c.interval[0])}, ${fmt(c.interval[1])}]`);
    lines.push(`  ${c.label}`);
  } else {
    lines.push('h corrected: - (the analysis gave no headline interval, or no surrogate gave an estimate)');
  }
  return lines.join('\n') + '\n';
}
