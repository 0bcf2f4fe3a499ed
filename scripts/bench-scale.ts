// Scale part of the benchmark (issue 6), run after the one-thread table by `npm run bench` or alone:
//   node scripts/build-cli.mjs && npx tsx scripts/bench-scale.ts
// 1. throughput with 1 and 2 worker threads and the parallel efficiency T1 / (2 T2) (target >= 80%);
// 2. a chunked run (BENCH_CHUNK, default 1e6) against the unchunked one on the Markov chain;
// 3. the memory estimate (estimatePeakMemory) against the measured peak resident size.
// Sizes: BENCH_SCALE_SIZES (default 1e6,1e7); runs per thread count: BENCH_REPEATS (default 3, the
// fastest counts). Files are the cached ones of scripts/bench.ts.
import { execFile, spawnSync } from 'node:child_process';
import { promisify } from 'node:util';
import { readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { benchFile } from './benchFiles';

interface Timing {
  symbols: number;
  readSeconds: number;
  analysisSeconds: number;
  peakRssBytes: number;
  threads: number;
  estimatedPeakBytes: number;
}
interface Estimate {
  estimate: number | null;
  ci95: [number, number] | null;
  lengthsUsed: [number, number];
}
interface Result {
  entropy: { estimate: number; ci95: [number, number]; method: string; alternatives: Record<string, Estimate> };
  trustedRange: { lo: number; hi: number } | null;
}

const sizes = (process.env.BENCH_SCALE_SIZES ?? '1e6,1e7').split(',').map(Number);
const chunk = Number(process.env.BENCH_CHUNK ?? '1e6');
const repeats = Number(process.env.BENCH_REPEATS ?? '3');
const maxN = 40;
const CASES = [
  { label: 'fair coin', spec: 'coin' },
  { label: 'Markov [[.9,.1],[.4,.6]]', spec: 'markov:0.9,0.1;0.4,0.6' },
];

function analyzeArgs(file: string, extra: string[], json?: string): string[] {
  const args = ['bin/returnrate.mjs', 'analyze', file, '--format', 'chars', '--max-n', String(maxN), '--quiet', '--timing', ...extra];
  return json === undefined ? args : [...args, '--json', json];
}

function timingOf(stderr: string): Timing {
  const line = stderr.split('\n').find((l) => l.startsWith('timing '));
  if (line === undefined) throw new Error(`run failed: ${stderr.trim().split('\n').pop() ?? ''}`);
  return JSON.parse(line.slice('timing '.length)) as Timing;
}

function run(file: string, extra: string[], json?: string): Timing {
  const p = spawnSync(process.execPath, analyzeArgs(file, extra, json), { encoding: 'utf8', maxBuffer: 1 << 26 });
  if (p.status !== 0) throw new Error(`run failed: ${p.stderr.trim().split('\n').pop() ?? ''}`);
  return timingOf(p.stderr);
}

/**
 * Two one-thread runs at the same time, as two processes: the slowdown each suffers from the other
 * (shared caches and memory) bounds what two threads of one run can gain on this machine.
 */
async function concurrentPair(file: string): Promise<[Timing, Timing]> {
  const runAsync = async (): Promise<Timing> => timingOf((await promisify(execFile)(process.execPath, analyzeArgs(file, ['--threads', '1']), { maxBuffer: 1 << 26 })).stderr);
  const [a, b] = await Promise.all([runAsync(), runAsync()]);
  return [a, b];
}

const mb = (b: number): string => (b / 1e6).toFixed(0);
console.log(`\nscale (issue 6), maxN = ${maxN}; load average now ${readFileSync('/proc/loadavg', 'utf8').split(' ')[0] ?? '?'}`);
console.log('source | N | T1 s | T2 s | efficiency T1/(2 T2) | estimate MB (1 thread) | peak MB | estimate/peak');
for (const c of CASES) {
  for (const N of sizes) {
    const file = await benchFile(c.spec, N);
    // One and two threads in turn, `repeats` times; the fastest of each counts: on this virtual
    // machine identical runs differ by up to 30%, and the fastest is the least disturbed.
    const ones: Timing[] = [];
    const twos: Timing[] = [];
    for (let i = 0; i < repeats; i++) {
      ones.push(run(file, ['--threads', '1']));
      twos.push(run(file, ['--threads', '2']));
    }
    const pairs: number[] = [];
    for (let i = 0; i < repeats; i++) pairs.push(Math.max(...(await concurrentPair(file)).map((t) => t.analysisSeconds)));
    const fastest = (ts: Timing[]): Timing => ts.reduce((a, b) => (b.analysisSeconds < a.analysisSeconds ? b : a));
    const [one, two] = [fastest(ones), fastest(twos)];
    const ceiling = one.analysisSeconds / Math.min(...pairs);
    const efficiency = one.analysisSeconds / (2 * two.analysisSeconds);
    const ratio = one.estimatedPeakBytes / one.peakRssBytes;
    console.log(
      [c.label, N.toExponential(0), one.analysisSeconds.toFixed(2), two.analysisSeconds.toFixed(2), `${(100 * efficiency).toFixed(0)}%${efficiency >= 0.8 ? ' ok' : ' MISSED'}`,
        mb(one.estimatedPeakBytes), mb(one.peakRssBytes), `${ratio.toFixed(2)}${Math.abs(ratio - 1) <= 0.2 ? ' ok' : ' MISSED'}`].join(' | '),
    );
    const all = (ts: Timing[]): string => ts.map((t) => t.analysisSeconds.toFixed(2)).join(', ');
    console.log(`  all runs: 1 thread ${all(ones)} s; 2 threads ${all(twos)} s`);
    // The threads start, and warm up, while the file is read: the read then takes longer, so the
    // efficiency of read and analysis together is shown as well (fastest of each).
    const whole = (ts: Timing[]): number => Math.min(...ts.map((t) => t.readSeconds + t.analysisSeconds));
    const [read1, read2] = [ones, twos].map((ts) => Math.min(...ts.map((t) => t.readSeconds)));
    console.log(`  read and analysis: 1 thread ${whole(ones).toFixed(2)} s, 2 threads ${whole(twos).toFixed(2)} s, efficiency ${(100 * whole(ones) / (2 * whole(twos))).toFixed(0)}% (reading alone: ${read1!.toFixed(2)} s against ${read2!.toFixed(2)} s)`);
    console.log(`  two 1-thread runs at once: the slower took ${pairs.map((x) => x.toFixed(2)).join(', ')} s, so this machine lets 2 threads reach at most ${(100 * ceiling).toFixed(0)}%; reached ${(100 * efficiency / ceiling).toFixed(0)}% of that`);
    const ratio2 = two.estimatedPeakBytes / two.peakRssBytes;
    console.log(`  2 threads: estimate ${mb(two.estimatedPeakBytes)} MB, peak ${mb(two.peakRssBytes)} MB, estimate/peak ${ratio2.toFixed(2)}${Math.abs(ratio2 - 1) <= 0.2 ? ' ok' : ' MISSED'}`);
  }
}

const N = Math.max(...sizes);
const file = await benchFile(CASES[1]!.spec, N);
const dir = tmpdir();
const whole = join(dir, 'returnrate-bench-unchunked.json');
const parts = join(dir, 'returnrate-bench-chunked.json');
const tw = run(file, ['--threads', '1'], whole);
const tc = run(file, ['--chunk', String(chunk), '--threads', '1'], parts);
const tc2 = run(file, ['--chunk', String(chunk), '--threads', '2']);
const [a, b] = [whole, parts].map((f) => JSON.parse(readFileSync(f, 'utf8')) as Result) as [Result, Result];
console.log(`\nchunked (--chunk ${chunk}) against unchunked, Markov chain, N = ${N.toExponential(0)} (exact h = 0.394669 nat)`);
console.log(`  time (1 thread): unchunked ${tw.analysisSeconds.toFixed(2)} s, chunked ${tc.analysisSeconds.toFixed(2)} s; peak ${mb(tw.peakRssBytes)} MB against ${mb(tc.peakRssBytes)} MB`);
console.log(`  chunked on 2 threads (a chunk per thread): ${tc2.analysisSeconds.toFixed(2)} s, efficiency ${(100 * tc.analysisSeconds / (2 * tc2.analysisSeconds)).toFixed(0)}%, peak ${mb(tc2.peakRssBytes)} MB (estimate ${mb(tc2.estimatedPeakBytes)} MB)`);
const show = (r: Result): string => `${r.entropy.estimate.toFixed(5)} [${r.entropy.ci95.map((x) => x.toFixed(5)).join(', ')}] (${r.entropy.method}), range ${r.trustedRange?.lo}..${r.trustedRange?.hi}`;
console.log(`  headline: unchunked ${show(a)}`);
console.log(`            chunked   ${show(b)}`);
for (const key of Object.keys(a.entropy.alternatives)) {
  const [x, y] = [a.entropy.alternatives[key]!, b.entropy.alternatives[key]!];
  const d = x.estimate !== null && y.estimate !== null ? (y.estimate - x.estimate).toFixed(5) : '-';
  console.log(`  ${key}: ${x.estimate?.toFixed(5)} (n ${x.lengthsUsed.join('-')}) against ${y.estimate?.toFixed(5)} (n ${y.lengthsUsed.join('-')}), chunked - unchunked = ${d}`);
}
