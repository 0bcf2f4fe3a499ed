import { readFileSync } from 'node:fs';
import { uniformInt } from 'pure-rand/distribution/uniformInt';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { afterAll, describe, expect, it } from 'vitest';
import { cli, tempFolder } from './cliHarness';

const folder = tempFolder('returns');
afterAll(() => folder.remove());

/**
 * R_n(i) from its definition (THEORY.md section 1): the first j >= 1 with x[i+j..i+j+n) =
 * x[i..i+n), observed when i + j + n <= N; otherwise censored at N - n - i. One CSV row per
 * position i = 0..N-n, as the command writes them.
 */
function bruteReturnsCsv(x: string, n: number): string {
  const N = x.length;
  const rows = ['position,return_time,censored'];
  for (let i = 0; i + n <= N; i++) {
    let r = 0;
    for (let j = 1; i + j + n <= N; j++) {
      if (x.slice(i + j, i + j + n) === x.slice(i, i + n)) {
        r = j;
        break;
      }
    }
    rows.push(r > 0 ? `${i},${r},0` : `${i},${N - n - i},1`);
  }
  return rows.join('\n') + '\n';
}

async function returnsCsv(path: string, n: number): Promise<string> {
  const run = await cli('returns', path, '--n', String(n), '--format', 'chars');
  expect(run.code).toBe(0);
  expect(run.stderr).toBe('');
  return run.stdout;
}

/** CSV rows for a list of THEORY.md-style values, ">k" meaning censored with bound k. */
function csvOf(values: readonly (number | string)[]): string {
  const rows = values.map((v, i) => (typeof v === 'number' ? `${i},${v},0` : `${i},${v.slice(1)},1`));
  return ['position,return_time,censored', ...rows].join('\n') + '\n';
}

describe('returnrate returns FILE --n N', () => {
  it('writes the return times of "abracadabra" at n = 1 and n = 4', async () => {
    const path = folder.file('abra.txt', 'abracadabra');
    // THEORY.md section 9, checked from the definition
    expect(await returnsCsv(path, 1)).toBe(csvOf([3, 7, 7, 2, '>6', 2, '>4', 3, '>2', '>1', '>0']));
    expect(await returnsCsv(path, 4)).toBe(csvOf([7, '>6', '>5', '>4', '>3', '>2', '>1', '>0']));
  });

  it('equals the brute-force return times on small random files, every position 0..N-n', async () => {
    const rng = xoroshiro128plus(20261201);
    const cases: [number, number, number[]][] = [
      [40, 2, [1, 2, 3, 6]],
      [157, 3, [1, 2, 4]],
      [300, 4, [1, 3, 5]],
    ];
    for (const [N, a, lengths] of cases) {
      let x = '';
      for (let i = 0; i < N; i++) x += 'abcd'[uniformInt(rng, 0, a - 1)];
      const path = folder.file(`random-${N}.txt`, x);
      for (const n of lengths) {
        const csv = await returnsCsv(path, n);
        expect(csv.split('\n')).toHaveLength(N - n + 1 + 2);
        expect(csv).toBe(bruteReturnsCsv(x, n));
      }
    }
  });

  it('--out PATH writes the same CSV to a file', async () => {
    const path = folder.file('abra.txt', 'abracadabra');
    const out = `${folder.dir}/abra-returns.csv`;
    const run = await cli('returns', path, '--n', '2', '--format', 'chars', '--out', out);
    expect(run).toEqual({ code: 0, stdout: '', stderr: '' });
    expect(readFileSync(out, 'utf8')).toBe(bruteReturnsCsv('abracadabra', 2));
  });

  it('refuses --n longer than the sequence with exit 1', async () => {
    const path = folder.file('abra.txt', 'abracadabra');
    const run = await cli('returns', path, '--n', '12', '--format', 'chars');
    expect(run.code).toBe(1);
    expect(run.stderr).toBe(`returnrate: ${path}: --n 12 is longer than the sequence (11 symbols)\n`);
  });
});
