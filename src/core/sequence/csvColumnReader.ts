import { CodeUnitBuffer } from './codeUnitBuffer';
import { ReadError } from './readError';
import type { InputPosition } from './readError';
import type { ReaderOptions } from './sequenceReader';
import { TextReader } from './textReader';

// The tokenizer is our own: papaparse and csv-parse tie streaming to host stream APIs (File, Node
// streams) that src/core may not import, and we need exact line, column and byte positions.

const LF = 0x0a;
const CR = 0x0d;
const QUOTE = 0x22;
const COMMA = 0x2c;
const SEMICOLON = 0x3b;
const TAB = 0x09;
const SPACE = 0x20;

const FIELD_START = 0;
const UNQUOTED = 1;
const QUOTED = 2;
const AFTER_QUOTE = 3;

/**
 * Format 'csv': the cells of one column, each cell's trimmed text a symbol. Fields follow RFC 4180
 * (Shafranovich, 2005): a field in double quotes may hold delimiters, line breaks and doubled quotes
 * ("" for one "); records end at LF or CRLF. Leniencies: a quote inside an unquoted field is kept
 * as text; spaces, tabs and CR after a closing quote are ignored; lines holding only whitespace are
 * skipped (counted in details.blankLines). Empty cells are skipped with a warning
 * (details.emptyCells). details.rows counts data rows, details.delimiter is the delimiter's code point.
 */
export class CsvColumnReader extends TextReader {
  private delimiter: number;
  private readonly delimiterGiven: boolean;
  private readonly hasHeader: boolean;
  private readonly column: string | number | undefined;
  /** 0-based index of the column read; -1 until the header row (or first row) fixes it. */
  private target: number;
  private headers: string[] | null = null;
  private readonly cell = new CodeUnitBuffer();
  private state = FIELD_START;
  private fieldIndex = 0;
  private collecting: boolean;
  private rowHasContent = false;
  private rowStartLine = 1;
  private headerPending: boolean;
  private firstRowPending = true;
  private quoteLine = 0;
  private quoteColumn = 0;
  private quoteByte = 0;
  private rows = 0;
  private emptyCells = 0;
  private firstEmptyLine = 0;
  /** Quotes inside unquoted cells of the read column (kept as text, RFC 4180 does not allow them). */
  private strayQuotes = 0;
  private firstStrayQuote: InputPosition = {};
  private blankLines = 0;
  private scanPos = 0;
  private scanInQuotes = false;
  /** Subclasses that report positions per cell set this; the base class then records where each cell of the column starts. */
  protected readonly trackCellStart: boolean = false;
  /** Line, column (code points, 1-based) and byte (0-based) where the current cell of the column starts (when tracked). */
  protected cellLine = 0;
  protected cellColumn = 0;
  protected cellByte = 0;

  constructor(options: ReaderOptions) {
    // A non-empty cell takes one byte and needs a delimiter or line break after it.
    super(options, 2);
    this.hasHeader = options.hasHeader ?? true;
    this.column = options.column;
    this.delimiterGiven = options.delimiter !== undefined;
    this.delimiter = options.delimiter === undefined ? COMMA : checkDelimiter(options.delimiter);
    const column = options.column;
    if (typeof column === 'number' && !(Number.isInteger(column) && column >= 0)) {
      throw new ReadError('bad-option', `column index must be an integer >= 0 (0-based), got ${column}`);
    }
    if (typeof column === 'string' && !this.hasHeader) {
      throw new ReadError('bad-option', `column '${column}' is a header name, but hasHeader is false; give a 0-based index`);
    }
    this.headerPending = this.hasHeader;
    // Without a header and a given column the first row decides; reading column 0 meanwhile is
    // right whenever the file turns out to have one column.
    this.target = this.hasHeader ? -1 : typeof column === 'number' ? column : 0;
    this.collecting = this.headerPending || this.target === 0;
  }

  protected override prefixReady(bytes: Uint8Array, length: number): boolean {
    if (this.delimiterGiven) return true;
    let inQuotes = this.scanInQuotes;
    for (let i = this.scanPos; i < length; i++) {
      const b = bytes[i];
      if (b === QUOTE) inQuotes = !inQuotes;
      else if (b === LF && !inQuotes) return true;
    }
    this.scanPos = length;
    this.scanInQuotes = inQuotes;
    return false;
  }

  /** Picks the delimiter from the first line: the most frequent of , ; TAB outside quotes. */
  protected override onPrefix(bytes: Uint8Array): void {
    if (this.delimiterGiven) {
      this.details['delimiter'] = this.delimiter;
      return;
    }
    let commas = 0;
    let semicolons = 0;
    let tabs = 0;
    let inQuotes = false;
    for (let i = 0; i < bytes.length; i++) {
      const b = bytes[i];
      if (b === QUOTE) inQuotes = !inQuotes;
      else if (inQuotes) continue;
      else if (b === LF) break;
      else if (b === COMMA) commas++;
      else if (b === SEMICOLON) semicolons++;
      else if (b === TAB) tabs++;
    }
    this.delimiter = commas >= semicolons && commas >= tabs ? COMMA : semicolons >= tabs ? SEMICOLON : TAB;
    this.details['delimiter'] = this.delimiter;
  }

  protected consume(cps: Int32Array, n: number): void {
    const delimiter = this.delimiter;
    const cell = this.cell;
    const base = this.cpBase;
    for (let k = 0; k < n; k++) {
      const cp = cps[k];
      let state = this.state;
      if (state === FIELD_START) {
        if (this.trackCellStart && this.collecting) {
          this.cellLine = this.line;
          this.cellColumn = base + k - this.lineStartCp + 1;
          this.cellByte = this.byteOffsetAt(k);
        }
        if (cp === QUOTE) {
          this.state = QUOTED;
          this.rowHasContent = true;
          this.quoteLine = this.line;
          this.quoteColumn = base + k - this.lineStartCp + 1;
          this.quoteByte = this.byteOffsetAt(k);
          continue;
        }
        state = this.state = UNQUOTED;
      }
      if (state === UNQUOTED) {
        if (cp === delimiter) {
          this.rowHasContent = true;
          this.endField();
        } else if (cp === LF) {
          this.endLine(base + k);
        } else {
          if (cp > SPACE) this.rowHasContent = true;
          if (this.collecting) {
            if (cp === QUOTE && this.strayQuotes++ === 0) this.firstStrayQuote = this.positionAt(k, this.line, this.lineStartCp);
            cell.pushCodePoint(cp);
          }
        }
      } else if (state === QUOTED) {
        if (cp === QUOTE) {
          this.state = AFTER_QUOTE;
          continue;
        }
        if (cp === LF) this.newLine(base + k);
        if (this.collecting) cell.pushCodePoint(cp);
      } else if (cp === QUOTE) {
        if (this.collecting) cell.pushCodePoint(QUOTE);
        this.state = QUOTED;
      } else if (cp === delimiter) {
        this.endField();
      } else if (cp === LF) {
        this.endLine(base + k);
      } else if (cp !== CR && cp !== SPACE && cp !== TAB) {
        throw new ReadError('bad-csv', 'a quoted field must end at a delimiter or a line end; write a quote inside quotes as ""', this.positionAt(k, this.line, this.lineStartCp));
      }
    }
  }

  protected endOfText(): void {
    if (this.state === QUOTED) {
      throw new ReadError('unterminated-quote', 'the quote opened here is never closed', {
        line: this.quoteLine,
        column: this.quoteColumn,
        byte: this.quoteByte,
      });
    }
    if (this.fieldIndex > 0 || this.rowHasContent) {
      this.endField();
      this.endRow();
    } else if (this.state !== FIELD_START) {
      this.blankLines++;
    }
    this.details['rows'] = this.rows;
    this.details['emptyCells'] = this.emptyCells;
    this.details['blankLines'] = this.blankLines;
    if (this.strayQuotes > 0) {
      const { line, column } = this.firstStrayQuote;
      this.warnings.push({
        code: 'csv-stray-quote',
        message: `kept ${this.strayQuotes} quote${this.strayQuotes === 1 ? '' : 's'} inside unquoted cells as text (first at line ${line}, column ${column}); quote the whole cell and double inner quotes if that is not meant`,
      });
    }
    if (this.emptyCells > 0) {
      this.warnings.push({
        code: 'csv-empty-cells',
        message: `skipped ${this.emptyCells} empty cell${this.emptyCells === 1 ? '' : 's'} in column ${this.columnLabel()} (first at line ${this.firstEmptyLine})`,
      });
    }
  }

  protected override emptyReason(): string {
    if (this.rows > 0) return `column ${this.columnLabel()} has no non-empty cells`;
    return this.hasHeader && !this.headerPending ? 'no rows after the header' : '';
  }

  /** A line feed outside quotes: ends the row, or skips a blank line. */
  private endLine(lfIndex: number): void {
    if (this.fieldIndex === 0 && !this.rowHasContent) {
      this.blankLines++;
      this.cell.clear();
    } else {
      this.endField();
      this.endRow();
    }
    this.newLine(lfIndex);
    this.rowStartLine = this.line;
    this.state = FIELD_START;
  }

  private newLine(lfIndex: number): void {
    this.line++;
    this.lineStartCp = this.cpBase + lfIndex + 1;
  }

  private endField(): void {
    if (this.headerPending) {
      (this.headers ??= []).push(this.cell.text().trim());
    } else if (this.fieldIndex === this.target) {
      this.takeCell();
    }
    this.cell.clear();
    this.fieldIndex++;
    this.collecting = this.headerPending || this.fieldIndex === this.target;
    this.state = FIELD_START;
  }

  private takeCell(): void {
    this.takeCellText(this.cell.text().trim());
  }

  /** One cell of the column, trimmed: a symbol, or an empty cell skipped. Subclasses may read cells otherwise. */
  protected takeCellText(text: string): void {
    if (text === '') {
      if (this.emptyCells++ === 0) this.firstEmptyLine = this.rowStartLine;
      return;
    }
    this.symbols.push(this.table.intern(text));
  }

  private endRow(): void {
    const fields = this.fieldIndex;
    if (this.headerPending) {
      this.headerPending = false;
      this.target = this.resolveColumn(this.headers ?? []);
    } else {
      if (this.firstRowPending && !this.hasHeader && this.column === undefined && fields > 1) {
        throw new ReadError('missing-column', `the rows have ${fields} fields; choose a column by 0-based index (--column)`, { line: this.rowStartLine });
      }
      if (fields <= this.target) {
        throw new ReadError('short-row', `the row has ${fields} field${fields === 1 ? '' : 's'}, too few for column ${this.columnLabel()}`, { line: this.rowStartLine });
      }
      this.firstRowPending = false;
      this.rows++;
    }
    this.fieldIndex = 0;
    this.rowHasContent = false;
    this.collecting = this.target === 0;
  }

  private resolveColumn(headers: string[]): number {
    const column = this.column;
    const available = headers.map((h) => `'${h}'`).join(', ');
    const where = { line: this.rowStartLine };
    if (typeof column === 'string') {
      const index = headers.indexOf(column.trim());
      if (index < 0) throw new ReadError('missing-column', `no column '${column}'; the header has ${available}`, where);
      return index;
    }
    if (typeof column === 'number') {
      if (column >= headers.length) {
        throw new ReadError('missing-column', `column index ${column} (0-based) is past the last column; the header has ${headers.length}: ${available}`, where);
      }
      return column;
    }
    if (headers.length !== 1) {
      throw new ReadError('missing-column', `choose a column by header name or 0-based index (--column); the header has ${available}`, where);
    }
    return 0;
  }

  private columnLabel(): string {
    return typeof this.column === 'string' ? `'${this.column}'` : `${this.target} (0-based)`;
  }
}

function checkDelimiter(delimiter: string): number {
  const cp = delimiter.codePointAt(0);
  if (cp === undefined || String.fromCodePoint(cp) !== delimiter || cp === QUOTE || cp === LF || cp === CR) {
    throw new ReadError('bad-option', `delimiter must be one character other than a quote or a line break, got '${delimiter}'`);
  }
  return cp;
}
