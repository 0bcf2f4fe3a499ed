import { guessFormat } from '../../core';
import type { PreviewOptions, ReaderOptions } from '../../core';
import { DEMO_LENGTH_RANGE } from '../store/inputSlice';
import type { AmbiguityChoice, ChosenInput, FormatChoice, ReadingChoices } from '../store/inputSlice';
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

/** What a FASTA reader does with ambiguity codes and gaps, with labels. */
export const AMBIGUITY_CHOICES: readonly { readonly value: AmbiguityChoice; readonly label: string }[] = [
  { value: 'skip', label: 'Skip them' },
  { value: 'symbol', label: 'Keep as symbols' },
  { value: 'error', label: 'Refuse the file' },
];

/** The CSV column as the reader wants it: all digits is a 0-based index, other text a header name, blank is the default. */
export function parseColumn(text: string): string | number | undefined {
  const t = text.trim();
  if (t === '') return undefined;
  return /^\d+$/.test(t) ? Number(t) : t;
}

/** The options of the page's reading choices that apply to `format` (others are left out). */
function optionsFor<F extends FormatChoice>(format: F, c: ReadingChoices): Omit<ReaderOptions, 'format'> & { format: F } {
  switch (format) {
    case 'csv': {
      const column = parseColumn(c.csvColumn);
      return column === undefined ? { format, hasHeader: c.csvHeader } : { format, column, hasHeader: c.csvHeader };
    }
    case 'chars':
      return { format, keepWhitespace: c.keepWhitespace };
    case 'fasta':
      return { format, ambiguity: c.ambiguity, caseFold: c.caseFold };
    default:
      return { format };
  }
}

/** Reader options for a file from the page's choices; `head` is the file's decoded start (see guessFormat). */
export function readerOptionsFor(fileName: string, head: string, c: ReadingChoices): ReaderOptions {
  return optionsFor(c.format === 'auto' ? guessFormat(fileName, head) : c.format, c);
}

/**
 * Options for the preview of a file's head; with 'auto' the preview guesses, and the options of
 * every format go along so that the guessed one finds its own.
 */
export function previewOptionsFor(c: ReadingChoices): PreviewOptions {
  if (c.format !== 'auto') return optionsFor(c.format, c);
  const column = parseColumn(c.csvColumn);
  return {
    format: 'auto',
    hasHeader: c.csvHeader,
    keepWhitespace: c.keepWhitespace,
    ambiguity: c.ambiguity,
    caseFold: c.caseFold,
    ...(column === undefined ? {} : { column }),
  };
}

/** A demo length typed by the user: an integer number of symbols inside DEMO_LENGTH_RANGE, or null. */
export function parseDemoLength(text: string): number | null {
  const t = text.trim();
  if (!/^\d+$/.test(t)) return null;
  const value = Number(t);
  return value >= DEMO_LENGTH_RANGE[0] && value <= DEMO_LENGTH_RANGE[1] ? value : null;
}

/** One line naming the input of the next run; `demoTitle` names a demo by its id. */
export function chosenInputText(chosen: ChosenInput | null, demoTitle: (id: string) => string = () => 'invented demo'): string {
  if (chosen === null) return 'none yet';
  if (chosen.kind === 'file') return `${chosen.name} (${formatBytes(chosen.bytes)})`;
  return `${demoTitle(chosen.id)}, ${formatCount(chosen.length)} symbols, seed ${chosen.seed}`;
}
