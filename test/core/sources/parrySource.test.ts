import { describe, expect, it } from 'vitest';
import { goldenMeanSource, parryMatrix, parrySource, perronEigen } from '../../../src/core/sources/parrySource';

describe('perronEigen', () => {
  it('finds the golden ratio for [[1,1],[1,0]] and 2 for the full 2-shift', () => {
    // phi = (1 + sqrt 5)/2, eigenvector proportional to (phi, 1) (from memory)
    const phi = (1 + Math.sqrt(5)) / 2;
    const golden = perronEigen([
      [1, 1],
      [1, 0],
    ]);
    expect(golden.eigenvalue).toBeCloseTo(phi, 14);
    expect(golden.vector[0]! / golden.vector[1]!).toBeCloseTo(phi, 13);
    expect(
      perronEigen([
        [1, 1],
        [1, 1],
      ]).eigenvalue,
    ).toBeCloseTo(2, 14);
  });

  it('converges for a periodic adjacency matrix (a 3-cycle has Perron root 1)', () => {
    const cycle = perronEigen([
      [0, 1, 0],
      [0, 0, 1],
      [1, 0, 0],
    ]);
    expect(cycle.eigenvalue).toBeCloseTo(1, 14);
  });

  it('rejects non-0/1, non-square and reducible matrices', () => {
    expect(() => perronEigen([[2]])).toThrow(/not 0 or 1/);
    expect(() => perronEigen([[1, 1]])).toThrow(/expected 1/);
    expect(() =>
      perronEigen([
        [1, 1],
        [0, 1],
      ]),
    ).toThrow(/not irreducible/);
  });
});

describe('parrySource', () => {
  it('gives a stochastic matrix supported on the allowed transitions', () => {
    const adjacency = [
      [1, 1, 0],
      [0, 1, 1],
      [1, 1, 1],
    ];
    const p = parryMatrix(adjacency);
    for (let i = 0; i < 3; i++) {
      expect(p[i]!.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 14);
      for (let j = 0; j < 3; j++) expect(p[i]![j]! > 0).toBe(adjacency[i]![j] === 1);
    }
  });

  it('states h = log lambda, sigma^2 = 0 and no Gaussian limit', () => {
    const source = parrySource([
      [1, 1, 0],
      [0, 1, 1],
      [1, 1, 1],
    ]);
    const lambda = perronEigen([
      [1, 1, 0],
      [0, 1, 1],
      [1, 1, 1],
    ]).eigenvalue;
    expect(source.facts.entropyRate).toBe(Math.log(lambda));
    expect(source.facts.sigma2).toBe(0);
    expect(source.facts.gaussianLimit).toBe(false);
    expect(source.id).toBe('parry:1,1,0;0,1,1;1,1,1');
  });

  it('only emits allowed transitions', () => {
    const adjacency = [
      [1, 1, 0],
      [0, 1, 1],
      [1, 1, 1],
    ];
    const { symbols } = parrySource(adjacency).generate(20_000, 4);
    let forbidden = 0;
    for (let t = 1; t < symbols.length; t++) if (adjacency[symbols[t - 1]!]![symbols[t]!] === 0) forbidden++;
    expect(forbidden).toBe(0);
  });
});

describe('goldenMeanSource', () => {
  it('is the Parry measure of [[1,1],[1,0]] with id golden and h = log phi', () => {
    const source = goldenMeanSource();
    expect(source.id).toBe('golden');
    // h = log phi = 0.481211825060, THEORY.md section 4
    expect(source.facts.entropyRate).toBeCloseTo(0.48121182506, 11);
    expect(source.facts.sigma2).toBe(0);
  });
});
