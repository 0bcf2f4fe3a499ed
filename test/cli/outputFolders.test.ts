import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { FolderError, makeFolder } from '../../src/cli/makeFolder';
import { cli, failureLine, tempFolder } from './cliHarness';

// Folders and files the command line writes into: one clear line when they cannot be made, and never
// a hang (Node 20's recursive mkdir never settles under /proc; makeFolder goes one level at a time).

const folder = tempFolder('folders');
afterAll(() => folder.remove());
const chain = folder.file('chain.txt', 'ab'.repeat(60) + 'ba'.repeat(60));
const common = ['analyze', chain, '--format', 'chars', '--max-n', '4', '--quiet'];
const PROC = existsSync('/proc/self');

describe('makeFolder', () => {
  it('makes missing levels and accepts folders that exist', async () => {
    const deep = join(folder.dir, 'a', 'b', 'c');
    await makeFolder(deep);
    expect(statSync(deep).isDirectory()).toBe(true);
    await makeFolder(deep);
    await makeFolder(folder.dir);
  });

  it('names a file in the way', async () => {
    const blocker = folder.file('blocker', 'x');
    await expect(makeFolder(join(blocker, 'sub'))).rejects.toThrow(new FolderError(`${blocker} is a file, not a folder`));
  });

  it.skipIf(!PROC)('fails at once under /proc, naming the folder that takes no new folders', async () => {
    await expect(makeFolder('/proc/returnrate-test/figs')).rejects.toThrow('/proc takes no new folders (ENOENT)');
  });
});

describe('writers under /proc and missing folders', () => {
  it.skipIf(!PROC)('--figures /proc/x fails with one line', async () => {
    const run = await cli(...common, '--figures', '/proc/x');
    expect(run.code).toBe(1);
    expect(failureLine(run)).toBe('returnrate: /proc/x: cannot make the figures folder: /proc takes no new folders (ENOENT)');
  });

  it.skipIf(!PROC)('--report /proc/x.html fails with one line', async () => {
    const run = await cli(...common, '--report', '/proc/x.html');
    expect(run.code).toBe(1);
    expect(failureLine(run)).toBe('returnrate: /proc/x.html: cannot write the report (/proc takes no new files, ENOENT)');
  });

  it('--report into a missing folder names the folder', async () => {
    const path = join(folder.dir, 'nowhere', 'r.html');
    const run = await cli(...common, '--report', path);
    expect(failureLine(run)).toBe(`returnrate: ${path}: cannot write the report (its folder ${join(folder.dir, 'nowhere')} does not exist, ENOENT)`);
  });

  it.skipIf(!PROC)('--parts-out /proc/x fails with one line', async () => {
    const run = await cli(...common, '--chunk', '64', '--parts-out', '/proc/x');
    expect(run.code).toBe(1);
    expect(failureLine(run)).toBe('returnrate: /proc/x: cannot make the folder for the part files: /proc takes no new folders (ENOENT)');
  });

  it('--figures into a new nested folder still works', async () => {
    const dir = join(folder.dir, 'out', 'figs');
    const run = await cli(...common, '--figures', dir);
    expect(run.code, run.stderr).toBe(0);
    expect(existsSync(join(dir, 'convergence.svg'))).toBe(true);
  });
});

describe('files of this program given as a sequence', () => {
  it('refuses an analysis result and a part file with what to do instead', async () => {
    const json = join(folder.dir, 'result.json');
    expect((await cli(...common, '--json', json)).code).toBe(0);
    const run = await cli('analyze', json);
    expect(failureLine(run)).toBe(`returnrate: ${json}: an analysis result of this program, not a sequence: analyse the file the result was made from (schema returnrate.analysis/1)`);
    const parts = join(folder.dir, 'parts');
    expect((await cli(...common, '--chunk', '128', '--parts-out', parts, '--part', '0')).code).toBe(0);
    const part = join(parts, readdirSync(parts)[0]!);
    expect(failureLine(await cli('returns', part, '--n', '2'))).toMatch(/: a part file of a chunked run, not a sequence: combine the part files with returnrate merge PART\.\.\. \(schema returnrate\.part\/1\)$/);
  });

  it('reads a JSON file of another program as the format asks', async () => {
    const other = folder.file('other.json', '{"schema": "someone.else/1", "x": [1, 2]}');
    expect((await cli('analyze', other, '--format', 'chars', '--max-n', '2', '--quiet')).code).toBe(0);
  });
});
