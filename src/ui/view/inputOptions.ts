import { guessFormat, parseSymbolizeSpec } from '../../core';
import type { MissingPolicy, PreviewOptions, ReaderOptions, SymbolizeSpec } from '../../core';
import { DEMO_LENGTH_RANGE } from '../store/inputSlice';
import type { AmbiguityChoice, ChosenInput, FormatChoice, ReadingChoices, SymbolizeKind } from '../store/inputSlice';
import { formatBytes, formatCount } from './format';

/** The formats offered in the page, with their labels. */
export const FORMAT_CHOICES: readonly { readonly value: FormatChoice; readonly label: string }[] = [
  { value: 'auto', label: 'Auto-detect' },
  { value: 'tokens', label: 'Tokens (whitespace-separated)' },
  { value: 'chars', label: 'Characters' },
  { value: 'fasta', label: 'FASTA' },
  { value: 'csv', label: 'CSV (one column)' },
  { value: 'bytes', label: 'Raw bytes' },
  { value: 'numbers', label: 'Numbers (one per line)' },
];

/** Ways to turn real numbers into symbols, with labels and what their parameter means. */
export const SYMBOLIZE_CHOICES: readonly { readonly value: SymbolizeKind; readonly label: string; readonly parameter: string }[] = [
  { value: 'none', label: 'None (the file holds symbols)', parameter: '' },
  { value: 'quantile', label: 'Quantile cells', parameter: 'Cells K' },
  { value: 'threshold', label: 'Thresholds', parameter: 'Cut points T1,T2,…' },
  { value: 'ordinal', label: 'Ordinal patterns', parameter: 'Order D or D:TAU' },
];

/** What to do with missing values (empty, NaN, NA), with labels. */
export const MISSING_CHOICES: readonly { readonly value: MissingPolicy; readonly label: string }[] = [
  { value: 'skip', label: 'Skip them (join the values around)' },
  { value: 'split', label: 'Split the series there' },
];

/**
 * The symbolization the choices ask for: null for 'none'.
 * @throws RangeError with the parser's message for a bad parameter
 */
export function symbolizeSpecOf(c: Pick<ReadingChoices, 'symbolizeKind' | 'symbolizeParameter'>): SymbolizeSpec | null {
  if (c.symbolizeKind === 'none') return null;
  return parseSymbolizeSpec(`${c.symbolizeKind}:${c.symbolizeParameter}`);
}

/** Symbolization options for a reader (empty when none is chosen). */
function symbolizeOptions(c: ReadingChoices): { symbolize?: SymbolizeSpec; missing?: MissingPolicy } {
  const symbolize = symbolizeSpecOf(c);
  return symbolize === null ? {} : { symbolize, missing: c.missing };
}

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
      const symbolize = symbolizeOptions(c);
      return column === undefined ? { format, hasHeader: c.csvHeader, ...symbolize } : { format, column, hasHeader: c.csvHeader, ...symbolize };
    }
    case 'numbers':
      return { format, ...symbolizeOptions(c) };
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
  if (c.format !== 'auto') return optionsFor(c.format, c);
  const guessed = guessFormat(fileName, head);
  // With a symbolization, 'auto' reads numbers: a CSV column for a CSV file, else one per line.
  return optionsFor(c.symbolizeKind === 'none' ? guessed : guessed === 'csv' ? 'csv' : 'numbers', c);
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
    ...symbolizeOptions(c),
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
