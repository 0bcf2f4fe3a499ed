import { describe, expect, it } from 'vitest';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { uniformInt } from 'pure-rand/distribution/uniformInt';
import { bruteScan } from './bruteScan';
import { expectScansAgree } from './expectScansAgree';
import { scanReturns } from '../../src/core/returns/scanReturns';

function ids(text: string): Uint8Array {
  const map = new Map<string, number>();
  return Uint8Array.from([...text].map((c) => (map.has(c) ? map.get(c)! : (map.set(c, map.size), map.size - 1))));
}

function forwardAt(scan: ReturnType<typeof bruteScan>, n: number): number[] {
  const { positions, forward, maxN } = scan.paths;
  const out: number[] = [];
  for (let s = 0; s < positions.length; s++) if (positions[s]! <= scan.length - n) out.push(forward[s * maxN + n - 1]!);
  return out;
}

describe('bruteScan', () => {
  it('gives the forward returns of "abracadabra" at n = 1 and 4, censored ones as -(bound + 1)', () => {
    // source: THEORY.md section 9 [calc]; ">k" there is written -(k + 1) here
    const scan = bruteScan(ids('abracadabra'), 5, { maxN: 4, batchLength: 4, sampleStride: 1, matchWindow: 5 });
    expect(forwardAt(scan, 1)).toEqual([3, 7, 7, 2, -7, 2, -5, 3, -3, -2, -1]);
    expect(forwardAt(scan, 4)).toEqual([7, -7, -6, -5, -4, -3, -2, -1]);
  });

  it('counts "abracadabra" 1-blocks by hand: 5 distinct, 2 singletons, sum c log c = 5 log 5 + 2 (2 log 2)', () => {
    // source: by hand (a x5, b x2, r x2, c x1, d x1)
    const level = bruteScan(ids('abracadabra'), 5, { maxN: 1, batchLength: 4, sampleStride: 1, matchWindow: 5 }).levels[0]!;
    expect(level.distinctBlocks).toBe(5);
    expect(level.singletons).toBe(2);
    expect(level.sumCountLogCount).toBeCloseTo(5 * Math.log(5) + 4 * Math.log(2), 12);
  });

  it('agrees with the fast engine on every LevelStats field for random sequences', () => {
    const rng = xoroshiro128plus(20260601);
    for (const [N, a] of [
      [300, 2],
      [517, 3],
      [1000, 4],
    ] as const) {
      const x = new Uint8Array(N);
      for (let i = 0; i < N; i++) x[i] = uniformInt(rng, 0, a - 1);
      const maxN = 12;
      const fast = scanReturns(x, a, { maxN, batchTarget: 64, sampleTarget: 32 });
      const stride = fast.paths.positions.length > 1 ? fast.paths.positions[1]! : N;
      const slow = bruteScan(x, a, { maxN, batchLength: fast.batchLength, sampleStride: stride, matchWindow: fast.matchWindow });
      expect(slow.batchCount).toBe(fast.batchCount);
      expectScansAgree(fast, slow, maxN);
      for (let n = 1; n <= maxN; n++) {
        const s = slow.levels[n - 1]!;
        const f = fast.levels[n - 1]!;
        for (let b = 0; b < s.batchSumLog.length; b++) {
          expect(f.batchSumLog[b]).toBeCloseTo(s.batchSumLog[b]!, 6);
          expect(f.batchSumLog2[b]).toBeCloseTo(s.batchSumLog2[b]!, 6);
          expect(f.batchSumLogCount[b]).toBeCloseTo(s.batchSumLogCount[b]!, 6);
        }
      }
    }
  });
});
