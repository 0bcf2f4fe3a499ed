import { SNIFF_BYTES } from '../core';
import { createComparisonClient } from './comparisonClient';
import type { ComparisonClient, ComparisonSide } from './comparisonClient';
import { appStore, bindActions } from './store/store';
import type { StoreHandle } from './store/store';
import { readerOptionsFor } from './view/inputOptions';

/** Symbols generated for a reference source chosen as one side of a comparison (default). */
export const COMPARE_SOURCE_LENGTH = 200_000;

/** Chooses the two sides and starts and stops comparisons; the only code that talks to the comparison client. */
export interface ComparisonRunner {
  chooseFile(which: 'A' | 'B', file: File): void;
  chooseSource(which: 'A' | 'B', spec: string, label: string, length?: number): void;
  compare(): Promise<void>;
  cancel(): void;
}

export function createComparisonRunner(client: ComparisonClient, store: StoreHandle): ComparisonRunner {
  const actions = bindActions(store);
  const files: { A: File | null; B: File | null } = { A: null, B: null };
  let controller: AbortController | null = null;

  const sideOf = async (which: 'A' | 'B'): Promise<ComparisonSide | null> => {
    const { comparisonRun, reading } = store.getState();
    const choice = which === 'A' ? comparisonRun.sideA : comparisonRun.sideB;
    if (choice === null) return null;
    if (choice.kind === 'source') return { kind: 'source', spec: choice.spec, length: choice.length, seed: which === 'A' ? 1 : 2 };
    const file = files[which];
    if (file === null) return null;
    const head = reading.format === 'auto' ? await file.slice(0, SNIFF_BYTES).text() : '';
    return { kind: 'file', blob: file, options: { ...readerOptionsFor(file.name, head, reading), name: file.name } };
  };

  return {
    chooseFile(which, file) {
      files[which] = file;
      actions.chooseCompareSide(which, { kind: 'file', name: file.name, bytes: file.size });
    },
    chooseSource(which, spec, label, length = COMPARE_SOURCE_LENGTH) {
      files[which] = null;
      actions.chooseCompareSide(which, { kind: 'source', spec, label, length });
    },
    async compare() {
      controller?.abort();
      const own = new AbortController();
      controller = own;
      actions.beginComparison();
      try {
        const a = await sideOf('A');
        const b = await sideOf('B');
        if (a === null || b === null) throw new Error(`Choose ${a === null ? 'sequence A' : 'sequence B'} first: a file or a reference source.`);
        const result = await client.compare(a, b, store.getState().settings, own.signal, (p) => actions.reportComparisonProgress(p));
        if (controller === own) actions.completeComparison(result);
      } catch (error) {
        if (own.signal.aborted) actions.cancelComparison();
        else actions.failComparison(error);
      } finally {
        if (controller === own) controller = null;
      }
    },
    cancel: () => controller?.abort(),
  };
}

/** The page's comparison runner; its worker starts on the first comparison. */
export const comparisonRunner = createComparisonRunner(createComparisonClient(), appStore);
