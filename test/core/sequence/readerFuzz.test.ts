import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ReadError } from '../../../src/core/sequence/readError';
import { readAll } from '../../../src/core/sequence/sequenceReader';
import type { ReaderOptions } from '../../../src/core/sequence/sequenceReader';
import { WHITESPACE_CLASS, WS_NONE, WS_TABLE_SIZE } from '../../../src/core/sequence/whitespace';
import { csvField } from '../../../src/figures/csvField';
import { labels, outcome, readSplit, utf8 } from './readerHarness';

// Fuzzing of every reader (chunk-split invariance of well-formed text is in sequenceReader.test.ts):
// arbitrary bytes under arbitrary options give a result or a ReadError with a position inside the
// input, never another exception; raw-byte inputs are split-invariant too; and labels written in a
// format's own syntax read back unchanged. Runs are counted in DEVELOPERS.md (fuzz runs).

const SEED = 20261201;

/** Bytes that reach every branch: raw bytes, and UTF-8 text of CSV/FASTA syntax with bad bytes spliced in. */
const fuzzBytes = fc.oneof(
  fc.uint8Array({ maxLength: 120 }),
  fc
    .tuple(
      fc.array(fc.constantFrom('a', 'A', 'C', 'g', 'N', '-', '>', ';', ',', '"', ' ', '\t', '\n', '\r', 'é', '😀', '\uFEFF', 'x,"y"', '""'), { maxLength: 60 }),
      fc.array(fc.tuple(fc.nat(), fc.constantFrom(0x00, 0x80, 0xbf, 0xc0, 0xc1, 0xe0, 0xed, 0xf0, 0xf4, 0xf5, 0xff, 0x01)), { maxLength: 3 }),
    )
    .map(([units, splices]) => {
      const bytes = Array.from(utf8(units.join('')));
      for (const [at, b] of splices) bytes.splice(at % (bytes.length + 1), 0, b);
      return Uint8Array.from(bytes);
    }),
);

const optionsArb: fc.Arbitrary<ReaderOptions> = fc.oneof(
  fc.record({ format: fc.constant('chars' as const), keepWhitespace: fc.boolean() }),
  fc.record({ format: fc.constant('tokens' as const) }),
  fc.record({ format: fc.constant('bytes' as const) }),
  fc.record({
    format: fc.constant('fasta' as const),
    ambiguity: fc.constantFrom('skip' as const, 'symbol' as const, 'error' as const),
    fastaRecords: fc.constantFrom('concatenate' as const, 'separate' as const),
    caseFold: fc.boolean(),
  }),
  fc.record(
    {
      format: fc.constant('csv' as const),
      column: fc.oneof(fc.nat({ max: 3 }), fc.constantFrom('a', 'x,"y"', '')),
      hasHeader: fc.boolean(),
      delimiter: fc.constantFrom(',', ';', '\t'),
    },
    { requiredKeys: ['format'] },
  ),
);

describe('readers under arbitrary bytes', () => {
  it('every format and option: a result, or a ReadError whose position lies inside the input', () => {
    fc.assert(
      fc.property(fuzzBytes, optionsArb, (bytes, options) => {
        try {
          const r = readAll(bytes, options);
          expect(r.sequence.symbols.length).toBeGreaterThan(0);
          expect(r.bytesRead).toBe(bytes.length);
        } catch (e) {
          if (!(e instanceof ReadError)) throw e;
          expect(e.message).not.toContain('\n');
          const { line, column, byte } = e.position;
          if (byte !== undefined) expect(byte >= 0 && byte < Math.max(bytes.length, 1)).toBe(true);
          if (line !== undefined) expect(line).toBeGreaterThanOrEqual(1);
          if (column !== undefined) expect(column).toBeGreaterThanOrEqual(1);
        }
      }),
      { numRuns: 3000, seed: SEED },
    );
  });

  it('every format: raw bytes give the same result or error under any split', () => {
    fc.assert(
      fc.property(fuzzBytes, optionsArb, fc.array(fc.nat(), { maxLength: 10 }), (bytes, options, cuts) => {
        expect(outcome(() => readSplit(bytes, options, cuts))).toEqual(outcome(() => readAll(bytes, options)));
      }),
      { numRuns: 1500, seed: SEED + 1 },
    );
  });
});

/** A code point that is a symbol of its own in every text format: not whitespace, no control, no surrogate, no NUL. */
const isPrintable = (cp: number): boolean =>
  cp > 0x20 && cp !== 0x7f && !(cp >= 0x80 && cp < 0xa0) && !(cp >= 0xd800 && cp <= 0xdfff) && cp !== 0xfeff && (cp >= WS_TABLE_SIZE || WHITESPACE_CLASS[cp] === WS_NONE);
const printableChar = fc.oneof(
  fc.constantFrom('a', 'b', 'Z', '0', '€', 'é', '😀', '"', ','),
  fc.integer({ min: 0x21, max: 0x10ffff }).filter(isPrintable).map((cp) => String.fromCodePoint(cp)),
);
const separators = fc.constantFrom(' ', '\t', '\n', '\r\n', '\r', '\u3000', ' \n ');

describe('round trips: labels written in a format read back unchanged', () => {
  it('chars: characters joined by arbitrary whitespace', () => {
    fc.assert(
      fc.property(fc.array(printableChar, { minLength: 1, maxLength: 60 }), fc.array(fc.oneof(fc.constant(''), separators), { maxLength: 60 }), (chars, gaps) => {
        const text = chars.map((c, i) => c + (gaps[i] ?? '')).join('');
        expect(labels(readAll(utf8(text), { format: 'chars' }))).toEqual(chars);
      }),
      { numRuns: 500, seed: SEED + 2 },
    );
  });

  it('tokens: words joined by spaces, commas, semicolons and line breaks', () => {
    const word = fc.array(printableChar.filter((c) => c !== ',' && c !== ';'), { minLength: 1, maxLength: 6 }).map((a) => a.join(''));
    fc.assert(
      fc.property(fc.array(word, { minLength: 1, maxLength: 40 }), fc.array(fc.oneof(separators, fc.constantFrom(',', ';', ' , ', ';\n')), { minLength: 40, maxLength: 40 }), (words, seps) => {
        const text = words.map((w, i) => w + seps[i]).join('');
        expect(labels(readAll(utf8(text), { format: 'tokens' }))).toEqual(words);
      }),
      { numRuns: 500, seed: SEED + 3 },
    );
  });

  it('csv: any trimmed non-empty cell text, quoted per RFC 4180, reads back as itself', () => {
    const cell = fc
      .array(fc.oneof(printableChar, fc.constantFrom(' ', '\n', '\r\n', ';', '\t')), { minLength: 1, maxLength: 8 })
      .map((a) => a.join('').trim())
      .filter((s) => s !== '');
    fc.assert(
      fc.property(fc.array(cell, { minLength: 1, maxLength: 30 }), fc.constantFrom('\n', '\r\n'), (cells, eol) => {
        const text = ['time,value', ...cells.map((c, i) => `${i},${csvField(c)}`)].join(eol) + eol;
        const r = readAll(utf8(text), { format: 'csv', column: 'value', delimiter: ',' });
        expect(labels(r)).toEqual(cells);
      }),
      { numRuns: 500, seed: SEED + 4 },
    );
  });

  it('bytes: every byte is the symbol of its decimal value', () => {
    fc.assert(
      fc.property(fc.uint8Array({ minLength: 1, maxLength: 200 }), (bytes) => {
        expect(labels(readAll(bytes, { format: 'bytes' }))).toEqual(Array.from(bytes, String));
      }),
      { numRuns: 500, seed: SEED + 5 },
    );
  });

  it('fasta: bases wrapped at any width under headers read back as the bases, case folded', () => {
    const bases = fc.array(fc.constantFrom('A', 'C', 'G', 'T', 'a', 'c', 'g', 't'), { minLength: 1, maxLength: 120 });
    fc.assert(
      fc.property(fc.array(bases, { minLength: 1, maxLength: 4 }), fc.integer({ min: 1, max: 80 }), fc.constantFrom('\n', '\r\n'), (records, width, eol) => {
        const text = records
          .map((r, i) => {
            const lines = [`>record ${i}`];
            for (let s = 0; s < r.length; s += width) lines.push(r.slice(s, s + width).join(''));
            return lines.join(eol);
          })
          .join(eol);
        const read = readAll(utf8(text), { format: 'fasta' });
        expect(labels(read)).toEqual(records.flat().map((b) => b.toUpperCase()));
        expect(read.records?.map((r) => r.length)).toEqual(records.map((r) => r.length));
      }),
      { numRuns: 500, seed: SEED + 6 },
    );
  });
});
