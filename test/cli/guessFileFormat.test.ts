import { afterAll, describe, expect, it } from 'vitest';
import { guessFileFormat } from '../../src/cli/guessFileFormat';
import { cli, tempFolder } from './cliHarness';

const folder = tempFolder('guess');
afterAll(() => folder.remove());

async function readAs(path: string): Promise<{ format: string; symbols: number; alphabetSize: number }> {
  const run = await cli('analyze', path, '--json', '-');
  expect(run.code).toBe(0);
  const { format, symbols, alphabetSize } = (JSON.parse(run.stdout) as { input: { format: string; symbols: number; alphabetSize: number } }).input;
  return { format, symbols, alphabetSize };
}

describe('returnrate analyze without --format reads a file by its extension, else by its fields', () => {
  it('reads a .txt of words separated by spaces as tokens', async () => {
    const path = folder.file('sectors.txt', 'N NE E SE S SW W NW\nN NE E\n');
    expect(await readAs(path)).toEqual({ format: 'tokens', symbols: 11, alphabetSize: 8 });
  });

  it('reads a .txt of integers separated by spaces as tokens, multi-digit ones as one symbol', async () => {
    const path = folder.file('counts.txt', '12 7 3 12 40 7 7 3\n');
    expect(await readAs(path)).toEqual({ format: 'tokens', symbols: 8, alphabetSize: 4 });
  });

  it('reads "0101..." as characters', async () => {
    const unbroken = folder.file('bits.txt', '0110100110010110');
    const spaced = folder.file('spaced.txt', '0 1 1 0 1 0 0 1\n');
    expect(await readAs(unbroken)).toEqual({ format: 'chars', symbols: 16, alphabetSize: 2 });
    expect(await readAs(spaced)).toEqual({ format: 'chars', symbols: 8, alphabetSize: 2 });
  });

  it('reads "0101..." lines ending with line breaks as characters', async () => {
    const path = folder.file('lines.txt', '01101001\n10010110\n');
    expect(await guessFileFormat(path)).toBe('chars');
  });

  it('reads .fa as FASTA and .csv as CSV', async () => {
    const fasta = folder.file('reads.fa', '>seq1 invented\nACGTAC\nGGT\n');
    const csv = folder.file('station.csv', 'sector\nN\nNE\nN\nE\n');
    expect(await readAs(fasta)).toEqual({ format: 'fasta', symbols: 9, alphabetSize: 4 });
    expect(await readAs(csv)).toEqual({ format: 'csv', symbols: 4, alphabetSize: 3 });
  });
});
