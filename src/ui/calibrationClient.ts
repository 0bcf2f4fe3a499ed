import { wrap } from 'comlink';
import type { Remote } from 'comlink';
import type { AnalysisSettings, CalibrationModelFacts, ReplicateRecord } from '../core';
import type { CalibrationApi, CalibrationInput, FittedInput } from '../../workers/calibration.worker';
import type { WorkerLike } from './workerHandle';

export type { CalibrationInput };

/** Most workers a calibration starts, whatever the machine offers. */
export const MAX_CALIBRATION_WORKERS = 4;

export interface CalibrationCall {
  readonly signal: AbortSignal;
  readonly onFitted?: (facts: CalibrationModelFacts) => void;
  readonly onRecord?: (record: ReplicateRecord) => void;
}

/** Starts calibrations on a small pool of workers; aborting terminates every worker of the call. */
export interface CalibrationClient {
  /** Fits the chain in one worker, then runs replicates 0..R-1 on the pool; resolves when all are done. */
  calibrate(input: CalibrationInput, settings: AnalysisSettings, replicates: number, baseSeed: number, call: CalibrationCall): Promise<void>;
}

export type CalibrationWorkerLike = WorkerLike;

function startCalibrationWorker(): Worker {
  return new Worker(new URL('../../workers/calibration.worker.ts', import.meta.url), { type: 'module', name: 'returnrate-calibration' });
}

/** navigator.hardwareConcurrency capped at MAX_CALIBRATION_WORKERS (1 where unknown). */
export function calibrationPoolSize(cores: number | undefined): number {
  return Math.max(1, Math.min(MAX_CALIBRATION_WORKERS, Number.isInteger(cores) && cores !== undefined ? cores : 1));
}

function abortError(signal: AbortSignal): unknown {
  return signal.reason ?? new DOMException('The calibration was cancelled.', 'AbortError');
}

/**
 * A client whose every call starts its own workers (`start`, default workers/calibration.worker.ts)
 * and terminates them when the call ends, fails or is aborted: a surrogate analysis is a tight loop
 * that only termination stops. Replicates are handed out one at a time from a shared counter, so a
 * fast worker takes more of them and progress arrives per replicate.
 */
export function createCalibrationClient(start: () => CalibrationWorkerLike = startCalibrationWorker, poolSize = calibrationPoolSize(globalThis.navigator?.hardwareConcurrency)): CalibrationClient {
  return {
    async calibrate(input, settings, replicates, baseSeed, call) {
      const { signal } = call;
      if (signal.aborted) throw abortError(signal);
      const workers: CalibrationWorkerLike[] = [];
      let fail: (reason: unknown) => void = () => undefined;
      const failed = new Promise<never>((_, reject) => {
        fail = reject;
      });
      // Keep an unhandled rejection from being reported when nothing waits on it any more.
      failed.catch(() => undefined);
      const spawn = (): Remote<CalibrationApi> => {
        const w = start();
        w.addEventListener('error', (event: Event) => {
          const detail = (event as Partial<ErrorEvent>).message;
          fail(new Error(`Calibration worker failed: ${typeof detail === 'string' && detail !== '' ? detail : 'it could not start or stopped unexpectedly'}`));
        });
        workers.push(w);
        return wrap<CalibrationApi>(w);
      };
      const onAbort = (): void => fail(abortError(signal));
      signal.addEventListener('abort', onAbort, { once: true });
      try {
        const first = spawn();
        const fitted: FittedInput = await Promise.race([first.fit(input, settings), failed]);
        call.onFitted?.(fitted.facts);
        const apis = [first];
        for (let k = 1; k < Math.min(poolSize, replicates); k++) apis.push(spawn());
        let next = 0;
        const drain = async (api: Remote<CalibrationApi>): Promise<void> => {
          while (next < replicates) {
            const index = next++;
            const record = await api.replicate(fitted, settings, baseSeed, index);
            if (signal.aborted) return;
            call.onRecord?.(record);
          }
        };
        await Promise.race([Promise.all(apis.map(drain)), failed]);
      } finally {
        signal.removeEventListener('abort', onAbort);
        for (const w of workers) w.terminate();
      }
    },
  };
}
