import { describe, expect, it } from 'vitest';
import { readAll } from '../../../src/core/sequence/sequenceReader';
import { labels, readError, utf8 } from './readerHarness';

const TWO_RECORDS = '>chr1 test\nACgt\nNNa\n;a comment\n>chr2\r\n\r\nTT-G\n';

describe('fasta reader', () => {
  it('reads records, folds case, skips comments, blank lines and (by default) N and gaps', () => {
    const r = readAll(utf8(TWO_RECORDS), { format: 'fasta' });
    // by hand: chr1 gives A C G T A, chr2 gives T T G; N N and - are skipped
    expect(labels(r)).toEqual(['A', 'C', 'G', 'T', 'A', 'T', 'T', 'G']);
    expect(r.sequence.alphabet).toEqual(['A', 'C', 'G', 'T']);
    expect(Array.from(r.sequence.counts)).toEqual([2, 1, 2, 3]);
    expect(r.records).toEqual([
      { name: 'chr1 test', start: 0, length: 5 },
      { name: 'chr2', start: 5, length: 3 },
    ]);
    expect(r.details).toEqual({ 'ambiguity:N': 2, ambiguity: 2, gaps: 1, records: 2 });
    expect(r.warnings.map((w) => w.code)).toEqual(['fasta-ambiguity-skipped']);
    expect(r.lines).toBe(7);
  });

  it("keeps ambiguity codes and gaps as symbols under policy 'symbol'", () => {
    const r = readAll(utf8('>x\nArn-\n'), { format: 'fasta', ambiguity: 'symbol' });
    expect(labels(r)).toEqual(['A', 'R', 'N', '-']);
    expect(r.details).toEqual({ 'ambiguity:N': 1, 'ambiguity:R': 1, ambiguity: 2, gaps: 1, records: 1 });
    expect(r.warnings).toEqual([]);
  });

  it("refuses the first ambiguity code under policy 'error', with its position", () => {
    const e = readError(() => readAll(utf8('>x\nACGT\nAAyA\n'), { format: 'fasta', ambiguity: 'error' }));
    expect(e.code).toBe('bad-fasta');
    expect(e.position).toEqual({ line: 3, column: 3, byte: 10 }); // by hand: 'y' is byte 10
  });

  it('keeps lower case apart when caseFold is false', () => {
    const r = readAll(utf8('>x\nAaCc\n'), { format: 'fasta', caseFold: false });
    expect(r.sequence.alphabet).toEqual(['A', 'a', 'C', 'c']);
  });

  it('accepts RNA (U) like any base', () => {
    expect(readAll(utf8('>r\nACGU\n'), { format: 'fasta' }).sequence.alphabet).toEqual(['A', 'C', 'G', 'U']);
  });

  it('refuses a character outside the nucleotide alphabet with line and column', () => {
    const e = readError(() => readAll(utf8('>p\nACGT\nAC*T\n'), { format: 'fasta' }));
    expect(e.code).toBe('bad-fasta');
    expect(e.position).toEqual({ line: 3, column: 3, byte: 10 }); // by hand
  });

  it('reads bases before the first header as an unnamed record, with a warning', () => {
    const r = readAll(utf8('AC\n>b\nG\n'), { format: 'fasta' });
    expect(r.records).toEqual([
      { name: '', start: 0, length: 2 },
      { name: 'b', start: 2, length: 1 },
    ]);
    expect(r.warnings.map((w) => w.code)).toEqual(['fasta-data-before-header']);
  });

  it('reads a headerless file of bases as one record', () => {
    const r = readAll(utf8('ACGT\nTTGA'), { format: 'fasta' });
    expect(r.records).toEqual([{ name: '', start: 0, length: 8 }]);
    expect(r.warnings.map((w) => w.code)).toEqual(['fasta-no-header']);
  });

  it('refuses a headerless text that is not made of bases, hinting at another format', () => {
    const e = readError(() => readAll(utf8('the cat sat\n'), { format: 'fasta' }));
    expect(e.code).toBe('bad-fasta');
    expect(e.position).toEqual({ line: 1, column: 3, byte: 2 }); // by hand: 't' is a base, 'h' an ambiguity code, 'e' neither
    expect(e.message).toContain('--format chars');
  });

  it('warns about records without bases', () => {
    const r = readAll(utf8('>a\n>b\nAC\n'), { format: 'fasta' });
    expect(r.records).toEqual([
      { name: 'a', start: 0, length: 0 },
      { name: 'b', start: 0, length: 2 },
    ]);
    expect(r.warnings.map((w) => w.code)).toEqual(['fasta-empty-record']);
  });

  it('refuses a file whose sequence is all N, saying why', () => {
    const e = readError(() => readAll(utf8('>a\nNNNN\n'), { format: 'fasta' }));
    expect(e.code).toBe('empty');
    expect(e.message).toContain('ambiguity');
  });

  it('takes a header cut at the end of input as a record', () => {
    const r = readAll(utf8('ACG\n>tail'), { format: 'fasta' });
    expect(r.records?.map((x) => x.name)).toEqual(['', 'tail']);
  });

  it("refuses an unknown 'ambiguity' policy", () => {
    const options = { format: 'fasta', ambiguity: 'drop' } as unknown as Parameters<typeof readAll>[1];
    expect(readError(() => readAll(utf8('>a\nA'), options)).code).toBe('bad-option');
    const records = { format: 'fasta', fastaRecords: 'split' } as unknown as Parameters<typeof readAll>[1];
    expect(readError(() => readAll(utf8('>a\nA'), records)).code).toBe('bad-option');
  });
});
