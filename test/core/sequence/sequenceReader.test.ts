import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createReader, readAll } from '../../../src/core/sequence/sequenceReader';
import type { InputFormat, ReaderOptions } from '../../../src/core/sequence/sequenceReader';
import { outcome, readError, readSplit, utf8 } from './readerHarness';

const TEXT_FORMATS: InputFormat[] = ['chars', 'tokens', 'fasta', 'csv'];

/** Same outcome (result or error with its position) for one chunk and for the given split. */
function expectSplitInvariant(bytes: Uint8Array, options: ReaderOptions, cuts: readonly number[]): void {
  expect(outcome(() => readSplit(bytes, options, cuts))).toEqual(outcome(() => readAll(bytes, options)));
}

/**
 * Checks a text alone, and after a padding longer than the 8 KiB that text readers hold back before
 * they stream; the cuts then fall inside the text, so the streaming path is split too.
 */
function expectSplitInvariantPadded(text: string, pad: string, padded: boolean, options: ReaderOptions, cuts: readonly number[]): void {
  if (!padded) {
    expectSplitInvariant(utf8(text), options, cuts);
    return;
  }
  const head = utf8(pad);
  const tail = utf8(text);
  const bytes = new Uint8Array(head.length + tail.length);
  bytes.set(head);
  bytes.set(tail, head.length);
  expectSplitInvariant(bytes, options, cuts.map((c) => head.length + (c % (tail.length + 1))));
}

const PAD = 9000;
const cutsArb = fc.array(fc.nat(), { maxLength: 12 });
const textOf = (units: string[], maxLength = 80) => fc.array(fc.constantFrom(...units), { maxLength }).map((a) => a.join(''));

const csvCell = fc.oneof(
  textOf(['a', '1', ' ', 'é', '😀'], 4),
  textOf(['a', ',', ';', '\t', '\n', '\r\n', '""', 'ü'], 5).map((s) => `"${s}"`),
);
const csvText = fc
  .tuple(fc.array(fc.array(csvCell, { minLength: 1, maxLength: 3 }), { maxLength: 8 }), fc.constantFrom(',', ';', '\t'), fc.constantFrom('\n', '\r\n'))
  .map(([rows, delimiter, eol]) => ({ text: rows.map((cells) => cells.join(delimiter)).join(eol), delimiter, eol }));

describe('chunk-split invariance', () => {
  it('chars: any split of the bytes, also inside multi-byte characters, gives the same result', () => {
    const text = fc.oneof(textOf(['a', 'é', '€', '😀', ' ', '\n', '\r', '\t', '\u3000', '\uFEFF']), fc.string({ unit: 'binary', maxLength: 40 }));
    const pad = `${'a'.repeat(PAD)}\n`;
    fc.assert(
      fc.property(text, cutsArb, fc.boolean(), fc.boolean(), (s, cuts, keepWhitespace, padded) =>
        expectSplitInvariantPadded(s, pad, padded, { format: 'chars', keepWhitespace }, cuts),
      ),
      { numRuns: 300 },
    );
  });

  it('tokens: any split gives the same result', () => {
    const text = textOf(['1', '22', 'a', 'é', '😀', ' ', ',', ';', '\n', '\r\n']);
    const pad = `${'7 '.repeat(PAD / 2)}\n`;
    fc.assert(
      fc.property(text, cutsArb, fc.boolean(), (s, cuts, padded) => expectSplitInvariantPadded(s, pad, padded, { format: 'tokens' }, cuts)),
      { numRuns: 300 },
    );
  });

  it('fasta: any split gives the same result, errors included', () => {
    const bases = ['A', 'c', 'G', 't', 'N', '-', 'R', 'ACGT', 'acgt'];
    const line = fc.oneof(
      { arbitrary: textOf(bases, 12), weight: 6 },
      { arbitrary: fc.constantFrom('>r1', '> r2 é ', '>', ';comment'), weight: 2 },
      { arbitrary: textOf([' ', 'X', 'é', '>', ...bases], 6), weight: 1 },
    );
    const text = fc.array(line, { maxLength: 8 }).chain((lines) => fc.constantFrom('\n', '\r\n').map((eol) => lines.join(eol)));
    const ambiguity = fc.constantFrom<'skip' | 'symbol' | 'error'>('skip', 'symbol', 'error');
    const pad = `>pad\n${'ACGT'.repeat(PAD / 4)}\n`;
    fc.assert(
      fc.property(text, cutsArb, ambiguity, fc.boolean(), (s, cuts, policy, padded) =>
        expectSplitInvariantPadded(s, pad, padded, { format: 'fasta', ambiguity: policy }, cuts),
      ),
      { numRuns: 300 },
    );
  });

  it('csv: any split gives the same result, including inside quotes and CRLF', () => {
    fc.assert(
      fc.property(csvText, cutsArb, fc.boolean(), fc.boolean(), ({ text, delimiter, eol }, cuts, hasHeader, padded) => {
        // The padding's first line shows the delimiter, so detection picks the one the rows use.
        const pad = `p${delimiter}q${eol}${`1${delimiter}2${eol}`.repeat(PAD / 4)}`;
        expectSplitInvariantPadded(text, pad, padded, { format: 'csv', column: 0, hasHeader }, cuts);
      }),
      { numRuns: 300 },
    );
  });

  it('bytes: any split gives the same result', () => {
    fc.assert(fc.property(fc.uint8Array({ maxLength: 80 }), cutsArb, (b, cuts) => expectSplitInvariant(b, { format: 'bytes' }, cuts)), { numRuns: 200 });
  });

  it('every text format: inputs longer than the 8 KiB sniff window give the same result under any split', () => {
    const units: Record<string, string[]> = {
      chars: ['a', 'é', '😀', ' ', '\n'],
      tokens: ['1', '22', 'é', ' ', ',', '\n'],
      fasta: ['A', 'c', 'N', '\n'],
      csv: ['1', 'é', ',', '"q,\n"', '\n'],
    };
    for (const format of TEXT_FORMATS) {
      const text = textOf(units[format] as string[], 40).map((s) => (format === 'fasta' ? '>r\n' : '') + s.repeat(Math.ceil(12000 / Math.max(1, s.length))));
      const cuts = fc.array(fc.nat({ max: 50000 }), { maxLength: 6 });
      const options: ReaderOptions = format === 'csv' ? { format, column: 0, hasHeader: false } : { format };
      fc.assert(fc.property(text, cuts, (s, c) => expectSplitInvariant(utf8(s), options, c)), { numRuns: 15 });
    }
  });
});

describe('errors common to the text formats', () => {
  it.each(TEXT_FORMATS)('%s refuses a NUL byte as binary, with its position and a hint', (format) => {
    const bytes = utf8('AC\nGT\u0000A\n');
    const e = readError(() => readAll(bytes, { format, column: 0, hasHeader: false }));
    expect(e.code).toBe('binary-in-text');
    expect(e.position).toEqual({ line: 2, column: 3, byte: 5 }); // by hand
    expect(e.message).toContain('--format bytes');
  });

  it('finds a NUL past the sniff window too', () => {
    const bytes = utf8(`${'A'.repeat(10000)}\n\u0000`);
    const e = readError(() => readAll(bytes, { format: 'chars' }));
    expect(e.code).toBe('binary-in-text');
    expect(e.position).toEqual({ line: 2, column: 1, byte: 10001 });
  });

  it('refuses text with more than 10% control characters as binary', () => {
    // 2 control bytes in 12: over the 10% threshold (common practice, no source).
    const bytes = Uint8Array.from([0x41, 0x42, 0x01, 0x43, 0x44, 0x45, 0x46, 0x02, 0x47, 0x48, 0x49, 0x4a]);
    const e = readError(() => readAll(bytes, { format: 'tokens' }));
    expect(e.code).toBe('binary-in-text');
    expect(e.position).toEqual({ line: 1, column: 3, byte: 2 });
    // One control byte in 12 stays below the threshold and is read as a symbol.
    const few = Uint8Array.from([0x41, 0x42, 0x01, 0x43, 0x44, 0x45, 0x46, 0x47, 0x47, 0x48, 0x49, 0x4a]);
    expect(readAll(few, { format: 'chars' }).sequence.alphabet).toContain('\u0001');
  });

  it('recognizes UTF-16 by its byte order mark', () => {
    const e = readError(() => readAll(Uint8Array.from([0xff, 0xfe, 0x41, 0x00]), { format: 'chars' }));
    expect(e.code).toBe('invalid-utf8');
    expect(e.message).toContain('UTF-16');
  });

  it.each(TEXT_FORMATS)('%s refuses input that ends inside a UTF-8 character', (format) => {
    const bytes = Uint8Array.from([0x41, 0x0a, 0x43, 0xe2, 0x82]); // E2 82 AC is U+20AC (from memory), cut after two bytes
    const e = readError(() => readAll(bytes, { format, column: 0, hasHeader: false }));
    expect(e.code).toBe('invalid-utf8');
    expect(e.position).toEqual({ line: 2, column: 2, byte: 3 });
  });

  it.each([...TEXT_FORMATS, 'bytes'] as InputFormat[])('%s refuses an empty input', (format) => {
    const e = readError(() => readAll(new Uint8Array(0), { format }));
    expect(e.code).toBe('empty');
    expect(e.message).toContain('the file holds no symbols');
  });
});

describe('createReader', () => {
  it('refuses unknown formats and bad sizes', () => {
    const bad = (options: unknown) => readError(() => createReader(options as ReaderOptions)).code;
    expect(bad({ format: 'json' })).toBe('bad-option');
    expect(bad({ format: 'chars', sizeHint: -1 })).toBe('bad-option');
    expect(bad({ format: 'chars', maxSymbols: 0 })).toBe('bad-option');
    expect(bad({ format: 'chars', maxSymbols: 1.5 })).toBe('bad-option');
  });

  it('gives the same result with and without a size hint, and with a hint that is too small', () => {
    const bytes = utf8('x y z y x\n'.repeat(300));
    const plain = outcome(() => readAll(bytes, { format: 'tokens' }));
    expect(outcome(() => readAll(bytes, { format: 'tokens', sizeHint: bytes.length }))).toEqual(plain);
    expect(outcome(() => readAll(bytes, { format: 'tokens', sizeHint: 10 }))).toEqual(plain);
  });

  it('refuses more symbols than maxSymbols', () => {
    expect(readAll(utf8('abc'), { format: 'chars', maxSymbols: 3 }).sequence.symbols.length).toBe(3);
    expect(readError(() => readAll(utf8('abcd'), { format: 'chars', maxSymbols: 3 })).code).toBe('too-many-symbols');
  });

  it('keeps throwing the first error, and refuses use after finish()', () => {
    const reader = createReader({ format: 'chars' });
    const first = readError(() => reader.push(Uint8Array.from([0x41, 0xff, ...new Array(9000).fill(0x41)])));
    expect(first.code).toBe('invalid-utf8');
    expect(readError(() => reader.push(utf8('A')))).toBe(first);
    expect(readError(() => reader.finish())).toBe(first);
    const done = createReader({ format: 'chars' });
    done.push(utf8('A'));
    done.finish();
    expect(() => done.push(utf8('B'))).toThrow(/after finish/);
  });

  it('counts lines as line feeds plus an unterminated last line', () => {
    expect(readAll(utf8('a\nb'), { format: 'chars' }).lines).toBe(2);
    expect(readAll(utf8('a\nb\n'), { format: 'chars' }).lines).toBe(2);
    expect(readAll(utf8('a\n\n'), { format: 'chars' }).lines).toBe(2);
  });

  it('reads 10^7 characters pushed in 1 MiB chunks', () => {
    // A 10-symbol line repeated: counts follow by hand (10^6 of each letter).
    const line = utf8('abcdefghij\n');
    const lines = 1_000_000;
    const bytes = new Uint8Array(line.length * lines);
    for (let i = 0; i < lines; i++) bytes.set(line, i * line.length);
    const reader = createReader({ format: 'chars', sizeHint: bytes.length });
    for (let start = 0; start < bytes.length; start += 1 << 20) reader.push(bytes.subarray(start, start + (1 << 20)));
    const r = reader.finish();
    expect(r.sequence.symbols.length).toBe(10_000_000);
    expect(Array.from(r.sequence.counts)).toEqual(new Array(10).fill(1_000_000));
    expect(r.lines).toBe(lines);
  });
});
