import { describe, expect, it } from 'vitest';
import {
  checkTransitionMatrix,
  markovEntropyRate,
  markovFunctionalMoments,
  markovVarentropyRate,
  stationaryDistribution,
} from '../../../src/core/sources/markovEntropy';

describe('checkTransitionMatrix', () => {
  it('rejects negative entries, rows not summing to 1, non-square shapes and reducible chains', () => {
    expect(() => checkTransitionMatrix([[1.1, -0.1], [0.5, 0.5]])).toThrow(/entry \(0, 1\) is -0.1/);
    expect(() => checkTransitionMatrix([[0.5, 0.4], [0.5, 0.5]])).toThrow(/row 1 sums to 0.9/);
    expect(() => checkTransitionMatrix([[0.5, 0.5, 0], [0.5, 0.5, 0]])).toThrow(RangeError);
    expect(() => checkTransitionMatrix([[Number.NaN, 1], [0.5, 0.5]])).toThrow(/NaN/);
    expect(() => checkTransitionMatrix([])).toThrow(/no rows/);
    expect(() => checkTransitionMatrix([[1, 0], [0, 1]])).toThrow(/reducible with 2 closed classes/);
  });

  it('rescales rows that sum to 1 within 1e-9 and reports the period', () => {
    const chain = checkTransitionMatrix([
      [0, 1 + 5e-10],
      [1, 0],
    ]);
    expect(chain.transitions[1]).toBe(1);
    expect(chain.period).toBe(2);
  });
});

describe('stationaryDistribution', () => {
  it('solves pi P = pi for a chain with a transient state, giving it mass 0', () => {
    // State 0 leaves at once; states 1, 2 form a symmetric closed class: pi = (0, 1/2, 1/2) by hand.
    const pi = stationaryDistribution([
      [0, 0.5, 0.5],
      [0, 0.3, 0.7],
      [0, 0.7, 0.3],
    ]);
    expect(pi[0]).toBe(0);
    expect(pi[1]).toBeCloseTo(0.5, 14);
    expect(pi[2]).toBeCloseTo(0.5, 14);
  });

  it('handles a periodic chain (uniform law on a 3-cycle)', () => {
    const pi = stationaryDistribution([
      [0, 1, 0],
      [0, 0, 1],
      [1, 0, 0],
    ]);
    for (let i = 0; i < 3; i++) expect(pi[i]).toBeCloseTo(1 / 3, 14);
  });
});

describe('markovEntropyRate and markovVarentropyRate', () => {
  it('give 0 and 0 for a deterministic cycle', () => {
    const cycle = [
      [0, 1],
      [1, 0],
    ];
    expect(markovEntropyRate(cycle)).toBe(0);
    expect(markovVarentropyRate(cycle)).toBe(0);
  });

  it('give log k and 0 for the uniform chain on k states', () => {
    const k = 5;
    const rows = Array.from({ length: k }, () => new Array<number>(k).fill(1 / k));
    expect(markovEntropyRate(rows)).toBeCloseTo(Math.log(k), 14);
    expect(markovVarentropyRate(rows)).toBeLessThan(1e-25);
  });

  it('accept typed-array rows', () => {
    const rows = [Float64Array.from([0.9, 0.1]), Float64Array.from([0.4, 0.6])];
    // closed form h of THEORY.md section 2 [calc]
    expect(markovEntropyRate(rows)).toBeCloseTo(0.394668712115, 11);
  });
});

describe('markovFunctionalMoments', () => {
  it('gives the i.i.d. variance p(1-p) for the count of a symbol when rows are identical', () => {
    const rows = [
      [0.7, 0.3],
      [0.7, 0.3],
    ];
    const { mean, variance } = markovFunctionalMoments(rows, [
      [0, 1],
      [0, 1],
    ]);
    expect(mean).toBeCloseTo(0.3, 14);
    expect(variance).toBeCloseTo(0.21, 14);
  });

  it('gives the two-state long-run variance of a symbol count, pi0 pi1 (1 + lambda)/(1 - lambda)', () => {
    // For P = [[1-a, a], [b, 1-b]], lambda = 1 - a - b; the long-run variance of the count of 1s is
    // pi0 pi1 (1 + lambda)/(1 - lambda) (standard two-state result, from memory).
    const a = 0.1;
    const b = 0.4;
    const lambda = 1 - a - b;
    const expected = (0.8 * 0.2 * (1 + lambda)) / (1 - lambda);
    const { variance } = markovFunctionalMoments(
      [
        [1 - a, a],
        [b, 1 - b],
      ],
      [
        [0, 1],
        [0, 1],
      ],
    );
    expect(variance).toBeCloseTo(expected, 13);
  });

  it('rejects a functional of the wrong shape', () => {
    expect(() => markovFunctionalMoments([[1]], [[1, 2]])).toThrow(RangeError);
    expect(() => markovFunctionalMoments([[1]], [[Number.POSITIVE_INFINITY]])).toThrow(/functional entry/);
  });
});
