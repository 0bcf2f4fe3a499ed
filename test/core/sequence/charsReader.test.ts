import { describe, expect, it } from 'vitest';
import { readAll } from '../../../src/core/sequence/sequenceReader';
import { labels, readError, utf8 } from './readerHarness';

describe('chars reader', () => {
  it('makes every non-whitespace character a symbol, ids in order of first appearance', () => {
    const r = readAll(utf8('ba b\r\nab\n'), { format: 'chars' });
    // by hand: b a b a b, with b first (id 0) and a second (id 1)
    expect(Array.from(r.sequence.symbols)).toEqual([0, 1, 0, 1, 0]);
    expect(r.sequence.alphabet).toEqual(['b', 'a']);
    expect(Array.from(r.sequence.counts)).toEqual([3, 2]);
    expect(r.sequence.symbols).toBeInstanceOf(Uint8Array);
    expect(r.bytesRead).toBe(9);
    expect(r.lines).toBe(2); // two line feeds, the last one ends the input
  });

  it('reads multi-byte and astral characters as one symbol each and skips a leading BOM', () => {
    const r = readAll(utf8('\uFEFFé€😀é'), { format: 'chars' });
    expect(labels(r)).toEqual(['é', '€', '😀', 'é']);
    expect(r.lines).toBe(1);
  });

  it('drops Unicode spaces such as U+00A0 and U+3000 unless keepWhitespace is set', () => {
    // White_Space code points: Unicode Character Database, PropList.txt (from memory).
    const text = 'a\u00A0b\u3000c\td e\n';
    expect(labels(readAll(utf8(text), { format: 'chars' }))).toEqual(['a', 'b', 'c', 'd', 'e']);
    expect(labels(readAll(utf8(text), { format: 'chars', keepWhitespace: true }))).toEqual(['a', '\u00A0', 'b', '\u3000', 'c', '\t', 'd', ' ', 'e']);
  });

  it('never keeps line breaks, even with keepWhitespace', () => {
    const r = readAll(utf8('a\r\nb\u2028c\fd'), { format: 'chars', keepWhitespace: true });
    expect(labels(r)).toEqual(['a', 'b', 'c', 'd']);
  });

  it('refuses input that is only whitespace', () => {
    const e = readError(() => readAll(utf8(' \n\t\r\n'), { format: 'chars' }));
    expect(e.code).toBe('empty');
    expect(e.message).toContain('the file holds no symbols');
  });

  it('refuses an empty file', () => {
    expect(readError(() => readAll(new Uint8Array(0), { format: 'chars' })).code).toBe('empty');
  });

  it('reads a single repeated symbol without complaint', () => {
    const r = readAll(utf8('aaaa'), { format: 'chars' });
    expect(r.sequence.alphabet).toEqual(['a']);
    expect(Array.from(r.sequence.counts)).toEqual([4]);
  });

  it('places invalid UTF-8 by line, column and byte', () => {
    // 'x', LF, 'é' (C3 A9), then C3 followed by '(' which cannot continue it (Unicode Table 3-7).
    const bytes = Uint8Array.from([0x78, 0x0a, 0xc3, 0xa9, 0xc3, 0x28]);
    const e = readError(() => readAll(bytes, { format: 'chars' }));
    expect(e.code).toBe('invalid-utf8');
    expect(e.position).toEqual({ line: 2, column: 2, byte: 4 });
  });
});
