import { ReadError } from '../../../src/core/sequence/readError';
import { createReader } from '../../../src/core/sequence/sequenceReader';
import type { ReaderOptions, ReadResult } from '../../../src/core/sequence/sequenceReader';

/** UTF-8 bytes of a string (Node's encoder, an independent implementation). */
export function utf8(text: string): Uint8Array {
  return new TextEncoder().encode(text);
}

/** Reads `bytes` pushed in the pieces between the given cut positions (any order, duplicates ok). */
export function readSplit(bytes: Uint8Array, options: ReaderOptions, cuts: readonly number[]): ReadResult {
  const reader = createReader(options);
  const points = [...new Set(cuts.map((c) => c % (bytes.length + 1)))].sort((a, b) => a - b);
  let start = 0;
  for (const p of points) {
    reader.push(bytes.subarray(start, p));
    start = p;
  }
  reader.push(bytes.subarray(start));
  return reader.finish();
}

/** Everything a reader reports, as plain data, or the error's code and message (which holds the position). */
export function outcome(read: () => ReadResult): unknown {
  try {
    const r = read();
    return {
      type: r.sequence.symbols.constructor.name,
      // joined into one string: deep equality over thousands of array elements is slow in vitest
      symbols: r.sequence.symbols.join(','),
      alphabet: r.sequence.alphabet,
      counts: Array.from(r.sequence.counts),
      records: r.records,
      warnings: r.warnings,
      bytesRead: r.bytesRead,
      lines: r.lines,
      details: r.details,
    };
  } catch (e) {
    if (e instanceof ReadError) return { code: e.code, message: e.message, position: e.position };
    throw e;
  }
}

/** The ReadError a read throws (fails the test when it throws nothing or something else). */
export function readError(read: () => unknown): ReadError {
  try {
    read();
  } catch (e) {
    if (e instanceof ReadError) return e;
    throw e;
  }
  throw new Error('expected a ReadError, but the read succeeded');
}

/** Labels of the symbols in order, for compact expectations. */
export function labels(r: ReadResult): string[] {
  return Array.from(r.sequence.symbols, (id) => r.sequence.alphabet[id] as string);
}
