import { ReadError } from '../sequence/readError';
import type { ReaderOptions } from '../sequence/sequenceReader';
import type { NumericReadResult } from './numericReadResult';
import { NumberLinesReader } from './numberLinesReader';
import { NumericCsvReader } from './numericCsvReader';

/** A streaming reader of a real-valued series: push chunks split anywhere, then finish() once. */
export interface NumericSeriesReader {
  push(chunk: Uint8Array): void;
  finish(): NumericReadResult;
}

/**
 * A numeric reader for format 'numbers' (one number per line) or 'csv' (one column of numbers),
 * with options.missing ('skip' by default) for empty cells, 'NaN' and 'NA'.
 * @throws ReadError 'bad-option' for another format
 */
export function createNumericReader(options: ReaderOptions): NumericSeriesReader {
  if (options.missing !== undefined && options.missing !== 'skip' && options.missing !== 'split') {
    throw new ReadError('bad-option', `missing must be 'skip' or 'split', got '${String(options.missing)}'`);
  }
  let inner: NumberLinesReader | NumericCsvReader;
  if (options.format === 'numbers') inner = new NumberLinesReader(options);
  else if (options.format === 'csv') inner = new NumericCsvReader(options);
  else throw new ReadError('bad-option', `a real-valued series is read from format 'numbers' or 'csv', not '${options.format}'`);
  let state: 'open' | 'failed' | 'finished' = 'open';
  let failure: unknown;
  const fail = (e: unknown): never => {
    state = 'failed';
    failure = e;
    throw e;
  };
  const check = (call: string): void => {
    if (state === 'failed') throw failure;
    if (state === 'finished') throw new Error(`NumericSeriesReader.${call}() after finish()`);
  };
  return {
    push(chunk) {
      check('push');
      try {
        inner.push(chunk);
      } catch (e) {
        fail(e);
      }
    },
    finish() {
      check('finish');
      try {
        const result = inner.finishSeries();
        state = 'finished';
        return result;
      } catch (e) {
        return fail(e);
      }
    },
  };
}

/** Reads a whole numeric input held in memory. */
export function readNumericSeries(bytes: Uint8Array, options: ReaderOptions): NumericReadResult {
  const reader = createNumericReader(options);
  reader.push(bytes);
  return reader.finish();
}
