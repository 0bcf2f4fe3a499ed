import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { scanReturns } from '../../../src/core/returns/scanReturns';
import { bruteScan } from '../../helpers/bruteScan';
import { expectScansAgree } from '../../helpers/expectScansAgree';

// Property test of the whole engine against the O(N^2) oracle on every LevelStats field. The
// oracle check in test/helpers/bruteScan.test.ts uses three fixed random sequences of 2 to 4
// symbols, and scanReturns.test.ts checks forward returns and block counts only; this one draws
// the shapes that take other code paths: binary classes (partitionBinaryLevel), alphabets above
// 256 (16- and 32-bit symbol arrays, no carried words), long runs and periodic data (classes that
// never split), random batch and sample sizes, and maxN up to N.

const SEED = 20261202;

type Case = { a: number; xs: number[] };

const random = (aMax: number, nMax: number): fc.Arbitrary<Case> =>
  fc.integer({ min: 1, max: aMax }).chain((a) => fc.array(fc.integer({ min: 0, max: a - 1 }), { minLength: 2, maxLength: nMax }).map((xs) => ({ a, xs })));

const shapes: fc.Arbitrary<Case> = fc.oneof(
  { weight: 3, arbitrary: random(2, 400) },
  { weight: 2, arbitrary: random(6, 300) },
  // a large alphabet whose ids spread up to 70000 (32-bit symbol arrays), few of them used
  { weight: 1, arbitrary: fc.array(fc.constantFrom(0, 1, 300, 65_535, 69_999), { minLength: 2, maxLength: 200 }).map((xs) => ({ a: 70_000, xs })) },
  // long runs: a sticky binary chain written as run lengths
  { weight: 1, arbitrary: fc.array(fc.integer({ min: 1, max: 40 }), { minLength: 1, maxLength: 20 }).map((runs) => ({ a: 2, xs: runs.flatMap((r, i) => new Array<number>(r).fill(i % 2)) })).filter((c) => c.xs.length >= 2) },
  // periodic with a random motif
  { weight: 1, arbitrary: fc.tuple(fc.array(fc.integer({ min: 0, max: 3 }), { minLength: 1, maxLength: 9 }), fc.integer({ min: 2, max: 300 })).map(([m, len]) => ({ a: 4, xs: Array.from({ length: len }, (_, i) => m[i % m.length]!) })) },
);

function symbolsOf({ a, xs }: Case): Uint8Array | Uint16Array | Int32Array {
  return a <= 256 ? Uint8Array.from(xs) : a <= 65_536 ? Uint16Array.from(xs) : Int32Array.from(xs);
}

describe('scanReturns against the brute-force oracle (property)', () => {
  it('every LevelStats field, paths and flags agree for random, large-alphabet, run-heavy and periodic sequences', () => {
    fc.assert(
      fc.property(shapes, fc.integer({ min: 1, max: 16 }), fc.integer({ min: 1, max: 64 }), fc.integer({ min: 1, max: 64 }), (c, nWanted, batchTarget, sampleTarget) => {
        const x = symbolsOf(c);
        const N = x.length;
        const maxN = Math.min(nWanted, N);
        const fast = scanReturns(x, c.a, { maxN, batchTarget, sampleTarget });
        const stride = fast.paths.positions.length > 1 ? fast.paths.positions[1]! : N;
        const slow = bruteScan(x, c.a, { maxN, batchLength: fast.batchLength, sampleStride: stride, matchWindow: fast.matchWindow });
        expectScansAgree(fast, slow, maxN);
      }),
      { numRuns: 400, seed: SEED },
    );
  });

  it('renaming the symbols (any injective relabelling) changes no statistic', () => {
    fc.assert(
      fc.property(random(5, 300), fc.integer({ min: 1, max: 12 }), fc.integer({ min: 0, max: 1000 }), ({ a, xs }, nWanted, shift) => {
        const maxN = Math.min(nWanted, xs.length);
        const size = a + shift;
        // reversal plus an offset is injective on 0..a-1 and lands in 0..size-1
        const renamed = xs.map((v) => a - 1 - v + shift);
        const one = scanReturns(Uint8Array.from(xs), a, { maxN });
        const two = scanReturns(size <= 256 ? Uint8Array.from(renamed) : Uint16Array.from(renamed), size, { maxN });
        expect(two.levels.map((l) => [l.positions, l.distinctBlocks, l.observed, l.forwardObserved, l.singletons])).toEqual(one.levels.map((l) => [l.positions, l.distinctBlocks, l.observed, l.forwardObserved, l.singletons]));
        expect(Array.from(two.paths.forward)).toEqual(Array.from(one.paths.forward));
      }),
      { numRuns: 300, seed: SEED + 1 },
    );
  });
});
