import type { ReadWarning } from '../sequence/sequenceReader';
import type { NumericSeries } from './seriesCollector';

/** What a numeric reader returns: the series and the reader's facts about the input. */
export interface NumericReadResult {
  readonly series: NumericSeries;
  readonly warnings: ReadWarning[];
  readonly bytesRead: number;
  /** csv: 'rows', 'blankLines', 'delimiter'; numbers: nothing yet. */
  readonly details: Record<string, number>;
}
