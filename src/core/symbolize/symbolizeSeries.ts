import { ReadError } from '../sequence/readError';
import { allocateSymbols } from '../sequence/sequence';
import type { Sequence } from '../sequence/sequence';
import type { FastaRecord } from '../sequence/sequenceReader';
import { quantileLabels, thresholdLabels } from './cellLabels';
import { cellsByCuts } from './cellsByCuts';
import { ordinalLabel, ordinalPatternCount, ordinalPatterns } from './ordinalPatterns';
import { quantileCuts } from './quantileCuts';
import type { NumericSeries } from './seriesCollector';
import type { SymbolizationRecord } from './symbolizationRecord';
import { formatSymbolizeSpec } from './symbolizeSpec';
import type { SymbolizeSpec } from './symbolizeSpec';

/** Ordinal orders up to this list every pattern (seen or not) in the record, so forbidden ones show as 0. */
const ORDINAL_ALL_LISTED = 5;

export interface SymbolizedSeries {
  /**
   * The symbols. The alphabet holds only the cells (patterns) that occur, in cell order (lowest
   * values first; patterns in lexicographic order) rather than in order of first appearance.
   */
  readonly sequence: Sequence;
  /** The segments in symbol positions (FASTA-record shape): analyse them apart so no block crosses a cut. */
  readonly records: FastaRecord[];
  readonly record: SymbolizationRecord;
  /** Cut points (quantile, threshold), empty for ordinal. */
  readonly cutPoints: Float64Array;
  /** Every cell (every pattern for ordinal) with its count. */
  readonly cellLabels: readonly string[];
  readonly cellCounts: Float64Array;
}

/**
 * Turns a real-valued series into symbols: quantile or threshold cells value by value, or ordinal
 * patterns window by window inside each segment (no window spans a cut of the 'split' policy).
 * @throws ReadError 'too-short' when no segment is long enough for one ordinal pattern
 */
export function symbolizeSeries(series: NumericSeries, spec: SymbolizeSpec): SymbolizedSeries {
  const { values, segments } = series;
  let codes: Int32Array;
  let records: FastaRecord[];
  let cutPoints: Float64Array = new Float64Array(0);
  let cellCount: number;
  let labelOf: (cell: number) => string;
  let segmentsDropped = 0;
  if (spec.kind === 'ordinal') {
    const span = (spec.order - 1) * spec.delay;
    const total = segments.reduce((sum, s) => sum + Math.max(0, s.length - span), 0);
    codes = new Int32Array(total);
    records = [];
    let at = 0;
    for (const segment of segments) {
      const patterns = ordinalPatterns(values.subarray(segment.start, segment.start + segment.length), spec.order, spec.delay);
      if (patterns.length === 0) {
        segmentsDropped++;
        continue;
      }
      codes.set(patterns, at);
      records.push({ name: segment.name, start: at, length: patterns.length });
      at += patterns.length;
    }
    if (total === 0) {
      const need = `one ordinal pattern of order ${spec.order} with delay ${spec.delay} needs ${span + 1} values`;
      const longest = segments.reduce((m, s) => Math.max(m, s.length), 0);
      throw new ReadError(
        'too-short',
        segments.length === 1 ? `the series holds ${longest} value${longest === 1 ? '' : 's'}, but ${need}` : `the longest of the ${segments.length} segments between missing values holds ${longest} value${longest === 1 ? '' : 's'}, but ${need}`,
      );
    }
    cellCount = ordinalPatternCount(spec.order);
    labelOf = (cell) => ordinalLabel(cell, spec.order);
  } else {
    cutPoints = spec.kind === 'quantile' ? quantileCuts(values, spec.cells) : Float64Array.from(spec.cuts);
    codes = cellsByCuts(values, cutPoints);
    records = segments.map((s) => ({ ...s }));
    cellCount = cutPoints.length + 1;
    const labels = spec.kind === 'quantile' ? quantileLabels(spec.cells) : thresholdLabels(spec.cuts);
    labelOf = (cell) => labels[cell];
  }

  const cellCounts = new Float64Array(cellCount);
  for (let i = 0; i < codes.length; i++) cellCounts[codes[i]]++;
  // Symbol ids for the cells that occur, in cell order.
  const idOfCell = new Int32Array(cellCount).fill(-1);
  const alphabet: string[] = [];
  for (let c = 0; c < cellCount; c++) {
    if (cellCounts[c] > 0) {
      idOfCell[c] = alphabet.length;
      alphabet.push(labelOf(c));
    }
  }
  const symbols = allocateSymbols(codes.length, alphabet.length);
  const counts = new Float64Array(alphabet.length);
  for (let i = 0; i < codes.length; i++) {
    const id = idOfCell[codes[i]];
    symbols[i] = id;
    counts[id]++;
  }

  const listAll = spec.kind !== 'ordinal' || spec.order <= ORDINAL_ALL_LISTED;
  const cellLabels: string[] = [];
  const listedCounts: number[] = [];
  for (let c = 0; c < cellCount; c++) {
    if (listAll || cellCounts[c] > 0) {
      cellLabels.push(labelOf(c));
      listedCounts.push(cellCounts[c]);
    }
  }
  const record: SymbolizationRecord = {
    spec: formatSymbolizeSpec(spec),
    cutPoints: Array.from(cutPoints),
    cells: cellLabels.map((label, i) => ({ label, count: listedCounts[i] })),
    values: values.length,
    missing: series.missing,
    missingPolicy: series.missingPolicy,
    segments: records.length,
    segmentsDropped,
  };
  return { sequence: { symbols, alphabet, counts }, records, record, cutPoints, cellLabels, cellCounts: Float64Array.from(listedCounts) };
}
