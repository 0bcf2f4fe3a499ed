import { describe, expect, it } from 'vitest';
import { readAll } from '../../../src/core/sequence/sequenceReader';
import { readError } from './readerHarness';

describe('bytes reader', () => {
  it('makes each byte value a symbol labelled by its decimal value, in order of first appearance', () => {
    const r = readAll(Uint8Array.from([200, 0, 10, 200, 255, 10]), { format: 'bytes' });
    expect(Array.from(r.sequence.symbols)).toEqual([0, 1, 2, 0, 3, 2]); // by hand
    expect(r.sequence.alphabet).toEqual(['200', '0', '10', '255']);
    expect(Array.from(r.sequence.counts)).toEqual([2, 1, 2, 1]);
    expect(r.sequence.symbols).toBeInstanceOf(Uint8Array);
    expect(r.lines).toBe(2); // byte 10 is a line feed; the input ends with one
  });

  it('reads binary data that the text formats refuse', () => {
    const bytes = Uint8Array.from({ length: 256 }, (_, i) => 255 - i);
    const r = readAll(bytes, { format: 'bytes' });
    expect(r.sequence.alphabet.length).toBe(256);
    expect(r.sequence.alphabet[0]).toBe('255');
    expect(r.lines).toBe(2); // one line feed (byte 10) not at the end
  });

  it('refuses an empty file', () => {
    expect(readError(() => readAll(new Uint8Array(0), { format: 'bytes' })).code).toBe('empty');
  });
});
