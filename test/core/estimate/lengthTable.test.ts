import { describe, expect, it } from 'vitest';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { uniformInt } from 'pure-rand/distribution/uniformInt';
import { bruteScan } from '../../helpers/bruteScan';
import { lengthTable, meanAndVariance } from '../../../src/core/estimate/lengthTable';

function randomSymbols(N: number, a: number, seed: number): Uint8Array {
  const rng = xoroshiro128plus(seed);
  const x = new Uint8Array(N);
  for (let i = 0; i < N; i++) x[i] = uniformInt(rng, 0, a - 1);
  return x;
}

/** Block counts by a string tally, independent of the scan. */
function blockCounts(x: Uint8Array, n: number): { key: string[]; count: Map<string, number> } {
  const key: string[] = [];
  const count = new Map<string, number>();
  for (let i = 0; i + n <= x.length; i++) {
    const k = Array.from(x.subarray(i, i + n)).join(',');
    key.push(k);
    count.set(k, (count.get(k) ?? 0) + 1);
  }
  return { key, count };
}

/** Nearer-history return of every position (0 = censored), straight from the definition. */
function nearerReturns(key: readonly string[]): number[] {
  const M = key.length;
  const half = Math.floor(M / 2);
  return key.map((k, i) => {
    if (i < half) {
      for (let j = i + 1; j < M; j++) if (key[j] === k) return j - i;
    } else {
      for (let j = i - 1; j >= 0; j--) if (key[j] === k) return i - j;
    }
    return 0;
  });
}

describe('lengthTable', () => {
  const x = randomSymbols(1200, 3, 11);
  const scan = bruteScan(x, 3, { maxN: 7, batchLength: 16, sampleStride: 8, matchWindow: 600 });
  const rows = lengthTable(scan.levels);

  it('plug-in H_n equals -sum p log p of the block tally, and Miller-Madow adds (m - 1)/(2M)', () => {
    // source: definitions (THEORY.md section 7; Miller 1955), checked by direct tally
    for (const row of rows) {
      const { count } = blockCounts(x, row.n);
      const M = x.length - row.n + 1;
      let H = 0;
      for (const c of count.values()) H -= (c / M) * Math.log(c / M);
      expect(row.blockEntropy).toBeCloseTo(H, 10);
      expect(row.meanInformation).toBeCloseTo(H, 10);
      expect(row.blockEntropyMillerMadow).toBeCloseTo(H + (count.size - 1) / (2 * M), 10);
      expect(row.distinctBlocks).toBe(count.size);
    }
  });

  it('conditional entropy is the difference of consecutive Miller-Madow block entropies, with H_0 = 0', () => {
    // source: definition h_n = H_n - H_(n-1) (THEORY.md section 7)
    expect(rows[0]!.conditionalEntropy).toBeCloseTo(rows[0]!.blockEntropyMillerMadow, 12);
    for (let j = 1; j < rows.length; j++) {
      expect(rows[j]!.conditionalEntropy).toBeCloseTo(rows[j]!.blockEntropyMillerMadow - rows[j - 1]!.blockEntropyMillerMadow, 12);
    }
  });

  it('mean and variance of log R and of log(R * frequency) equal direct sums over observed nearer-history returns', () => {
    // source: definitions in src/core/returns/levelStats.ts, computed directly
    for (const row of rows) {
      const { key, count } = blockCounts(x, row.n);
      const M = key.length;
      const R = nearerReturns(key);
      const logs: number[] = [];
      const logsRf: number[] = [];
      R.forEach((r, i) => {
        if (r > 0) {
          logs.push(Math.log(r));
          logsRf.push(Math.log((r * count.get(key[i]!)!) / M));
        }
      });
      const mean = logs.reduce((s, v) => s + v, 0) / logs.length;
      const variance = logs.reduce((s, v) => s + (v - mean) ** 2, 0) / (logs.length - 1);
      const meanRf = logsRf.reduce((s, v) => s + v, 0) / logsRf.length;
      const varRf = logsRf.reduce((s, v) => s + (v - meanRf) ** 2, 0) / (logsRf.length - 1);
      expect(row.observed).toBe(logs.length);
      expect(row.censored).toBe(M - logs.length);
      expect(row.meanLogReturn).toBeCloseTo(mean, 10);
      expect(row.varLogReturn).toBeCloseTo(variance, 10);
      expect(row.meanLogRFreq).toBeCloseTo(meanRf, 10);
      expect(row.varLogRFreq).toBeCloseTo(varRf, 10);
      expect(row.ratePerSymbol).toBeCloseTo(mean / row.n, 12);
    }
  });

  it('histogram quantiles lie within one 1/64-nat bin of the direct order statistics', () => {
    // source: the histogram resolution HISTOGRAM_BINS_PER_NAT = 64 (levelStats.ts)
    for (const row of rows) {
      const { key } = blockCounts(x, row.n);
      const logs = nearerReturns(key)
        .filter((r) => r > 0)
        .map((r) => Math.log(r))
        .sort((a, b) => a - b);
      [0.05, 0.25, 0.5, 0.75, 0.95].forEach((p, k) => {
        const direct = logs[Math.min(logs.length - 1, Math.max(0, Math.ceil(p * logs.length) - 1))]!;
        expect(Math.abs(row.quantilesLogReturn[k]! - direct)).toBeLessThanOrEqual(1 / 64 + 1e-12);
      });
    }
  });

  it('gives entropies in bits as the nat values divided by log 2, leaving log R in nats', () => {
    // source: 1 bit = log 2 nats (definition)
    const bits = lengthTable(scan.levels, 'bit');
    rows.forEach((row, j) => {
      const b = bits[j]!;
      expect(b.blockEntropy).toBeCloseTo(row.blockEntropy / Math.LN2, 12);
      expect(b.conditionalEntropy).toBeCloseTo(row.conditionalEntropy / Math.LN2, 12);
      expect(b.ratePerSymbol).toBeCloseTo(row.ratePerSymbol! / Math.LN2, 12);
      expect(b.meanLogReturn).toBe(row.meanLogReturn);
    });
  });

  it('leaves the corrected mean equal to the plain one when no observed return exceeds M/2, and never lowers it', () => {
    // source: censoringCorrection.ts: only returns above floor(M/2) can be censored, and restoring them adds large values
    for (const row of rows) {
      const level = scan.levels[row.n - 1]!;
      const half = Math.floor(level.positions / 2);
      let above = 0;
      for (let k = Math.floor(Math.log(half + 1) * 64); k < level.histogram.length; k++) above += level.histogram[k]!;
      if (above === 0) expect(row.meanLogReturnCorrected).toBeCloseTo(row.meanLogReturn!, 12);
      else expect(row.meanLogReturnCorrected!).toBeGreaterThanOrEqual(row.meanLogReturn! - 1e-12);
    }
  });
});

describe('meanAndVariance', () => {
  it('returns nulls without data and the n-1 variance otherwise', () => {
    // source: by hand: values 1, 2, 4 have mean 7/3 and variance ((4/3)^2 + (1/3)^2 + (5/3)^2)/2 = 7/3
    expect(meanAndVariance(0, 0, 0)).toEqual({ mean: null, variance: null });
    expect(meanAndVariance(1, 3, 9)).toEqual({ mean: 3, variance: null });
    const r = meanAndVariance(3, 7, 21);
    expect(r.mean).toBeCloseTo(7 / 3, 14);
    expect(r.variance).toBeCloseTo(7 / 3, 14);
  });
});
