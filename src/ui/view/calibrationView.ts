import { calibrationBelongsTo } from '../../core';
import type { AnalysisResult, EstimatorCalibration } from '../../core';
import type { CalibrationRun } from '../store/calibrationSlice';
import { formatCount, formatFixed, prettyUnit } from './format';

/** One row of the calibration table (h or sigma^2), as text. */
export interface CalibrationRowView {
  readonly name: string;
  readonly exact: string;
  readonly mean: string;
  readonly bias: string;
  readonly spread: string;
  readonly coverage: string;
}

/** Everything the calibration panel prints; no numbers are computed in the component. */
export interface CalibrationView {
  readonly running: boolean;
  /** e.g. "Replicate 12 of 50", "Fitting the Markov chain", "Done: 50 replicates". */
  readonly progress: string;
  readonly done: number;
  readonly total: number;
  /** The result shown on the page is not the one this calibration belongs to. */
  readonly stale: boolean;
  readonly partial: boolean;
  readonly message: string | null;
  readonly model: string | null;
  readonly rows: readonly CalibrationRowView[];
  readonly corrected: { readonly value: string; readonly interval: string; readonly label: string } | null;
}

const DIGITS = 4;

/** The calibration belongs to this result: same input name, SHA-256, length and settings (compared field by
 * field, so a session's sorted keys do not make it stale). */
export function calibrationMatches(run: CalibrationRun, result: AnalysisResult | null): boolean {
  return result !== null && calibrationBelongsTo(run.analysis, result);
}

function signed(x: number | null): string {
  if (x === null || !Number.isFinite(x)) return '—';
  return `${x >= 0 ? '+' : '−'}${formatFixed(Math.abs(x), DIGITS)}`;
}

function row(name: string, c: EstimatorCalibration, level: number): CalibrationRowView {
  return {
    name,
    exact: formatFixed(c.exact, 6),
    mean: formatFixed(c.mean, DIGITS),
    bias: c.bias === null ? '—' : `${signed(c.bias)} ± ${formatFixed(c.biasStandardError, DIGITS)}`,
    spread: formatFixed(c.spread, DIGITS),
    coverage:
      c.coverage === null
        ? '—'
        : `${formatFixed(c.coverage, 3)} ± ${formatFixed(c.coverageStandardError, 3)} (${c.covered} of ${c.intervals}; nominal ${level}%)`,
  };
}

function progressText(run: CalibrationRun): string {
  const done = run.records.length;
  switch (run.status) {
    case 'fitting':
      return 'Reading the data again and fitting the Markov chain';
    case 'running':
      return `Replicate ${done} of ${run.replicates}`;
    case 'done':
      return `Done: ${done} replicates`;
    case 'cancelled':
      return `Stopped at ${done} of ${run.replicates} replicates (partial)`;
    case 'failed':
      return 'Failed';
  }
}

export function calibrationView(run: CalibrationRun, shown: AnalysisResult | null): CalibrationView {
  const result = run.result;
  const level = Math.round(run.analysis.settings.confidence * 100);
  const unit = run.analysis.settings.unit;
  const facts = run.facts;
  const model =
    facts === null
      ? null
      : `Markov chain of order ${facts.order} (BIC over k = 0..${facts.maxOrder}; cap: ${facts.capReason}), ${facts.states} contexts` +
        `${facts.transientStates > 0 ? `, ${facts.transientStates} transient` : ''}; surrogates of ${formatCount(run.analysis.input.symbols)} symbols, base seed ${run.baseSeed}.`;
  const c = result?.summary.correctedEntropy ?? null;
  return {
    running: run.status === 'fitting' || run.status === 'running',
    progress: progressText(run),
    done: run.records.length,
    total: run.replicates,
    stale: !calibrationMatches(run, shown),
    partial: run.status !== 'running' && run.status !== 'fitting' && run.records.length < run.replicates,
    message: run.message,
    model,
    rows:
      result === null
        ? []
        : [row(`h (${unit}/symbol)`, result.summary.entropy, level), row(`σ² (${prettyUnit(`${unit}^2`)}/symbol)`, result.summary.sigma2, level)],
    corrected:
      c === null
        ? null
        : {
            value: formatFixed(c.estimate, DIGITS),
            interval: `${level}% interval [${formatFixed(c.interval[0], DIGITS)}, ${formatFixed(c.interval[1], DIGITS)}] ${unit}/symbol`,
            label: c.label,
          },
  };
}
