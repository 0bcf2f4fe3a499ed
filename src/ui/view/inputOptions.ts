import { guessFormat } from '../../core';
import type { ReaderOptions } from '../../core';
import { DEMO_LENGTH_RANGE } from '../store/inputSlice';
import type { ChosenInput, FormatChoice } from '../store/inputSlice';
import { formatBytes, formatCount } from './format';

/** The formats offered in the page, with their labels. */
export const FORMAT_CHOICES: readonly { readonly value: FormatChoice; readonly label: string }[] = [
  { value: 'auto', label: 'Auto-detect' },
  { value: 'tokens', label: 'Tokens (whitespace-separated)' },
  { value: 'chars', label: 'Characters' },
  { value: 'fasta', label: 'FASTA' },
  { value: 'csv', label: 'CSV (one column)' },
  { value: 'bytes', label: 'Raw bytes' },
];

/** The CSV column as the reader wants it: all digits is a 0-based index, other text a header name, blank is the default. */
export function parseColumn(text: string): string | number | undefined {
  const t = text.trim();
  if (t === '') return undefined;
  return /^\d+$/.test(t) ? Number(t) : t;
}

/** Reader options for a file from the page's choices; `head` is the file's decoded start (see guessFormat). */
export function readerOptionsFor(fileName: string, head: string, choice: FormatChoice, columnText: string): ReaderOptions {
  const format = choice === 'auto' ? guessFormat(fileName, head) : choice;
  if (format !== 'csv') return { format };
  const column = parseColumn(columnText);
  return column === undefined ? { format } : { format, column };
}

/** A demo length typed by the user: an integer number of symbols inside DEMO_LENGTH_RANGE, or null. */
export function parseDemoLength(text: string): number | null {
  const t = text.trim();
  if (!/^\d+$/.test(t)) return null;
  const value = Number(t);
  return value >= DEMO_LENGTH_RANGE[0] && value <= DEMO_LENGTH_RANGE[1] ? value : null;
}

/** One line naming the input of the last run. */
export function chosenInputText(chosen: ChosenInput | null): string {
  if (chosen === null) return 'none yet';
  if (chosen.kind === 'file') return `${chosen.name} (${formatBytes(chosen.bytes)})`;
  return `invented demo, ${formatCount(chosen.length)} symbols, seed ${chosen.seed}`;
}
