import type { CalibrationClient, CalibrationInput } from './calibrationClient';
import { createCalibrationClient } from './calibrationClient';
import { runner } from './runner';
import { appStore, bindActions } from './store/store';
import type { StoreApi } from 'zustand';
import type { AppState, StoreHandle } from './store/store';

/** Base seed of the page's surrogates (the command line's default too), so a calibration can be repeated. */
export const CALIBRATION_BASE_SEED = 1;
export const MAX_PAGE_REPLICATES = 1000;

export interface CalibrationRunner {
  /** Calibrates the shown result with the replicate count of the control. */
  start(): Promise<void>;
  /** Stops the calibration: its workers are terminated, finished replicates stay. */
  cancel(): void;
}

/** The store with its subscription, so a calibration replaced in it (an opened session) stops its workers. */
type WatchedStore = StoreHandle & Pick<StoreApi<AppState>, 'subscribe'>;

export function createCalibrationRunner(client: CalibrationClient, store: WatchedStore, inputOf: () => CalibrationInput | null): CalibrationRunner {
  const actions = bindActions(store);
  let controller: AbortController | null = null;
  return {
    async start() {
      const { result, calibrationReplicates: replicates } = store.getState();
      if (result === null) return;
      controller?.abort();
      const own = new AbortController();
      controller = own;
      const id = actions.beginCalibration(result, replicates, CALIBRATION_BASE_SEED);
      const input = inputOf();
      if (!Number.isInteger(replicates) || replicates < 10 || replicates > MAX_PAGE_REPLICATES) {
        actions.failCalibration(id, `The number of replicates must be a whole number from 10 to ${MAX_PAGE_REPLICATES}; got ${replicates}.`);
        return;
      }
      if (input === null) {
        actions.failCalibration(id, 'This page no longer holds the input of the shown result (after a reload or an opened session): run the analysis again, then calibrate.');
        return;
      }
      // An opened session (or anything else) that replaces this calibration in the store stops its workers.
      const unsubscribe = store.subscribe((state) => {
        if (state.calibration?.id !== id) own.abort();
      });
      try {
        await client.calibrate(input, result.settings, replicates, CALIBRATION_BASE_SEED, {
          signal: own.signal,
          onFitted: (facts) => actions.calibrationFitted(id, facts),
          onRecord: (record) => actions.addCalibrationRecord(id, record),
        });
        actions.finishCalibration(id);
      } catch (error) {
        if (own.signal.aborted) actions.cancelCalibration(id);
        else actions.failCalibration(id, error);
      } finally {
        unsubscribe();
        if (controller === own) controller = null;
      }
    },
    cancel: () => controller?.abort(),
  };
}

/** The page's calibration runner; its workers start with each calibration. */
export const calibrationRunner = createCalibrationRunner(createCalibrationClient(), appStore, () => runner.calibrationInput());
