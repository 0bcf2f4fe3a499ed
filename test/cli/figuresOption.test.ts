import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { DOMParser } from '@xmldom/xmldom';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeSequence } from '../../src/cli/writeSequence';
import { parseSourceSpec } from '../../src/core/sources/catalog';
import { cli, failureLine, tempFolder } from './cliHarness';

const folder = tempFolder('figures');
let chain = '';
const STEMS = ['convergence', 'envelopes', 'fluctuations-histogram', 'fluctuations-qq', 'information-acf', 'mixing-beta', 'return-law', 'variance-growth'];

beforeAll(async () => {
  // A two-state chain (invented parameters); only the files are checked here.
  chain = join(folder.dir, 'chain.txt');
  await writeSequence(parseSourceSpec('markov:0.9,0.1;0.4,0.6').generate(20_000, 3), chain);
});
afterAll(() => folder.remove());

describe('returnrate analyze --figures DIR', () => {
  it('writes one SVG and one CSV per view, and two runs give byte-identical files', async () => {
    const a = join(folder.dir, 'run-a', 'nested');
    const b = join(folder.dir, 'run-b');
    const runA = await cli('analyze', chain, '--format', 'chars', '--max-n', '14', '--quiet', '--figures', a);
    const runB = await cli('analyze', chain, '--format', 'chars', '--max-n', '14', '--quiet', '--figures', b);
    expect([runA.code, runA.stderr]).toEqual([0, '']);
    expect(runB.code).toBe(0);
    const files = readdirSync(a).sort();
    expect(files).toEqual(STEMS.flatMap((s) => [`${s}.csv`, `${s}.svg`]));
    for (const f of files) expect(readFileSync(join(b, f))).toEqual(readFileSync(join(a, f)));
    for (const s of STEMS) {
      const svg = readFileSync(join(a, `${s}.svg`), 'utf8');
      const errors: string[] = [];
      new DOMParser({ onError: (level, message) => errors.push(`${level}: ${message}`) }).parseFromString(svg, 'image/svg+xml');
      expect(errors).toEqual([]);
      expect(svg).toContain('Input: chain.txt');
      expect(readFileSync(join(a, `${s}.csv`), 'utf8')).toMatch(/^# returnrate figure data: /);
    }
  });

  it('names the folder in one line when it cannot be made', async () => {
    const blocker = join(folder.dir, 'a-file');
    writeFileSync(blocker, 'x');
    const run = await cli('analyze', chain, '--format', 'chars', '--max-n', '6', '--quiet', '--figures', join(blocker, 'figs'));
    expect(run.code).toBe(1);
    expect(failureLine(run)).toBe(`returnrate: ${join(blocker, 'figs')}: cannot make the figures folder: ${blocker} is a file, not a folder`);
  });

  it('is in the help text', async () => {
    expect((await cli('--help')).stdout).toContain('--figures DIR');
  });
});
