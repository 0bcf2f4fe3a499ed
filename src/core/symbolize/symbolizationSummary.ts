import { downsampleMinMax, type DownsampledSeries } from './downsampleMinMax';
import type { NumericSeries } from './seriesCollector';
import { symbolizeSeries } from './symbolizeSeries';
import type { SymbolizationRecord } from './symbolizationRecord';
import type { SymbolizeSpec } from './symbolizeSpec';
import { valueHistogram, type ValueHistogram } from './valueHistogram';

/** What the page shows about a symbolization before running: the series, its histogram, the cuts, the cells. */
export interface SymbolizationSummary {
  readonly record: SymbolizationRecord;
  readonly histogram: ValueHistogram;
  readonly series: DownsampledSeries;
  /** Every cell (pattern) with its count, in symbol order. */
  readonly cells: readonly { readonly label: string; readonly count: number }[];
  /** Value index where each segment starts (after the first), for marking the cuts of 'split'. */
  readonly segmentStarts: readonly number[];
}

export interface SummaryOptions {
  /** Buckets of the downsampled series (about one per pixel). Default 600. */
  readonly buckets?: number;
  /** Histogram bins. Default: sqrt(N) rounded up, from 10 to 60 (common practice, no source). */
  readonly bins?: number;
}

/**
 * The preview of a symbolization: symbolizes the series (so the cut points and counts are the ones
 * a run on these values would use), bins the values and downsamples the series for drawing.
 */
export function symbolizationSummary(series: NumericSeries, spec: SymbolizeSpec, options: SummaryOptions = {}): SymbolizationSummary {
  const N = series.values.length;
  const symbolized = symbolizeSeries(series, spec);
  const bins = options.bins ?? Math.min(60, Math.max(10, Math.ceil(Math.sqrt(N))));
  return {
    record: symbolized.record,
    histogram: valueHistogram(series.values, bins),
    series: downsampleMinMax(series.values, options.buckets ?? 600),
    cells: symbolized.record.cells,
    segmentStarts: series.segments.slice(1).map((s) => s.start),
  };
}
