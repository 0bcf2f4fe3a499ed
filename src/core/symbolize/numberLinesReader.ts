import { CodeUnitBuffer } from '../sequence/codeUnitBuffer';
import type { ReaderOptions } from '../sequence/sequenceReader';
import { TextReader } from '../sequence/textReader';
import { WHITESPACE_CLASS, WS_LF, WS_NONE, WS_TABLE_SIZE } from '../sequence/whitespace';
import { numericCellKind } from './numericCell';
import { numericCellError } from './numericCellError';
import type { NumericReadResult } from './numericReadResult';
import { SeriesCollector } from './seriesCollector';

/**
 * Format 'numbers': one decimal number per line (surrounding whitespace ignored). A line that is
 * empty or holds only whitespace, 'NaN' or 'NA' is a missing value; text after the last line feed
 * counts as a line only when it is not blank. Anything else is a ReadError 'bad-number' at the
 * line, column and byte where the line's text starts.
 */
export class NumberLinesReader extends TextReader {
  private readonly text = new CodeUnitBuffer();
  private textColumn = 0;
  private textByte = 0;
  private readonly collector: SeriesCollector;

  constructor(options: ReaderOptions) {
    // The symbol array of the base class stays unused: ask for no preallocation.
    super({ format: options.format }, 2);
    const hint = options.sizeHint;
    this.collector = new SeriesCollector(options.missing ?? 'skip', hint === undefined ? undefined : Math.ceil(hint / 2));
  }

  /** Ends the input and returns the series (use this, not finish(), which expects symbols). */
  finishSeries(): NumericReadResult {
    this.end();
    return { series: this.collector.finish(), warnings: this.warnings, bytesRead: this.bytesRead, details: this.details };
  }

  protected consume(cps: Int32Array, n: number): void {
    const text = this.text;
    const base = this.cpBase;
    for (let k = 0; k < n; k++) {
      const cp = cps[k];
      const ws = cp < WS_TABLE_SIZE ? WHITESPACE_CLASS[cp] : WS_NONE;
      if (ws === WS_LF) {
        this.endLine();
        this.line++;
        this.lineStartCp = base + k + 1;
        continue;
      }
      if (text.length === 0) {
        if (ws !== WS_NONE) continue;
        this.textColumn = base + k - this.lineStartCp + 1;
        this.textByte = this.byteOffsetAt(k);
      }
      text.pushCodePoint(cp);
    }
  }

  protected endOfText(): void {
    if (this.text.length > 0) this.endLine();
  }

  private endLine(): void {
    const text = this.text.length === 0 ? '' : this.text.text().trim();
    this.text.clear();
    const kind = numericCellKind(text);
    if (kind === 'number') this.collector.value(Number(text), this.line);
    else if (kind === 'missing') this.collector.missingValue(this.line);
    else throw numericCellError(kind, text, { line: this.line, column: this.textColumn, byte: this.textByte }, this.collector.untouched);
  }
}
