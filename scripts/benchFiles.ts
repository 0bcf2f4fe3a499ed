// Generated sequence files shared by the command-line and browser benchmarks, cached in BENCH_DIR
// (default: the system's temporary folder) so both time the same bytes.
import { existsSync, mkdirSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { writeSequence } from '../src/cli/writeSequence';
import { parseSourceSpec } from '../src/core/sources/catalog';

export const BENCH_DIR = process.env.BENCH_DIR ?? join(tmpdir(), 'returnrate-bench');

/** The path of N symbols of the reference source `spec` (seed 2026), generated once. */
export async function benchFile(spec: string, N: number): Promise<string> {
  mkdirSync(BENCH_DIR, { recursive: true });
  const path = join(BENCH_DIR, `${spec.replace(/[^a-z0-9]+/gi, '_')}-${N}.txt`);
  if (existsSync(path) && statSync(path).size >= N) return path;
  process.stdout.write(`  generating ${N} symbols of ${spec} ...\n`);
  await writeSequence(parseSourceSpec(spec).generate(N, 2026), path);
  return path;
}
