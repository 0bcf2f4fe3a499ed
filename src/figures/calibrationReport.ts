import { calibrationBelongsTo } from '../core';
import type { AnalysisResult, CalibrationResult, EstimatorCalibration } from '../core';
import { exportCalibrationFigure } from './exportCalibrationFigure';
import { figureSvg } from './figureSvg';
import { xmlText } from './xmlText';

/** Fixed decimals; '-' for a missing number. */
function fixed(x: number | null | undefined, digits: number): string {
  return x === null || x === undefined || !Number.isFinite(x) ? '-' : x.toFixed(digits);
}

/** The exact value in data-value (empty when missing), so readers and tests need not parse text. */
function data(name: string, x: number | null): string {
  return x === null ? '' : ` data-${name}="${xmlText(String(x))}"`;
}

function signed(x: number | null, digits: number): string {
  return x === null || !Number.isFinite(x) ? '-' : `${x >= 0 ? '+' : '−'}${Math.abs(x).toFixed(digits)}`;
}

function row(id: string, name: string, unit: string, c: EstimatorCalibration): string {
  const coverage =
    c.coverage === null ? '-' : `${fixed(c.coverage, 3)} ± ${fixed(c.coverageStandardError, 3)} (${c.covered} of ${c.intervals})`;
  return (
    `<tr id="${id}"><th scope="row">${xmlText(`${name} (${unit})`)}</th>` +
    `<td class="num"${data('value', c.exact)}>${fixed(c.exact, 6)}</td>` +
    `<td class="num"${data('value', c.mean)}>${fixed(c.mean, 4)}</td>` +
    `<td class="num"${data('value', c.bias)}${data('se', c.biasStandardError)}>${signed(c.bias, 4)} ± ${fixed(c.biasStandardError, 4)}</td>` +
    `<td class="num"${data('value', c.spread)}>${fixed(c.spread, 4)}</td>` +
    `<td class="num"${data('value', c.coverage)}${data('se', c.coverageStandardError)}>${coverage}</td></tr>`
  );
}

/**
 * The report's calibration section: the fitted chain (order by BIC, how unseen transitions are
 * treated, its exact h and sigma^2), the replicates and seed, bias with its standard error, spread
 * and coverage with its binomial standard error for h and sigma^2, the corrected h with its label,
 * and the calibration figure inline. A partial calibration (cancelled) and one that belongs to
 * another analysis (stale) say so. Empty without a calibration.
 */
export function calibrationSection(result: AnalysisResult, cal: CalibrationResult | null | undefined, level: number): string {
  if (cal === null || cal === undefined) return '';
  const stale = !calibrationBelongsTo(cal, result);
  const m = cal.model;
  const s = cal.summary;
  const hUnit = result.entropy.unit;
  const sUnit = result.sigma2.unit;
  const parts: string[] = [];
  if (stale) {
    parts.push(
      `<p class="report-note" id="calibration-stale">${xmlText(`This calibration belongs to another analysis (input “${cal.input.name}”, ${cal.input.symbols} symbols, or other settings), not to the result above: its numbers do not apply here.`)}</p>`,
    );
  }
  if (cal.partial) {
    parts.push(
      `<p class="report-note" id="calibration-partial">${xmlText(`Partial: ${s.replicates} of ${cal.replicatesRequested} replicates finished before the calibration was stopped.`)}</p>`,
    );
  }
  const facts: [string, string][] = [
    ['Fitted Markov order', `${m.order} (${m.criterion}, chosen among orders 0 to ${m.maxOrder}: ${m.capReason})`],
    ['Observations behind the criterion', String(m.observations)],
    ['Fitted chain', `${m.states} contexts, ${m.transientStates} transient, ${m.droppedTransitions} transitions dropped, period ${m.period}`],
    ['Rule for unseen transitions', m.rule],
    ['Replicates', `${s.replicates} of ${cal.replicatesRequested}${cal.partial ? ' (partial)' : ''}`],
    ['Base seed', String(cal.baseSeed)],
    ['Headline method of the surrogates', Object.entries(s.methods).map(([k, v]) => `${k} ${v}`).join(', ') || '-'],
  ];
  parts.push(
    `<dl class="facts" id="calibration-facts" data-order="${m.order}" data-replicates="${s.replicates}" data-requested="${cal.replicatesRequested}" data-seed="${xmlText(String(cal.baseSeed))}">` +
      facts.map(([k, v]) => `<dt>${xmlText(k)}</dt><dd>${xmlText(v)}</dd>`).join('') +
      '</dl>',
  );
  parts.push(
    `<p id="calibration-exact">Exact values of the fitted chain: h = <span${data('value', m.entropyRate)}>${fixed(m.entropyRate, 6)}</span> ${xmlText(hUnit)}, ` +
      `σ² = <span${data('value', m.sigma2)}>${fixed(m.sigma2, 6)}</span> ${xmlText(sUnit)}.</p>`,
  );
  parts.push(
    `<table id="calibration-table"><caption>${xmlText(`Surrogate estimates against the fitted chain (nominal ${level}% intervals)${cal.partial ? ', partial' : ''}`)}</caption>` +
      '<thead><tr><th scope="col">Quantity</th><th scope="col">Exact</th><th scope="col">Mean</th><th scope="col">Bias ± SE</th><th scope="col">Spread (SD)</th><th scope="col">Coverage ± SE</th></tr></thead>' +
      `<tbody>${row('calibration-h', 'h', hUnit, s.entropy)}${row('calibration-sigma2', 'σ²', sUnit, s.sigma2)}</tbody></table>`,
  );
  const c = s.correctedEntropy;
  if (c !== null) {
    parts.push(
      `<p id="calibration-corrected"${data('value', c.estimate)}${data('low', c.interval[0])}${data('high', c.interval[1])}><strong>${xmlText(`Corrected h = ${fixed(c.estimate, 4)} ${hUnit}`)}</strong>, ` +
        `${xmlText(`${level}% interval ${fixed(c.interval[0], 4)} to ${fixed(c.interval[1], 4)}`)}${stale ? ' (stale)' : ''}. ${xmlText(`${c.label}.`)}</p>`,
    );
  }
  const { id, figure, caption } = exportCalibrationFigure(cal, stale ? null : result);
  if (figure.kind === 'figure') {
    const svg = figureSvg(figure.model, caption, `${id}-`).replace(/^<\?xml[^>]*\?>\n/, '');
    const text = `Calibration figure. ${figure.model.title}. ${figure.model.description} ${caption.view}.`;
    parts.push(`<figure id="figure-${id}" data-figure="${id}">${svg}<figcaption>${xmlText(text)}</figcaption></figure>`);
  } else {
    parts.push(`<figure id="figure-${id}" data-figure="${id}"><p class="unavailable">${xmlText(`The calibration figure cannot be drawn: ${figure.message}`)}</p></figure>`);
  }
  return `<section id="calibration"><h2>Calibration at this N</h2><p>${xmlText(
    'A Markov chain fitted to the data generated surrogates of the same length; each was analysed with the same settings, and their estimates are compared with the chain’s exact h and σ². The bias and coverage describe the estimator on data like the fitted chain, not on the data themselves.',
  )}</p>${parts.join('\n')}</section>`;
}
