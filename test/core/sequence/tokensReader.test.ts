import { describe, expect, it } from 'vitest';
import { readAll } from '../../../src/core/sequence/sequenceReader';
import { labels, readError, readSplit, utf8 } from './readerHarness';

describe('tokens reader', () => {
  it('splits at whitespace, commas and semicolons, a run of separators counting as one', () => {
    const r = readAll(utf8('12 7,,7;\t12\r\n  x;y\n'), { format: 'tokens' });
    expect(labels(r)).toEqual(['12', '7', '7', '12', 'x', 'y']);
    expect(Array.from(r.sequence.symbols)).toEqual([0, 1, 1, 0, 2, 3]); // by hand, first appearance
    expect(Array.from(r.sequence.counts)).toEqual([2, 2, 1, 1]);
    expect(r.lines).toBe(2);
  });

  it('treats tokens as text: 07 and 7 differ', () => {
    expect(readAll(utf8('07 7 07'), { format: 'tokens' }).sequence.alphabet).toEqual(['07', '7']);
  });

  it('keeps a token whole when a chunk boundary falls inside it, even inside a character', () => {
    const bytes = utf8('alpha βeta alpha');
    const r = readSplit(bytes, { format: 'tokens' }, [3, 7]); // byte 7 is inside 'β' (CE B2)
    expect(labels(r)).toEqual(['alpha', 'βeta', 'alpha']);
  });

  it('widens the symbol array past 256 and past 65536 distinct tokens', () => {
    const text = (n: number) => Array.from({ length: n }, (_, i) => String(i)).join(' ');
    const small = readAll(utf8(text(256)), { format: 'tokens' });
    expect(small.sequence.symbols).toBeInstanceOf(Uint8Array);
    const mid = readAll(utf8(text(257)), { format: 'tokens' });
    expect(mid.sequence.symbols).toBeInstanceOf(Uint16Array);
    expect(mid.sequence.symbols[256]).toBe(256);
    const big = readAll(utf8(`${text(65537)} 0 65536`), { format: 'tokens' });
    expect(big.sequence.symbols).toBeInstanceOf(Int32Array);
    expect(big.sequence.alphabet.length).toBe(65537);
    expect(Array.from(big.sequence.symbols.subarray(65536))).toEqual([65536, 0, 65536]);
    expect(big.sequence.counts[65536]).toBe(2);
  });

  it('refuses input with separators only', () => {
    expect(readError(() => readAll(utf8(' ,; \n'), { format: 'tokens' })).code).toBe('empty');
  });
});
