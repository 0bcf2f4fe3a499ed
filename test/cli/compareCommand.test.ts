import { afterAll, describe, expect, it } from 'vitest';
import { COMPARISON_SCHEMA, parseSourceSpec, type ComparisonResult } from '../../src/core';
import { cli, tempFolder } from './cliHarness';

const folder = tempFolder('compare');
afterAll(() => folder.remove());

function charsOf(spec: string, length: number, seed: number): string {
  const s = parseSourceSpec(spec).generate(length, seed);
  return Array.from(s.symbols, (k) => (k === 0 ? 'a' : 'b')).join('') + '\n';
}

describe('returnrate compare', () => {
  it('compares two files and prints the three rates with intervals', async () => {
    const a = folder.file('a.txt', charsOf('bernoulli:0.3', 40_000, 1));
    const b = folder.file('b.txt', charsOf('coin', 40_000, 2));
    const run = await cli('compare', a, b);
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/cross entropy H\(A, B\)\s+\d\.\d{4}\s+\[\d\.\d{4}, \d\.\d{4}\]/);
    expect(run.stdout).toMatch(/entropy rate h\(A\)/);
    expect(run.stdout).toMatch(/relative entropy D\(A\|\|B\)/);
  });

  it('writes the comparison JSON to standard output with --json -, with exact values for two reference chains', async () => {
    const run = await cli('compare', '--source', 'bernoulli:0.3', '--length', '20000', '--source-b', 'coin', '--length-b', '20000', '--json', '-');
    expect(run.code).toBe(0);
    const json = JSON.parse(run.stdout) as ComparisonResult;
    expect(json.schema).toBe(COMPARISON_SCHEMA);
    // Against a fair coin the cross entropy is log 2 for any A (markovCrossFacts' closed form).
    expect(json.exact?.crossEntropy).toBeCloseTo(Math.LN2, 12);
    expect(json.crossEntropy.ci95).not.toBeNull();
  });

  it('refuses a single input as a usage error, in one line', async () => {
    const a = folder.file('one.txt', 'abababab\n');
    const run = await cli('compare', a);
    expect(run.code).toBe(2);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
    expect(run.stderr).toMatch(/compare needs two inputs/);
  });
});
