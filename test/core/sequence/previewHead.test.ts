import { describe, expect, it } from 'vitest';
import { PREVIEW_BYTES, PREVIEW_LINE_CHARS, PREVIEW_LINES, previewHead } from '../../../src/core/sequence/previewHead';
import { utf8 } from './readerHarness';

describe('previewHead', () => {
  it('a small file is read whole: exact counts, its lines, no size estimate', () => {
    const text = 'abba\nbaab\n';
    const p = previewHead(utf8(text), text.length, 'bits.txt', { format: 'auto' });
    expect(p.wholeFile).toBe(true);
    expect(p.format).toBe('chars');
    expect(p.lines).toEqual(['abba', 'baab']);
    // by hand: 4 a and 4 b, a first
    expect(p.alphabet).toEqual([
      { symbol: 'a', count: 4 },
      { symbol: 'b', count: 4 },
    ]);
    expect([p.symbolsInHead, p.estimatedSymbols, p.alphabetSize]).toEqual([8, null, 2]);
    expect(p.issues).toEqual([]);
  });

  it('the head of a big file is cut after its last line break and the count is scaled by the file size', () => {
    const line = '0 1 1 0 1\n'; // 10 bytes, 5 symbols
    const head = utf8(line.repeat(Math.ceil(PREVIEW_BYTES / line.length) + 3));
    const fileBytes = 10_000_000;
    const p = previewHead(head, fileBytes, 'coin.txt', { format: 'auto' });
    expect(p.wholeFile).toBe(false);
    // by hand: 65536 bytes hold 6553 whole lines (65530 bytes); the 6 bytes after are a cut line
    expect(p.bytesRead).toBe(65_530);
    expect(p.symbolsInHead).toBe(6553 * 5);
    expect(p.estimatedSymbols).toBe(Math.round((6553 * 5 * fileBytes) / 65_530));
    expect(p.lines).toHaveLength(PREVIEW_LINES);
    expect(p.alphabet).toEqual([
      { symbol: '1', count: 6553 * 3 },
      { symbol: '0', count: 6553 * 2 },
    ]);
  });

  it('a chosen format overrides the guess, which is still reported', () => {
    const text = 'N NE E\nSW W N\n';
    const guessed = previewHead(utf8(text), text.length, 'wind.txt', { format: 'auto' });
    expect([guessed.format, guessed.guessedFormat, guessed.symbolsInHead]).toEqual(['tokens', 'tokens', 6]);
    const chars = previewHead(utf8(text), text.length, 'wind.txt', { format: 'chars' });
    // by hand: N N E E S W W N
    expect([chars.format, chars.guessedFormat, chars.symbolsInHead]).toEqual(['chars', 'tokens', 8]);
  });

  it('a reading error becomes an issue with the line, column and byte of the file', () => {
    // 'x', LF, 'é' (C3 A9), then C3 followed by '(' which cannot continue it (Unicode Table 3-7).
    const bytes = Uint8Array.from([0x78, 0x0a, 0xc3, 0xa9, 0xc3, 0x28, 0x0a]);
    const p = previewHead(bytes, bytes.length, 'x.txt', { format: 'chars' });
    expect(p.symbolsInHead).toBeNull();
    expect(p.issues).toEqual([{ code: 'read-error', message: expect.stringContaining('line 2, column 2, byte 4') }]);
  });

  it('a CSV column that is not there is reported with the header it found', () => {
    const text = 'time,sector\n1,N\n2,NE\n';
    const p = previewHead(utf8(text), text.length, 'log.csv', { format: 'auto', column: 'speed' });
    expect(p.format).toBe('csv');
    expect(p.issues.map((i) => i.code)).toEqual(['read-error']);
    expect(p.issues[0]?.message).toContain('speed');
    const ok = previewHead(utf8(text), text.length, 'log.csv', { format: 'auto', column: 'sector' });
    expect(ok.alphabet.map((s) => s.symbol)).toEqual(['N', 'NE']);
  });

  it('one symbol only is flagged', () => {
    const p = previewHead(utf8('aaaa\n'), 5, 'a.txt', { format: 'chars' });
    expect(p.issues.map((i) => i.code)).toEqual(['one-symbol']);
  });

  it('binary data is flagged once and shown in hexadecimal; as raw bytes it is read without complaint', () => {
    const bytes = Uint8Array.from([0x41, 0x00, 0x42, 0x0a, 0xff]);
    const text = previewHead(bytes, 100, 'blob', { format: 'chars' });
    expect(text.issues.map((i) => i.code)).toEqual(['looks-binary']);
    expect(text.issues[0]?.message).toContain('byte 1');
    expect(text.linesKind).toBe('hex');
    expect(text.lines).toEqual(['000000  41 00 42 0a ff']);
    const raw = previewHead(bytes, 100, 'blob', { format: 'bytes' });
    expect(raw.issues).toEqual([]);
    // bytes are not cut at a line break: all 5 are read, and 100 bytes hold 100 symbols
    expect([raw.symbolsInHead, raw.estimatedSymbols]).toEqual([5, 100]);
  });

  it('long lines are cut and marked, and a head without any line break says its counts come from a cut line', () => {
    const long = 'ab'.repeat(PREVIEW_LINE_CHARS);
    const p = previewHead(utf8(long), long.length + 10, 'x.txt', { format: 'chars' });
    expect(p.lines).toEqual([`${long.slice(0, PREVIEW_LINE_CHARS)}…`]);
    expect(p.issues.map((i) => i.code)).toEqual(['cut-line']);
  });

  it('looks at PREVIEW_BYTES at most and refuses a file size below the head', () => {
    const head = utf8('0\n'.repeat(PREVIEW_BYTES));
    expect(previewHead(head, head.length, 'x.txt', { format: 'chars' }).bytesRead).toBe(PREVIEW_BYTES);
    expect(() => previewHead(utf8('abc'), 2, 'x.txt', { format: 'chars' })).toThrow(RangeError);
  });
});
