import { alphabetSummary, type SymbolCount } from '../result/alphabetSummary';
import { findBinaryEvidence } from './binarySniff';
import { guessFormat } from './guessFormat';
import { ReadError } from './readError';
import { readAll, type InputFormat, type ReaderOptions } from './sequenceReader';
import { Utf8Decoder } from './utf8Decoder';
import { readNumericSeries } from '../symbolize/numericSeriesReader';
import { symbolizationSummary, type SymbolizationSummary } from '../symbolize/symbolizationSummary';

/** Bytes of a file's start the preview reads: enough for guessFormat and a fair look at the alphabet. */
export const PREVIEW_BYTES = 1 << 16;
/** Lines of text the preview keeps, and characters per line (longer lines are cut and marked). */
export const PREVIEW_LINES = 12;
export const PREVIEW_LINE_CHARS = 160;
/** Symbols listed in the preview's alphabet at most. */
export const PREVIEW_SYMBOLS_LISTED = 40;
/** Bytes shown per line, and lines, when the preview shows bytes in hexadecimal. */
const HEX_BYTES_PER_LINE = 16;

/** How to read the file: a reader format or 'auto' (guessFormat on name and head), plus the reader's options. */
export type PreviewOptions = Omit<ReaderOptions, 'format' | 'sizeHint' | 'maxSymbols'> & { readonly format: InputFormat | 'auto' };

/** A soft or hard problem seen in the head; 'read-error' carries the reader's message with its line, column and byte. */
export interface PreviewIssue {
  readonly code: 'read-error' | 'looks-binary' | 'one-symbol' | 'cut-line' | 'reader-warning';
  readonly message: string;
}

/** What the page shows about a file before running: its first lines and what the reader makes of its head. */
export interface HeadPreview {
  /** The format the reader used: the chosen one, or the guess when 'auto'. */
  readonly format: InputFormat;
  /** What guessFormat says for this name and head, whatever was chosen. */
  readonly guessedFormat: InputFormat;
  readonly fileBytes: number;
  /** Bytes of the head that were read as symbols (cut back to the last line break for text when the head is not the whole file). */
  readonly bytesRead: number;
  /** True when the head is the whole file, so counts are exact. */
  readonly wholeFile: boolean;
  /** 'text' lines as decoded (control characters left in, the view makes them visible), or 'hex' rows for bytes. */
  readonly linesKind: 'text' | 'hex';
  readonly lines: readonly string[];
  /** Symbols read from the head; null when the reader refused it. */
  readonly symbolsInHead: number | null;
  /** symbolsInHead scaled by fileBytes / bytesRead when the head is not the whole file, else null. */
  readonly estimatedSymbols: number | null;
  /** The head's alphabet, most frequent first, at most PREVIEW_SYMBOLS_LISTED entries. */
  readonly alphabet: readonly SymbolCount[];
  readonly alphabetSize: number;
  readonly issues: readonly PreviewIssue[];
  /** With options.symbolize: the head's values, histogram, cut points and cell counts (absent when unread). */
  readonly symbolization?: SymbolizationSummary;
}

const LINE_FEED = 0x0a;

/** The head cut after its last line feed, so a text reader does not see a half line or half character (whole head when it has none). */
function completeLines(head: Uint8Array): Uint8Array {
  const last = head.lastIndexOf(LINE_FEED);
  return last < 0 ? head : head.subarray(0, last + 1);
}

/** The head decoded as UTF-8 up to its end, or up to invalid UTF-8 or a NUL byte. */
function decodeText(head: Uint8Array): string {
  const decoder = new Utf8Decoder();
  const count = decoder.decode(head);
  const parts: string[] = [];
  // fromCodePoint takes its arguments on the stack: go in slices.
  for (let i = 0; i < count; i += 4096) parts.push(String.fromCodePoint(...decoder.codePoints.subarray(i, Math.min(count, i + 4096))));
  return parts.join('');
}

/** The first PREVIEW_LINES lines, each cut to PREVIEW_LINE_CHARS code points (marked with '…'). */
function firstLines(text: string): string[] {
  const lines = text.split(/\r?\n/, PREVIEW_LINES + 1);
  if (lines.length > 0 && lines[lines.length - 1] === '') lines.pop();
  return lines.slice(0, PREVIEW_LINES).map((line) => {
    const points = [...line];
    return points.length > PREVIEW_LINE_CHARS ? points.slice(0, PREVIEW_LINE_CHARS).join('') + '…' : line;
  });
}

function hexLines(head: Uint8Array): string[] {
  const lines: string[] = [];
  for (let start = 0; start < head.length && lines.length < PREVIEW_LINES; start += HEX_BYTES_PER_LINE) {
    const row = Array.from(head.subarray(start, start + HEX_BYTES_PER_LINE), (b) => b.toString(16).padStart(2, '0'));
    lines.push(`${start.toString(16).padStart(6, '0')}  ${row.join(' ')}`);
  }
  return lines;
}

function readerOptions(format: InputFormat, options: PreviewOptions): ReaderOptions {
  const { format: _choice, ...rest } = options;
  return { ...rest, format };
}

/**
 * What a reader makes of the first bytes of a file, for a look before the full run: the first
 * lines, the guessed and used format, the head's alphabet with counts and the number of symbols
 * (scaled to the file's size when the head is only its start), and problems found on the way.
 * A text head is cut after its last line feed, so counts never include a half line; positions in
 * read errors are those of the file, because the head is its start.
 * @param head the file's first bytes (at most PREVIEW_BYTES are looked at)
 * @param fileBytes size of the whole file in bytes
 * @param fileName used by guessFormat for its extension rule
 * @throws RangeError for a negative file size or one smaller than the head
 */
export function previewHead(head: Uint8Array, fileBytes: number, fileName: string, options: PreviewOptions): HeadPreview {
  const window = head.subarray(0, PREVIEW_BYTES);
  if (!(Number.isFinite(fileBytes) && fileBytes >= window.length)) {
    throw new RangeError(`fileBytes must be at least the head's ${window.length} bytes; got ${fileBytes}`);
  }
  const wholeFile = window.length === fileBytes;
  const usable = wholeFile ? window : completeLines(window);
  const text = decodeText(usable);
  const guessedFormat = guessFormat(fileName, text);
  // A symbolization reads numbers: 'auto' then means a CSV column for a CSV file, else one number per line.
  const autoFormat = options.symbolize === undefined ? guessedFormat : guessedFormat === 'csv' ? 'csv' : 'numbers';
  const format = options.format === 'auto' ? autoFormat : options.format;
  const issues: PreviewIssue[] = [];
  const readBytes = format === 'bytes' ? window : usable;

  const evidence = format === 'bytes' ? null : findBinaryEvidence(window);
  if (evidence !== null) {
    issues.push({
      code: 'looks-binary',
      message: `byte ${evidence.byte}: this looks like binary data (${evidence.reason === 'nul' ? 'a NUL byte' : evidence.reason === 'utf16' ? 'a UTF-16 byte order mark' : 'many control bytes'}); choose "Raw bytes" to read it byte by byte`,
    });
  }
  if (!wholeFile && format !== 'bytes' && usable.length === window.length && window.length > 0) {
    issues.push({ code: 'cut-line', message: `no line break in the first ${window.length} bytes: the preview's counts come from a cut line` });
  }

  let symbolsInHead: number | null = null;
  let alphabet: SymbolCount[] = [];
  let alphabetSize = 0;
  let symbolization: SymbolizationSummary | undefined;
  try {
    const read = readAll(readBytes, readerOptions(format, options));
    symbolsInHead = read.sequence.symbols.length;
    alphabetSize = read.sequence.alphabet.length;
    alphabet = alphabetSummary(read.sequence, PREVIEW_SYMBOLS_LISTED).symbols;
    for (const w of read.warnings) issues.push({ code: 'reader-warning', message: w.message });
    if (options.symbolize !== undefined) {
      symbolization = symbolizationSummary(readNumericSeries(readBytes, readerOptions(format, options)).series, options.symbolize);
    }
    if (alphabetSize === 1) {
      issues.push({ code: 'one-symbol', message: `only one symbol ('${alphabet[0]?.symbol ?? ''}') ${wholeFile ? 'in the file' : 'in the head'}: its entropy rate is 0` });
    }
  } catch (error) {
    if (!(error instanceof ReadError)) throw error;
    if (!issues.some((i) => i.code === 'looks-binary') || error.code !== 'binary-in-text') {
      issues.push({ code: 'read-error', message: error.message });
    }
  }

  const estimatedSymbols =
    symbolsInHead === null || wholeFile || readBytes.length === 0 ? null : Math.round((symbolsInHead * fileBytes) / readBytes.length);
  return {
    format,
    guessedFormat,
    fileBytes,
    bytesRead: readBytes.length,
    wholeFile,
    linesKind: format === 'bytes' || evidence !== null ? 'hex' : 'text',
    lines: format === 'bytes' || evidence !== null ? hexLines(window) : firstLines(text),
    symbolsInHead,
    estimatedSymbols,
    alphabet,
    alphabetSize,
    issues,
    ...(symbolization === undefined ? {} : { symbolization }),
  };
}
