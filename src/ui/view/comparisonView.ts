import type { ComparisonResult, RateEstimate } from '../../core';
import type { ComparisonProgress } from '../comparisonClient';
import type { CompareSideChoice } from '../store/comparisonSlice';

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
  return `${side.label}, ${side.length.toLocaleString('en-US')} symbols`;
}

/** The running comparison's stage in words. */
export function comparisonProgressText(progress: ComparisonProgress | null): string {
  if (progress === null) return 'Starting…';
  if (progress.stage === 'read') return 'Reading the inputs…';
  if (progress.stage === 'entropy-a') return `Entropy rate of A: block length ${progress.done} of ${progress.total}`;
  return `Waiting times of A in B: segment pair ${progress.done} of ${progress.total}`;
}
