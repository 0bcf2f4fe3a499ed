import { readFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import { readInputFile } from '../../src/cli/readInput';
import { parseSourceSpec } from '../../src/core/sources/catalog';
import type { Sequence } from '../../src/core/sequence/sequence';
import { cli, tempFolder } from './cliHarness';

const folder = tempFolder('generate');
afterAll(() => folder.remove());

const LENGTH = 5000;
const labels = (s: Sequence): string[] => Array.from(s.symbols, (id) => s.alphabet[id]!);

async function generate(spec: string, seed: number, name: string): Promise<{ path: string; stderr: string }> {
  const path = `${folder.dir}/${name}`;
  const run = await cli('generate', spec, '--length', String(LENGTH), '--seed', String(seed), '--out', path);
  expect(run.code).toBe(0);
  expect(run.stdout).toBe('');
  return { path, stderr: run.stderr };
}

describe('returnrate generate SOURCE --length L --seed S --out FILE', () => {
  it('writes a fair coin as characters that analyze reads back to the same L symbols', async () => {
    const { path, stderr } = await generate('coin', 11, 'coin.txt');
    expect(stderr).toBe(`wrote ${LENGTH} symbols of coin (read back with --format chars); exact h = ${Math.log(2)} nat, sigma^2 = 0\n`);
    expect(readFileSync(path, 'utf8')).toMatch(/^[01\n]+$/);
    const read = await readInputFile(path, { format: 'chars' });
    expect(labels(read.sequence)).toEqual(labels(parseSourceSpec('coin').generate(LENGTH, 11)));
    const run = await cli('analyze', path, '--format', 'chars', '--json', '-');
    expect(run.code).toBe(0);
    const input = (JSON.parse(run.stdout) as { input: { symbols: number; alphabetSize: number } }).input;
    expect(input).toMatchObject({ symbols: LENGTH, alphabetSize: 2 });
  });

  it('writes continued-fraction digits as space-separated tokens, guessed and read back as tokens', async () => {
    const { path, stderr } = await generate('cf', 3, 'cf.txt');
    expect(stderr).toContain('(read back with --format tokens)');
    const text = readFileSync(path, 'utf8');
    expect(text.split(/\s+/).some((field) => field.length > 1)).toBe(true);
    const read = await readInputFile(path, { format: 'tokens' });
    expect(labels(read.sequence)).toEqual(labels(parseSourceSpec('cf').generate(LENGTH, 3)));
    const run = await cli('analyze', path, '--json', '-');
    expect(run.code).toBe(0);
    const input = (JSON.parse(run.stdout) as { input: { symbols: number; format: string } }).input;
    expect(input).toMatchObject({ symbols: LENGTH, format: 'tokens' });
  });

  it('gives the same bytes for the same seed, other bytes for another seed, and the same to standard output', async () => {
    const a = readFileSync((await generate('markov:0.9,0.1;0.4,0.6', 5, 'a.txt')).path);
    const b = readFileSync((await generate('markov:0.9,0.1;0.4,0.6', 5, 'b.txt')).path);
    const c = readFileSync((await generate('markov:0.9,0.1;0.4,0.6', 6, 'c.txt')).path);
    expect(a.equals(b)).toBe(true);
    expect(a.equals(c)).toBe(false);
    const toStdout = await cli('generate', 'markov:0.9,0.1;0.4,0.6', '--length', String(LENGTH), '--seed', '5');
    expect(toStdout.code).toBe(0);
    expect(toStdout.stderr).toBe('');
    expect(toStdout.stdout).toBe(a.toString('utf8'));
  });

  it('takes a negative seed as a seed, not as an option', async () => {
    const run = await cli('generate', 'coin', '--length', '20', '--seed', '-3');
    expect(run.code).toBe(0);
    expect(run.stdout).toBe(labels(parseSourceSpec('coin').generate(20, -3)).join('') + '\n');
  });
});
