import type { HeadPreview, InputFormat, MissingPolicy } from '../../core';
import type { StoreHandle } from './store';

/** 'auto' picks the reader from the file name and head (see guessFormat). */
export type FormatChoice = InputFormat | 'auto';
export type AmbiguityChoice = 'skip' | 'symbol' | 'error';
/** How real numbers become symbols ('none': the file holds symbols already). */
export type SymbolizeKind = 'none' | 'quantile' | 'threshold' | 'ordinal';

/** How the page reads a file; survives a reload. Options of other formats are kept but not used. */
export interface ReadingChoices {
  readonly format: FormatChoice;
  /** CSV column as typed: a header name, or a 0-based index when it is all digits. */
  readonly csvColumn: string;
  /** CSV: the first row is a header. */
  readonly csvHeader: boolean;
  /** Characters: keep spaces and tabs as symbols. */
  readonly keepWhitespace: boolean;
  /** FASTA: what to do with ambiguity codes and gaps. */
  readonly ambiguity: AmbiguityChoice;
  /** FASTA: fold lower case (soft-masked bases) to upper case. */
  readonly caseFold: boolean;
  /** Numbers (one per line) or a CSV column of numbers: how they become symbols. */
  readonly symbolizeKind: SymbolizeKind;
  /** The symbolization's parameter as typed: K (quantile), T1,T2,... (threshold), D or D:TAU (ordinal). */
  readonly symbolizeParameter: string;
  /** Missing values of a real-valued series: drop them, or cut the series there. */
  readonly missing: MissingPolicy;
}

/** What the next run reads: a file (kept by the runner, only its name here) or a generated demo. */
export type ChosenInput =
  | { readonly kind: 'file'; readonly name: string; readonly bytes: number }
  | { readonly kind: 'demo'; readonly id: string; readonly length: number; readonly seed: number };

/** The preview of the chosen file's head, or why the head could not be read. */
export type FilePreview =
  | { readonly kind: 'ready'; readonly name: string; readonly model: HeadPreview }
  | { readonly kind: 'failed'; readonly name: string; readonly message: string };

export interface InputState {
  readonly reading: ReadingChoices;
  /** Symbols a demo generates. */
  readonly demoLength: number;
  readonly chosen: ChosenInput | null;
  readonly preview: FilePreview | null;
}

/** The invented demo that opens on first load; generated in the worker from a fixed seed. */
export const DEFAULT_DEMO = { id: 'hilltop-wind', length: 200_000, seed: 20_240_611 } as const;
/** Bounds of the demo length input (symbols). */
export const DEMO_LENGTH_RANGE = [1_000, 20_000_000] as const;

export const DEFAULT_READING: ReadingChoices = {
  format: 'auto',
  csvColumn: '',
  csvHeader: true,
  keepWhitespace: false,
  ambiguity: 'skip',
  caseFold: true,
  symbolizeKind: 'none',
  symbolizeParameter: '4',
  missing: 'skip',
};

/** The parameter a symbolization starts with when it is chosen. */
export const SYMBOLIZE_DEFAULT_PARAMETER: Readonly<Record<SymbolizeKind, string>> = { none: '', quantile: '4', threshold: '0', ordinal: '3' };

export const initialInputState: InputState = {
  reading: DEFAULT_READING,
  demoLength: DEFAULT_DEMO.length,
  chosen: null,
  preview: null,
};

const FORMAT_VALUES: readonly FormatChoice[] = ['auto', 'chars', 'tokens', 'fasta', 'csv', 'bytes', 'numbers'];
const SYMBOLIZE_KINDS: readonly SymbolizeKind[] = ['none', 'quantile', 'threshold', 'ordinal'];
const AMBIGUITY_VALUES: readonly AmbiguityChoice[] = ['skip', 'symbol', 'error'];

function isDemoLength(length: unknown): length is number {
  return typeof length === 'number' && Number.isInteger(length) && length >= DEMO_LENGTH_RANGE[0] && length <= DEMO_LENGTH_RANGE[1];
}

/** Saved reading choices merged over the defaults; fields that are missing or of the wrong kind fall back. */
export function restoreReading(stored: unknown): ReadingChoices {
  if (typeof stored !== 'object' || stored === null) return DEFAULT_READING;
  const s = stored as Record<string, unknown>;
  const bool = (key: 'csvHeader' | 'keepWhitespace' | 'caseFold'): boolean =>
    typeof s[key] === 'boolean' ? (s[key] as boolean) : DEFAULT_READING[key];
  return {
    format: FORMAT_VALUES.includes(s['format'] as FormatChoice) ? (s['format'] as FormatChoice) : DEFAULT_READING.format,
    csvColumn: typeof s['csvColumn'] === 'string' ? s['csvColumn'] : DEFAULT_READING.csvColumn,
    csvHeader: bool('csvHeader'),
    keepWhitespace: bool('keepWhitespace'),
    ambiguity: AMBIGUITY_VALUES.includes(s['ambiguity'] as AmbiguityChoice) ? (s['ambiguity'] as AmbiguityChoice) : DEFAULT_READING.ambiguity,
    caseFold: bool('caseFold'),
    symbolizeKind: SYMBOLIZE_KINDS.includes(s['symbolizeKind'] as SymbolizeKind) ? (s['symbolizeKind'] as SymbolizeKind) : DEFAULT_READING.symbolizeKind,
    symbolizeParameter: typeof s['symbolizeParameter'] === 'string' ? s['symbolizeParameter'] : DEFAULT_READING.symbolizeParameter,
    missing: s['missing'] === 'split' ? 'split' : 'skip',
  };
}

/** A saved demo length, or the default when it is missing or out of range. */
export function restoreDemoLength(stored: unknown): number {
  return isDemoLength(stored) ? stored : DEFAULT_DEMO.length;
}

/** Input actions bound to a store; plain functions, callable outside React. */
export function inputActions(store: StoreHandle) {
  return {
    /** Replaces the reading choices with a new snapshot carrying the patch. */
    updateReading(patch: Partial<ReadingChoices>): void {
      store.setState((s) => ({ reading: { ...s.reading, ...patch } }));
    },
    /** Ignores values that are not integers inside DEMO_LENGTH_RANGE (the input shows them as invalid). */
    setDemoLength(length: number): void {
      if (isDemoLength(length)) store.setState({ demoLength: length });
    },
    /** Sets what the next run reads; choosing a demo drops the file preview. */
    chooseInput(chosen: ChosenInput): void {
      store.setState(chosen.kind === 'demo' ? { chosen, preview: null } : { chosen });
    },
    showPreview(preview: FilePreview | null): void {
      store.setState({ preview });
    },
  };
}
