import { ReadError } from '../sequence/readError';
import type { ReadResult, ReaderOptions, SequenceReader } from '../sequence/sequenceReader';
import { MISSING_POLICIES } from './missingPolicy';
import { createNumericReader } from './numericSeriesReader';
import { symbolizationWarning } from './symbolizationWarning';
import { symbolizeSeries } from './symbolizeSeries';
import type { SymbolizeSpec } from './symbolizeSpec';

/**
 * A SequenceReader for real-valued input: reads the numbers (format 'numbers' or 'csv'), then
 * symbolizes them with options.symbolize, so the analysis takes the result like any other input.
 * The result carries `symbolization`; under missing 'split' it carries the segments as `records`
 * (the shape of FASTA records), to be analysed apart.
 */
export function createSymbolizingReader(options: ReaderOptions & { symbolize: SymbolizeSpec }): SequenceReader {
  const { missing } = options;
  if (missing !== undefined && !MISSING_POLICIES.includes(missing)) {
    throw new ReadError('bad-option', `the missing-value policy must be ${MISSING_POLICIES.map((p) => `'${p}'`).join(' or ')}; got '${String(missing)}'`);
  }
  const numeric = createNumericReader(options);
  let lineFeeds = 0;
  let lastByte = -1;
  return {
    push(chunk) {
      numeric.push(chunk);
      for (let i = 0; i < chunk.length; i++) if (chunk[i] === 0x0a) lineFeeds++;
      if (chunk.length > 0) lastByte = chunk[chunk.length - 1];
    },
    finish(): ReadResult {
      const read = numeric.finish();
      const symbolized = symbolizeSeries(read.series, options.symbolize);
      const { series } = read;
      const warnings = [...read.warnings];
      if (series.missing > 0) {
        // The segments as cut, before any too short for an ordinal pattern are left out.
        const cut = series.segments.length;
        const what = series.missingPolicy === 'skip' ? 'dropped them and joined the values around them' : `cut the series into ${cut} segment${cut === 1 ? '' : 's'} there`;
        warnings.push({ code: 'missing-values', message: `${series.missing} missing value${series.missing === 1 ? '' : 's'} (first at line ${series.firstMissingLine}): ${what}` });
      }
      if (symbolized.record.segmentsDropped > 0) {
        const dropped = symbolized.record.segmentsDropped;
        const spec = options.symbolize;
        const need = spec.kind === 'ordinal' ? `one ordinal pattern of order ${spec.order} with delay ${spec.delay} needs ${(spec.order - 1) * spec.delay + 1} values` : 'too short';
        warnings.push({ code: 'short-segments', message: `left out ${dropped} of the ${series.segments.length} segments as too short: ${need}` });
      }
      const flat = symbolizationWarning(series.values, options.symbolize, symbolized.sequence.alphabet);
      if (flat !== null) warnings.push(flat);
      if (options.maxSymbols !== undefined && symbolized.sequence.symbols.length > options.maxSymbols) {
        throw new ReadError('too-many-symbols', `the series gives ${symbolized.sequence.symbols.length} symbols, more than the limit of ${options.maxSymbols}`);
      }
      const result: ReadResult = {
        sequence: symbolized.sequence,
        warnings,
        bytesRead: read.bytesRead,
        lines: read.bytesRead === 0 ? 0 : lineFeeds + (lastByte === 0x0a ? 0 : 1),
        details: { ...read.details, values: series.values.length, missing: series.missing },
        symbolization: symbolized.record,
      };
      if (series.missingPolicy === 'split') result.records = symbolized.records;
      return result;
    },
  };
}
