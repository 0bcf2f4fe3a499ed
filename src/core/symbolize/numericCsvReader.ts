import { CsvColumnReader } from '../sequence/csvColumnReader';
import type { ReaderOptions } from '../sequence/sequenceReader';
import { numericCellKind } from './numericCell';
import { numericCellError } from './numericCellError';
import type { NumericReadResult } from './numericReadResult';
import { SeriesCollector } from './seriesCollector';

/**
 * Format 'csv' read as numbers: the CSV tokenizer and column choice of CsvColumnReader, with each
 * cell of the column parsed as a decimal number. Empty cells, 'NaN' and 'NA' are missing values
 * (handled by the missing policy, never skipped silently); other text is a ReadError 'bad-number'
 * at the cell's line, column and byte.
 */
export class NumericCsvReader extends CsvColumnReader {
  protected override readonly trackCellStart = true;
  private readonly collector: SeriesCollector;

  constructor(options: ReaderOptions) {
    const { sizeHint, ...rest } = options;
    super(rest);
    this.collector = new SeriesCollector(options.missing ?? 'skip', sizeHint === undefined ? undefined : Math.ceil(sizeHint / 2));
  }

  /** Ends the input and returns the series (use this, not finish(), which expects symbols). */
  finishSeries(): NumericReadResult {
    this.end();
    return { series: this.collector.finish(), warnings: this.warnings, bytesRead: this.bytesRead, details: this.details };
  }

  protected override takeCellText(text: string): void {
    const kind = numericCellKind(text);
    if (kind === 'number') this.collector.value(Number(text), this.cellLine);
    else if (kind === 'missing') this.collector.missingValue(this.cellLine);
    else throw numericCellError(kind, text, { line: this.cellLine, column: this.cellColumn, byte: this.cellByte }, this.collector.untouched);
  }
}
