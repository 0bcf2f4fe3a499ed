import type { AnalysisResult, EntropyUnit, LengthRow } from '../../core';
import type { AnalysisProgress } from '../analysisClient';
import type { StoreHandle } from './store';

/** What the run machinery is doing; only one run at a time. */
export type RunPhase =
  | { readonly status: 'idle'; readonly note: string | null }
  | {
      readonly status: 'running';
      readonly id: number;
      readonly label: string;
      /** The maxN the run was started with, for the progress bar. */
      readonly maxN: number;
      readonly progress: AnalysisProgress | null;
      /** Clock time (ms) the run started, for the elapsed time. */
      readonly startedAtMs: number;
      /** The scan's level reports so far, for the time-left rule (see view/timeLeft.ts); null before the first. */
      readonly levels: LevelTrack | null;
      /** Clock times (ms) of the first and the last report of a shared scan's class groups; null before. */
      readonly shares: { readonly firstAtMs: number; readonly lastAtMs: number } | null;
    };

/**
 * The level reports condensed: times of the first and last report, the positions in play after the
 * last two levels, and the work between the first and the last report (the sum of the positions in
 * play after each level but the last, since level k+1 works on those left after level k).
 */
export interface LevelTrack {
  readonly firstAtMs: number;
  readonly lastAtMs: number;
  readonly active: number;
  readonly previousActive: number | null;
  readonly positionLevelsSinceFirst: number;
}

/** The level track after one more report. */
export function trackLevel(track: LevelTrack | null, active: number, atMs: number): LevelTrack {
  if (track === null) return { firstAtMs: atMs, lastAtMs: atMs, active, previousActive: null, positionLevelsSinceFirst: 0 };
  return {
    firstAtMs: track.firstAtMs,
    lastAtMs: atMs,
    active,
    previousActive: track.active,
    positionLevelsSinceFirst: track.positionLevelsSinceFirst + track.active,
  };
}

/**
 * The per-n rows a run has finished so far, drawn by the table and the convergence figure until its
 * result arrives. A cancelled run keeps them (status 'cancelled') until the next run starts: nothing
 * computed is thrown away.
 */
export interface PartialRows {
  readonly runId: number;
  readonly label: string;
  /** Unit of the rows' entropies: the run's, which the settings may no longer show. */
  readonly unit: EntropyUnit;
  /** The run's maxN, so the figure's n axis stays put while rows arrive. */
  readonly maxN: number;
  /** Rows n = 1..k in order. */
  readonly rows: readonly LengthRow[];
  /** 'stopped': the worker died; 'interrupted': the page was reloaded during the run (the rows were saved). */
  readonly status: 'running' | 'cancelled' | 'stopped' | 'interrupted';
}

/** A failed run, told in plain words; `message` is the core's message, unchanged. */
export interface RunFailure {
  readonly title: string;
  readonly message: string;
}

export interface RunState {
  readonly run: RunPhase;
  readonly failure: RunFailure | null;
  readonly lastRunId: number;
  /** Rows of the running (or last cancelled) run; null when there are none to show. */
  readonly partial: PartialRows | null;
}

export const initialRunState: RunState = { run: { status: 'idle', note: null }, failure: null, lastRunId: 0, partial: null };

/** The note shown after a cancel: where the scan stopped, and what stays on screen. */
export function cancelNote(partial: PartialRows | null): string {
  const last = partial?.rows[partial.rows.length - 1];
  if (partial === null || last === undefined) return 'Cancelled; the previous result stays shown.';
  return `Cancelled at n = ${last.n} of ${partial.maxN}; the rows n = 1..${last.n} stay in the table and figure, the previous result in the summary.`;
}

/** Whether an error is the cancellation of a run (an AbortError from the client or the signal). */
export function isAbortError(error: unknown): boolean {
  return typeof error === 'object' && error !== null && (error as { name?: unknown }).name === 'AbortError';
}

/** Whether an error is the analysis worker's death (analysisClient's WorkerStopped). */
export function isWorkerStopped(error: unknown): boolean {
  return typeof error === 'object' && error !== null && (error as { name?: unknown }).name === 'WorkerStopped';
}

/** The title and message shown for an error thrown by the reader, the analysis or the worker. */
export function describeFailure(error: unknown, label: string): RunFailure {
  const name = typeof error === 'object' && error !== null ? (error as { name?: unknown }).name : undefined;
  const raw = error instanceof Error || (typeof error === 'object' && error !== null && 'message' in error)
    ? String((error as { message: unknown }).message)
    : String(error);
  const message = raw.trim() === '' ? 'no details were given' : raw;
  if (name === 'ReadError') return { title: `Could not read ${label}`, message };
  if (name === 'RangeError') return { title: `The analysis of ${label} refused its input`, message };
  if (name === 'WorkerStopped') return { title: `The analysis of ${label} stopped unexpectedly`, message };
  return { title: `The analysis of ${label} failed`, message };
}

export function runActions(store: StoreHandle) {
  const isCurrent = (id: number): boolean => {
    const { run } = store.getState();
    return run.status === 'running' && run.id === id;
  };
  return {
    /** Marks a new run as started and returns its id; reports for older ids are ignored from now on. */
    beginRun(label: string, maxN: number, atMs: number = Date.now(), unit: EntropyUnit = 'nat'): number {
      const id = store.getState().lastRunId + 1;
      store.setState({
        run: { status: 'running', id, label, maxN, progress: null, startedAtMs: atMs, levels: null, shares: null },
        failure: null,
        lastRunId: id,
        partial: { runId: id, label, unit, maxN, rows: [], status: 'running' },
      });
      return id;
    },
    /** Appends rows of the current run; rows that do not continue n = 1..k (repeats, gaps, old runs) are ignored. */
    addPartialRows(id: number, rows: readonly LengthRow[]): void {
      store.setState((s) => {
        const partial = s.partial;
        if (!isCurrent(id) || partial?.runId !== id) return s;
        const added: LengthRow[] = [];
        let next = partial.rows.length + 1;
        for (const row of rows) {
          if (row.n !== next) continue;
          added.push(row);
          next++;
        }
        if (added.length === 0) return s;
        return { partial: { ...partial, rows: [...partial.rows, ...added] } };
      });
    },
    /** Stores the latest report; level and share reports also feed the time-left tracks. */
    reportProgress(id: number, progress: AnalysisProgress, atMs: number = Date.now()): void {
      store.setState((s) => {
        if (!isCurrent(id) || s.run.status !== 'running') return s;
        const levels = progress.kind === 'level' ? trackLevel(s.run.levels, progress.active, atMs) : s.run.levels;
        const shares = progress.kind === 'shares' ? { firstAtMs: s.run.shares?.firstAtMs ?? atMs, lastAtMs: atMs } : s.run.shares;
        return { run: { ...s.run, progress, levels, shares } };
      });
    },
    /** Stores the result (replacing the previous snapshot) and returns to idle. */
    completeRun(id: number, result: AnalysisResult): void {
      if (!isCurrent(id)) return;
      store.setState({ run: { status: 'idle', note: null }, result, pathsDropped: false, partial: null });
    },
    /** Back to idle; rows already computed stay shown, marked as cancelled. */
    cancelRun(id: number): void {
      if (!isCurrent(id)) return;
      const { partial } = store.getState();
      const kept = partial !== null && partial.runId === id && partial.rows.length > 0 ? { ...partial, status: 'cancelled' as const } : null;
      store.setState({ run: { status: 'idle', note: cancelNote(kept) }, partial: kept });
    },
    failRun(id: number, error: unknown): void {
      const { run } = store.getState();
      if (!isCurrent(id) || run.status !== 'running') return;
      // A worker that died leaves the rows it finished: they stay, marked as stopped.
      const { partial } = store.getState();
      const stopped = isWorkerStopped(error) && partial !== null && partial.runId === id && partial.rows.length > 0;
      store.setState({ run: { status: 'idle', note: null }, failure: describeFailure(error, run.label), partial: stopped ? { ...partial, status: 'stopped' } : null });
    },
    dismissFailure(): void {
      store.setState({ failure: null });
    },
  };
}
