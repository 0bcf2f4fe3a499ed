import { describe, expect, it } from 'vitest';
import { readAll } from '../../../src/core/sequence/sequenceReader';
import type { ReaderOptions } from '../../../src/core/sequence/sequenceReader';
import { labels, outcome, readError, readSplit, utf8 } from './readerHarness';

const csv = (text: string, options: Omit<ReaderOptions, 'format'> = {}) => readAll(utf8(text), { format: 'csv', ...options });

describe('csv column reader', () => {
  it('reads one column by header name, each trimmed cell a symbol', () => {
    const r = csv('t,state,x\n1, up ,a\n2,down,b\n3,up,c\n', { column: 'state' });
    expect(labels(r)).toEqual(['up', 'down', 'up']);
    expect(Array.from(r.sequence.symbols)).toEqual([0, 1, 0]); // by hand
    expect(r.details).toEqual({ delimiter: 0x2c, rows: 3, emptyCells: 0, blankLines: 0 });
    expect(r.lines).toBe(4);
  });

  it('reads a column by 0-based index', () => {
    expect(labels(csv('a,b\n1,2\n3,4', { column: 1 }))).toEqual(['2', '4']);
  });

  it('follows RFC 4180 quoting: delimiters, line breaks and doubled quotes inside quotes', () => {
    // RFC 4180 (Shafranovich, 2005), section 2, rules 5-7; CRLF line ends (rule 1).
    const r = csv('k,v\r\n1,"a,b"\r\n2,"line\r\nbreak"\r\n3,"say ""hi"""\r\n', { column: 'v' });
    expect(labels(r)).toEqual(['a,b', 'line\r\nbreak', 'say "hi"']);
    expect(r.details['rows']).toBe(3);
    expect(r.lines).toBe(5);
  });

  it('detects semicolon and tab delimiters from the first line, ignoring quoted ones', () => {
    expect(labels(csv('"a,b";c\n1;2\n', { column: 1 }))).toEqual(['2']);
    expect(csv('a\tb\n1\t2\n', { column: 'b' }).details['delimiter']).toBe(0x09);
    // A tie between comma and semicolon goes to the comma (documented order).
    expect(csv('a,b;c\n1,2;3\n', { column: 1 }).sequence.alphabet).toEqual(['2;3']);
  });

  it('uses a given delimiter instead of detecting one', () => {
    expect(labels(csv('a|b,c\n1|2,3\n', { column: 'b,c', delimiter: '|' }))).toEqual(['2,3']);
  });

  it('reads the only column without being told, and rows without a header', () => {
    expect(labels(csv('x\n5\n6\n'))).toEqual(['5', '6']);
    expect(labels(csv('5\n6\n', { hasHeader: false }))).toEqual(['5', '6']);
    expect(labels(csv('5,a\n6,b\n', { hasHeader: false, column: 1 }))).toEqual(['a', 'b']);
  });

  it('skips empty cells and blank lines, counting them, with a warning', () => {
    const r = csv('a,b\n1,x\n2,\n\n3, \n4,y\n', { column: 'b' });
    expect(labels(r)).toEqual(['x', 'y']);
    expect(r.details).toEqual({ delimiter: 0x2c, rows: 4, emptyCells: 2, blankLines: 1 });
    expect(r.warnings).toHaveLength(1);
    expect(r.warnings[0]?.code).toBe('csv-empty-cells');
    expect(r.warnings[0]?.message).toContain('line 3'); // by hand: '2,' is line 3
  });

  it('skips a byte order mark before the header', () => {
    expect(labels(csv('\uFEFFname\nq\n', { column: 'name' }))).toEqual(['q']);
  });

  it('names the available headers when the column is missing', () => {
    const e = readError(() => csv('alpha,beta\n1,2\n', { column: 'gamma' }));
    expect(e.code).toBe('missing-column');
    expect(e.message).toContain("'alpha', 'beta'");
    expect(readError(() => csv('alpha,beta\n1,2\n', { column: 2 })).code).toBe('missing-column');
    expect(readError(() => csv('alpha,beta\n1,2\n')).code).toBe('missing-column');
    expect(readError(() => csv('1,2\n', { hasHeader: false })).code).toBe('missing-column');
  });

  it('refuses a row too short for the column, naming its line', () => {
    const e = readError(() => csv('a,b\n1,2\n3\n4,5\n', { column: 'b' }));
    expect(e.code).toBe('short-row');
    expect(e.position).toEqual({ line: 3 });
  });

  it('refuses an unterminated quote, placed where the quote opened', () => {
    const e = readError(() => csv('a,b\n1,"x\n2,3\n', { column: 'b' }));
    expect(e.code).toBe('unterminated-quote');
    expect(e.position).toEqual({ line: 2, column: 3, byte: 6 }); // by hand
  });

  it('refuses text after a closing quote', () => {
    const e = readError(() => csv('a\n"x"y\n'));
    expect(e.code).toBe('bad-csv');
    expect(e.position).toEqual({ line: 2, column: 4, byte: 5 });
  });

  it('counts columns from the last line break inside a quoted field', () => {
    const e = readError(() => csv('a\n"x\ny"z\n'));
    expect(e.code).toBe('bad-csv');
    expect(e.position).toEqual({ line: 3, column: 3, byte: 7 }); // by hand: 'z' is byte 7, third on line 3
  });

  it('keeps a quote inside an unquoted field as text', () => {
    expect(labels(csv('a\n5"\n'))).toEqual(['5"']);
  });

  it('decides the delimiter from the first 1 MiB when the first line is longer, whatever the split', () => {
    const long = `${'h'.repeat(1_200_000)};b\n1;2\n`;
    const bytes = utf8(long);
    // No delimiter in the first 1 MiB: the comma is assumed, so column 'b' does not exist.
    const detected = outcome(() => readAll(bytes, { format: 'csv', column: 'b' }));
    expect(detected).toMatchObject({ code: 'missing-column' });
    expect(outcome(() => readSplit(bytes, { format: 'csv', column: 'b' }, [5000, 1_100_000]))).toEqual(detected);
    expect(labels(csv(long, { column: 'b', delimiter: ';' }))).toEqual(['2']);
  });

  it('refuses a header-only file as empty', () => {
    expect(readError(() => csv('a,b\n', { column: 'a' })).code).toBe('empty');
  });

  it('refuses bad options', () => {
    expect(readError(() => csv('a', { delimiter: ',,' })).code).toBe('bad-option');
    expect(readError(() => csv('a', { delimiter: '"' })).code).toBe('bad-option');
    expect(readError(() => csv('a', { column: -1 })).code).toBe('bad-option');
    expect(readError(() => csv('a', { column: 'a', hasHeader: false })).code).toBe('bad-option');
  });
});
