import { SNIFF_BYTES } from '../core';
import { demoScenario } from '../../workers/demoScenarios';
import { createComparisonClient } from './comparisonClient';
import type { ComparisonClient, ComparisonSide } from './comparisonClient';
import { appStore, bindActions } from './store/store';
import type { StoreHandle } from './store/store';
import { readerOptionsFor } from './view/inputOptions';
import { runner, type CurrentInput } from './runner';

/** Symbols generated for a reference source chosen as one side of a comparison (default). */
export const COMPARE_SOURCE_LENGTH = 200_000;

/** Chooses the two sides and starts and stops comparisons; the only code that talks to the comparison client. */
export interface ComparisonRunner {
  chooseFile(which: 'A' | 'B', file: File): void;
  chooseSource(which: 'A' | 'B', spec: string, label: string, length?: number): void;
  /** A gallery entry (reference source or invented story), generated at `length` symbols. */
  chooseDemo(which: 'A' | 'B', id: string, length?: number): void;
  /** Sequence A is whatever the Input panel holds when the comparison starts. */
  chooseLoadedInput(): void;
  /** New length for a generated side. */
  setLength(which: 'A' | 'B', length: number): void;
  compare(): Promise<void>;
  cancel(): void;
}

/** Seed offset of side B, so that the same gallery entry on both sides gives two different sequences. */
const SEED_B_OFFSET = 1;

/**
 * @param current the Input panel's current input (the page's runner by default), read when a
 *   comparison with "the input loaded above" as A starts
 */
export function createComparisonRunner(
  client: ComparisonClient,
  store: StoreHandle,
  current: () => CurrentInput | null = () => runner.currentInput(),
): ComparisonRunner {
  const actions = bindActions(store);
  const files: { A: File | null; B: File | null } = { A: null, B: null };
  let controller: AbortController | null = null;

  const sideOf = async (which: 'A' | 'B'): Promise<ComparisonSide | null> => {
    const { comparisonRun, reading } = store.getState();
    const choice = which === 'A' ? comparisonRun.sideA : comparisonRun.sideB;
    if (choice === null) return null;
    if (choice.kind === 'source') return { kind: 'source', spec: choice.spec, length: choice.length, seed: which === 'A' ? 1 : 2 };
    if (choice.kind === 'demo') {
      return { kind: 'demo', id: choice.id, length: choice.length, seed: demoScenario(choice.id).seed + (which === 'A' ? 0 : SEED_B_OFFSET) };
    }
    if (choice.kind === 'input') {
      const loaded = current();
      if (loaded === null) throw new Error('The file of the Input panel is no longer held by this page (after a reload): open it again, or choose another A.');
      if (loaded.kind === 'demo') return { kind: 'demo', id: loaded.id, length: loaded.length, seed: loaded.seed };
      const head = reading.format === 'auto' ? await loaded.file.slice(0, SNIFF_BYTES).text() : '';
      return { kind: 'file', blob: loaded.file, options: { ...readerOptionsFor(loaded.file.name, head, reading), name: loaded.file.name } };
    }
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
    chooseDemo(which, id, length = COMPARE_SOURCE_LENGTH) {
      files[which] = null;
      actions.chooseCompareSide(which, { kind: 'demo', id, label: demoScenario(id).title, length });
    },
    chooseLoadedInput() {
      files.A = null;
      actions.chooseCompareSide('A', { kind: 'input' });
    },
    setLength: (which, length) => actions.setCompareLength(which, length),
    async compare() {
      controller?.abort();
      const own = new AbortController();
      controller = own;
      actions.beginComparison();
      try {
        const a = await sideOf('A');
        const b = await sideOf('B');
        if (a === null || b === null) throw new Error(`Choose ${a === null ? 'sequence A' : 'sequence B'} first: a file or a generated sequence.`);
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
