import type { RunPhase } from '../store/runSlice';
import { formatBytes, formatCount } from './format';

/** What the progress area shows: a status word, a line of detail and the bar's value out of max (null = indeterminate). */
export interface ProgressView {
  readonly status: string;
  readonly detail: string;
  readonly value: number | null;
  readonly max: number;
}

/** The progress area's text and bar for the current run phase. */
export function progressView(run: RunPhase): ProgressView {
  if (run.status === 'idle') return { status: 'Idle', detail: run.note ?? 'Ready.', value: 0, max: 1 };
  const p = run.progress;
  if (p === null) return { status: 'Running', detail: `Starting ${run.label}…`, value: null, max: 1 };
  if (p.kind === 'read') {
    return {
      status: 'Running',
      detail: `Reading ${run.label}: ${formatBytes(p.bytes)} of ${formatBytes(p.totalBytes)}`,
      value: p.bytes,
      max: Math.max(1, p.totalBytes),
    };
  }
  return {
    status: 'Running',
    detail: `Block length n = ${p.n} of at most ${run.maxN} · ${formatCount(p.active)} positions still active`,
    value: Math.min(p.n, run.maxN),
    max: run.maxN,
  };
}
