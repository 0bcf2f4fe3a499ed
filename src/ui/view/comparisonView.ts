import type { ComparisonResult, RateEstimate } from '../../core';
import type { ComparisonProgress } from '../comparisonClient';
import type { ComparisonRunState, CompareSideChoice } from '../store/comparisonSlice';
import { formatDuration } from './timeLeft';

/** One row of the comparison's estimate table, as text. */
export interface ComparisonLine {
  readonly id: 'cross' | 'entropy-a' | 'relative';
  readonly label: string;
  readonly estimate: string;
  readonly interval: string;
  readonly exact: string | null;
  readonly note: string;
}

function number(x: number | null | undefined): string {
  return x === null || x === undefined || !Number.isFinite(x) ? '—' : x.toFixed(4);
}

function line(id: ComparisonLine['id'], label: string, r: RateEstimate, exact: number | null | undefined): ComparisonLine {
  return {
    id,
    label,
    estimate: number(r.estimate),
    interval: r.ci95 === null ? 'no interval' : `${number(r.ci95[0])} to ${number(r.ci95[1])}`,
    exact: exact === undefined || exact === null ? null : number(exact),
    note: r.note,
  };
}

/** The three estimates of a comparison with their intervals and, when known, the exact values. */
export function comparisonLines(result: ComparisonResult): readonly ComparisonLine[] {
  const exact = result.exact;
  return [
    line('cross', 'Cross entropy rate H(A, B)', result.crossEntropy, exact?.crossEntropy),
    line('entropy-a', 'Entropy rate h(A)', result.entropyA, exact?.entropyA),
    line('relative', 'Relative entropy rate D(A‖B)', result.relativeEntropy, exact?.relativeEntropy),
  ];
}

/** What one side holds, in words. */
export function sideText(side: CompareSideChoice | null): string {
  if (side === null) return 'nothing chosen';
  if (side.kind === 'file') return `file “${side.name}” (${side.bytes.toLocaleString('en-US')} bytes)`;
  if (side.kind === 'input') return 'the input loaded above (read when the comparison starts)';
  return `${side.label}, ${side.length.toLocaleString('en-US')} symbols`;
}

/** The running comparison's stage in words. */
export function comparisonProgressText(progress: ComparisonProgress | null): string {
  if (progress === null) return 'Starting…';
  if (progress.stage === 'read') return 'Reading the inputs…';
  if (progress.stage === 'entropy-a') return `Entropy rate of A: block length n = ${progress.done} of at most ${progress.total}`;
  return `Waiting times of A in B: segment pair ${progress.done} of ${progress.total}`;
}

/** The comparison's progress area: status word, detail, bar value of max (null = indeterminate), elapsed time. */
export interface ComparisonProgressView {
  readonly status: string;
  readonly detail: string;
  readonly value: number | null;
  readonly max: number;
  readonly elapsed: string | null;
}

const STATUS_WORD: Record<ComparisonRunState['status'], string> = { idle: 'Idle', running: 'Running', cancelled: 'Stopped', failed: 'Failed' };

/** Progress of the comparison like the Run panel's: which stage, block length n of maxN (or pair g of K), elapsed. */
export function comparisonProgressView(run: ComparisonRunState, nowMs: number): ComparisonProgressView {
  const status = STATUS_WORD[run.status];
  if (run.status !== 'running') return { status, detail: run.status === 'idle' ? 'Ready.' : '', value: 0, max: 1, elapsed: null };
  const started = run.startedAtMs ?? null;
  const elapsed = started === null ? null : `${formatDuration(Math.max(0, nowMs - started) / 1000)} elapsed`;
  const p = run.progress;
  const detail = comparisonProgressText(p);
  if (p === null || p.stage === 'read') return { status, detail, value: null, max: 1, elapsed };
  return { status, detail, value: Math.min(p.done, p.total), max: Math.max(1, p.total), elapsed };
}
