import type { Sequence } from './sequence';
import { ReadError } from './readError';
import { BytesReader } from './bytesReader';
import { CharsReader } from './charsReader';
import { CsvColumnReader } from './csvColumnReader';
import { FastaReader } from './fastaReader';
import { TokensReader } from './tokensReader';
import type { MissingPolicy } from '../symbolize/missingPolicy';
import type { SymbolizationRecord } from '../symbolize/symbolizationRecord';
import type { SymbolizeSpec } from '../symbolize/symbolizeSpec';
import { createSymbolizingReader } from '../symbolize/symbolizingReader';

/** 'numbers' is one real number per line; it needs `symbolize` (as does a CSV column of numbers). */
export type InputFormat = 'chars' | 'tokens' | 'fasta' | 'csv' | 'bytes' | 'numbers';

/**
 * How to turn a file's bytes into symbols. Text formats expect UTF-8 (a leading byte order mark is
 * skipped). Options that do not apply to the chosen format are ignored.
 */
export interface ReaderOptions {
  format: InputFormat;
  /** chars: keep spaces, tabs and other non-breaking whitespace as symbols. Line breaks (LF, CR,
   * VT, FF, U+0085, U+2028, U+2029) are always dropped. Default false. */
  keepWhitespace?: boolean;
  /** csv: the column to read, a header name (exact match after trimming) or a 0-based index.
   * Default: the only column when the first row has one field, otherwise an error. */
  column?: string | number;
  /** csv: one character. Default: detected from the first line as the most frequent of comma,
   * semicolon and tab outside quotes (ties in that order; comma when none occurs). */
  delimiter?: string;
  /** csv: whether the first row is a header. Default true. */
  hasHeader?: boolean;
  /** fasta: 'concatenate' (default) or 'separate'. Both give one symbol sequence with every
   * record's start and length in `records`; 'separate' tells the analysis not to let blocks
   * cross record boundaries. */
  fastaRecords?: 'concatenate' | 'separate';
  /** fasta: what to do with IUPAC ambiguity codes (R Y S W K M B D H V N) and '-' gaps:
   * 'skip' drops them (default), 'symbol' keeps them as symbols, 'error' refuses the file.
   * Their counts are reported in `details` in every case. */
  ambiguity?: 'skip' | 'symbol' | 'error';
  /** fasta: fold lower-case letters (soft-masked regions) to upper case. Default true. */
  caseFold?: boolean;
  /** Size of the whole input in bytes, if known; used to preallocate the symbol array once. */
  sizeHint?: number;
  /** Write the symbols into a SharedArrayBuffer (where the host has one), so that the worker threads
   * of a shared scan read them in place instead of a copy (symbolized series are copied still). */
  sharedMemory?: boolean;
  /** Refuse inputs with more symbols than this ('too-many-symbols'). Default: no limit. */
  maxSymbols?: number;
  /** numbers, csv: read the input as real numbers and turn them into symbols this way
   * (src/core/symbolize). Without it, 'csv' cells are symbols as written. */
  symbolize?: SymbolizeSpec;
  /** With `symbolize`: what to do with missing values (empty cells, NaN, NA). Default 'skip'. */
  missing?: MissingPolicy;
}

export interface FastaRecord {
  /** Header text after '>', trimmed; '' for bases before the first header. */
  name: string;
  /** Index of the record's first symbol in the output sequence. */
  start: number;
  /** Number of symbols the record contributed. */
  length: number;
}

export interface ReadWarning {
  code: string;
  message: string;
}

export interface ReadResult {
  /** Symbol ids are assigned in order of first appearance: the first symbol read is id 0 (a
   * symbolized series instead numbers its cells in cell order, see src/core/symbolize). */
  sequence: Sequence;
  /** fasta only: one entry per record, in file order. */
  records?: FastaRecord[];
  warnings: ReadWarning[];
  bytesRead: number;
  /** Number of lines: line feeds, plus one when the input does not end with one (0 for no bytes). */
  lines: number;
  /** Counts the format reports, e.g. fasta 'ambiguity:N', 'gaps'; csv 'rows', 'emptyCells'. */
  details: Record<string, number>;
  /** With `symbolize`: how the numbers became symbols (cut points, cells, missing values, segments). */
  symbolization?: SymbolizationRecord;
}

/**
 * A streaming reader: push the input's bytes in chunks split anywhere (inside a UTF-8 character, a
 * line or a quoted CSV field), then call finish() once. The result does not depend on the split.
 * Errors are ReadError with the line, column (in code points, 1-based) and byte (0-based) of the
 * problem; after an error the reader throws the same error on every call.
 */
export interface SequenceReader {
  push(chunk: Uint8Array): void;
  finish(): ReadResult;
}

const FORMATS: readonly InputFormat[] = ['chars', 'tokens', 'fasta', 'csv', 'bytes', 'numbers'];

/** A reader for one input in the given format; throws ReadError 'bad-option' for invalid options. */
export function createReader(options: ReaderOptions): SequenceReader {
  checkCommonOptions(options);
  const { symbolize } = options;
  if (symbolize !== undefined) {
    if (options.format !== 'numbers' && options.format !== 'csv') {
      throw new ReadError('bad-option', `symbolization reads numbers: use format 'numbers' (one per line) or 'csv' (one column), not '${options.format}'`);
    }
    return createSymbolizingReader({ ...options, symbolize });
  }
  switch (options.format) {
    case 'numbers':
      throw new ReadError('bad-option', `format 'numbers' needs a symbolization (quantile:K, threshold:T1,T2,... or ordinal:D[:TAU])`);
    case 'chars':
      return new CharsReader(options);
    case 'tokens':
      return new TokensReader(options);
    case 'fasta':
      return new FastaReader(options);
    case 'csv':
      return new CsvColumnReader(options);
    case 'bytes':
      return new BytesReader(options);
  }
}

/** Reads a whole input held in memory (one chunk). */
export function readAll(bytes: Uint8Array, options: ReaderOptions): ReadResult {
  const reader = createReader(options);
  reader.push(bytes);
  return reader.finish();
}

function checkCommonOptions(options: ReaderOptions): void {
  if (!FORMATS.includes(options.format)) {
    throw new ReadError('bad-option', `unknown format '${String(options.format)}'; expected one of ${FORMATS.join(', ')}`);
  }
  const { sizeHint, maxSymbols } = options;
  if (sizeHint !== undefined && !(Number.isFinite(sizeHint) && sizeHint >= 0)) {
    throw new ReadError('bad-option', `sizeHint must be a byte count >= 0, got ${sizeHint}`);
  }
  if (maxSymbols !== undefined && !(Number.isInteger(maxSymbols) && maxSymbols >= 1)) {
    throw new ReadError('bad-option', `maxSymbols must be an integer >= 1, got ${maxSymbols}`);
  }
}
