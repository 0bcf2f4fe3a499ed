import type { AnalysisResult } from '../../core';
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

/** A failed run, told in plain words; `message` is the core's message, unchanged. */
export interface RunFailure {
  readonly title: string;
  readonly message: string;
}

export interface RunState {
  readonly run: RunPhase;
  readonly failure: RunFailure | null;
  readonly lastRunId: number;
}

export const initialRunState: RunState = { run: { status: 'idle', note: null }, failure: null, lastRunId: 0 };

/** Whether an error is the cancellation of a run (an AbortError from the client or the signal). */
export function isAbortError(error: unknown): boolean {
  return typeof error === 'object' && error !== null && (error as { name?: unknown }).name === 'AbortError';
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
  return { title: `The analysis of ${label} failed`, message };
}

export function runActions(store: StoreHandle) {
  const isCurrent = (id: number): boolean => {
    const { run } = store.getState();
    return run.status === 'running' && run.id === id;
  };
  return {
    /** Marks a new run as started and returns its id; reports for older ids are ignored from now on. */
    beginRun(label: string, maxN: number, atMs: number = Date.now()): number {
      const id = store.getState().lastRunId + 1;
      store.setState({ run: { status: 'running', id, label, maxN, progress: null, startedAtMs: atMs, levels: null }, failure: null, lastRunId: id });
      return id;
    },
    /** Stores the latest report; level reports also feed the time-left track. */
    reportProgress(id: number, progress: AnalysisProgress, atMs: number = Date.now()): void {
      store.setState((s) => {
        if (!isCurrent(id) || s.run.status !== 'running') return s;
        const levels = progress.kind === 'level' ? trackLevel(s.run.levels, progress.active, atMs) : s.run.levels;
        return { run: { ...s.run, progress, levels } };
      });
    },
    /** Stores the result (replacing the previous snapshot) and returns to idle. */
    completeRun(id: number, result: AnalysisResult): void {
      if (!isCurrent(id)) return;
      store.setState({ run: { status: 'idle', note: null }, result, pathsDropped: false });
    },
    cancelRun(id: number): void {
      if (!isCurrent(id)) return;
      store.setState({ run: { status: 'idle', note: 'Cancelled; the previous result stays shown.' } });
    },
    failRun(id: number, error: unknown): void {
      const { run } = store.getState();
      if (!isCurrent(id) || run.status !== 'running') return;
      store.setState({ run: { status: 'idle', note: null }, failure: describeFailure(error, run.label) });
    },
    dismissFailure(): void {
      store.setState({ failure: null });
    },
  };
}
