import { describe, expect, test } from 'vitest';
import { estimateBetaMixing, mixingBlockPlan, mixingGaps, PAIRS_PER_CELL, SIGNAL_FACTOR } from '../../../src/core/diagnostics/betaMixing';
import { iidSource } from '../../../src/core/sources/iidSource';
import { markovSource } from '../../../src/core/sources/markovSource';
import { renewalSource } from '../../../src/core/sources/renewalSource';

type M2 = readonly [readonly [number, number], readonly [number, number]];

/** k-step matrix of a 2x2 transition matrix by repeated multiplication. */
function power2(P: M2, k: number): M2 {
  let M: M2 = [
    [1, 0],
    [0, 1],
  ];
  for (let i = 0; i < k; i++) {
    M = [
      [M[0][0] * P[0][0] + M[0][1] * P[1][0], M[0][0] * P[0][1] + M[0][1] * P[1][1]],
      [M[1][0] * P[0][0] + M[1][1] * P[1][0], M[1][0] * P[0][1] + M[1][1] * P[1][1]],
    ];
  }
  return M;
}

describe('estimateBetaMixing', () => {
  test('matches the exact beta(k) of a two-state chain at block length 1', () => {
    // beta(k) = (1/2) sum_x sum_y pi_x |P^k_xy - pi_y|: the absolute-regularity coefficient of
    // sigma(X_0) and sigma(X_k) (Bradley, Probab. Surveys 2 (2005) 107-144, section 2; for a Markov
    // chain the past and future sigma-fields reduce to X_0 and X_k by the Markov property, from
    // memory). Our gap k puts the second 1-block at t + k, so P^(k) is the k-step matrix.
    const P: M2 = [
      [0.9, 0.1],
      [0.4, 0.6],
    ];
    const pi = [0.8, 0.2] as const; // THEORY.md section 2 [calc]
    const gaps = [1, 2, 3, 4, 5, 6, 8, 10];
    const seq = markovSource(P.map((row) => [...row])).generate(1_000_000, 2026);
    const est = estimateBetaMixing(seq.symbols, 2, { blockLength: 1, gaps });
    expect(est).not.toBeNull();
    if (est === null) return;
    expect(est.blockLength).toBe(1);
    expect(est.stride).toBe(1);
    gaps.forEach((k, i) => {
      const Pk = power2(P, k);
      let exact = 0;
      for (const x of [0, 1] as const) for (const y of [0, 1] as const) exact += 0.5 * pi[x] * Math.abs(Pk[x][y] - pi[y]);
      // The noise floor is sqrt(2/pi) times the standard deviation of the cell errors under
      // independence; dependence between pairs of this chain inflates the variance by at most
      // (1 + 0.5)/(1 - 0.5) = 3 (second eigenvalue 0.5). 6 floors = 4.8 sd = 2.8 inflated sd.
      expect(Math.abs((est.beta[i] ?? Number.NaN) - exact)).toBeLessThan(6 * (est.noiseFloor[i] ?? Number.NaN));
    });
  });

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
