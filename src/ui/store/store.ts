import { createStore } from 'zustand/vanilla';
import { useStore } from 'zustand';
import { createJSONStorage, persist } from 'zustand/middleware';
import type { PersistStorage, StateStorage, StorageValue } from 'zustand/middleware';
import type { StoreApi } from 'zustand/vanilla';
import { calibrationActions, initialCalibrationState, restoreCalibration } from './calibrationSlice';
import type { CalibrationState } from './calibrationSlice';
import { initialInputState, inputActions, restoreDemoLength, restoreReading } from './inputSlice';
import type { InputState } from './inputSlice';
import { memoryStorage } from './memoryStorage';
import { pageSideStorage, pageStorage } from './pageStorage';
import { initialResultState, MAX_STORED_RESULT_CHARS, restoreResult, resultActions, resultForStorage } from './resultSlice';
import type { ResultState } from './resultSlice';
import { initialRunState, runActions } from './runSlice';
import type { RunState } from './runSlice';
import { initialSessionState, sessionActions } from './sessionSlice';
import type { SessionState } from './sessionSlice';
import { initialSettingsState, restoreSettings, settingsActions } from './settingsSlice';
import type { SettingsState } from './settingsSlice';
import { initialViewState, restoreView, viewActions } from './viewSlice';
import type { ViewState } from './viewSlice';
import { comparisonActions, initialComparisonState, restoreComparisonResult } from './comparisonSlice';
import type { ComparisonState } from './comparisonSlice';
import { keepPartialRows } from './partialRowsKeeper';

export type AppState = InputState & SettingsState & RunState & ResultState & ViewState & SessionState & CalibrationState & ComparisonState;
/** What slice actions need of a store. */
export type StoreHandle = Pick<StoreApi<AppState>, 'getState' | 'setState'>;

/** Key and version of the saved state (IndexedDB, formerly localStorage); bump the version when its shape changes. */
export const STORAGE_KEY = 'returnrate.workbench';
const STORAGE_VERSION = 1;

/** The part that survives a reload: settings, reading choices, demo length, view options and the
 * last result (see resultForStorage). */
export type PersistedState = SettingsState & ResultState & ViewState & Pick<InputState, 'reading' | 'demoLength'> & CalibrationState & Pick<ComparisonState, 'comparisonResult'>;

export function persistedPart(state: AppState, savedResult: (state: ResultState) => ResultState = resultForStorage): PersistedState {
  return {
    settings: state.settings,
    reading: state.reading,
    demoLength: state.demoLength,
    view: state.view,
    ...savedResult(state),
    calibration: state.calibration,
    calibrationReplicates: state.calibrationReplicates,
    comparisonResult: state.comparisonResult,
  };
}

/** Saved state merged into a fresh one; anything unreadable falls back to the initial values. */
export function mergePersisted(stored: unknown, current: AppState): AppState {
  const s = typeof stored === 'object' && stored !== null ? (stored as Partial<Record<keyof PersistedState, unknown>>) : {};
  return {
    ...current,
    settings: restoreSettings(s.settings),
    reading: restoreReading(s.reading),
    demoLength: restoreDemoLength(s.demoLength),
    view: restoreView(s.view),
    ...restoreResult(s),
    ...restoreCalibration(s),
    comparisonResult: restoreComparisonResult(s.comparisonResult),
  };
}

function sameParts(a: PersistedState, b: PersistedState): boolean {
  return (Object.keys(b) as (keyof PersistedState)[]).every((key) => Object.is(a[key], b[key]));
}

/**
 * The saved parts written as JSON, but only when one of them changed. zustand's persist writes on
 * every update, and a run updates the store once per block length; serializing the last result
 * and handing it to localStorage each time held the main thread 50 to 350 ms per update at 1e6
 * symbols (`npm run bench`, browser part). Every part is an immutable snapshot, so comparing
 * references is enough.
 *
 * Nothing is written before the saved state has been read: with an async storage (IndexedDB) the
 * store starts from the initial state, and an update in that moment would overwrite the saved
 * result with none.
 */
function changedPartsStorage(storage: () => StateStorage): PersistStorage<PersistedState> | undefined {
  const json = createJSONStorage<PersistedState>(storage);
  if (json === undefined) return undefined;
  let written: StorageValue<PersistedState> | null = null;
  let read = false;
  return {
    getItem: (name) => {
      const value = json.getItem(name);
      if (value instanceof Promise) return value.finally(() => void (read = true));
      read = true;
      return value;
    },
    setItem: (name, value) => {
      if (!read) return;
      if (written !== null && written.version === value.version && sameParts(written.state, value.state)) return;
      written = value;
      return json.setItem(name, value);
    },
    removeItem: (name) => {
      written = null;
      return json.removeItem(name);
    },
  };
}

/** persistedPart with the saved form of the result kept per result: measuring its JSON size costs a serialization. */
function memoPersistedPart(maxResultChars: number): (state: AppState) => PersistedState {
  let source: ResultState | null = null;
  let saved: ResultState = initialResultState;
  const savedResult = (state: ResultState): ResultState => {
    if (source === null || source.result !== state.result || source.pathsDropped !== state.pathsDropped) {
      source = { result: state.result, pathsDropped: state.pathsDropped };
      saved = resultForStorage(state, maxResultChars);
    }
    return saved;
  };
  return (state) => persistedPart(state, savedResult);
}

export interface AppStoreOptions {
  /** Saved results larger than this many characters of JSON lose their sampled paths; Infinity keeps them whole (IndexedDB). */
  readonly maxResultChars?: number;
}

/**
 * One store for the whole page: the slices' state, saved (settings, view, reading choices and the
 * last result) to `storage` under STORAGE_KEY. Tests pass an in-memory storage.
 */
export function createAppStore(storage: () => StateStorage, options: AppStoreOptions = {}) {
  const initial = { ...initialInputState, ...initialSettingsState, ...initialRunState, ...initialResultState, ...initialViewState, ...initialSessionState, ...initialCalibrationState, ...initialComparisonState };
  return createStore<AppState>()(
    persist(() => initial, {
      name: STORAGE_KEY,
      version: STORAGE_VERSION,
      storage: changedPartsStorage(storage),
      partialize: memoPersistedPart(options.maxResultChars ?? MAX_STORED_RESULT_CHARS),
      merge: mergePersisted,
    }),
  );
}

export { memoryStorage };

/** All slice actions bound to one store. */
export function bindActions(store: StoreHandle) {
  return { ...inputActions(store), ...settingsActions(store), ...runActions(store), ...resultActions(store), ...viewActions(store), ...sessionActions(store), ...calibrationActions(store), ...comparisonActions(store) };
}

const page = pageStorage();
/** The page's store, saved to IndexedDB where the browser has it (see pageStorage.ts). */
export const appStore = createAppStore(() => page.storage, { maxResultChars: page.wholeResults ? Infinity : MAX_STORED_RESULT_CHARS });

/** Calls `then` once the saved state has been read into the store (at once when it already has). */
export function whenHydrated(then: () => void, store: Pick<typeof appStore, 'persist'> = appStore): void {
  if (store.persist.hasHydrated()) then();
  else {
    const stop = store.persist.onFinishHydration(() => {
      stop();
      then();
    });
  }
}

// The running analysis's rows survive a reload too (marked "interrupted by a reload").
keepPartialRows(appStore, pageSideStorage(), (then) => whenHydrated(then));

/** Selects one field (or a derived value) of the page's store in a component. */
export function useAppState<T>(selector: (state: AppState) => T): T {
  return useStore(appStore, selector);
}

export const {
  updateReading,
  setDemoLength,
  showPreview,
  chooseInput,
  updateSettings,
  resetSettings,
  beginRun,
  reportProgress,
  addPartialRows,
  completeRun,
  cancelRun,
  failRun,
  dismissFailure,
  clearResult,
  updateView,
  resetView,
  openSession,
  sessionFailed,
  checkData,
  setCalibrationReplicates,
  clearCalibration,
  chooseCompareSide,
} = bindActions(appStore);
