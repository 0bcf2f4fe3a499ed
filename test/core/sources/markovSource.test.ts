import { describe, expect, it } from 'vitest';
import { markovEntropyRate, markovVarentropyRate } from '../../../src/core/sources/markovEntropy';
import { liftMarkovOrder, markovSource } from '../../../src/core/sources/markovSource';
import { TWO_STATE, ORDER_TWO } from '../../helpers/referenceChains';

describe('markovSource', () => {
  it('states the exact h and sigma^2 of THEORY.md section 2', () => {
    const source = markovSource(TWO_STATE);
    // closed forms, THEORY.md section 2 [calc]
    expect(source.facts.entropyRate).toBeCloseTo(0.394668712115, 11);
    expect(source.facts.sigma2).toBeCloseTo(0.606682202706, 11);
    expect(source.facts.gaussianLimit).toBe(true);
    expect(source.id).toBe('markov:0.9,0.1;0.4,0.6');
  });

  it('an order-2 chain whose rows depend only on the last symbol has the order-1 facts', () => {
    // Contexts 00, 01, 10, 11 with the most recent symbol last: rows follow x_{t-1} only.
    const rows = [TWO_STATE[0]!, TWO_STATE[1]!, TWO_STATE[0]!, TWO_STATE[1]!];
    const facts = markovSource(rows, 2).facts;
    expect(facts.entropyRate).toBeCloseTo(markovEntropyRate(TWO_STATE), 13);
    expect(facts.sigma2).toBeCloseTo(markovVarentropyRate(TWO_STATE), 12);
  });

  it('reads the context with the most recent symbol last: x_t = x_{t-2} when rows say so', () => {
    // Context r = 2 x_{t-2} + x_{t-1}; P(x_t = x_{t-2}) = 1, i.e. rows 0,1 -> 0 and rows 2,3 -> 1.
    const rows = [
      [1, 0],
      [1, 0],
      [0, 1],
      [0, 1],
    ];
    // Reducible on contexts (00 and 11 absorbing, 01 <-> 10 a cycle): the source refuses it.
    expect(() => markovSource(rows, 2)).toThrow(/reducible/);
    // With a little noise it is irreducible and x_t = x_{t-2} almost always.
    const noisy = [
      [0.99, 0.01],
      [0.99, 0.01],
      [0.01, 0.99],
      [0.01, 0.99],
    ];
    const { symbols } = markovSource(noisy, 2).generate(20_000, 5);
    let same = 0;
    for (let t = 2; t < symbols.length; t++) if (symbols[t] === symbols[t - 2]) same++;
    expect(same / (symbols.length - 2)).toBeGreaterThan(0.97);
  });

  it('lifts an order-k chain to A^k contexts with A transitions each', () => {
    const rows = ORDER_TWO;
    const lift = liftMarkovOrder(rows, 2);
    expect(lift.states).toBe(4);
    // Context 1 = (x_{t-2}, x_{t-1}) = (0, 1); emitting j moves to (1, j) = 2 + j.
    expect(Array.from(lift.lifted[1]!)).toEqual([0, 0, 0.3, 0.7]);
    expect(lift.nextState[1 * 2 + 1]).toBe(3);
  });

  it('flags a periodic chain as stationary but without a Gaussian limit', () => {
    const source = markovSource([
      [0, 1],
      [1, 0],
    ]);
    expect(source.facts.entropyRate).toBe(0);
    expect(source.facts.gaussianLimit).toBe(false);
    expect(source.facts.description).toMatch(/period 2/);
    const { symbols } = source.generate(10, 1);
    for (let t = 1; t < 10; t++) expect(symbols[t]).toBe(1 - symbols[t - 1]!);
  });

  it('gives information whose sum is -log mu of the path, checked by the chain rule', () => {
    const rows = ORDER_TWO;
    const source = markovSource(rows, 2);
    const lift = liftMarkovOrder(rows, 2);
    const { sequence, information } = source.generateDetailed!(12, 3);
    const x = sequence.symbols;
    // mu(x_0..x_11) = pi(context 2 x_0 + x_1) times the row entries; pi by iterating pi P to
    // convergence (second eigenvalue well inside the unit disc), independent of the LU solver.
    let pi = [0.25, 0.25, 0.25, 0.25];
    for (let k = 0; k < 2000; k++) {
      const next = [0, 0, 0, 0];
      for (let r = 0; r < 4; r++) for (let s = 0; s < 4; s++) next[s]! += pi[r]! * lift.lifted[r]![s]!;
      pi = next;
    }
    let logMu = Math.log(pi[2 * x[0]! + x[1]!]!);
    for (let t = 2; t < 12; t++) logMu += Math.log(rows[2 * x[t - 2]! + x[t - 1]!]![x[t]!]!);
    const total = information.reduce((a, b) => a + b, 0);
    expect(total).toBeCloseTo(-logMu, 12);
  });

  it('emits only the first symbols of the start context when the length is below the order', () => {
    const rows = ORDER_TWO;
    const source = markovSource(rows, 2);
    const long = source.generate(5, 8);
    const short = source.generate(1, 8);
    expect(short.symbols[0]).toBe(long.symbols[0]);
  });

  it('uses the bisection path for alphabets above 16 symbols', () => {
    const k = 20;
    const rows = Array.from({ length: k }, (_, i) => Array.from({ length: k }, (_, j) => (j === (i + 1) % k ? 0.5 : 0.5 / (k - 1))));
    const source = markovSource(rows);
    const { symbols, counts } = source.generate(20_000, 2);
    let follow = 0;
    for (let t = 1; t < symbols.length; t++) if (symbols[t] === (symbols[t - 1]! + 1) % k) follow++;
    // P(x_t = x_{t-1} + 1) = 0.5; binomial SE 0.0035 for 2e4 steps, 4 SE = 0.014.
    expect(Math.abs(follow / (symbols.length - 1) - 0.5)).toBeLessThan(0.015);
    expect(counts.reduce((a, b) => a + b, 0)).toBe(20_000);
  });

  it('rejects bad orders, shapes and rows with RangeError naming them', () => {
    expect(() => markovSource(TWO_STATE, 0)).toThrow(/order/);
    expect(() => markovSource(TWO_STATE, 2)).toThrow(/needs 4 rows, got 2/);
    expect(() => markovSource([[0.9, 0.1], [0.4]])).toThrow(/row 2 has 1 entries/);
    expect(() => markovSource([[0.9, 0.1], [0.4, 0.5]])).toThrow(/row 2: probabilities sum to 0.9/);
    expect(() => markovSource([[0.9, 0.1], [-0.4, 1.4]])).toThrow(/row 2: probability 1 is -0.4/);
    expect(() => markovSource([[1, 0], [0, 1]])).toThrow(/reducible/);
    expect(() => markovSource(Array.from({ length: 2 ** 11 }, () => [0.5, 0.5]), 11)).toThrow(/more than 1024/);
  });
});
