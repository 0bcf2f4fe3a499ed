import { describe, expect, it } from 'vitest';
import { guessFormat } from '../../../src/core/sequence/guessFormat';
import { DEFAULT_READING } from '../../../src/ui/store/inputSlice';
import { chosenInputText, parseColumn, parseDemoLength, previewOptionsFor, readerOptionsFor } from '../../../src/ui/view/inputOptions';

describe('inputOptions', () => {
  it('guessFormat goes by extension first, then by the longest field in the head of the file', () => {
    expect(guessFormat('genome.FA', 'ACGT')).toBe('fasta');
    expect(guessFormat('log.tsv', '')).toBe('csv');
    expect(guessFormat('dump.bin', '')).toBe('bytes');
    expect(guessFormat('wind.txt', 'N NE E SE\n')).toBe('tokens');
    expect(guessFormat('coin.txt', 'a b a a\n')).toBe('chars');
    expect(guessFormat('coin.txt', '0110100\n1001011\n')).toBe('chars');
    expect(guessFormat('counts.txt', '12\n7\n33\n')).toBe('tokens');
    expect(guessFormat('codes.txt', 'NE\nSW\nNW\n')).toBe('tokens');
    expect(guessFormat('bits.txt', '0\n1\n1\n')).toBe('chars');
  });

  it('guessFormat ignores the last line without its line break, which the sniff window may have cut', () => {
    expect(guessFormat('x', 'a b c\na b cdef')).toBe('chars');
  });

  it('parseColumn reads digits as a 0-based index, other text as a header name, blank as default', () => {
    expect(parseColumn(' 2 ')).toBe(2);
    expect(parseColumn('sector')).toBe('sector');
    expect(parseColumn('  ')).toBeUndefined();
  });

  it('readerOptionsFor passes each format only its own options', () => {
    const c = { ...DEFAULT_READING, csvColumn: 'sector', keepWhitespace: true, ambiguity: 'symbol' as const };
    expect(readerOptionsFor('a.csv', '', c)).toEqual({ format: 'csv', column: 'sector', hasHeader: true });
    expect(readerOptionsFor('a.csv', '', { ...c, csvColumn: '' })).toEqual({ format: 'csv', hasHeader: true });
    expect(readerOptionsFor('a.csv', '', { ...c, format: 'tokens' })).toEqual({ format: 'tokens' });
    expect(readerOptionsFor('a.txt', '0110\n', c)).toEqual({ format: 'chars', keepWhitespace: true });
    expect(readerOptionsFor('a.fa', '', c)).toEqual({ format: 'fasta', ambiguity: 'symbol', caseFold: true });
  });

  it('previewOptionsFor sends every option along with auto, so the guessed format finds its own', () => {
    expect(previewOptionsFor({ ...DEFAULT_READING, csvColumn: '2' })).toEqual({
      format: 'auto',
      column: 2,
      hasHeader: true,
      keepWhitespace: false,
      ambiguity: 'skip',
      caseFold: true,
    });
    expect(previewOptionsFor({ ...DEFAULT_READING, format: 'bytes' })).toEqual({ format: 'bytes' });
  });

  it('parseDemoLength accepts integers in range only', () => {
    expect(parseDemoLength('3000000')).toBe(3_000_000);
    expect(parseDemoLength('999')).toBeNull();
    expect(parseDemoLength('1e6')).toBeNull();
    expect(parseDemoLength('')).toBeNull();
  });

  it('chosenInputText names the input', () => {
    expect(chosenInputText(null)).toBe('none yet');
    expect(chosenInputText({ kind: 'file', name: 'a.txt', bytes: 2048 })).toBe('a.txt (2.0 KiB)');
    expect(chosenInputText({ kind: 'demo', id: 'd', length: 200_000, seed: 5 })).toBe('invented demo, 200,000 symbols, seed 5');
    expect(chosenInputText({ kind: 'demo', id: 'd', length: 1_000, seed: 5 }, (id) => `demo ${id}`)).toBe('demo d, 1,000 symbols, seed 5');
  });
});
