import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { scanReturns } from '../../src/core/returns/scanReturns';
import { scanReturnsSplit } from '../../src/core/returns/splitScan';
import { sharedSymbols, startScanThreads } from '../../src/cli/scanThreads';
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
    expect(failureLine(await cli('analyze', data, '--threads', '0'))).toBe('returnrate: --threads must be a whole number of at least 1; got "0" (see returnrate --help)');
  });
});
