import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Utf8Decoder, describeInvalidUtf8, utf8Length } from '../../../src/core/sequence/utf8Decoder';

function decodeAll(bytes: readonly number[] | Uint8Array, cuts: readonly number[] = []) {
  const data = Uint8Array.from(bytes);
  const decoder = new Utf8Decoder();
  const codePoints: number[] = [];
  const points = [...new Set(cuts.map((c) => c % (data.length + 1)))].sort((a, b) => a - b);
  let start = 0;
  for (const end of [...points, data.length]) {
    const n = decoder.decode(data.subarray(start, end));
    codePoints.push(...decoder.codePoints.subarray(0, n));
    if (decoder.stop !== 'none') break;
    start = end;
  }
  if (decoder.stop === 'none') decoder.finish();
  return { codePoints, stop: decoder.stop, stopByte: decoder.stopByte };
}

const hex = (s: string) => s.split(' ').map((h) => parseInt(h, 16));

describe('Utf8Decoder', () => {
  it('decodes the examples of RFC 3629', () => {
    // RFC 3629 (Yergeau, 2003), section 7: "A<NOT IDENTICAL TO><ALPHA>.", Korean, Japanese, U+233B4 after a BOM.
    expect(decodeAll(hex('41 E2 89 A2 CE 91 2E')).codePoints).toEqual([0x41, 0x2262, 0x391, 0x2e]);
    expect(decodeAll(hex('ED 95 9C EA B5 AD EC 96 B4')).codePoints).toEqual([0xd55c, 0xad6d, 0xc5b4]);
    expect(decodeAll(hex('E6 97 A5 E6 9C AC E8 AA 9E')).codePoints).toEqual([0x65e5, 0x672c, 0x8a9e]);
    // The byte order mark at the start is dropped (RFC 3629, section 6).
    expect(decodeAll(hex('EF BB BF F0 A3 8E B4')).codePoints).toEqual([0x233b4]);
  });

  it('keeps U+FEFF when it is not the first character', () => {
    // RFC 3629, section 6: only a leading U+FEFF is a signature.
    expect(decodeAll(hex('41 EF BB BF')).codePoints).toEqual([0x41, 0xfeff]);
  });

  it('stops at the first byte of each ill-formed sequence of Unicode Table 3-7', () => {
    // The Unicode Standard, chapter 3, Table 3-7 (well-formed UTF-8 byte sequences); offsets by hand.
    const cases: [string, number][] = [
      ['41 C0 AF', 1], // overlong '/'
      ['41 C1 BF', 1], // overlong, C1 is never a lead byte
      ['41 42 E0 80 AF', 2], // overlong three-byte form
      ['ED A0 80', 0], // surrogate U+D800
      ['F0 80 80 80', 0], // overlong four-byte form
      ['F4 90 80 80', 0], // above U+10FFFF
      ['F5 80 80 80', 0], // F5 is never a lead byte
      ['41 80', 1], // lone continuation byte
      ['41 FF', 1],
      ['E2 82 41', 0], // sequence cut short by an ASCII byte
    ];
    for (const [bytes, at] of cases) {
      const data = hex(bytes);
      // Whole, and cut at every position (the second-byte limits of E0, ED, F0, F4 must survive a cut).
      for (let cut = 0; cut <= data.length; cut++) {
        const r = decodeAll(data, [cut]);
        expect(r.stop, `${bytes} cut at ${cut}`).toBe('invalid');
        expect(r.stopByte, `${bytes} cut at ${cut}`).toBe(at);
      }
    }
  });

  it('reports a sequence still open at the end of input as truncated at its first byte', () => {
    const r = decodeAll(hex('41 E2 82')); // "A" and the first two bytes of U+20AC (E2 82 AC; from memory)
    expect(r).toEqual({ codePoints: [0x41], stop: 'truncated', stopByte: 1 });
  });

  it('names why a sequence is ill-formed, by the row of Unicode Table 3-7 it breaks, whatever the split', () => {
    // Byte ranges of the Unicode Standard, Table 3-7 (well-formed UTF-8 byte sequences; from memory).
    const cases: [string, RegExp][] = [
      ['41 80', /^a continuation byte 0x80 with no lead byte before it$/],
      ['C1 BF', /^an overlong encoding \(lead byte 0xC1/],
      ['E0 9F BF', /^an overlong encoding \(0xE0 0x9F\)$/],
      ['F0 8F BF BF', /^an overlong encoding \(0xF0 0x8F\)$/],
      ['ED BF BF', /^a surrogate code point \(0xED 0xBF/],
      ['F4 90 80 80', /^a code point above U\+10FFFF \(0xF4 0x90\)$/],
      ['F8 88 80 80 80', /^byte 0xF8, which never occurs in UTF-8$/],
      ['E2 82 41', /^a character cut short: lead byte 0xE2 is followed by 0x41, not by a continuation byte$/],
      ['C3 28', /^a character cut short: lead byte 0xC3 is followed by 0x28/],
    ];
    for (const [bytes, why] of cases) {
      for (const cut of [0, 1, 2, 3]) {
        const data = Uint8Array.from(hex(bytes));
        const decoder = new Utf8Decoder();
        decoder.decode(data.subarray(0, cut));
        if (decoder.stop === 'none') decoder.decode(data.subarray(cut));
        expect(decoder.stop, bytes).toBe('invalid');
        expect(describeInvalidUtf8(decoder.stopLead, decoder.stopNext), `${bytes} cut at ${cut}`).toMatch(why);
      }
    }
  });

  it('stops at a NUL byte', () => {
    expect(decodeAll(hex('41 00 42'))).toEqual({ codePoints: [0x41], stop: 'nul', stopByte: 1 });
  });

  it('agrees with TextDecoder (fatal) on well-formed text split anywhere', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 60 }), fc.array(fc.nat(), { maxLength: 8 }), (text, cuts) => {
        const bytes = new TextEncoder().encode(text.replace(/\0/g, ''));
        const expected = Array.from(new TextDecoder('utf-8', { fatal: true }).decode(bytes), (c) => c.codePointAt(0));
        const r = decodeAll(bytes, cuts);
        expect(r.stop).toBe('none');
        expect(r.codePoints).toEqual(expected);
      }),
    );
  });

  it('stops where TextDecoder (fatal) says the bytes stop being UTF-8, whatever the split', () => {
    fc.assert(
      fc.property(fc.uint8Array({ minLength: 1, maxLength: 24 }), fc.array(fc.nat(), { maxLength: 6 }), (raw, cuts) => {
        const bytes = raw.map((b) => (b === 0 ? 1 : b));
        const strict = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false });
        const r = decodeAll(bytes, cuts);
        const whole = decodeAll(bytes);
        expect(r).toEqual(whole);
        let valid = true;
        try {
          strict.decode(bytes);
        } catch {
          valid = false;
        }
        expect(r.stop === 'none').toBe(valid);
        if (!valid) {
          // Everything before the stop is well formed and decodes to the code points delivered.
          const before = new TextDecoder('utf-8', { fatal: true }).decode(bytes.subarray(0, r.stopByte));
          expect(r.codePoints).toEqual(Array.from(before, (c) => c.codePointAt(0)));
        }
      }),
      { numRuns: 500 },
    );
  });

  it('gives the byte offset of each code point of a batch', () => {
    const d = new Utf8Decoder();
    const bytes = new TextEncoder().encode('aé€😀b'); // 1 + 2 + 3 + 4 + 1 bytes (RFC 3629, section 3)
    d.decode(bytes.subarray(0, 2)); // 'a' and the first byte of 'é'
    const n = d.decode(bytes.subarray(2));
    expect(n).toBe(4);
    expect([0, 1, 2, 3].map((k) => d.byteOffsetOf(k))).toEqual([1, 3, 6, 10]);
    expect(d.byteOffsetOf(1)).toBe(3); // asking again for an earlier index restarts the walk
  });

  it('counts UTF-8 lengths at the boundaries of RFC 3629, section 3', () => {
    expect([0x7f, 0x80, 0x7ff, 0x800, 0xffff, 0x10000, 0x10ffff].map(utf8Length)).toEqual([1, 2, 2, 3, 3, 4, 4]);
  });
});
