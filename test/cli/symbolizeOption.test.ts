import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { uniformStream } from '../../src/core/sources/seededRandom';
import { cli, tempFolder } from './cliHarness';

interface Symbolization {
  spec: string;
  cutPoints: number[];
  cells: { label: string; count: number }[];
  values: number;
  missing: number;
  missingPolicy: string;
  segments: number;
}
interface Result {
  input: { format: string; symbols: number; alphabetSize: number; symbolization?: Symbolization };
  entropy: { estimate: number };
}

const folder = tempFolder('symbolize');
let csv = '';
let lines = '';
const N = 4000;

beforeAll(() => {
  // An invented series of uniforms with a few missing cells; only the shape of the output is checked.
  const rand = uniformStream(11);
  const rows = ['time,level'];
  const values: string[] = [];
  for (let i = 0; i < N; i++) {
    const v = rand.next().toFixed(6);
    values.push(v);
    rows.push(`${i},${v}`);
  }
  rows.splice(1001, 0, '4000,', '4001,NA');
  csv = folder.file('level.csv', rows.join('\n') + '\n');
  lines = folder.file('level.txt', values.join('\n') + '\n');
});
afterAll(() => folder.remove());

describe('analyze --symbolize', () => {
  it('symbolizes a numeric CSV column and records how in input.symbolization', async () => {
    const run = await cli('analyze', csv, '--column', 'level', '--symbolize', 'quantile:4', '--max-n', '6', '--json', '-');
    expect(run.code).toBe(0);
    const result = JSON.parse(run.stdout) as Result;
    expect(result.input.format).toBe('csv');
    expect(result.input.symbols).toBe(N);
    const s = result.input.symbolization;
    expect(s).toMatchObject({ spec: 'quantile:4', values: N, missing: 2, missingPolicy: 'skip', segments: 1 });
    expect(s?.cutPoints).toHaveLength(3);
    // N = 4000 distinct values, K = 4: the stated quantile rule gives exactly N/K values per cell.
    expect(s?.cells.map((c) => c.count)).toEqual([1000, 1000, 1000, 1000]);
    expect(run.stderr).toMatch(/note: 2 missing values \(first at line 1002\)/);
    const text = await cli('analyze', csv, '--column', 'level', '--symbolize', 'quantile:4', '--max-n', '6', '--no-table');
    expect(text.stdout).toMatch(/symbolized quantile:4, cut points [-0-9.]+, [-0-9.]+, [-0-9.]+; 2 missing values skipped/);
  });

  it('reads one number per line with --format numbers and ordinal patterns', async () => {
    const run = await cli('analyze', lines, '--format', 'numbers', '--symbolize', 'ordinal:3', '--max-n', '5', '--json', '-');
    expect(run.code).toBe(0);
    const result = JSON.parse(run.stdout) as Result;
    expect(result.input.symbols).toBe(N - 2);
    expect(result.input.symbolization?.cells.map((c) => c.label)).toEqual(['012', '021', '102', '120', '201', '210']);
  });

  it('--missing split analyses the segments apart, each with its symbolization', async () => {
    const run = await cli('analyze', csv, '--column', 'level', '--symbolize', 'threshold:0.5', '--missing', 'split', '--max-n', '5', '--json', '-');
    expect(run.code).toBe(0);
    const set = JSON.parse(run.stdout) as { schema: string; records: Result[] };
    expect(set.schema).toBe('returnrate.analysis-set/1');
    expect(set.records.map((r) => r.input.symbols)).toEqual([1000, 3000]);
    expect(set.records[0]?.input.symbolization).toMatchObject({ spec: 'threshold:0.5', missingPolicy: 'split', segments: 2 });
  });

  it.each([
    [['--symbolize', 'quantile:1'], /--symbolize: symbolization 'quantile:1': K must be between 2/],
    [['--symbolize', 'threshold:2,1'], /increase strictly/],
    [['--symbolize', 'ordinal:9'], /order D must be between 2 and 8/],
    [['--format', 'numbers'], /--format numbers needs --symbolize/],
    [['--format', 'chars', '--symbolize', 'quantile:2'], /use --format numbers/],
    [['--symbolize', 'quantile:2', '--missing', 'zero'], /--missing must be one of skip, split/],
  ])('%j is a usage error (exit 2, one line)', async (args, message) => {
    const run = await cli('analyze', lines, ...args);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(message);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
  });

  it('a cell that is not a number is an input error with its line, column and byte (exit 1)', async () => {
    const bad = folder.file('bad.csv', 'time,level\n0,1.5\n1,high\n');
    const run = await cli('analyze', bad, '--column', 'level', '--symbolize', 'quantile:2');
    expect(run.code).toBe(1);
    expect(run.stderr).toMatch(/line 3, column 3, byte 19: 'high' is not a number/);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
  });
});

describe('returns --symbolize', () => {
  it('writes the returns of the symbolized series, and refuses --missing split', async () => {
    const ok = await cli('returns', lines, '--format', 'numbers', '--symbolize', 'threshold:0.5', '--n', '2');
    expect(ok.code).toBe(0);
    const split = await cli('returns', lines, '--format', 'numbers', '--symbolize', 'threshold:0.5', '--missing', 'split', '--n', '2');
    expect(split.code).toBe(2);
    expect(split.stderr).toMatch(/returns reads one sequence/);
  });
});
