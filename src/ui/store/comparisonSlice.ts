import { COMPARISON_SCHEMA } from '../../core';
import type { ComparisonResult } from '../../core';
import type { ComparisonProgress } from '../comparisonClient';
import type { StoreHandle } from './store';

/**
 * One side of a comparison as the page shows it: a file (kept by the comparison runner), a reference
 * source of the core, a gallery entry (reference or invented, generated at `length`), or, for A, the
 * input loaded in the Input panel (resolved when the comparison starts).
 */
export type CompareSideChoice =
  | { readonly kind: 'file'; readonly name: string; readonly bytes: number }
  | { readonly kind: 'source'; readonly spec: string; readonly label: string; readonly length: number }
  | { readonly kind: 'demo'; readonly id: string; readonly label: string; readonly length: number }
  | { readonly kind: 'input' };

export type ComparisonStatus = 'idle' | 'running' | 'cancelled' | 'failed';

export interface ComparisonRunState {
  readonly sideA: CompareSideChoice | null;
  readonly sideB: CompareSideChoice | null;
  readonly status: ComparisonStatus;
  readonly progress: ComparisonProgress | null;
  /** Why the last comparison failed, or a note after a cancel. */
  readonly message: string | null;
  /** Clock time (ms) the running comparison started; null when none has run. */
  readonly startedAtMs?: number | null;
}

export interface ComparisonState {
  /** The last finished comparison (saved across reloads); replaced, never mutated. */
  readonly comparisonResult: ComparisonResult | null;
  readonly comparisonRun: ComparisonRunState;
}

export const initialComparisonState: ComparisonState = {
  comparisonResult: null,
  comparisonRun: { sideA: null, sideB: null, status: 'idle', progress: null, message: null },
};

/** A saved comparison if it has this schema and the fields the panel draws; else null. */
export function restoreComparisonResult(stored: unknown): ComparisonResult | null {
  if (typeof stored !== 'object' || stored === null) return null;
  const s = stored as Partial<Record<keyof ComparisonResult, unknown>>;
  if (s.schema !== COMPARISON_SCHEMA || !Array.isArray(s.lengths)) return null;
  for (const key of ['crossEntropy', 'entropyA', 'relativeEntropy', 'inputA', 'inputB'] as const) {
    if (typeof s[key] !== 'object' || s[key] === null) return null;
  }
  return stored as ComparisonResult;
}

export function comparisonActions(store: StoreHandle) {
  const run = (patch: Partial<ComparisonRunState>): void =>
    store.setState((state) => ({ comparisonRun: { ...state.comparisonRun, ...patch } }));
  return {
    chooseCompareSide(which: 'A' | 'B', side: CompareSideChoice | null): void {
      run(which === 'A' ? { sideA: side } : { sideB: side });
    },
    /** New length (symbols) for a generated side; other sides are left as they are. */
    setCompareLength(which: 'A' | 'B', length: number): void {
      const side = which === 'A' ? store.getState().comparisonRun.sideA : store.getState().comparisonRun.sideB;
      if (side === null || (side.kind !== 'demo' && side.kind !== 'source')) return;
      run(which === 'A' ? { sideA: { ...side, length } } : { sideB: { ...side, length } });
    },
    beginComparison(nowMs: number = Date.now()): void {
      run({ status: 'running', progress: null, message: null, startedAtMs: nowMs });
    },
    reportComparisonProgress(progress: ComparisonProgress): void {
      if (store.getState().comparisonRun.status === 'running') run({ progress });
    },
    completeComparison(result: ComparisonResult): void {
      store.setState((state) => ({ comparisonResult: result, comparisonRun: { ...state.comparisonRun, status: 'idle', progress: null, message: null } }));
    },
    cancelComparison(): void {
      run({ status: 'cancelled', progress: null, message: 'The comparison was cancelled; the last finished result (if any) is still shown.' });
    },
    failComparison(error: unknown): void {
      run({ status: 'failed', progress: null, message: error instanceof Error ? error.message : String(error) });
    },
  };
}
