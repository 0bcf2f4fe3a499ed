import type { RunPhase } from '../store/runSlice';
import { formatBytes, formatCount } from './format';
import { formatDuration, timeLeftSeconds } from './timeLeft';

/**
 * What the progress area shows: a status word, a line of detail, the bar's value out of max (null =
 * indeterminate), and while running the elapsed time and the estimate of the time left.
 */
export interface ProgressView {
  readonly status: string;
  readonly detail: string;
  readonly value: number | null;
  readonly max: number;
  readonly elapsed: string | null;
  readonly timeLeft: string | null;
}

function timeLeftText(seconds: number): string {
  return seconds < 1 ? 'less than 1 s left' : `about ${formatDuration(seconds)} left`;
}

/** The progress area's text and bar for the current run phase, at clock time nowMs. */
export function progressView(run: RunPhase, nowMs: number = Date.now()): ProgressView {
  if (run.status === 'idle') return { status: 'Idle', detail: run.note ?? 'Ready.', value: 0, max: 1, elapsed: null, timeLeft: null };
  const elapsed = `${formatDuration(Math.max(0, nowMs - run.startedAtMs) / 1000)} elapsed`;
  const p = run.progress;
  if (p === null) return { status: 'Running', detail: `Starting ${run.label}…`, value: null, max: 1, elapsed, timeLeft: null };
  if (p.kind === 'read') {
    return {
      status: 'Running',
      detail: `Reading ${run.label}: ${formatBytes(p.bytes)} of ${formatBytes(p.totalBytes)}`,
      value: p.bytes,
      max: Math.max(1, p.totalBytes),
      elapsed,
      timeLeft: null,
    };
  }
  if (p.kind === 'shares') {
    // No level completes until every group is done: the bar moves by finished groups, and the time
    // left is the time per group so far times the groups still to come (they are of about equal work).
    const span = run.maxN - (p.firstN - 1);
    const shares = run.shares;
    const perShare = shares !== null && p.done > 0 ? (shares.lastAtMs - shares.firstAtMs) / 1000 / p.done : null;
    const left = perShare === null ? null : Math.max(0, perShare * (p.total - p.done) - (nowMs - (shares?.lastAtMs ?? nowMs)) / 1000);
    return {
      status: 'Running',
      detail: `Block lengths n = ${p.firstN} to ${run.maxN}, shared among workers: ${p.done} of ${p.total} groups of blocks done · ${formatCount(p.active)} positions in play`,
      value: p.firstN - 1 + (span * p.done) / Math.max(1, p.total),
      max: run.maxN,
      elapsed,
      timeLeft: left === null ? 'time left: estimating…' : timeLeftText(left),
    };
  }
  const track = run.levels;
  const left =
    track === null
      ? null
      : timeLeftSeconds({
          elapsedSeconds: (track.lastAtMs - track.firstAtMs) / 1000,
          n: p.n,
          maxN: run.maxN,
          active: track.active,
          previousActive: track.previousActive,
          positionLevelsDone: track.positionLevelsSinceFirst,
        });
  return {
    status: 'Running',
    detail: `Block length n = ${p.n} of at most ${run.maxN} · ${formatCount(p.active)} positions still in play`,
    value: Math.min(p.n, run.maxN),
    max: run.maxN,
    elapsed,
        // The estimate was made at the last report; count it down since then.
    timeLeft: left === null || track === null ? 'time left: estimating…' : timeLeftText(Math.max(0, left - (nowMs - track.lastAtMs) / 1000)),
  };
}
