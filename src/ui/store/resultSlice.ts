import { ANALYSIS_SCHEMA } from '../../core';
import type { AnalysisResult } from '../../core';
import type { StoreHandle } from './store';

export interface ResultState {
  /** The last finished analysis, an immutable snapshot. */
  readonly result: AnalysisResult | null;
  /** True when the sampled paths were left out to keep the saved copy small. */
  readonly pathsDropped: boolean;
}

export const initialResultState: ResultState = { result: null, pathsDropped: false };

/** Saved results larger than this many characters of JSON lose their sampled paths (localStorage holds a few MB). */
export const MAX_STORED_RESULT_CHARS = 400_000;

/** The result as saved across reloads: whole when small, otherwise without its sampled paths. */
export function resultForStorage(state: ResultState, maxChars = MAX_STORED_RESULT_CHARS): ResultState {
  const { result, pathsDropped } = state;
  if (result === null || pathsDropped || maxChars === Infinity || JSON.stringify(result).length <= maxChars) return { result, pathsDropped };
  return { result: { ...result, paths: { positions: [], logReturn: [] } }, pathsDropped: true };
}

/** A saved result, or nothing when it is missing or written by another schema version. */
export function restoreResult(stored: unknown): ResultState {
  if (typeof stored !== 'object' || stored === null) return initialResultState;
  const { result, pathsDropped } = stored as { result?: unknown; pathsDropped?: unknown };
  if (typeof result !== 'object' || result === null || (result as { schema?: unknown }).schema !== ANALYSIS_SCHEMA) {
    return initialResultState;
  }
  return { result: result as AnalysisResult, pathsDropped: pathsDropped === true };
}

export function resultActions(store: StoreHandle) {
  return {
    clearResult(): void {
      store.setState(initialResultState);
    },
  };
}
