import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Writable } from 'node:stream';
import { runCli } from '../../src/cli/runCli';

/** What one in-process run of the command line printed and returned. */
export interface CliRun {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
}

/** A stream that keeps what is written to it; a small buffer so that the commands' drain waits run. */
function sink(chunks: Buffer[]): Writable {
  return new Writable({
    highWaterMark: 1024,
    write(chunk: Buffer | string, _encoding, callback) {
      chunks.push(typeof chunk === 'string' ? Buffer.from(chunk) : chunk);
      callback();
    },
  });
}

/** Runs `returnrate ARGS` in this process, as main.ts does with the real standard streams. */
export async function cli(...args: string[]): Promise<CliRun> {
  const out: Buffer[] = [];
  const err: Buffer[] = [];
  const code = await runCli(args, { stdout: sink(out), stderr: sink(err) });
  return { code, stdout: Buffer.concat(out).toString('utf8'), stderr: Buffer.concat(err).toString('utf8') };
}

/** A fresh folder under the system's temporary directory, with a helper that writes files into it. */
export function tempFolder(prefix: string): { dir: string; file: (name: string, content: string | Uint8Array) => string; remove: () => void } {
  const dir = mkdtempSync(join(tmpdir(), `returnrate-${prefix}-`));
  return {
    dir,
    file(name, content) {
      const path = join(dir, name);
      writeFileSync(path, content);
      return path;
    },
    remove: () => rmSync(dir, { recursive: true, force: true }),
  };
}

/**
 * The failure contract of the command line: one line on standard error, starting "returnrate: ",
 * and no stack trace (a V8 trace line starts with four spaces and "at ").
 */
export function failureLine(run: CliRun): string {
  const lines = run.stderr.split('\n');
  if (lines.length !== 2 || lines[1] !== '' || !lines[0]!.startsWith('returnrate: ') || run.stderr.includes('    at ')) {
    throw new Error(`expected one failure line on stderr, got ${JSON.stringify(run.stderr)}`);
  }
  return lines[0]!;
}
