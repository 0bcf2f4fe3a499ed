import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { scanReturns } from '../../src/core/returns/scanReturns';
import { scanReturnsSplit } from '../../src/core/returns/splitScan';
import { startScanThreads, threadsAhead } from '../../src/cli/scanThreads';
import { sharedSymbols } from '../../src/core/returns/sharedBuffer';
import { writeFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { SHARE_FROM_SYMBOLS } from '../../src/core/returns/splitScan';
import { cli, failureLine, tempFolder } from './cliHarness';

const folder = tempFolder('threads');
afterAll(() => folder.remove());

/** xorshift32 from a seed: test data only (common practice, no source). */
function symbols(length: number, alphabet: number, seed: number): Uint8Array {
  let s = seed;
  return Uint8Array.from({ length }, () => {
    s ^= s << 13;
    s >>>= 0;
    s ^= s >>> 17;
    s ^= s << 5;
    s >>>= 0;
    return s % alphabet;
  });
}

describe('scan on worker threads', () => {
  it('gives exactly the return times and counts of the one-thread scan (real worker_threads, a pool serving every batch, shared symbols)', async () => {
    const x = symbols(30000, 3, 11);
    const options = { maxN: 14, sampleTarget: 30000 };
    const single = scanReturns(x, 3, options);
    const pool = startScanThreads(2);
    const threaded = await scanReturnsSplit(sharedSymbols(x), 3, options, 2, pool.run).finally(pool.close);
    // The oracle is scanReturns (checked against the brute-force definitions in its own tests).
    expect(threaded.paths).toEqual(single.paths);
    single.levels.forEach((want, j) => {
      const got = threaded.levels[j]!;
      expect([got.observed, got.distinctBlocks, got.singletons, got.matchCount]).toEqual([want.observed, want.distinctBlocks, want.singletons, want.matchCount]);
      expect(Array.from(got.histogram)).toEqual(Array.from(want.histogram));
      expect(Math.abs(got.sumLog - want.sumLog)).toBeLessThanOrEqual(1e-9 * Math.abs(want.sumLog));
    });
  });

  it('analyze --threads 2 prints the estimates of --threads 1', async () => {
    const data = join(folder.dir, 'chain.txt');
    expect((await cli('generate', 'markov:0.9,0.1;0.4,0.6', '--length', '100000', '--out', data)).code).toBe(0);
    const one = JSON.parse((await cli('analyze', data, '--format', 'chars', '--max-n', '16', '--threads', '1', '--json', '-')).stdout) as Record<string, unknown>;
    const two = JSON.parse((await cli('analyze', data, '--format', 'chars', '--max-n', '16', '--threads', '2', '--json', '-')).stdout) as Record<string, unknown>;
    expect(two.paths).toEqual(one.paths);
    // Sums of logarithms are added in another grouping: equal to about 1e-12 relative.
    const round = (v: unknown): unknown => JSON.parse(JSON.stringify(v, (_k, x: unknown) => (typeof x === 'number' ? Number(x.toPrecision(9)) : x)));
    expect(round(two.entropy)).toEqual(round(one.entropy));
    expect(round(two.lengths)).toEqual(round(one.lengths));
    // The diagnostics ran on a thread beside the class groups: the same numbers exactly.
    expect(two.diagnostics).toEqual(one.diagnostics);
    // While the class groups run, the progress line counts them (API contract: analyzeCommand.ts).
    const shown = (await cli('analyze', data, '--format', 'chars', '--max-n', '16', '--threads', '2', '--progress', '--quiet')).stderr.split('\r');
    const groups = shown.filter((line) => line.includes('groups done')).map((line) => /(\d+) of (\d+) groups done/.exec(line)!.slice(1).map(Number));
    expect(groups[0]![0]).toBe(0);
    expect(groups.at(-1)![0]).toBe(groups.at(-1)![1]);
    expect(groups.map(([done]) => done)).toEqual(Array.from({ length: groups.length }, (_, k) => k));
    expect(failureLine(await cli('analyze', data, '--threads', '0'))).toBe('returnrate: --threads must be a whole number of at least 1; got "0" (see returnrate --help)');
  });

  it('starts threads before the read only when the run will most likely share its scan', () => {
    // API contract (scanThreads.ts): --threads W > 1, or a file of at least SHARE_FROM_SYMBOLS bytes.
    const small = join(folder.dir, 'small.txt');
    writeFileSync(small, '0101');
    expect(threadsAhead(small, {})).toBeNull();
    expect(threadsAhead(small, { threads: '1' })).toBeNull();
    expect(threadsAhead(join(folder.dir, 'missing.txt'), {})).toBeNull();
    expect(threadsAhead(undefined, { source: 'coin', length: '1000' })).toBeNull();
    const given = threadsAhead(small, { threads: '2' });
    given?.pool.close();
    expect(given?.count).toBe(2);
    const chunked = threadsAhead(small, { threads: '2', chunk: '1000' });
    expect(chunked).toBeNull();
    const big = threadsAhead(undefined, { source: 'coin', length: String(SHARE_FROM_SYMBOLS) });
    big?.pool.close();
    // One thread per core; none on a one-core machine.
    expect(big?.count ?? 1).toBe(availableParallelism() >= 2 ? availableParallelism() : 1);
    expect(() => threadsAhead(small, { threads: '0' })).toThrow('--threads');
    // Symbols the reader wrote into shared memory are used in place; others are copied there.
    const plain = Uint8Array.from([0, 1, 1]);
    const copied = sharedSymbols(plain);
    expect(copied.buffer).toBeInstanceOf(SharedArrayBuffer);
    expect(Array.from(copied)).toEqual([0, 1, 1]);
    expect(sharedSymbols(copied)).toBe(copied);
  });
});
