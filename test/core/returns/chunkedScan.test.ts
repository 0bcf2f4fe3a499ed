import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CHUNKS_PER_THREAD, chunkBounds, chunkPlan, mergedPositions, mergeScanParts, partMerger, scanChunk, scanChunked, scanChunkedOn } from '../../../src/core/returns/chunkedScan';
import { inThisThread, type ScanRunner } from '../../../src/core/returns/scanJobs';
import type { LevelStats, ReturnScan } from '../../../src/core/returns/levelStats';
import { mergeLevelStats } from '../../../src/core/returns/mergeLevels';
import { scanReturns } from '../../../src/core/returns/scanReturns';
import { bruteScan } from '../../helpers/bruteScan';

/** Relative closeness for sums taken in a different order (a few ulps per term). */
function close(actual: number, expected: number, label: string): void {
  const tol = 1e-9 * Math.max(1, Math.abs(expected));
  if (!(Math.abs(actual - expected) <= tol)) throw new Error(`${label}: ${actual} differs from ${expected}`);
}

function closeArrays(actual: ArrayLike<number>, expected: ArrayLike<number>, label: string): void {
  const len = Math.max(actual.length, expected.length);
  for (let i = 0; i < len; i++) close(actual[i] ?? 0, expected[i] ?? 0, `${label}[${i}]`);
}

/** xorshift32 from a seed: test data only (common practice, no source). */
function randomSymbols(length: number, alphabet: number, seed: number, shift = 0): Uint8Array {
  let s = seed >>> 0 || 1;
  const out = new Uint8Array(length);
  for (let i = 0; i < length; i++) {
    s ^= s << 13;
    s >>>= 0;
    s ^= s >>> 17;
    s ^= s << 5;
    s >>>= 0;
    out[i] = shift + (s % alphabet);
  }
  return out;
}

describe('chunkPlan', () => {
  it('rounds the chunk size up to the batch grid and gives the remainder to the last chunk', () => {
    // N = 10000: batch length and stride are the powers of two at least 10000/256 = 39.06, i.e. 64
    const plan = chunkPlan(10000, 1000, 10);
    expect(plan.batchLength).toBe(64);
    expect(plan.stride).toBe(64);
    expect(plan.chunkSize).toBe(1024); // 16 * 64
    expect(plan.chunkCount).toBe(9); // floor(10000 / 1024)
    expect(chunkBounds(plan, 8)).toEqual({ offset: 8192, length: 1808 });
    expect(plan.matchWindow).toBe(512);
    expect(mergedPositions(plan, 3)).toBe(10000 - 9 * 2);
    expect(() => chunkBounds(plan, 9)).toThrow('there is no part 9: the plan has parts 0 to 8');
    expect(() => chunkPlan(10000, 10, 10)).toThrow('above maxN = 10');
  });
});

describe('scanChunked', () => {
  it('with one chunk equals the unchunked scan field for field', () => {
    fc.assert(
      fc.property(fc.integer({ min: 20, max: 3000 }), fc.integer({ min: 2, max: 5 }), fc.integer({ min: 1, max: 1e9 }), (N, a, seed) => {
        const x = randomSymbols(N, a, seed);
        const maxN = Math.min(12, N - 1);
        const plan = chunkPlan(N, N, maxN);
        expect(plan.chunkCount).toBe(1);
        expect(scanChunked(x, a, plan)).toEqual(scanReturns(x, a, { maxN }));
      }),
      { numRuns: 40 },
    );
  });

  it('equals the brute-force statistics of every chunk taken as a sequence of its own, added on the shared batch grid', () => {
    fc.assert(
      fc.property(fc.integer({ min: 600, max: 2500 }), fc.integer({ min: 100, max: 700 }), fc.integer({ min: 2, max: 4 }), fc.integer({ min: 1, max: 1e9 }), (N, size, a, seed) => {
        const x = randomSymbols(N, a, seed);
        const maxN = 8;
        const plan = chunkPlan(N, size, maxN);
        const merged = scanChunked(x, a, plan);
        // Oracle: bruteScan of each chunk, summed with every count read against the merged positions.
        for (let n = 1; n <= maxN; n++) {
          const P = mergedPositions(plan, n);
          const want = { observed: 0, sumLog: 0, sumLog2: 0, forwardSumLog: 0, sumCountLogCount: 0, sumLogRc: 0, distinct: 0, matchCount: 0 };
          const batches = new Float64Array(plan.batchCount);
          const batchCounts = new Float64Array(plan.batchCount);
          const histogram: number[] = [];
          for (let k = 0; k < plan.chunkCount; k++) {
            const { offset, length } = chunkBounds(plan, k);
            const brute = bruteScan(x.subarray(offset, offset + length), a, { maxN, batchLength: plan.batchLength, sampleStride: plan.stride, matchWindow: plan.matchWindow });
            const l = brute.levels[n - 1]!;
            const d = Math.log(P / l.positions);
            want.observed += l.observed;
            want.sumLog += l.sumLog;
            want.sumLog2 += l.sumLog2;
            want.forwardSumLog += l.forwardSumLog;
            want.sumCountLogCount += l.sumCountLogCount + l.positions * d;
            want.sumLogRc += l.sumLogRc + l.observed * d;
            want.distinct += l.distinctBlocks;
            want.matchCount += l.matchCount;
            l.histogram.forEach((v, i) => (histogram[i] = (histogram[i] ?? 0) + v));
            const first = offset / plan.batchLength;
            l.batchSumLog.forEach((v, b) => (batches[first + b] = batches[first + b]! + v));
            l.batchSumLogCount.forEach((v, b) => (batchCounts[first + b] = batchCounts[first + b]! + v));
            for (let p = 0; p < l.positions; p++) {
              const b = first + (p >> Math.log2(plan.batchLength));
              batchCounts[b] = batchCounts[b]! + d;
            }
          }
          const got = merged.levels[n - 1]!;
          expect(got.positions).toBe(P);
          expect(got.observed).toBe(want.observed);
          expect(got.distinctBlocks).toBe(want.distinct);
          expect(got.matchCount).toBe(want.matchCount);
          close(got.sumLog, want.sumLog, 'sumLog');
          close(got.sumLog2, want.sumLog2, 'sumLog2');
          close(got.forwardSumLog, want.forwardSumLog, 'forwardSumLog');
          close(got.sumCountLogCount, want.sumCountLogCount, 'sumCountLogCount');
          close(got.sumLogRc, want.sumLogRc, 'sumLogRc');
          closeArrays(got.histogram, histogram, 'histogram');
          closeArrays(got.batchSumLog, batches, 'batchSumLog');
          closeArrays(got.batchSumLogCount, batchCounts, 'batchSumLogCount');
        }
      }),
      { numRuns: 15 },
    );
  });

  it('equals the unchunked scan exactly where no block recurs across a chunk boundary (chunks over disjoint alphabets)', () => {
    // Chunk k uses symbols {2k, 2k+1} only, so every block inside a chunk recurs only inside it and
    // every block across a boundary is unique: the forward returns and block counts of the
    // unchunked scan are the chunks' own, and the boundary blocks are its extra singletons.
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 4 }), fc.integer({ min: 1, max: 1e9 }), fc.integer({ min: 0, max: 300 }), (chunks, seed, extra) => {
        const size = 256;
        const N = chunks * size + extra;
        const maxN = 9;
        const plan = chunkPlan(N, size, maxN, N);
        const x = new Uint8Array(N);
        for (let k = 0; k < plan.chunkCount; k++) {
          const { offset, length } = chunkBounds(plan, k);
          x.set(randomSymbols(length, 2, seed + k, 2 * k), offset);
        }
        const a = 2 * plan.chunkCount;
        const whole = scanReturns(x, a, { maxN, batchLength: plan.batchLength, sampleStride: 1 });
        const merged = scanChunked(x, a, plan);
        for (let n = 1; n <= maxN; n++) {
          const w = whole.levels[n - 1]!;
          const m = merged.levels[n - 1]!;
          const straddling = (plan.chunkCount - 1) * (n - 1);
          expect(m.positions + straddling).toBe(w.positions);
          expect(m.distinctBlocks + straddling).toBe(w.distinctBlocks);
          expect(m.singletons + straddling).toBe(w.singletons);
          expect(m.forwardObserved).toBe(w.forwardObserved);
          close(m.forwardSumLog, w.forwardSumLog, 'forwardSumLog');
          close(m.forwardSumLog2, w.forwardSumLog2, 'forwardSumLog2');
          // Frequencies read against the merged positions: c log(c P / P_k) summed.
          let expected = w.sumCountLogCount;
          for (let k = 0; k < plan.chunkCount; k++) {
            const Pk = chunkBounds(plan, k).length - n + 1;
            expected += Pk * Math.log(m.positions / Pk);
          }
          close(m.sumCountLogCount, expected, `sumCountLogCount n=${n}`);
        }
        // Every sampled position: the same observed forward return, the same block count (rescaled).
        for (let s = 0; s < merged.paths.positions.length; s++) {
          const p = merged.paths.positions[s]!;
          for (let n = 1; n <= maxN; n++) {
            const r = merged.paths.forward[s * maxN + n - 1]!;
            const rw = whole.paths.forward[p * maxN + n - 1]!;
            if (r > 0) expect(r).toBe(rw);
            else if (rw > 0) throw new Error(`position ${p} n ${n}: censored in the chunk but returns at ${rw}`);
          }
        }
      }),
      { numRuns: 25 },
    );
  });

  it('scanChunkedOn runs every chunk as a job and merges them exactly as scanChunked', async () => {
    // The oracle is scanChunked (brute-force checked above); same chunks, same merge: equal to the bit.
    const x = randomSymbols(9000, 3, 17);
    const plan = chunkPlan(x.length, 600, 8);
    const batches: string[][] = [];
    const run: ScanRunner = (jobs) => {
      batches.push(jobs.map((j) => j.kind));
      return inThisThread(jobs);
    };
    const shared = await scanChunkedOn(x, 3, plan, 1, run);
    expect(shared).toEqual(scanChunked(x, 3, plan));
    // Batches of CHUNKS_PER_THREAD chunks per thread, merged as they come.
    expect(batches.flat()).toEqual(Array.from({ length: plan.chunkCount }, () => 'chunk'));
    expect(batches.length).toBe(Math.ceil(plan.chunkCount / CHUNKS_PER_THREAD));
    // The merge of all parts at once agrees to the bit; a part out of order is refused.
    const parts = Array.from({ length: plan.chunkCount }, (_, k) => {
      const { offset, length } = chunkBounds(plan, k);
      return scanChunk(x.subarray(offset, offset + length), 3, plan, k);
    });
    expect(mergeScanParts([...parts].reverse())).toEqual(shared);
    const merger = partMerger(plan);
    expect(() => merger.add(parts[1]!)).toThrow('part 1 came where part 0 was due');
  });

  it('merges parts given in any order, and refuses a missing, repeated or foreign part', () => {
    const x = randomSymbols(5000, 3, 7);
    const plan = chunkPlan(5000, 1000, 6);
    const parts = Array.from({ length: plan.chunkCount }, (_, k) => {
      const { offset, length } = chunkBounds(plan, k);
      return scanChunk(x.subarray(offset, offset + length), 3, plan, k);
    });
    expect(mergeScanParts([...parts].reverse())).toEqual(mergeScanParts(parts));
    expect(mergeScanParts(parts)).toEqual(scanChunked(x, 3, plan));
    expect(() => mergeScanParts(parts.slice(1))).toThrow('parts missing: 0 (of 0 to 3)');
    expect(() => mergeScanParts([...parts, parts[0]!])).toThrow('part 0 is given twice');
    const other = scanChunk(x.subarray(0, 1024), 3, chunkPlan(5000, 1000, 5), 0);
    expect(() => mergeScanParts([...parts.slice(1), other])).toThrow('different chunk plan');
  });

  it('mergeLevelStats is associative and commutative up to rounding', () => {
    const levelsOf = (seed: number): ReturnScan => scanReturns(randomSymbols(2048, 2, seed), 2, { maxN: 4, batchLength: 16 });
    const [a, b, c] = [levelsOf(1), levelsOf(2), levelsOf(3)].map((s) => s.levels[2]!) as [LevelStats, LevelStats, LevelStats];
    const left = mergeLevelStats(mergeLevelStats(a, b), c);
    const right = mergeLevelStats(a, mergeLevelStats(c, b));
    for (const key of ['positions', 'distinctBlocks', 'singletons', 'observed', 'sumLog', 'sumLog2', 'sumLogRc2', 'matchCount'] as const) {
      close(left[key], right[key], key);
    }
    closeArrays(left.histogram, right.histogram, 'histogram');
    closeArrays(left.batchSumLogCount, right.batchSumLogCount, 'batchSumLogCount');
    expect(() => mergeLevelStats(a, levelsOf(1).levels[1]!)).toThrow('different block lengths 3 and 2');
  });
});
