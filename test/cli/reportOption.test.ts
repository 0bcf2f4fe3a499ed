import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeSequence } from '../../src/cli/writeSequence';
import { parseSourceSpec } from '../../src/core/sources/catalog';
import { cli, failureLine, tempFolder } from './cliHarness';

const folder = tempFolder('report');
let chain = '';

beforeAll(async () => {
  // A two-state chain (invented parameters); only the report file is checked here.
  chain = join(folder.dir, 'chain.txt');
  await writeSequence(parseSourceSpec('markov:0.9,0.1;0.4,0.6').generate(20_000, 3), chain);
});
afterAll(() => folder.remove());

describe('returnrate analyze --report PATH.html', () => {
  it('writes the report with every figure and the estimate the JSON holds', async () => {
    const path = join(folder.dir, 'chain-report.html');
    const json = join(folder.dir, 'chain.json');
    const run = await cli('analyze', chain, '--format', 'chars', '--max-n', '14', '--quiet', '--json', json, '--report', path);
    expect([run.code, run.stderr]).toEqual([0, '']);
    const html = readFileSync(path, 'utf8');
    const result = JSON.parse(readFileSync(json, 'utf8')) as { entropy: { estimate: number } };
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html.match(/<svg /g)?.length).toBe(6);
    expect(html).toContain(`data-value="${String(result.entropy.estimate)}"`);
    expect(html).toContain('Input</dt><dd>chain.txt</dd>');
    expect(html).not.toMatch(/<script/i);
  });

  it('names the path in one line when it cannot be written', async () => {
    const blocker = join(folder.dir, 'a-file');
    writeFileSync(blocker, 'x');
    const run = await cli('analyze', chain, '--format', 'chars', '--max-n', '6', '--quiet', '--report', join(blocker, 'r.html'));
    expect(run.code).toBe(1);
    expect(failureLine(run)).toMatch(/^returnrate: .*a-file\/r\.html: cannot write the report \(a file of that name is in the way, ENOTDIR\)$/);
  });

  it('is in the help text', async () => {
    expect((await cli('--help')).stdout).toContain('--report PATH.html');
  });
});
