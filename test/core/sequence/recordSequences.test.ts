import { describe, expect, it } from 'vitest';
import { readAll } from '../../../src/core/sequence/sequenceReader';
import { recordSequences } from '../../../src/core/sequence/recordSequences';

const encode = (text: string): Uint8Array => new TextEncoder().encode(text);

describe('recordSequences', () => {
  it('gives each FASTA record its own symbols and counts, as views of the whole', () => {
    // source: worked by hand from the two invented records below
    const read = readAll(encode('>one\nACGT\nAA\n>two\nGGC\n'), { format: 'fasta', fastaRecords: 'separate' });
    const parts = recordSequences(read.sequence, read.records!);
    expect(parts.map((p) => p.record.name)).toEqual(['one', 'two']);
    const labels = (i: number): string => Array.from(parts[i]!.sequence.symbols, (s) => read.sequence.alphabet[s]).join('');
    expect(labels(0)).toBe('ACGTAA');
    expect(labels(1)).toBe('GGC');
    const g = read.sequence.alphabet.indexOf('G');
    expect(parts[1]!.sequence.counts[g]).toBe(2);
    expect(parts[0]!.sequence.symbols.buffer).toBe(read.sequence.symbols.buffer);
  });

  it('refuses a record that lies outside the sequence', () => {
    const read = readAll(encode('>one\nACGT\n'), { format: 'fasta' });
    expect(() => recordSequences(read.sequence, [{ name: 'bad', start: 2, length: 5 }])).toThrow(/outside/);
  });
});
