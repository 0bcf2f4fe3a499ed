import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeSequence } from '../../src/cli/writeSequence';
import { PROGRAM_VERSION } from '../../src/core/result/version';
import { parseSourceSpec } from '../../src/core/sources/catalog';
import { cli, tempFolder } from './cliHarness';

interface Estimate {
  estimate: number;
  ci95: [number, number];
}
interface AnalysisJson {
  schema: string;
  input: { name: string; symbols: number; alphabetSize: number; sha256: string; format: string };
  settings: { maxN: number; unit: string; intervalSeconds: number | null; maxCensoredFraction: number; confidence: number };
  lengths: Record<string, number | null>[];
  entropy: Estimate & { unit: string; method: string; lengthsUsed: [number, number]; perSecond: Estimate | null; perSecondUnit: string | null };
  sigma2: Estimate;
  warnings: { code: string; message: string }[];
}

const folder = tempFolder('analyze');
let chain = '';
const LENGTH = 20_000;

beforeAll(async () => {
  // The two-state chain of THEORY.md section 2; only the shape of the output is checked here.
  chain = `${folder.dir}/chain.txt`;
  await writeSequence(parseSourceSpec('markov:0.9,0.1;0.4,0.6').generate(LENGTH, 7), chain);
});
afterAll(() => folder.remove());

async function analyzeJson(...args: string[]): Promise<AnalysisJson> {
  const run = await cli('analyze', chain, '--format', 'chars', '--json', '-', ...args);
  expect(run.code).toBe(0);
  expect(run.stderr).toBe('');
  return JSON.parse(run.stdout) as AnalysisJson;
}

describe('returnrate analyze --json - prints the analysis contract', () => {
  it('has the schema, the input with its SHA-256, the settings, the per-n rows, h and sigma^2 with intervals', async () => {
    const r = await analyzeJson();
    expect(r.schema).toBe('returnrate.analysis/1');
    expect(r.input.name).toBe('chain.txt');
    expect(r.input.symbols).toBe(LENGTH);
    expect(r.input.alphabetSize).toBe(2);
    expect(r.input.format).toBe('chars');
    expect(r.input.sha256).toMatch(/^[0-9a-f]{64}$/);
    // Node's own SHA-256 of the same bytes, an implementation independent of the one the CLI uses.
    expect(r.input.sha256).toBe(createHash('sha256').update(readFileSync(chain)).digest('hex'));
    // DEFAULT_SETTINGS (src/core/result/analysisResult.ts), as documented in --help
    expect(r.settings).toEqual({ maxN: 40, unit: 'nat', intervalSeconds: null, maxCensoredFraction: 0.01, confidence: 0.95 });

    expect(r.lengths).toHaveLength(r.settings.maxN);
    r.lengths.forEach((row, k) => {
      expect(row.n).toBe(k + 1);
      // N - n + 1 positions have an n-block, and each is either observed or censored
      expect(row.positions).toBe(LENGTH - k);
      expect(row.observed! + row.censored!).toBe(row.positions);
      for (const key of ['meanLogReturn', 'varLogReturn', 'blockEntropy', 'distinctBlocks']) expect(row).toHaveProperty(key);
      expect(row.distinctBlocks).toBeGreaterThanOrEqual(1);
    });

    const h = r.entropy;
    expect(Number.isFinite(h.estimate)).toBe(true);
    expect(h.ci95[0]).toBeLessThanOrEqual(h.estimate);
    expect(h.estimate).toBeLessThanOrEqual(h.ci95[1]);
    expect(h.unit).toBe('nat/symbol');
    expect(['return-slope', 'plugin-conditional', 'return-mean', 'match-length']).toContain(h.method);
    expect(h.lengthsUsed[0]).toBeGreaterThanOrEqual(1);
    expect(h.lengthsUsed[0]).toBeLessThanOrEqual(h.lengthsUsed[1]);
    expect(h.lengthsUsed[1]).toBeLessThanOrEqual(r.settings.maxN);
    expect(h.perSecond).toBeNull();

    expect(Number.isFinite(r.sigma2.estimate)).toBe(true);
    expect(r.sigma2.ci95[0]).toBeLessThanOrEqual(r.sigma2.ci95[1]);
    expect(Array.isArray(r.warnings)).toBe(true);
    for (const w of r.warnings) expect(typeof w.code === 'string' && typeof w.message === 'string').toBe(true);
  });

  it('--unit bit divides every entropy by ln 2 and --interval 0.01 gives rates per second = per symbol / 0.01', async () => {
    const nat = await analyzeJson();
    const bit = await analyzeJson('--unit', 'bit', '--interval', '0.01');
    // 1 bit = ln 2 nat (common practice, no source); relative tolerance for rounding only
    const closeTo = (x: number, y: number): void => expect(Math.abs(x - y)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(y)));
    closeTo(bit.entropy.estimate, nat.entropy.estimate / Math.LN2);
    closeTo(bit.entropy.ci95[0], nat.entropy.ci95[0] / Math.LN2);
    closeTo(bit.entropy.ci95[1], nat.entropy.ci95[1] / Math.LN2);
    expect(bit.entropy.unit).toBe('bit/symbol');
    expect(bit.settings.unit).toBe('bit');
    expect(bit.settings.intervalSeconds).toBe(0.01);
    // symbols per second = 1 / interval (common practice, no source)
    const perSecond = bit.entropy.perSecond!;
    closeTo(perSecond.estimate, bit.entropy.estimate / 0.01);
    closeTo(perSecond.ci95[0], bit.entropy.ci95[0] / 0.01);
    closeTo(perSecond.ci95[1], bit.entropy.ci95[1] / 0.01);
    expect(bit.entropy.perSecondUnit).toBe('bit/s');
  });

  it('--json PATH writes the same JSON to the file and prints the human summary', async () => {
    const viaStdout = await cli('analyze', chain, '--format', 'chars', '--json', '-');
    const path = `${folder.dir}/chain.json`;
    const run = await cli('analyze', chain, '--format', 'chars', '--json', path);
    expect(run.code).toBe(0);
    expect(readFileSync(path, 'utf8')).toBe(viaStdout.stdout);
    expect(run.stdout).toContain('95% interval');
    expect(() => JSON.parse(run.stdout) as unknown).toThrow();
  });
});

describe('returnrate analyze prints a human summary', () => {
  it('with the estimate, the 95% interval, the method and the per-n table; --no-table drops the table', async () => {
    const r = await analyzeJson();
    const full = await cli('analyze', chain, '--format', 'chars');
    const short = await cli('analyze', chain, '--format', 'chars', '--no-table');
    expect(full.code).toBe(0);
    expect(short.code).toBe(0);
    const ci = `[${r.entropy.ci95[0].toFixed(4)}, ${r.entropy.ci95[1].toFixed(4)}]`;
    for (const run of [full, short]) {
      expect(run.stdout).toContain(`h = ${r.entropy.estimate.toFixed(4)} nat/symbol   95% interval ${ci}`);
      expect(run.stdout).toContain(`method ${r.entropy.method}, block lengths n = ${r.entropy.lengthsUsed[0]}..${r.entropy.lengthsUsed[1]}`);
      expect(run.stdout).toContain('20,000 symbols, alphabet of 2, read as chars');
    }
    const header = /^ *n +positions +observed +censored +mean logR +var logR/m;
    expect(full.stdout).toContain('per block length (log R in nats)');
    expect(full.stdout).toMatch(header);
    expect(short.stdout).not.toContain('per block length');
    expect(short.stdout).not.toMatch(header);
  });

  it('runs a file shorter than the default --max-n 40 with n up to N - 1', async () => {
    const path = folder.file('abra.txt', 'abracadabra');
    const run = await cli('analyze', path, '--json', '-');
    expect(run.code).toBe(0);
    const r = JSON.parse(run.stdout) as AnalysisJson;
    // 11 symbols: the largest usable block length is 10
    expect(r.settings.maxN).toBe(10);
    expect(r.lengths).toHaveLength(10);
  });

  it('--help and --version exit 0 with the usage and the version', async () => {
    const help = await cli('--help');
    const version = await cli('--version');
    const bare = await cli();
    expect(help.code).toBe(0);
    expect(help.stdout).toContain('usage');
    expect(help.stdout).toContain('returnrate analyze FILE');
    expect(bare).toEqual(help);
    expect(version).toEqual({ code: 0, stdout: `${PROGRAM_VERSION}\n`, stderr: '' });
  });
});

describe('returnrate analyze --fasta-records separate', () => {
  it('analyses every record on its own and names the ones too short to analyse', async () => {
    // source: API contract; the records hold invented bases, only the shape of the output is checked
    const bases = (seed: number, n: number): string => {
      let s = seed;
      let out = '';
      for (let i = 0; i < n; i++) {
        s = (Math.imul(s, 1103515245) + 12345) >>> 0;
        out += 'ACGT'[s >>> 30];
      }
      return out;
    };
    const path = folder.file('reads.fa', `>first\n${bases(1, 3000)}\n>tiny\nA\n>second\n${bases(2, 2000)}\n`);
    const run = await cli('analyze', path, '--fasta-records', 'separate', '--json', '-', '--max-n', '8');
    expect(run.code).toBe(0);
    expect(run.stderr).toBe('returnrate: note: record "tiny" has 1 symbol(s) and is left out\n');
    const set = JSON.parse(run.stdout) as { schema: string; records: AnalysisJson[] };
    expect(set.schema).toBe('returnrate.analysis-set/1');
    expect(set.records.map((r) => [r.input.name, r.input.symbols])).toEqual([
      ['reads.fa > first', 3000],
      ['reads.fa > second', 2000],
    ]);
    const together = await cli('analyze', path, '--json', '-', '--max-n', '8');
    expect((JSON.parse(together.stdout) as AnalysisJson).input.symbols).toBe(5001);
  });
});

describe('returnrate analyze --progress', () => {
  it('rewrites one progress line per block length on standard error and ends it', async () => {
    // source: API contract (runCli.ts help text)
    const run = await cli('analyze', chain, '--format', 'chars', '--max-n', '6', '--progress', '--quiet');
    expect(run.code).toBe(0);
    const updates = run.stderr.split('\r').filter((part) => part.includes('block length'));
    expect(updates).toHaveLength(6);
    expect(updates[5]).toContain('block length 6 of 6');
    expect(run.stderr.endsWith('\n')).toBe(true);
  });
});
