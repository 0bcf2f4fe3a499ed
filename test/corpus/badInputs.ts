import { analyzeSequence } from '../../src/core/analyze';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import type { AnalysisSettings } from '../../src/core/result/analysisResult';
import type { InputPosition } from '../../src/core/sequence/readError';
import { readAll } from '../../src/core/sequence/sequenceReader';
import type { ReaderOptions } from '../../src/core/sequence/sequenceReader';
import { sessionOf } from '../../src/core/session/session';
import { writeSession } from '../../src/core/session/writeSession';
import { NUMERIC_BAD_INPUTS } from './numericBadInputs';

/**
 * The bad-input corpus: every kind of input a user may drop, type or pass that once broke, or
 * could break, a reader, the analysis or a session, with what the program must say about it. The
 * bytes are generated here (never stored as files) and driven through the core
 * (test/core/badInputs.test.ts), the command line in-process (test/cli/badInputs.test.ts) and, for
 * the kinds marked `browser`, the workbench (e2e/badInput.spec.ts).
 *
 * Expected messages and positions are written by hand from the bytes (1-based lines and columns in
 * code points, 0-based bytes), not taken from the program's output.
 */

/** Which part of the program meets the input first. */
export type Stage =
  /** a reader (createReader/readAll) with `reader` options */
  | 'read'
  /** read, then analyzeSequence with `settings` */
  | 'analyze'
  /** readSession on the bytes as UTF-8 text */
  | 'session'
  /** read, then the page's memory check (pageMemoryCheck) with `memoryBudgetBytes` */
  | 'memory';

/** The input is refused with this error. */
export interface Refused {
  readonly outcome: 'refused';
  /** ReadError/SessionError code; absent for a RangeError of the analysis settings. */
  readonly code?: string;
  readonly message: RegExp;
  /**
   * Where the problem sits. 'whole-input' for a property of the whole file (empty, no symbols, too
   * many symbols) or of a setting, where no single place is to blame; the message then says what
   * was counted instead.
   */
  readonly position: InputPosition | 'whole-input';
}

/** The input is read (and analysed) without an error; these are checked. */
export interface Accepted {
  readonly outcome: 'accepted';
  readonly symbols?: number;
  readonly alphabetSize?: number;
  /** the first labels of the symbol sequence */
  readonly startsWith?: readonly string[];
  /** a warning the reader must give (its message) */
  readonly warning?: RegExp;
  /** analyze stage: the entropy rate in nats must be at most this (0 for a deterministic sequence) */
  readonly entropyAtMost?: number;
  /** the segments of a series cut at missing values (ReadResult.records) */
  readonly segments?: number;
}

/** How the command line must end on this input. */
export interface CliCase {
  /** Arguments, with 'FILE' standing for the written input file. */
  readonly args: readonly string[];
  readonly exit: 0 | 1 | 2;
  /** The one failure line (exit 1, 2) or a note on standard error (exit 0). */
  readonly stderr?: RegExp;
}

export interface BadInput {
  readonly id: string;
  readonly title: string;
  readonly fileName: string;
  readonly bytes: () => Uint8Array;
  readonly stage: Stage;
  readonly reader: ReaderOptions;
  /** A symbolization as typed (`--symbolize`, the page's field): parsed with parseSymbolizeSpec into `reader.symbolize`. */
  readonly symbolize?: string;
  /** memory stage: the budget in place of the page's fixed one (the command line's `--max-memory` in its args). */
  readonly memoryBudgetBytes?: number;
  readonly settings?: Partial<AnalysisSettings>;
  readonly expect: Refused | Accepted;
  /** Absent where the command line has no such input (e.g. sessions, reader-only limits). */
  readonly cli?: CliCase;
  /** In the workbench subset (e2e/badInput.spec.ts): the page shows `message` for a dropped file. */
  readonly browser?: boolean;
  /** Too slow or too large for every test run (100 MB, 10^7 tokens); run with RETURNRATE_HEAVY=1. */
  readonly heavy?: boolean;
}

const text = (s: string): Uint8Array => new TextEncoder().encode(s);
const bytesOf = (...parts: (string | number[])[]): Uint8Array =>
  Uint8Array.from(parts.flatMap((p) => (typeof p === 'string' ? Array.from(text(p)) : p)));

const ANALYSIS_FILE = 'abracadabra';

/** A valid session of a small real analysis, as written by the page's Save session. */
function sessionText(): string {
  const read = readAll(text('ab'.repeat(40) + 'ba'.repeat(40)), { format: 'chars' });
  const result = analyzeSequence(read.sequence, { name: 'chain.txt', sha256: null, format: 'chars' }, { ...DEFAULT_SETTINGS, maxN: 6 });
  return writeSession(sessionOf({ result, settings: { ...DEFAULT_SETTINGS, maxN: 6 }, view: {}, reading: { format: 'chars' }, savedAt: '2026-12-01T10:00:00.000Z' }));
}

/** One line of `length` bytes of 'a' with a 'b' every 7th byte, no line break. */
function longLine(length: number): Uint8Array {
  const line = new Uint8Array(length).fill(0x61);
  for (let i = 1; i < length; i += 7) line[i] = 0x62;
  return line;
}

/** `count` distinct integer tokens separated by spaces. */
function distinctTokens(count: number): Uint8Array {
  const parts: string[] = new Array<string>(count);
  for (let i = 0; i < count; i++) parts[i] = String(i);
  return text(parts.join(' '));
}

export const BAD_INPUTS: readonly BadInput[] = [
  // --- nothing to read ---
  {
    id: 'empty', title: 'an empty file', fileName: 'empty.txt', bytes: () => new Uint8Array(0), stage: 'read', reader: { format: 'chars' },
    expect: { outcome: 'refused', code: 'empty', message: /^the file holds no symbols \(0 bytes\)$/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'chars'], exit: 1, stderr: /holds no symbols \(0 bytes\)/ }, browser: true,
  },
  {
    id: 'whitespace-chars', title: 'spaces, tabs and line breaks only (chars)', fileName: 'blank.txt', bytes: () => text('  \n\t \r\n\n'), stage: 'read', reader: { format: 'chars' },
    expect: { outcome: 'refused', code: 'empty', message: /no symbols \(only whitespace\)/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'chars'], exit: 1, stderr: /only whitespace/ }, browser: true,
  },
  {
    id: 'whitespace-tokens', title: 'separators only (tokens)', fileName: 'blank-tokens.txt', bytes: () => text(' ,;\n ;; \n'), stage: 'read', reader: { format: 'tokens' },
    expect: { outcome: 'refused', code: 'empty', message: /no symbols \(only whitespace and separators\)/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'tokens'], exit: 1, stderr: /only whitespace and separators/ },
  },
  {
    id: 'bom-only', title: 'a UTF-8 byte order mark and nothing else', fileName: 'bom.txt', bytes: () => bytesOf([0xef, 0xbb, 0xbf]), stage: 'read', reader: { format: 'chars' },
    expect: { outcome: 'refused', code: 'empty', message: /no symbols/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'chars'], exit: 1, stderr: /no symbols/ },
  },
  // --- text that is fine but unusual ---
  {
    id: 'bom-text', title: 'a byte order mark before the text (skipped, not a symbol)', fileName: 'bom-text.txt', bytes: () => bytesOf([0xef, 0xbb, 0xbf], 'abab'.repeat(10)), stage: 'read', reader: { format: 'chars' },
    expect: { outcome: 'accepted', symbols: 40, alphabetSize: 2, startsWith: ['a', 'b'] },
    cli: { args: ['analyze', 'FILE', '--format', 'chars', '--max-n', '4', '--quiet'], exit: 0 },
  },
  {
    id: 'crlf', title: 'CRLF line ends (no CR symbol)', fileName: 'crlf.txt', bytes: () => text('ab\r\n'.repeat(20)), stage: 'read', reader: { format: 'chars' },
    expect: { outcome: 'accepted', symbols: 40, alphabetSize: 2, startsWith: ['a', 'b', 'a'] },
    cli: { args: ['analyze', 'FILE', '--format', 'chars', '--max-n', '4', '--quiet'], exit: 0 },
  },
  {
    id: 'mixed-line-ends', title: 'LF, CRLF and lone CR mixed (tokens)', fileName: 'mixed.txt', bytes: () => text('a b\r\nc\rd\n e\r\na'), stage: 'read', reader: { format: 'tokens' },
    expect: { outcome: 'accepted', symbols: 6, alphabetSize: 5, startsWith: ['a', 'b', 'c', 'd', 'e', 'a'] },
    cli: { args: ['analyze', 'FILE', '--format', 'tokens', '--max-n', '1', '--quiet'], exit: 0 },
  },
  // --- not UTF-8 ---
  {
    id: 'utf8-stray-continuation', title: 'a continuation byte without a lead byte', fileName: 'stray.txt', bytes: () => bytesOf('ab\nc', [0x80], 'd'), stage: 'read', reader: { format: 'chars' },
    expect: { outcome: 'refused', code: 'invalid-utf8', message: /continuation byte 0x80 with no lead byte/, position: { line: 2, column: 2, byte: 4 } },
    cli: { args: ['analyze', 'FILE', '--format', 'chars'], exit: 1, stderr: /line 2, column 2, byte 4: invalid UTF-8: a continuation byte 0x80/ }, browser: true,
  },
  {
    id: 'utf8-cut-short', title: 'a three-byte character cut after two bytes, inside the text', fileName: 'cut.txt', bytes: () => bytesOf('x y\nz ', [0xe2, 0x82], ' w'), stage: 'read', reader: { format: 'tokens' },
    expect: { outcome: 'refused', code: 'invalid-utf8', message: /cut short: lead byte 0xE2 is followed by 0x20/, position: { line: 2, column: 3, byte: 6 } },
    cli: { args: ['analyze', 'FILE', '--format', 'tokens'], exit: 1, stderr: /line 2, column 3, byte 6: invalid UTF-8: a character cut short/ },
  },
  {
    id: 'utf8-truncated-end', title: 'the file ends inside a character', fileName: 'end.txt', bytes: () => bytesOf('ACGT\nAC', [0xf0, 0x9f]), stage: 'read', reader: { format: 'chars' },
    expect: { outcome: 'refused', code: 'invalid-utf8', message: /the input ends inside a UTF-8 character/, position: { line: 2, column: 3, byte: 7 } },
    cli: { args: ['analyze', 'FILE', '--format', 'chars'], exit: 1, stderr: /line 2, column 3, byte 7: the input ends inside/ },
  },
  {
    id: 'utf8-overlong-2', title: "an overlong two-byte '/' (C0 AF)", fileName: 'overlong2.txt', bytes: () => bytesOf('abc', [0xc0, 0xaf]), stage: 'read', reader: { format: 'chars' },
    expect: { outcome: 'refused', code: 'invalid-utf8', message: /overlong encoding \(lead byte 0xC0/, position: { line: 1, column: 4, byte: 3 } },
    cli: { args: ['analyze', 'FILE', '--format', 'chars'], exit: 1, stderr: /line 1, column 4, byte 3: invalid UTF-8: an overlong/ }, browser: true,
  },
  {
    id: 'utf8-overlong-3', title: 'an overlong three-byte form (E0 80 AF)', fileName: 'overlong3.txt', bytes: () => bytesOf('1 2\n', [0xe0, 0x80, 0xaf]), stage: 'read', reader: { format: 'tokens' },
    expect: { outcome: 'refused', code: 'invalid-utf8', message: /overlong encoding \(0xE0 0x80\)/, position: { line: 2, column: 1, byte: 4 } },
    cli: { args: ['analyze', 'FILE', '--format', 'tokens'], exit: 1, stderr: /line 2, column 1, byte 4/ },
  },
  {
    id: 'utf8-surrogate', title: 'an encoded surrogate code point (ED A0 80 = U+D800)', fileName: 'surrogate.fa', bytes: () => bytesOf('>r\nACG', [0xed, 0xa0, 0x80]), stage: 'read', reader: { format: 'fasta' },
    expect: { outcome: 'refused', code: 'invalid-utf8', message: /surrogate code point \(0xED 0xA0/, position: { line: 2, column: 4, byte: 6 } },
    cli: { args: ['analyze', 'FILE'], exit: 1, stderr: /line 2, column 4, byte 6: invalid UTF-8: a surrogate/ }, browser: true,
  },
  {
    id: 'utf8-above-max', title: 'a code point above U+10FFFF (F4 90 80 80)', fileName: 'above.txt', bytes: () => bytesOf('ab', [0xf4, 0x90, 0x80, 0x80]), stage: 'read', reader: { format: 'chars' },
    expect: { outcome: 'refused', code: 'invalid-utf8', message: /above U\+10FFFF/, position: { line: 1, column: 3, byte: 2 } },
    cli: { args: ['analyze', 'FILE', '--format', 'chars'], exit: 1, stderr: /byte 2: invalid UTF-8: a code point above/ },
  },
  {
    id: 'utf8-ff', title: 'Latin-1 text (é as the single byte 0xE9)', fileName: 'latin1.txt', bytes: () => bytesOf('caf', [0xe9], ' ', [0xff]), stage: 'read', reader: { format: 'chars' },
    expect: { outcome: 'refused', code: 'invalid-utf8', message: /cut short: lead byte 0xE9 is followed by 0x20/, position: { line: 1, column: 4, byte: 3 } },
    cli: { args: ['analyze', 'FILE', '--format', 'chars'], exit: 1, stderr: /byte 3: invalid UTF-8/ },
  },
  {
    id: 'utf8-never-byte', title: 'a byte that never occurs in UTF-8 (0xFF)', fileName: 'ff.txt', bytes: () => bytesOf('ab\n', [0xff]), stage: 'read', reader: { format: 'chars' },
    expect: { outcome: 'refused', code: 'invalid-utf8', message: /byte 0xFF, which never occurs in UTF-8/, position: { line: 2, column: 1, byte: 3 } },
    cli: { args: ['analyze', 'FILE', '--format', 'chars'], exit: 1, stderr: /line 2, column 1, byte 3/ },
  },
  {
    id: 'utf16', title: 'UTF-16 text with its byte order mark', fileName: 'utf16.txt', bytes: () => bytesOf([0xff, 0xfe, 0x61, 0x00, 0x62, 0x00]), stage: 'read', reader: { format: 'chars' },
    expect: { outcome: 'refused', code: 'invalid-utf8', message: /UTF-16 text \(byte order mark\)/, position: { line: 1, column: 1, byte: 0 } },
    cli: { args: ['analyze', 'FILE', '--format', 'chars'], exit: 1, stderr: /line 1, column 1, byte 0: UTF-16/ }, browser: true,
  },
  // --- binary data in text modes ---
  {
    id: 'binary-nul-chars', title: 'binary data (NUL bytes) read as characters', fileName: 'dump.txt', bytes: () => bytesOf('AC\nGT', [0, 1, 2, 0]), stage: 'read', reader: { format: 'chars' },
    expect: { outcome: 'refused', code: 'binary-in-text', message: /NUL byte.*--format bytes/, position: { line: 2, column: 3, byte: 5 } },
    cli: { args: ['analyze', 'FILE', '--format', 'chars'], exit: 1, stderr: /line 2, column 3, byte 5: a NUL byte/ }, browser: true,
  },
  {
    id: 'binary-control-tokens', title: 'mostly control bytes read as tokens', fileName: 'ctl.txt', bytes: () => bytesOf('AB', [1], 'CDEF', [2], 'GHIJ'), stage: 'read', reader: { format: 'tokens' },
    expect: { outcome: 'refused', code: 'binary-in-text', message: /more than 10% control characters/, position: { line: 1, column: 3, byte: 2 } },
    cli: { args: ['analyze', 'FILE', '--format', 'tokens'], exit: 1, stderr: /byte 2: more than 10% control/ },
  },
  {
    id: 'binary-in-fasta', title: 'binary data inside a FASTA file', fileName: 'dump.fa', bytes: () => bytesOf('>r\nACGT\nAC', [0, 0], 'GT\n'), stage: 'read', reader: { format: 'fasta' },
    expect: { outcome: 'refused', code: 'binary-in-text', message: /NUL byte/, position: { line: 3, column: 3, byte: 10 } },
    cli: { args: ['analyze', 'FILE'], exit: 1, stderr: /line 3, column 3, byte 10/ },
  },
  // --- size and shape ---
  {
    id: 'long-line-1mb', title: 'one line of 1 MB (the quick stand-in for 100 MB)', fileName: 'line1m.txt', bytes: () => longLine(1_000_000), stage: 'read', reader: { format: 'chars' },
    expect: { outcome: 'accepted', symbols: 1_000_000, alphabetSize: 2, startsWith: ['a', 'b', 'a'] },
    cli: { args: ['returns', 'FILE', '--format', 'chars', '--n', '1', '--out', 'FILE.out'], exit: 0 },
  },
  {
    id: 'long-line-100mb', title: 'one line of 100 MB', fileName: 'line100m.txt', bytes: () => longLine(100_000_000), stage: 'read', reader: { format: 'chars' }, heavy: true,
    expect: { outcome: 'accepted', symbols: 100_000_000, alphabetSize: 2 },
  },
  {
    id: 'long-token-10mb', title: 'one token of 10 MB: one symbol, too few to analyse', fileName: 'token.txt', bytes: () => new Uint8Array(10_000_000).fill(0x78), stage: 'analyze', reader: { format: 'tokens' },
    expect: { outcome: 'refused', message: /the sequence needs at least 2 symbols; got 1/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'tokens'], exit: 1, stderr: /needs at least 2 symbols; got 1/ },
  },
  {
    id: 'distinct-tokens-1e5', title: '10^5 distinct tokens (the quick stand-in for 10^7)', fileName: 'distinct.txt', bytes: () => distinctTokens(100_000), stage: 'analyze', reader: { format: 'tokens' }, settings: { maxN: 2 },
    expect: { outcome: 'accepted', symbols: 100_000, alphabetSize: 100_000, startsWith: ['0', '1', '2'] },
    cli: { args: ['analyze', 'FILE', '--format', 'tokens', '--max-n', '2', '--quiet'], exit: 0 },
  },
  {
    id: 'distinct-tokens-1e7', title: '10^7 distinct tokens', fileName: 'distinct1e7.txt', bytes: () => distinctTokens(10_000_000), stage: 'read', reader: { format: 'tokens' }, heavy: true,
    expect: { outcome: 'accepted', symbols: 10_000_000, alphabetSize: 10_000_000 },
  },
  {
    id: 'one-symbol-repeated', title: 'a single symbol repeated (h = 0)', fileName: 'same.txt', bytes: () => text('a'.repeat(2000)), stage: 'analyze', reader: { format: 'chars' }, settings: { maxN: 10 },
    expect: { outcome: 'accepted', symbols: 2000, alphabetSize: 1, entropyAtMost: 1e-12 },
    cli: { args: ['analyze', 'FILE', '--format', 'chars', '--max-n', '10', '--no-table'], exit: 0 }, browser: true,
  },
  {
    id: 'period-2', title: 'a period-2 sequence (h = 0)', fileName: 'period2.txt', bytes: () => text('ab'.repeat(1000)), stage: 'analyze', reader: { format: 'chars' }, settings: { maxN: 10 },
    // log R_n = log 2 for every n, so every estimate tends to 0; at n = 10 the slope is exactly 0.
    expect: { outcome: 'accepted', symbols: 2000, alphabetSize: 2, entropyAtMost: 0.1 },
    cli: { args: ['analyze', 'FILE', '--format', 'chars', '--max-n', '10', '--no-table'], exit: 0 },
  },
  {
    id: 'one-symbol', title: 'a single symbol', fileName: 'one.txt', bytes: () => text('a'), stage: 'analyze', reader: { format: 'chars' },
    expect: { outcome: 'refused', message: /the sequence needs at least 2 symbols; got 1/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'chars'], exit: 1, stderr: /at least 2 symbols; got 1/ },
  },
  {
    id: 'max-symbols', title: 'more symbols than the reader was allowed', fileName: 'many.txt', bytes: () => text('abcd'), stage: 'read', reader: { format: 'chars', maxSymbols: 3 },
    expect: { outcome: 'refused', code: 'too-many-symbols', message: /more than maxSymbols = 3 symbols/, position: 'whole-input' },
  },
  // --- CSV ---
  {
    id: 'csv-unterminated-quote', title: 'an unterminated quote', fileName: 'open.csv', bytes: () => text('a,b\n1,"2\n3,4\n'), stage: 'read', reader: { format: 'csv', column: 'b' },
    expect: { outcome: 'refused', code: 'unterminated-quote', message: /the quote opened here is never closed/, position: { line: 2, column: 3, byte: 6 } },
    cli: { args: ['analyze', 'FILE', '--column', 'b'], exit: 1, stderr: /line 2, column 3, byte 6: the quote opened here/ }, browser: true,
  },
  {
    id: 'csv-text-after-quote', title: 'text after a closing quote', fileName: 'after.csv', bytes: () => text('a,b\n1,"2"x\n'), stage: 'read', reader: { format: 'csv', column: 'b' },
    expect: { outcome: 'refused', code: 'bad-csv', message: /a quoted field must end at a delimiter/, position: { line: 2, column: 6, byte: 9 } },
    cli: { args: ['analyze', 'FILE', '--column', 'b'], exit: 1, stderr: /line 2, column 6, byte 9/ },
  },
  {
    id: 'csv-quote-in-unquoted', title: 'a quote inside an unquoted field (kept as text, with a warning)', fileName: 'inner.csv', bytes: () => text('a,b\n1,2"x\n3,4\n5,2"x\n'), stage: 'read', reader: { format: 'csv', column: 'b' },
    expect: { outcome: 'accepted', symbols: 3, startsWith: ['2"x', '4', '2"x'], warning: /kept 2 quotes inside unquoted cells as text \(first at line 2, column 4\)/ },
    cli: { args: ['analyze', 'FILE', '--column', 'b', '--max-n', '1', '--quiet'], exit: 0, stderr: /note: kept 2 quotes .*line 2, column 4/ },
  },
  {
    id: 'csv-ragged', title: 'a ragged row, too short for the column', fileName: 'ragged.csv', bytes: () => text('a,b\n1,2\n3\n5,6\n'), stage: 'read', reader: { format: 'csv', column: 'b' },
    expect: { outcome: 'refused', code: 'short-row', message: /the row has 1 field, too few for column 'b'/, position: { line: 3 } },
    cli: { args: ['analyze', 'FILE', '--column', 'b'], exit: 1, stderr: /line 3: the row has 1 field/ }, browser: true,
  },
  {
    id: 'csv-missing-name', title: 'a column name that is not in the header', fileName: 'log.csv', bytes: () => text('time,sector\n0,N\n1,E\n'), stage: 'read', reader: { format: 'csv', column: 'direction' },
    expect: { outcome: 'refused', code: 'missing-column', message: /no column 'direction'; the header has 'time', 'sector'/, position: { line: 1 } },
    cli: { args: ['analyze', 'FILE', '--column', 'direction'], exit: 1, stderr: /line 1: no column 'direction'/ },
  },
  {
    id: 'csv-missing-index', title: 'a column index past the last column', fileName: 'idx.csv', bytes: () => text('time,sector\n0,N\n1,E\n'), stage: 'read', reader: { format: 'csv', column: 5 },
    expect: { outcome: 'refused', code: 'missing-column', message: /column index 5 \(0-based\) is past the last column/, position: { line: 1 } },
    cli: { args: ['analyze', 'FILE', '--column', '5'], exit: 1, stderr: /line 1: column index 5/ },
  },
  {
    id: 'csv-no-column-chosen', title: 'several columns and none chosen', fileName: 'two.csv', bytes: () => text('time,sector\n0,N\n1,E\n'), stage: 'read', reader: { format: 'csv' },
    expect: { outcome: 'refused', code: 'missing-column', message: /choose a column by header name or 0-based index/, position: { line: 1 } },
    cli: { args: ['analyze', 'FILE'], exit: 1, stderr: /line 1: choose a column/ },
  },
  {
    id: 'csv-empty-column', title: 'the chosen column has only empty cells', fileName: 'hole.csv', bytes: () => text('a,b\n1,\n2,\n'), stage: 'read', reader: { format: 'csv', column: 'b' },
    expect: { outcome: 'refused', code: 'empty', message: /column 'b' has no non-empty cells/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--column', 'b'], exit: 1, stderr: /no non-empty cells/ },
  },
  {
    id: 'csv-header-only', title: 'a header and no rows', fileName: 'head.csv', bytes: () => text('a,b\n'), stage: 'read', reader: { format: 'csv', column: 'a' },
    expect: { outcome: 'refused', code: 'empty', message: /no rows after the header/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--column', 'a'], exit: 1, stderr: /no rows after the header/ },
  },
  {
    // Without --symbolize a column is labels; with it, NaN is missing and infinities are refused (csv-nan-then-infinity).
    id: 'csv-nan-infinity', title: 'NaN and infinities in a column read as labels (no symbolization)', fileName: 'nan.csv', bytes: () => text('t,x\n1,0.5\n2,NaN\n3,Infinity\n4,-Infinity\n5,0.5\n'), stage: 'read', reader: { format: 'csv', column: 'x' },
    expect: { outcome: 'accepted', symbols: 5, alphabetSize: 4, startsWith: ['0.5', 'NaN', 'Infinity', '-Infinity'] },
    cli: { args: ['analyze', 'FILE', '--column', 'x', '--max-n', '1', '--quiet'], exit: 0 },
  },
  {
    id: 'csv-negative-index', title: 'a negative column index', fileName: 'neg.csv', bytes: () => text('a,b\n1,2\n'), stage: 'read', reader: { format: 'csv', column: -1 },
    expect: { outcome: 'refused', code: 'bad-option', message: /column index must be an integer >= 0 \(0-based\), got -1/, position: 'whole-input' },
    // The command line takes anything but digits as a header name.
    cli: { args: ['analyze', 'FILE', '--column', '-1'], exit: 1, stderr: /line 1: no column '-1'/ },
  },
  {
    id: 'csv-fractional-index', title: 'a fractional column index', fileName: 'frac.csv', bytes: () => text('a,b\n1,2\n'), stage: 'read', reader: { format: 'csv', column: 1.5 },
    expect: { outcome: 'refused', code: 'bad-option', message: /got 1\.5/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--column', '1.5'], exit: 1, stderr: /line 1: no column '1\.5'/ },
  },
  {
    id: 'csv-bad-delimiter', title: 'a delimiter of two characters', fileName: 'delim.csv', bytes: () => text('a,b\n1,2\n'), stage: 'read', reader: { format: 'csv', column: 0, delimiter: ',,' },
    expect: { outcome: 'refused', code: 'bad-option', message: /delimiter must be one character/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--column', '0', '--delimiter', ',,'], exit: 2, stderr: /--delimiter must be one character/ },
  },
  // --- FASTA ---
  {
    id: 'fasta-headers-only', title: 'FASTA headers and no bases', fileName: 'heads.fa', bytes: () => text('>r1\n>r2\n'), stage: 'read', reader: { format: 'fasta' },
    expect: { outcome: 'refused', code: 'empty', message: /the records hold no bases/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE'], exit: 1, stderr: /the records hold no bases/ },
  },
  {
    id: 'fasta-bad-letter', title: 'a letter that is no nucleotide code', fileName: 'bad.fa', bytes: () => text('>r1\nACGTZ\n'), stage: 'read', reader: { format: 'fasta' },
    expect: { outcome: 'refused', code: 'bad-fasta', message: /'Z' is not a nucleotide code/, position: { line: 2, column: 5, byte: 8 } },
    cli: { args: ['analyze', 'FILE'], exit: 1, stderr: /line 2, column 5, byte 8: 'Z'/ }, browser: true,
  },
  {
    id: 'fasta-ambiguity-refused', title: "an ambiguity code under policy 'error'", fileName: 'amb.fa', bytes: () => text('>r1\nACGTN\n'), stage: 'read', reader: { format: 'fasta', ambiguity: 'error' },
    expect: { outcome: 'refused', code: 'bad-fasta', message: /ambiguity code 'N' where the ambiguity policy is 'error'/, position: { line: 2, column: 5, byte: 8 } },
    cli: { args: ['analyze', 'FILE', '--ambiguity', 'error'], exit: 1, stderr: /line 2, column 5, byte 8: ambiguity code 'N'/ },
  },
  // --- settings (each analysis option) ---
  {
    id: 'max-n-zero', title: 'maxN of 0', fileName: 'abra.txt', bytes: () => text(ANALYSIS_FILE), stage: 'analyze', reader: { format: 'chars' }, settings: { maxN: 0 },
    expect: { outcome: 'refused', message: /maxN must be an integer from 1 to N - 1 = 10; got 0/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--max-n', '0'], exit: 2, stderr: /--max-n must be a whole number of at least 1; got "0"/ },
  },
  {
    id: 'max-n-beyond', title: 'maxN beyond the data', fileName: 'abra.txt', bytes: () => text(ANALYSIS_FILE), stage: 'analyze', reader: { format: 'chars' }, settings: { maxN: 20 },
    expect: { outcome: 'refused', message: /N - 1 = 10; got 20/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'chars', '--max-n', '20'], exit: 1, stderr: /--max-n 20 is too large for a sequence of 11 symbols/ },
  },
  {
    id: 'max-n-negative', title: 'a negative maxN', fileName: 'abra.txt', bytes: () => text(ANALYSIS_FILE), stage: 'analyze', reader: { format: 'chars' }, settings: { maxN: -3 },
    expect: { outcome: 'refused', message: /got -3/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--max-n', '-3'], exit: 2, stderr: /--max-n must be a whole number of at least 1; got "-3"/ },
  },
  {
    id: 'max-n-fractional', title: 'a fractional maxN', fileName: 'abra.txt', bytes: () => text(ANALYSIS_FILE), stage: 'analyze', reader: { format: 'chars' }, settings: { maxN: 2.5 },
    expect: { outcome: 'refused', message: /got 2\.5/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--max-n', '2.5'], exit: 2, stderr: /got "2\.5"/ },
  },
  {
    id: 'confidence-outside', title: 'a confidence level of 1.5', fileName: 'abra.txt', bytes: () => text(ANALYSIS_FILE), stage: 'analyze', reader: { format: 'chars' }, settings: { confidence: 1.5, maxN: 3 },
    expect: { outcome: 'refused', message: /confidence must be in \(0, 1\); got 1\.5/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--confidence', '1.5'], exit: 2, stderr: /--confidence must be a probability strictly between 0 and 1; got "1\.5"/ },
  },
  {
    id: 'confidence-negative', title: 'a negative confidence level', fileName: 'abra.txt', bytes: () => text(ANALYSIS_FILE), stage: 'analyze', reader: { format: 'chars' }, settings: { confidence: -0.5, maxN: 3 },
    expect: { outcome: 'refused', message: /got -0\.5/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--confidence', '-0.5'], exit: 2, stderr: /got "-0\.5"/ },
  },
  {
    id: 'interval-negative', title: 'a negative sampling interval', fileName: 'abra.txt', bytes: () => text(ANALYSIS_FILE), stage: 'analyze', reader: { format: 'chars' }, settings: { intervalSeconds: -1, maxN: 3 },
    expect: { outcome: 'refused', message: /intervalSeconds must be null or a positive finite number; got -1/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--interval', '-1'], exit: 2, stderr: /--interval must be a positive number of seconds per symbol; got "-1"/ },
  },
  {
    id: 'interval-nan', title: 'a sampling interval of NaN', fileName: 'abra.txt', bytes: () => text(ANALYSIS_FILE), stage: 'analyze', reader: { format: 'chars' }, settings: { intervalSeconds: Number.NaN, maxN: 3 },
    expect: { outcome: 'refused', message: /got NaN/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--interval', 'NaN'], exit: 2, stderr: /got "NaN"/ },
  },
  {
    id: 'interval-infinite', title: 'an infinite sampling interval', fileName: 'abra.txt', bytes: () => text(ANALYSIS_FILE), stage: 'analyze', reader: { format: 'chars' }, settings: { intervalSeconds: Number.POSITIVE_INFINITY, maxN: 3 },
    expect: { outcome: 'refused', message: /got Infinity/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--interval', 'Infinity'], exit: 2, stderr: /got "Infinity"/ },
  },
  {
    id: 'max-censored-one', title: 'a censored fraction of 1', fileName: 'abra.txt', bytes: () => text(ANALYSIS_FILE), stage: 'analyze', reader: { format: 'chars' }, settings: { maxCensoredFraction: 1, maxN: 3 },
    expect: { outcome: 'refused', message: /maxCensoredFraction must be in \[0, 1\); got 1/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--max-censored', '1'], exit: 2, stderr: /--max-censored must be a fraction strictly between 0 and 1; got "1"/ },
  },
  {
    id: 'max-censored-negative', title: 'a negative censored fraction', fileName: 'abra.txt', bytes: () => text(ANALYSIS_FILE), stage: 'analyze', reader: { format: 'chars' }, settings: { maxCensoredFraction: -0.1, maxN: 3 },
    expect: { outcome: 'refused', message: /got -0\.1/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--max-censored', '-0.1'], exit: 2, stderr: /got "-0\.1"/ },
  },
  // --- sessions (the page opens them; the command line has no session input) ---
  {
    id: 'session-newer-schema', title: 'a session file from a newer schema version', fileName: 'newer.returnrate-session.json', stage: 'session', reader: { format: 'chars' },
    bytes: () => text(sessionText().replace('"returnrate.session/1"', '"returnrate.session/7"')),
    expect: { outcome: 'refused', code: 'schema-version', message: /returnrate\.session\/7/, position: 'whole-input' }, browser: true,
  },
  {
    id: 'session-older-schema', title: 'a session file from an older schema version', fileName: 'older.returnrate-session.json', stage: 'session', reader: { format: 'chars' },
    bytes: () => text(sessionText().replace('"returnrate.session/1"', '"returnrate.session/0"')),
    expect: { outcome: 'refused', code: 'schema-version', message: /returnrate\.session\/0/, position: 'whole-input' },
  },
  {
    id: 'session-tampered-field', title: 'a session whose symbol count was edited into text', fileName: 'edited.returnrate-session.json', stage: 'session', reader: { format: 'chars' },
    bytes: () => text(sessionText().replace(/"symbols": \d+/, '"symbols": "many"')),
    expect: { outcome: 'refused', code: 'invalid-field', message: /the session is damaged: result\.input\.symbols should be/, position: 'whole-input' }, browser: true,
  },
  {
    // The page opens it; the command line once read it as JSON characters without a word.
    id: 'session-as-sequence', title: 'a workbench session file given to the command line as a sequence', fileName: 'chain.returnrate-session.json', stage: 'session', reader: { format: 'chars' },
    bytes: () => text(sessionText()),
    expect: { outcome: 'accepted' },
    cli: { args: ['analyze', 'FILE'], exit: 1, stderr: /: a workbench session file, not a sequence: open it in the workbench with Open session \(schema returnrate\.session\/1\)$/ },
  },
  {
    id: 'session-truncated', title: 'a session file cut off in the middle', fileName: 'cut.returnrate-session.json', stage: 'session', reader: { format: 'chars' },
    bytes: () => {
      const full = sessionText();
      return text(full.slice(0, full.indexOf('\n', 200)));
    },
    expect: { outcome: 'refused', code: 'not-json', message: /not valid JSON.*line \d+/, position: 'whole-input' },
  },
  ...NUMERIC_BAD_INPUTS,
];

/** The kinds in the workbench subset. */
export const BROWSER_BAD_INPUTS: readonly BadInput[] = BAD_INPUTS.filter((k) => k.browser === true);
