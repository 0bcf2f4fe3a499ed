import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { scanWaitingTimes } from '../../../src/core/cross/scanWaitingTimes';
import { ScanCancelled } from '../../../src/core/returns/partitionLevel';
import { bruteWaiting } from '../../helpers/bruteWaiting';

function scanAll(a: number[], b: number[], k: number, maxN: number): { waits: Int32Array[]; scan: ReturnType<typeof scanWaitingTimes> } {
  const waits: Int32Array[] = [];
  const scan = scanWaitingTimes(a, b, k, {
    maxN,
    batchTarget: 8,
    sampleTarget: 16,
    onLevel: (level, w) => waits.push(w.slice(0, level.positions)),
  });
  return { waits, scan };
}

describe('scanWaitingTimes', () => {
  it('equals the brute-force definition of W_n on random pairs (alphabets 1-4, lengths 1-200)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 4 }).chain((k) =>
          fc.record({
            k: fc.constant(k),
            a: fc.array(fc.integer({ min: 0, max: k - 1 }), { minLength: 1, maxLength: 200 }),
            b: fc.array(fc.integer({ min: 0, max: k - 1 }), { minLength: 1, maxLength: 200 }),
            maxN: fc.integer({ min: 1, max: 12 }),
          }),
        ),
        ({ k, a, b, maxN }) => {
          const top = Math.min(maxN, a.length);
          const { waits, scan } = scanAll(a, b, k, top);
          const brute = bruteWaiting(a, b, top);
          for (let n = 1; n <= top; n++) {
            expect(Array.from(waits[n - 1]!)).toEqual(Array.from(brute[n - 1]!));
            const level = scan.levels[n - 1]!;
            const row = brute[n - 1]!;
            let observed = 0;
            let sumLog = 0;
            for (const w of row) {
              if (w > 0) {
                observed++;
                sumLog += Math.log(w);
              }
            }
            expect(level.observed).toBe(observed);
            expect(level.censored).toBe(row.length - observed);
            expect(level.sumLog).toBeCloseTo(sumLog, 9);
            let batchTotal = 0;
            for (const o of level.batchObserved) batchTotal += o;
            expect(batchTotal).toBe(observed);
          }
        },
      ),
      { numRuns: 400, seed: 20261201 },
    );
  });

  it('marks every block holding a symbol that B lacks as censored, at every n', () => {
    // A = 0 1 2 0 1, B = 0 1 0 1: symbol 2 never occurs in B.
    const { waits } = scanAll([0, 1, 2, 0, 1], [0, 1, 0, 1], 3, 3);
    expect(Array.from(waits[0]!)).toEqual([1, 2, 0, 1, 2]);
    expect(Array.from(waits[1]!)).toEqual([1, 0, 0, 1]);
    expect(Array.from(waits[2]!)).toEqual([0, 0, 0]);
  });

  it('records log W for the sampled positions, NaN and a flag where censored', () => {
    const { scan } = scanAll([0, 1, 2, 0, 1], [0, 1, 0, 1], 3, 2);
    // Position 0: W_1 = W_2 = 1 (B starts with 0 1); position 1: W_1 = 2, W_2 censored (1 2 not in B).
    expect(scan.sample.logWait[0]).toBeCloseTo(0, 12);
    expect(scan.sample.logWait[1]).toBeCloseTo(0, 12);
    expect(scan.sample.logWait[2]).toBeCloseTo(Math.log(2), 12);
    expect(scan.sample.censored[3]).toBe(1);
    // Position 2 (symbol 2) is censored at n = 1 and 2.
    const s = Array.from(scan.sample.positions).indexOf(2);
    expect(Number.isNaN(scan.sample.logWait[s * 2]!)).toBe(true);
    expect(scan.sample.censored[s * 2]).toBe(1);
  });

  it('stops with ScanCancelled when asked, and rejects bad parameters', () => {
    expect(() => scanWaitingTimes([0, 1], [0, 1], 2, { maxN: 2, shouldStop: () => true })).toThrow(ScanCancelled);
    expect(() => scanWaitingTimes([0, 1], [0, 1], 2, { maxN: 3 })).toThrow(/maxN/);
    expect(() => scanWaitingTimes([0, 5], [0, 1], 2, { maxN: 1 })).toThrow(/symbol 5 at A\[1\]/);
    expect(() => scanWaitingTimes([0], [], 2, { maxN: 1 })).toThrow(/B is empty/);
  });
});
