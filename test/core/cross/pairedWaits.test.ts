import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { pairedWaits } from '../../../src/core/cross/pairedWaits';
import { bruteWaiting } from '../../helpers/bruteWaiting';

describe('pairedWaits', () => {
  it('pools per pair the brute-force waits of A segment g in B segment g, censored at log(|B_g| - n + 2)', () => {
    fc.assert(
      fc.property(
        fc.record({
          a: fc.array(fc.integer({ min: 0, max: 2 }), { minLength: 12, maxLength: 150 }),
          b: fc.array(fc.integer({ min: 0, max: 2 }), { minLength: 12, maxLength: 150 }),
          pairs: fc.integer({ min: 1, max: 4 }),
          maxN: fc.integer({ min: 1, max: 3 }),
        }),
        ({ a, b, pairs, maxN }) => {
          const r = pairedWaits(Int32Array.from(a), Int32Array.from(b), 3, { maxN, pairs });
          for (let g = 0; g < pairs; g++) {
            const segA = a.slice(r.startsA[g], r.startsA[g + 1]);
            const segB = b.slice(r.startsB[g], r.startsB[g + 1]);
            const brute = bruteWaiting(segA, segB, maxN);
            for (let n = 1; n <= maxN; n++) {
              const row = brute[n - 1]!;
              let sum = 0;
              let observed = 0;
              for (const w of row) {
                if (w > 0) observed++;
                sum += w > 0 ? Math.log(w) : Math.log(Math.max(1, segB.length - n + 2));
              }
              const level = r.levels[n - 1]!;
              expect(level.pairPositions[g]).toBe(row.length);
              expect(level.pairObserved[g]).toBe(observed);
              expect(level.pairSumLog[g]).toBeCloseTo(sum, 9);
            }
          }
        },
      ),
      { numRuns: 200, seed: 7 },
    );
  });
});
