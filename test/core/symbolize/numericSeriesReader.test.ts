import { describe, expect, it } from 'vitest';
import { ReadError } from '../../../src/core/sequence/readError';
import { readAll } from '../../../src/core/sequence/sequenceReader';
import { numericCellKind } from '../../../src/core/symbolize/numericCell';
import { createNumericReader, readNumericSeries } from '../../../src/core/symbolize/numericSeriesReader';
import type { ReaderOptions } from '../../../src/core/sequence/sequenceReader';

const utf8 = (text: string): Uint8Array => new TextEncoder().encode(text);

function errorOf(f: () => unknown): ReadError {
  try {
    f();
  } catch (e) {
    if (e instanceof ReadError) return e;
    throw e;
  }
  throw new Error('no error');
}

describe('numericCellKind', () => {
  it('tells numbers, missing values, infinities and other text apart', () => {
    expect(['1', '-0.5', '+.5', '3e-4', '1E3', '7.'].map(numericCellKind)).toEqual(Array(6).fill('number'));
    expect(['', 'NaN', 'nan', 'NA', 'na'].map(numericCellKind)).toEqual(Array(5).fill('missing'));
    expect(['inf', '-Infinity', '1e400'].map(numericCellKind)).toEqual(Array(3).fill('infinite'));
    expect(['0x10', 'abc', '1,5', '1 2', '--1'].map(numericCellKind)).toEqual(Array(5).fill('not-a-number'));
  });
});

describe('numeric readers', () => {
  const numbers: ReaderOptions = { format: 'numbers' };

  it('reads one number per line whatever the chunking', () => {
    const bytes = utf8(' 1.5\r\n-2\n3e1\n');
    const whole = readNumericSeries(bytes, numbers).series;
    expect(Array.from(whole.values)).toEqual([1.5, -2, 30]);
    for (let cut = 0; cut <= bytes.length; cut++) {
      const r = createNumericReader(numbers);
      r.push(bytes.subarray(0, cut));
      r.push(bytes.subarray(cut));
      expect(Array.from(r.finish().series.values)).toEqual([1.5, -2, 30]);
    }
  });

  it('names line, column and byte of a line that is not a number', () => {
    const e = errorOf(() => readNumericSeries(utf8('1\n2\n  x7\n'), numbers));
    expect(e.code).toBe('bad-number');
    expect(e.position).toEqual({ line: 3, column: 3, byte: 6 });
    expect(e.message).toMatch(/^line 3, column 3, byte 6: 'x7' is not a number/);
  });

  it('refuses an infinity with its position', () => {
    const e = errorOf(() => readNumericSeries(utf8('1\n-inf\n'), numbers));
    expect(e.position).toEqual({ line: 2, column: 1, byte: 2 });
    expect(e.message).toMatch(/infinite/);
  });

  it('skip drops missing values and counts them', () => {
    const s = readNumericSeries(utf8('1\n\nNaN\n2\nNA\n3\n'), { ...numbers, missing: 'skip' }).series;
    expect(Array.from(s.values)).toEqual([1, 2, 3]);
    expect(s.missing).toBe(3);
    expect(s.firstMissingLine).toBe(2);
    expect(s.segments).toEqual([{ name: 'series', start: 0, length: 3 }]);
  });

  it('split cuts the series at each run of missing values', () => {
    const s = readNumericSeries(utf8('NA\n1\n2\n\nNaN\n3\nNA\n'), { ...numbers, missing: 'split' }).series;
    expect(Array.from(s.values)).toEqual([1, 2, 3]);
    expect(s.segments).toEqual([
      { name: 'segment 1 (from line 2)', start: 0, length: 2 },
      { name: 'segment 2 (from line 6)', start: 2, length: 1 },
    ]);
    expect(s.missing).toBe(4);
  });

  it('reads a CSV column of numbers by header name, with cell positions in errors', () => {
    const csv = 'time,level\n0,1.25\n1,\n2,NA\n3,2.5\n4,"3"\n';
    const s = readNumericSeries(utf8(csv), { format: 'csv', column: 'level', missing: 'split' }).series;
    expect(Array.from(s.values)).toEqual([1.25, 2.5, 3]);
    expect(s.missing).toBe(2);
    expect(s.segments.map((x) => [x.start, x.length])).toEqual([[0, 1], [1, 2]]);
    const e = errorOf(() => readNumericSeries(utf8('time,level\n0,1\n1,  low\n'), { format: 'csv', column: 'level' }));
    expect(e.code).toBe('bad-number');
    expect(e.position).toEqual({ line: 3, column: 3, byte: 17 });
  });

  it('says when there are no numbers at all', () => {
    expect(errorOf(() => readNumericSeries(utf8('NA\n\n'), numbers)).message).toMatch(/no numbers \(2 missing values\)/);
  });
});

describe('createReader with symbolize', () => {
  it('symbolizes numbers into a sequence with the symbolization record', () => {
    const read = readAll(utf8('4\n7\n9\n10\n6\n11\n3\n'), { format: 'numbers', symbolize: { kind: 'ordinal', order: 3, delay: 1 } });
    expect(read.sequence.alphabet).toEqual(['012', '102', '201']);
    expect(Array.from(read.sequence.counts)).toEqual([2, 1, 2]);
    expect(read.symbolization?.spec).toBe('ordinal:3:1');
    expect(read.symbolization?.cells.find((c) => c.label === '210')?.count).toBe(0);
    expect(read.lines).toBe(7);
    expect(read.records).toBeUndefined();
  });

  it('split gives the segments as records and a warning about the missing values', () => {
    const read = readAll(utf8('1\n2\n3\nNA\n4\n5\n'), { format: 'numbers', missing: 'split', symbolize: { kind: 'threshold', cuts: [3] } });
    expect(read.records?.map((r) => [r.start, r.length])).toEqual([[0, 3], [3, 2]]);
    expect(read.warnings.map((w) => w.code)).toEqual(['missing-values']);
    expect(read.symbolization).toMatchObject({ missing: 1, missingPolicy: 'split', segments: 2, cutPoints: [3] });
  });

  it('refuses numbers without a symbolization and a symbolization of a non-numeric format', () => {
    expect(errorOf(() => readAll(utf8('1\n'), { format: 'numbers' })).code).toBe('bad-option');
    expect(errorOf(() => readAll(utf8('1\n'), { format: 'tokens', symbolize: { kind: 'quantile', cells: 2 } })).message).toMatch(/format 'numbers'/);
  });
});
