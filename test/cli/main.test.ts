import { spawn, spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { PROGRAM_VERSION } from '../../src/core/result/version';
import { tempFolder } from './cliHarness';

// Real processes, as a user runs the program (bin/returnrate.mjs and `npm run returnrate` load the
// same entry through tsx); everything else about the commands is tested in-process through runCli.
const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const ENTRY = ['--import', 'tsx', 'src/cli/main.ts'];
const folder = tempFolder('main');
afterAll(() => folder.remove());

describe('src/cli/main.ts as a process', () => {
  it('exits 0 with the version, and 1 with one stderr line and no stack trace for a missing file', () => {
    const version = spawnSync(process.execPath, [...ENTRY, '--version'], { cwd: ROOT, encoding: 'utf8' });
    expect(version.status).toBe(0);
    expect(version.stdout).toBe(`${PROGRAM_VERSION}\n`);
    const path = `${folder.dir}/missing.txt`;
    const missing = spawnSync(process.execPath, [...ENTRY, 'analyze', path], { cwd: ROOT, encoding: 'utf8' });
    expect(missing.status).toBe(1);
    expect(missing.stdout).toBe('');
    expect(missing.stderr).toBe(`returnrate: ${path}: no such file\n`);
  });

  it('stops quietly with exit 0 when the reader of its output goes away (`| head`)', async () => {
    // 200,000 symbols give several MB of CSV, far more than a pipe holds, so the writer meets EPIPE.
    const path = folder.file('long.txt', 'abcd'.repeat(50_000));
    const child = spawn(process.execPath, [...ENTRY, 'returns', path, '--n', '3', '--format', 'chars'], { cwd: ROOT });
    let stderr = '';
    child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
    child.stdout.once('data', () => child.stdout.destroy());
    const code = await new Promise<number | null>((resolve) => child.on('close', resolve));
    expect(stderr).toBe('');
    expect(code).toBe(0);
  });
});
