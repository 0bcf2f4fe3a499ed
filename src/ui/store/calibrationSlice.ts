import { CALIBRATION_SCHEMA, calibrationResult } from '../../core';
import type { CalibratedAnalysis, CalibrationModelFacts, CalibrationResult, ReplicateRecord } from '../../core';
import type { StoreHandle } from './store';

/** Where a calibration stands; 'cancelled' keeps the replicates that finished (a partial result). */
export type CalibrationStatus = 'fitting' | 'running' | 'done' | 'cancelled' | 'failed';

/** One calibration of one analysis: immutable snapshots, replaced on every change. */
export interface CalibrationRun {
  readonly id: number;
  readonly status: CalibrationStatus;
  /** The analysis it calibrates (input name, SHA-256, length, settings, headline): the tie to its result. */
  readonly analysis: CalibratedAnalysis;
  readonly replicates: number;
  readonly baseSeed: number;
  readonly facts: CalibrationModelFacts | null;
  readonly records: readonly ReplicateRecord[];
  /** Summary of the records so far; null until the first replicate. */
  readonly result: CalibrationResult | null;
  /** Why it failed or stopped, in plain words. */
  readonly message: string | null;
}

export interface CalibrationState {
  readonly calibration: CalibrationRun | null;
  /** The replicate count the control shows. */
  readonly calibrationReplicates: number;
}

export const DEFAULT_CALIBRATION_REPLICATES = 50;

export const initialCalibrationState: CalibrationState = { calibration: null, calibrationReplicates: DEFAULT_CALIBRATION_REPLICATES };

const STATUSES: readonly CalibrationStatus[] = ['fitting', 'running', 'done', 'cancelled', 'failed'];

/**
 * A saved calibration, or none when it is unreadable. One saved while running was interrupted by
 * the reload: it comes back as cancelled, with the replicates that had finished.
 */
export function restoreCalibration(stored: unknown): CalibrationState {
  if (typeof stored !== 'object' || stored === null) return initialCalibrationState;
  const { calibration, calibrationReplicates } = stored as { calibration?: unknown; calibrationReplicates?: unknown };
  const replicates = typeof calibrationReplicates === 'number' && Number.isInteger(calibrationReplicates) && calibrationReplicates >= 10 ? calibrationReplicates : DEFAULT_CALIBRATION_REPLICATES;
  if (typeof calibration !== 'object' || calibration === null) return { calibration: null, calibrationReplicates: replicates };
  const c = calibration as Partial<Record<keyof CalibrationRun, unknown>>;
  const ok =
    typeof c.id === 'number' &&
    STATUSES.includes(c.status as CalibrationStatus) &&
    typeof c.analysis === 'object' &&
    c.analysis !== null &&
    Array.isArray(c.records) &&
    typeof c.replicates === 'number' &&
    typeof c.baseSeed === 'number' &&
    (c.result === null || (typeof c.result === 'object' && (c.result as { schema?: unknown }).schema === CALIBRATION_SCHEMA));
  if (!ok) return { calibration: null, calibrationReplicates: replicates };
  const run = calibration as CalibrationRun;
  if (run.status !== 'fitting' && run.status !== 'running') return { calibration: run, calibrationReplicates: replicates };
  return {
    calibration: {
      ...run,
      status: 'cancelled',
      message: 'The page was reloaded while the calibration ran.',
      result: run.result === null ? null : { ...run.result, partial: true },
    },
    calibrationReplicates: replicates,
  };
}

let nextId = 1;

/**
 * A finished (or partial) calibration as the panel shows it, from a saved CalibrationResult (an
 * opened session); `entropy` is the headline of the result it belongs to. Nothing is recomputed.
 */
export function calibrationRunOfResult(result: CalibrationResult, entropy: CalibratedAnalysis['entropy']): CalibrationRun {
  const partial = result.partial;
  return {
    id: nextId++,
    status: partial ? 'cancelled' : 'done',
    analysis: { input: result.input, settings: result.settings, entropy: { estimate: entropy.estimate, ci95: entropy.ci95 } },
    replicates: result.replicatesRequested,
    baseSeed: result.baseSeed,
    facts: result.model,
    records: result.records,
    result,
    message: partial ? `Saved after ${result.summary.replicates} of ${result.replicatesRequested} replicates: the summary below is partial.` : null,
  };
}

export function calibrationActions(store: StoreHandle) {
  const update = (id: number, change: (run: CalibrationRun) => CalibrationRun): void => {
    store.setState((s) => (s.calibration === null || s.calibration.id !== id ? {} : { calibration: change(s.calibration) }));
  };
  return {
    setCalibrationReplicates(replicates: number): void {
      store.setState({ calibrationReplicates: replicates });
    },
    /** Starts a calibration of `analysis`, replacing any earlier one; returns its id. */
    beginCalibration(analysis: CalibratedAnalysis, replicates: number, baseSeed: number): number {
      const id = nextId++;
      const tie: CalibratedAnalysis = {
        input: { name: analysis.input.name, sha256: analysis.input.sha256, symbols: analysis.input.symbols },
        settings: analysis.settings,
        entropy: { estimate: analysis.entropy.estimate, ci95: analysis.entropy.ci95 },
      };
      store.setState({ calibration: { id, status: 'fitting', analysis: tie, replicates, baseSeed, facts: null, records: [], result: null, message: null } });
      return id;
    },
    calibrationFitted(id: number, facts: CalibrationModelFacts): void {
      update(id, (run) => ({ ...run, status: 'running', facts }));
    },
    /** One more replicate; the summary is rebuilt from all records so far (R is small). */
    addCalibrationRecord(id: number, record: ReplicateRecord): void {
      update(id, (run) => {
        if (run.facts === null) return run;
        const records = [...run.records, record];
        return { ...run, records, result: calibrationResult(run.analysis, run.facts, records, run.replicates, run.baseSeed) };
      });
    },
    finishCalibration(id: number): void {
      update(id, (run) => ({ ...run, status: 'done' }));
    },
    /** Stopped by the user: what finished stays, marked partial. */
    cancelCalibration(id: number): void {
      update(id, (run) => ({
        ...run,
        status: 'cancelled',
        message: `Cancelled after ${run.records.length} of ${run.replicates} replicates: the summary below is partial.`,
      }));
    },
    failCalibration(id: number, error: unknown): void {
      update(id, (run) => ({ ...run, status: 'failed', message: error instanceof Error ? error.message : String(error) }));
    },
    clearCalibration(): void {
      store.setState({ calibration: null });
    },
  };
}
