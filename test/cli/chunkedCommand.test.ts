import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cli, failureLine, tempFolder } from './cliHarness';

const folder = tempFolder('chunked');
afterAll(() => folder.remove());
let data = '';
beforeAll(async () => {
  data = join(folder.dir, 'chain.txt');
  const made = await cli('generate', 'markov:0.9,0.1;0.4,0.6', '--length', '20000', '--seed', '3', '--out', data);
  expect(made.code).toBe(0);
});

const common = ['--format', 'chars', '--max-n', '12'];

describe('analyze --chunk and merge', () => {
  it('with one chunk writes the same JSON as the unchunked run, less the diagnostics', async () => {
    const plain = await cli('analyze', data, ...common, '--json', '-');
    const one = await cli('analyze', data, ...common, '--chunk', '30000', '--json', '-');
    expect(one.code).toBe(0);
    // Chunked results have no mixing diagnostics: part files keep sums, not the symbols they need.
    const { diagnostics, ...rest } = JSON.parse(plain.stdout) as Record<string, unknown>;
    expect(diagnostics).toBeDefined();
    expect(JSON.parse(one.stdout)).toEqual(rest);
  });

  it('merges part files into exactly the in-process chunked result, with the chunking warning', async () => {
    const inProcess = await cli('analyze', data, ...common, '--chunk', '5000', '--json', '-');
    const result = JSON.parse(inProcess.stdout) as { warnings: { code: string }[]; input: { symbols: number } };
    expect(result.warnings.map((w) => w.code)).toContain('chunked');
    expect(result.input.symbols).toBe(20000);
    const plan = await cli('analyze', data, ...common, '--chunk', '5000', '--plan');
    // 20000 symbols: batches and stride of 128 (the power of two >= 20000/256), so 5000 -> 5120, 3 parts
    expect(JSON.parse(plan.stdout)).toEqual({ symbols: 20000, chunkSize: 5120, parts: 3 });
    const dir = join(folder.dir, 'parts');
    for (const part of ['2', '0', '1']) {
      const run = await cli('analyze', data, ...common, '--chunk', '5000', '--parts-out', dir, '--part', part);
      expect(run.code).toBe(0);
      expect(run.stderr).toMatch(new RegExp(`part ${part} of 0 to 2`));
    }
    const files = readdirSync(dir).map((f) => join(dir, f));
    expect(files.map((f) => f.slice(dir.length + 1))).toEqual([
      'chain.txt.part-0000-of-0003.json',
      'chain.txt.part-0001-of-0003.json',
      'chain.txt.part-0002-of-0003.json',
    ]);
    const merged = await cli('merge', ...[...files].reverse(), '--json', '-');
    expect(merged.code).toBe(0);
    expect(merged.stdout).toBe(inProcess.stdout);
  });

  it('shares the chunks among worker threads with exactly the one-thread result', async () => {
    // The oracle is the one-thread chunked run (itself checked against part files above and
    // against the unchunked scan in test/core/returns/chunkedScan.test.ts).
    const one = await cli('analyze', data, ...common, '--chunk', '5000', '--threads', '1', '--json', '-', '--timing');
    const two = await cli('analyze', data, ...common, '--chunk', '5000', '--threads', '2', '--json', '-', '--timing');
    expect(two.code).toBe(0);
    expect(two.stdout).toBe(one.stdout);
    const threadsOf = (stderr: string): unknown => (JSON.parse(stderr.split('\n').find((l) => l.startsWith('timing '))!.slice(7)) as { threads: unknown }).threads;
    expect([threadsOf(one.stderr), threadsOf(two.stderr)]).toEqual([1, 2]);
    // Never more threads than chunks: 20000 symbols at --chunk 15000 make one chunk.
    expect(threadsOf((await cli('analyze', data, ...common, '--chunk', '15000', '--threads', '2', '--json', '-', '--timing')).stderr)).toBe(1);
  });

  it('refuses missing, foreign and broken parts and misused options with one line', async () => {
    const dir = join(folder.dir, 'bad');
    await cli('analyze', data, ...common, '--chunk', '5000', '--parts-out', dir);
    const files = readdirSync(dir).map((f) => join(dir, f));
    expect(files).toHaveLength(3);
    expect(failureLine(await cli('merge', files[0]!, files[2]!))).toBe('returnrate: parts missing: 1 (of 0 to 2)');
    const other = join(folder.dir, 'other');
    await cli('analyze', data, '--format', 'chars', '--max-n', '11', '--chunk', '5000', '--parts-out', other, '--part', '1');
    const foreign = readdirSync(other).map((f) => join(other, f))[0]!;
    expect(failureLine(await cli('merge', files[0]!, foreign, files[2]!))).toBe(`returnrate: ${foreign}: settings not the same as in ${files[0]}`);
    const broken = folder.file('broken.json', '{"schema": "returnrate.analysis/1"}');
    expect(failureLine(await cli('merge', broken))).toBe(`returnrate: ${broken}: not a returnrate.part/1 file (schema "returnrate.analysis/1")`);
    const cut = folder.file('cut.json', readFileSync(files[0]!, 'utf8').slice(0, 500));
    expect(failureLine(await cli('merge', cut))).toBe(`returnrate: ${cut}: not JSON, so not a returnrate part file`);
    const text = JSON.parse(readFileSync(files[1]!, 'utf8')) as { levels: { sumLog: unknown }[] };
    text.levels[3]!.sumLog = 'x';
    writeFileSync(files[1]!, JSON.stringify(text));
    expect(failureLine(await cli('merge', ...files))).toBe(`returnrate: ${files[1]}: levels[3].sumLog is missing or not a number`);
    expect(failureLine(await cli('analyze', data, ...common, '--chunk', '5000', '--part', '1'))).toBe('returnrate: --part needs --parts-out DIR (see returnrate --help)');
    expect(failureLine(await cli('analyze', data, ...common, '--chunk', '5000', '--parts-out', dir, '--part', '3'))).toBe(
      `returnrate: ${data}: there is no part 3: at --chunk 5000 the input has parts 0 to 2`,
    );
    expect(failureLine(await cli('analyze', data, ...common, '--chunk', '10'))).toBe(`returnrate: ${data}: the chunk size must be a whole number above maxN = 12; got 10`);
    expect(failureLine(await cli('merge'))).toMatch(/^returnrate: merge needs the part files/);
  });
});
