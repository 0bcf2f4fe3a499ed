import { describe, expect, test } from 'vitest';
import { estimateBetaMixing, mixingBlockPlan, mixingGaps, PAIRS_PER_CELL, SIGNAL_FACTOR } from '../../../src/core/diagnostics/betaMixing';
import { iidSource } from '../../../src/core/sources/iidSource';
import { markovSource } from '../../../src/core/sources/markovSource';
import { renewalSource } from '../../../src/core/sources/renewalSource';

describe('estimateBetaMixing', () => {
  test('an i.i.d. source stays at its noise floor at every gap', () => {
    const seq = iidSource([0.5, 0.3, 0.2]).generate(300_000, 11);
    const est = estimateBetaMixing(seq.symbols, 3);
    expect(est).not.toBeNull();
    if (est === null) return;
    // Rule: 3^(2m) <= 300000 / 1000 gives m = 2 (81 cells).
    expect(est.blockLength).toBe(2);
    const ratio = est.beta.map((b, i) => b / (est.noiseFloor[i] ?? Number.NaN));
    for (const r of ratio) expect(r).toBeLessThan(SIGNAL_FACTOR);
    // The floor is the expected estimate under independence: the mean ratio over gaps is 1 within
    // 4 standard errors, the SE taken from the spread of the ratios across gaps (independent
    // replicates up to the overlap of pairs).
    const mean = ratio.reduce((a, b) => a + b, 0) / ratio.length;
    const sd = Math.sqrt(ratio.reduce((a, b) => a + (b - mean) ** 2, 0) / (ratio.length - 1));
    expect(Math.abs(mean - 1)).toBeLessThan(4 * (sd / Math.sqrt(ratio.length)));
  });

  test('the slowly mixing renewal chain keeps more dependence at a fixed gap than a fast chain', () => {
    const N = 1_000_000;
    const fast = markovSource([
      [0.5, 0.5],
      [0.3, 0.7],
    ]).generate(N, 5);
    const slow = renewalSource(1.5).generate(N, 5); // catalog entry with tail exponent 1.5
    const gaps = [1, 2, 4, 8, 16, 32];
    const a = estimateBetaMixing(fast.symbols, 2, { gaps });
    const b = estimateBetaMixing(slow.symbols, 2, { gaps });
    expect(a).not.toBeNull();
    expect(b).not.toBeNull();
    if (a === null || b === null) return;
    expect(a.blockLength).toBe(b.blockLength);
    // Gap 16: the fast chain (second eigenvalue 0.2, 0.2^16 ~ 7e-12) is at its floor; the renewal
    // chain's beta falls only polynomially. Margin: 4 noise floors of each estimate.
    const i = gaps.indexOf(16);
    const at = (v: readonly number[]): number => v[i] ?? Number.NaN;
    expect(at(b.beta) - at(a.beta)).toBeGreaterThan(4 * (at(a.noiseFloor) + at(b.noiseFloor)));
    expect(at(a.beta)).toBeLessThan(SIGNAL_FACTOR * at(a.noiseFloor));
  });

  test('samples pairs with a stride beyond maxPairs and coarsens large alphabets', () => {
    const seq = iidSource(new Array<number>(50).fill(1 / 50)).generate(200_000, 3);
    const est = estimateBetaMixing(seq.symbols, 50, { maxPairs: 100_000, gaps: [1, 2] });
    expect(est).not.toBeNull();
    if (est === null) return;
    expect(est.stride).toBe(2);
    // 100000 / 1000 = 100 cells at most: 50^2 is too many, so L = floor(sqrt(100)) = 10 classes.
    expect(est.symbolsKept).toBe(10);
    expect(est.cells).toBe(100);
    expect(est.pairs[0]).toBe(Math.floor((200_000 - 2) / 2) + 1);
  });

  test('rejects bad gaps and returns null for very short input', () => {
    const seq = iidSource([0.5, 0.5]).generate(10_000, 1);
    expect(() => estimateBetaMixing(seq.symbols, 2, { gaps: [0] })).toThrow(RangeError);
    // 3000 pairs allow 3 cells, fewer than the 4 of the smallest table.
    expect(estimateBetaMixing(seq.symbols.subarray(0, 3000), 2)).toBeNull();
  });
});

describe('mixingBlockPlan and mixingGaps', () => {
  test('block length is the largest m with A^(2m) <= pairs / PAIRS_PER_CELL', () => {
    expect(PAIRS_PER_CELL).toBe(1000);
    expect(mixingBlockPlan(1_000_000, 2)).toEqual({ symbols: 2, blockLength: 4 }); // 256 <= 1000 < 1024
    expect(mixingBlockPlan(1 << 20, 4)).toEqual({ symbols: 4, blockLength: 2 }); // 256 <= 1048 < 4096
    expect(mixingBlockPlan(3000, 2)).toBeNull();
  });
  test('gaps run 1..8 then about 25% apart', () => {
    expect(mixingGaps(20)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 10, 13, 16, 20]);
  });
});
