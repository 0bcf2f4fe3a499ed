// Speed and memory of the installed command line (bin/returnrate.mjs, running the bundle that
// `npm run bench` builds first), end to end: start-up and reading the file included. Sizes default
// to 1e6, 1e7, 1e8; BENCH_SIZES=1e6,1e7 limits them. Generated files are cached in BENCH_DIR
// (default: the system's temporary folder).
import { spawnSync } from 'node:child_process';
import { benchFile } from './benchFiles';

interface Case {
  label: string;
  spec: string;
  /** The speed targets are set for the i.i.d. binary case; the Markov chain (h = 0.39 nats) keeps
   * every position in play for all 40 levels, about 1.5 times the work, and is reported beside it. */
  targets: boolean;
}
const CASES: Case[] = [
  { label: 'i.i.d. binary (fair coin)', spec: 'coin', targets: true },
  { label: 'Markov chain [[.9,.1],[.4,.6]]', spec: 'markov:0.9,0.1;0.4,0.6', targets: false },
];
const sizes = (process.env.BENCH_SIZES ?? '1e6,1e7,1e8').split(',').map(Number);
const maxN = 40;

// Targets on a 2-core machine, one thread, end to end.
const TIME_TARGET: Record<number, number> = { 1e7: 6, 1e8: 90 };
const MEMORY_TARGET_BYTES_PER_SYMBOL = 16;

interface Timing {
  symbols: number;
  readSeconds: number;
  analysisSeconds: number;
  positionLevels: number;
  peakRssBytes: number;
}

const rows: string[][] = [];
for (const c of CASES) {
  for (const N of sizes) {
    const file = await benchFile(c.spec, N);
    const t0 = performance.now();
    const run = spawnSync(process.execPath, ['bin/returnrate.mjs', 'analyze', file, '--format', 'chars', '--max-n', String(maxN), '--threads', '1', '--quiet', '--timing'], {
      encoding: 'utf8',
      maxBuffer: 1 << 26,
    });
    const wall = (performance.now() - t0) / 1000;
    const line = run.stderr.split('\n').find((l) => l.startsWith('timing '));
    if (run.status !== 0 || line === undefined) {
      rows.push([c.label, N.toExponential(0), 'failed', run.stderr.trim().split('\n').pop() ?? '']);
      continue;
    }
    const t = JSON.parse(line.slice('timing '.length)) as Timing;
    const bytesPerSymbol = t.peakRssBytes / N;
    const target = c.targets ? TIME_TARGET[N] : undefined;
    const verdict = [
      target === undefined ? '' : wall <= target ? `time <= ${target} s ok` : `time > ${target} s MISSED`,
      N >= 1e8 ? (bytesPerSymbol < MEMORY_TARGET_BYTES_PER_SYMBOL ? 'memory ok' : 'memory MISSED') : '',
      c.targets ? '' : '(no time target)',
    ]
      .filter(Boolean)
      .join(', ');
    rows.push([
      c.label,
      N.toExponential(0),
      wall.toFixed(2),
      t.readSeconds.toFixed(2),
      t.analysisSeconds.toFixed(2),
      (t.positionLevels / t.analysisSeconds / 1e6).toFixed(1),
      bytesPerSymbol.toFixed(1),
      verdict,
    ]);
    process.stdout.write(`  ${rows[rows.length - 1]!.join(' | ')}\n`);
  }
}

const header = ['source', 'N', 'wall s', 'read s', 'analysis s', 'M position-levels/s', 'peak bytes/symbol', 'targets'];
const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? '').length)));
console.log(`\nreturn-time engine, maxN = ${maxN}, one thread, end to end from the command line`);
for (const r of [header, ...rows]) console.log(r.map((cell, i) => (cell ?? '').padEnd(widths[i]!)).join('  '));

// Threads, chunks and the memory estimate (issue 6): BENCH_SCALE=0 skips them.
if (process.env.BENCH_SCALE !== '0') await import('./bench-scale');
