import type { InputFormat } from '../../core';
import type { StoreHandle } from './store';

/** 'auto' picks the reader from the file name (see guessFormat). */
export type FormatChoice = InputFormat | 'auto';

/** What the next run reads: a file (kept by the runner, only its name here) or a generated demo. */
export type ChosenInput =
  | { readonly kind: 'file'; readonly name: string; readonly bytes: number }
  | { readonly kind: 'demo'; readonly id: string; readonly length: number; readonly seed: number };

export interface InputState {
  readonly format: FormatChoice;
  /** CSV column as typed: a header name, or a 0-based index when it is all digits. */
  readonly csvColumn: string;
  /** Symbols the demo generates. */
  readonly demoLength: number;
  readonly chosen: ChosenInput | null;
}

/** The invented demo that opens on first load; generated in the worker from a fixed seed. */
export const DEFAULT_DEMO = { id: 'hilltop-wind', length: 200_000, seed: 20_240_611 } as const;
/** Bounds of the demo length input (symbols). */
export const DEMO_LENGTH_RANGE = [1_000, 20_000_000] as const;

export const initialInputState: InputState = {
  format: 'auto',
  csvColumn: '',
  demoLength: DEFAULT_DEMO.length,
  chosen: null,
};

/** Input actions bound to a store; plain functions, callable outside React. */
export function inputActions(store: StoreHandle) {
  return {
    setFormat(format: FormatChoice): void {
      store.setState({ format });
    },
    setCsvColumn(csvColumn: string): void {
      store.setState({ csvColumn });
    },
    /** Ignores values that are not integers inside DEMO_LENGTH_RANGE (the input shows them as invalid). */
    setDemoLength(length: number): void {
      if (Number.isInteger(length) && length >= DEMO_LENGTH_RANGE[0] && length <= DEMO_LENGTH_RANGE[1]) {
        store.setState({ demoLength: length });
      }
    },
    chooseInput(chosen: ChosenInput): void {
      store.setState({ chosen });
    },
  };
}
