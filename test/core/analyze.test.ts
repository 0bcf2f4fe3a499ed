import { describe, expect, it } from 'vitest';
import { bruteScan } from '../helpers/bruteScan';
import { randomSymbols, stickyChain } from '../helpers/estimateFixtures';
import { analyzeFromScan, analyzeSequence, validateSettings } from '../../src/core/analyze';
import { ANALYSIS_SCHEMA, DEFAULT_SETTINGS, type AnalysisSettings, type InputSummary } from '../../src/core/result/analysisResult';
import { ScanCancelled } from '../../src/core/returns/scanReturns';
import type { Sequence } from '../../src/core/sequence/sequence';

const settings: AnalysisSettings = { ...DEFAULT_SETTINGS, maxN: 12 };

function sequenceOf(symbols: Uint8Array, alphabet: number): Sequence {
  const counts = new Float64Array(alphabet);
  for (const s of symbols) counts[s]!++;
  return { symbols, alphabet: Array.from({ length: alphabet }, (_, k) => String(k)), counts };
}

function inputOf(N: number, alphabetSize: number): InputSummary {
  return { name: 'test', symbols: N, alphabetSize, sha256: null, format: 'generated' };
}

describe('validateSettings', () => {
  it('throws RangeError naming each bad setting and its value', () => {
    // source: API contract (analyze.ts)
    const bad: [Partial<AnalysisSettings>, string][] = [
      [{ maxN: 0 }, 'maxN'],
      [{ maxN: 100 }, 'maxN'],
      [{ maxN: 2.5 }, '2.5'],
      [{ confidence: 1 }, 'confidence'],
      [{ confidence: Number.NaN }, 'confidence'],
      [{ maxCensoredFraction: 1 }, 'maxCensoredFraction'],
      [{ intervalSeconds: -1 }, 'intervalSeconds'],
      [{ unit: 'byte' as 'bit' }, 'byte'],
    ];
    for (const [change, word] of bad) {
      expect(() => validateSettings({ ...settings, maxN: 5, ...change }, 100)).toThrow(RangeError);
      expect(() => validateSettings({ ...settings, maxN: 5, ...change }, 100)).toThrow(word);
    }
    expect(() => validateSettings({ ...settings, maxN: 99 }, 100)).not.toThrow();
  });
});

describe('analyzeFromScan', () => {
  const x = stickyChain(3000, 8);
  const scan = bruteScan(x, 2, { maxN: 12, batchLength: 4, sampleStride: 64, matchWindow: 1500 });
  const result = analyzeFromScan(scan, inputOf(3000, 2), settings);

  it('builds a versioned result with the per-n table, every estimator and a headline inside its interval', () => {
    // source: API contract (analysisResult.ts); program version from package.json
    expect(result.schema).toBe(ANALYSIS_SCHEMA);
    expect(result.program).toEqual({ name: 'returnrate', version: '0.1.0' });
    expect(result.lengths.map((r) => r.n)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
    expect(Object.keys(result.entropy.alternatives).sort()).toEqual(['match-length', 'plugin-conditional', 'return-mean', 'return-slope']);
    expect(result.entropy.ci95[0]).toBeLessThanOrEqual(result.entropy.estimate);
    expect(result.entropy.ci95[1]).toBeGreaterThanOrEqual(result.entropy.estimate);
    expect(result.entropy.unit).toBe('nat/symbol');
    expect(result.entropy.reason.length).toBeGreaterThan(20);
    expect(result.sigma2.ci95[0]).toBeLessThan(result.sigma2.estimate);
    expect(result.scan.intervalBatches).toBeGreaterThan(1);
    expect(JSON.parse(JSON.stringify(result))).toEqual(result);
  });

  it('gives no interval for the estimators with a bias of known order (mean log R_n / n, variance growth)', () => {
    // source: the stated rule (analyze.ts, alternative()): their intervals would cover sampling error only
    const mean = result.entropy.alternatives['return-mean']!;
    const growth = result.sigma2.alternatives['variance-growth']!;
    expect(mean.estimate).not.toBeNull();
    expect(mean.ci95).toBeNull();
    expect(mean.note).toContain('No interval');
    expect(growth.ci95).toBeNull();
    expect(result.entropy.alternatives['return-slope']!.ci95).not.toBeNull();
  });

  it('reports entropies in bits as the nat values divided by log 2, and sigma^2 by (log 2)^2', () => {
    // source: 1 bit = log 2 nats (definition)
    const bits = analyzeFromScan(scan, inputOf(3000, 2), { ...settings, unit: 'bit' });
    expect(bits.entropy.estimate).toBeCloseTo(result.entropy.estimate / Math.LN2, 12);
    expect(bits.entropy.ci95[1]).toBeCloseTo(result.entropy.ci95[1] / Math.LN2, 12);
    expect(bits.sigma2.estimate).toBeCloseTo(result.sigma2.estimate / Math.LN2 ** 2, 12);
    expect(bits.lengths[3]!.blockEntropy).toBeCloseTo(result.lengths[3]!.blockEntropy / Math.LN2, 12);
    expect(bits.entropy.unit).toBe('bit/symbol');
  });

  it('gives rates per second when a sampling interval is set', () => {
    // source: by hand: per second = per symbol / seconds per symbol
    const timed = analyzeFromScan(scan, inputOf(3000, 2), { ...settings, intervalSeconds: 0.25 });
    expect(timed.entropy.perSecond!.estimate).toBeCloseTo(result.entropy.estimate * 4, 12);
    expect(timed.entropy.perSecondUnit).toBe('nat/s');
    expect(result.entropy.perSecond).toBeNull();
  });

  it('turns sampled forward returns into log R, null where censored or past the end', () => {
    // source: SampledPaths encoding (levelStats.ts)
    const { positions, logReturn } = result.paths;
    expect(positions).toEqual(Array.from(scan.paths.positions));
    positions.forEach((_, s) => {
      for (let n = 1; n <= 12; n++) {
        const f = scan.paths.forward[s * 12 + n - 1]!;
        expect(logReturn[s]![n - 1]).toBe(f > 0 ? Math.log(f) : null);
      }
    });
  });

  it('gives the log block count and, for a censored return, the log of its lower bound N - n - i', () => {
    // source: SampledPaths encoding (levelStats.ts); counts and returns from the brute-force scan
    const { positions, logCount, logCensoredBound } = result.paths;
    const N = scan.length;
    positions.forEach((p, s) => {
      for (let n = 1; n <= 12; n++) {
        const c = scan.paths.counts[s * 12 + n - 1]!;
        expect(logCount![s]![n - 1]).toBe(p <= N - n ? Math.log(c) : null);
        const f = scan.paths.forward[s * 12 + n - 1]!;
        expect(logCensoredBound![s]![n - 1]).toBe(f < 0 && N - n - p > 0 ? Math.log(N - n - p) : null);
      }
    });
  });
});

describe('analyzeFromScan warnings', () => {
  it('flags a single-symbol sequence and a short one', () => {
    // source: the warning rules in analyze.ts
    const x = new Uint8Array(500);
    const scan = bruteScan(x, 1, { maxN: 4, batchLength: 1, sampleStride: 50, matchWindow: 250 });
    const codes = analyzeFromScan(scan, inputOf(500, 1), { ...settings, maxN: 4 }).warnings.map((w) => w.code);
    expect(codes).toContain('single-symbol');
    expect(codes).toContain('short-sequence');
  });

  it('flags matches that reach maxN, and data whose blocks are unique before anything can be trusted', () => {
    // source: the warning rules in analyze.ts; a period-7 sequence matches one period back at any length;
    // 400 symbols over 250 letters leave fewer than 100 returns at n = 1 and unique blocks soon after
    const x = Uint8Array.from({ length: 700 }, (_, i) => [0, 1, 1, 0, 2, 1, 0][i % 7]!);
    const scan = bruteScan(x, 3, { maxN: 5, batchLength: 1, sampleStride: 50, matchWindow: 350 });
    expect(analyzeFromScan(scan, inputOf(700, 3), { ...settings, maxN: 5 }).warnings.map((w) => w.code)).toContain('match-truncated');
    const y = randomSymbols(400, 250, 2);
    const unique = bruteScan(y, 250, { maxN: 12, batchLength: 1, sampleStride: 50, matchWindow: 200 });
    expect(unique.exhausted).toBe(true);
    const codes = analyzeFromScan(unique, inputOf(400, 250), settings).warnings.map((w) => w.code);
    expect(codes).toContain('all-unique');
    expect(codes).toContain('range-empty');
  });
});

describe('analyzeSequence', () => {
  it('runs the engine, reports progress per level and takes symbols and alphabet from the sequence', () => {
    // source: API contract
    const seq = sequenceOf(stickyChain(5000, 1), 2);
    const seen: number[] = [];
    const r = analyzeSequence(seq, { name: 'chain', sha256: null, format: 'generated' }, settings, { onLevel: (n) => seen.push(n) });
    expect(seen).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
    const { alphabet, alphabetUnlisted, ...rest } = r.input;
    expect(rest).toEqual({ name: 'chain', sha256: null, format: 'generated', symbols: 5000, alphabetSize: 2 });
    expect(alphabetUnlisted).toBe(0);
    expect(alphabet!.reduce((sum, s) => sum + s.count, 0)).toBe(5000);
    expect(r.reference).toBeNull();
  });

  it('stops with ScanCancelled when asked, and states reference facts in the output unit', () => {
    // source: API contract; log2(e) = 1/ln 2 converts nats to bits (common practice, no source)
    const seq = sequenceOf(randomSymbols(3000, 2, 5), 2);
    expect(() => analyzeSequence(seq, { name: 'x', sha256: null, format: 'generated' }, settings, { shouldStop: () => true })).toThrow(ScanCancelled);
    const reference = { source: 'chain', entropyRateNats: 0.5, sigma2Nats: 0.25 };
    const input = { name: 'x', sha256: null, format: 'generated' };
    expect(analyzeSequence(seq, input, settings, { reference }).reference).toEqual({ source: 'chain', entropyRate: 0.5, sigma2: 0.25 });
    const inBits = analyzeSequence(seq, input, { ...settings, unit: 'bit' }, { reference }).reference!;
    expect(inBits.entropyRate).toBeCloseTo(0.5 / Math.LN2, 12);
    expect(inBits.sigma2).toBeCloseTo(0.25 / Math.LN2 ** 2, 12);
  });

  it('rejects bad settings before scanning', () => {
    // source: API contract
    const seq = sequenceOf(randomSymbols(100, 2, 5), 2);
    expect(() => analyzeSequence(seq, { name: 'x', sha256: null, format: 'generated' }, { ...settings, maxN: 100 })).toThrow(RangeError);
  });
});
