import { describe, expect, it } from 'vitest';
import { csvField, csvRecord } from '../../src/figures/csvField';

// Expected texts follow RFC 4180 (Shafranovich 2005), section 2, rules 1 and 5-7.
describe('csvField', () => {
  it('writes a plain field as it is', () => {
    expect(csvField('aaa')).toBe('aaa');
    expect(csvField('')).toBe('');
  });

  it('quotes a field with a comma (rule 6)', () => {
    expect(csvField('a,b')).toBe('"a,b"');
  });

  it('quotes a field with a line break, CR or LF (rule 6)', () => {
    expect(csvField('b\r\nbb')).toBe('"b\r\nbb"');
    expect(csvField('x\ny')).toBe('"x\ny"');
  });

  it('doubles a quote inside a quoted field (rule 7: "b""bb")', () => {
    expect(csvField('b"bb')).toBe('"b""bb"');
  });

  it('keeps a hostile symbol name as text: quotes doubled, the markup left alone', () => {
    expect(csvField('"><script>alert(1)</script>')).toBe('"""><script>alert(1)</script>"');
    expect(csvField('<script>')).toBe('<script>');
  });
});

describe('csvRecord', () => {
  it('joins fields by commas and ends with CRLF (rule 1)', () => {
    expect(csvRecord(['aaa', 'b,b', 'c"c'])).toBe('aaa,"b,b","c""c"\r\n');
  });
});
