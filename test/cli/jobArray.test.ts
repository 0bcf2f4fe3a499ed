import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { cli, tempFolder } from './cliHarness';

// The README's job-array recipe, run as it is written: every task of the array is a separate
// process (scripts/job-array/part.sh with TASK_ID), started together, then merge.sh.
const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const RETURNRATE = `${process.execPath} --import tsx ${join(ROOT, 'src/cli/main.ts')}`;
const folder = tempFolder('array');
afterAll(() => folder.remove());

function sh(script: string, env: Record<string, string>): Promise<{ code: number | null; stderr: string }> {
  return new Promise((resolve) => {
    const child = spawn('sh', [join(ROOT, 'scripts/job-array', script)], { cwd: ROOT, env: { ...process.env, ...env } });
    let stderr = '';
    child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
    child.on('close', (code) => resolve({ code, stderr }));
  });
}

describe('job-array recipe (scripts/job-array)', () => {
  it('parts run as separate processes and merged equal the in-process chunked run byte for byte', async () => {
    const input = join(folder.dir, 'chain.txt');
    expect((await cli('generate', 'markov:0.9,0.1;0.4,0.6', '--length', '40000', '--seed', '5', '--out', input)).code).toBe(0);
    const args = '--format chars --max-n 14';
    const plan = await cli('analyze', input, ...args.split(' '), '--chunk', '9000', '--plan');
    const { parts } = JSON.parse(plan.stdout) as { parts: number };
    expect(parts).toBe(4); // 9000 rounded up to 9216 (multiple of 256 = 40000/256 rounded up to a power of two)
    const env = { RETURNRATE, INPUT: input, CHUNK: '9000', PARTS_DIR: join(folder.dir, 'parts'), RETURNRATE_ARGS: args };
    const tasks = await Promise.all(Array.from({ length: parts }, (_, k) => sh('part.sh', { ...env, TASK_ID: String(k) })));
    for (const t of tasks) expect(t.code, t.stderr).toBe(0);
    const result = join(folder.dir, 'result.json');
    const merged = await sh('merge.sh', { ...env, RESULT: result });
    expect(merged.code, merged.stderr).toBe(0);
    const inProcess = await cli('analyze', input, ...args.split(' '), '--chunk', '9000', '--json', '-');
    expect(readFileSync(result, 'utf8')).toBe(inProcess.stdout);
    const missing = await sh('part.sh', { ...env, TASK_ID: '' });
    expect(missing.code).not.toBe(0);
    expect(missing.stderr).toMatch(/set TASK_ID, or run as a Slurm array task/);
  });
});
