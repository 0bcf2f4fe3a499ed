import { DEFAULT_ENVELOPE_OPTIONS } from '../../figures';
import type { StoreHandle } from './store';

/** How the figures are drawn; saved across reloads. Never changes an analysis. */
export interface ViewOptions {
  /** Multiplier z of the Gaussian band ±z σ̂ √n. */
  readonly z: number;
  /** δ of the error-term band ±C n^(1/2 − δ). */
  readonly delta: number;
  /** C of the error-term band, nats. */
  readonly errorC: number;
  /** Draw the sampled paths in the convergence figure. */
  readonly showPaths: boolean;
  /** Block length of the fluctuation view; null: the middle of the result's trusted range. */
  readonly fluctuationN: number | null;
  /** Least distance between the positions the fluctuation view keeps (integer >= 1). */
  readonly fluctuationGap: number;
  /** Block length of the return-law view; null: the middle of the result's trusted range. */
  readonly returnLawN: number | null;
}

export interface ViewState {
  readonly view: ViewOptions;
}

export const DEFAULT_VIEW: ViewOptions = { ...DEFAULT_ENVELOPE_OPTIONS, showPaths: true, fluctuationN: null, fluctuationGap: 1, returnLawN: null };

export const initialViewState: ViewState = { view: DEFAULT_VIEW };

/** Stored view options over the defaults; a missing or mistyped field takes its default. */
export function restoreView(stored: unknown): ViewOptions {
  if (typeof stored !== 'object' || stored === null) return DEFAULT_VIEW;
  const s = stored as Record<string, unknown>;
  const num = (key: 'z' | 'delta' | 'errorC'): number => (typeof s[key] === 'number' && Number.isFinite(s[key]) ? s[key] : DEFAULT_VIEW[key]);
  const length = (key: 'fluctuationN' | 'returnLawN' | 'fluctuationGap', fallback: number | null): number | null => {
    const v = s[key];
    return typeof v === 'number' && Number.isInteger(v) && v >= 1 ? v : fallback;
  };
  return {
    z: num('z'),
    delta: num('delta'),
    errorC: num('errorC'),
    showPaths: typeof s['showPaths'] === 'boolean' ? s['showPaths'] : DEFAULT_VIEW.showPaths,
    fluctuationN: length('fluctuationN', null),
    fluctuationGap: length('fluctuationGap', DEFAULT_VIEW.fluctuationGap) ?? DEFAULT_VIEW.fluctuationGap,
    returnLawN: length('returnLawN', null),
  };
}

export function viewActions(store: StoreHandle) {
  return {
    /** Replaces the view options with a new snapshot carrying the patch (values are validated by the panel). */
    updateView(patch: Partial<ViewOptions>): void {
      store.setState((s) => ({ view: { ...s.view, ...patch } }));
    },
    resetView(): void {
      store.setState({ view: DEFAULT_VIEW });
    },
  };
}
