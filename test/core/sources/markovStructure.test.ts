import { describe, expect, it } from 'vitest';
import { matrixFromRows } from '../../../src/core/sources/linearAlgebra';
import { chainStructure } from '../../../src/core/sources/markovStructure';

function structureOf(rows: number[][]) {
  return chainStructure(matrixFromRows(rows, rows.length), rows.length);
}

describe('chainStructure', () => {
  it('finds one aperiodic class in a positive chain', () => {
    const s = structureOf([
      [0.9, 0.1],
      [0.4, 0.6],
    ]);
    expect(s.closedClasses).toBe(1);
    expect(Array.from(s.recurrent)).toEqual([1, 1]);
    expect(s.period).toBe(1);
  });

  it('finds the period of a cycle of length 3 and of a bipartite chain', () => {
    expect(
      structureOf([
        [0, 1, 0],
        [0, 0, 1],
        [1, 0, 0],
      ]).period,
    ).toBe(3);
    expect(
      structureOf([
        [0, 0.5, 0.5],
        [1, 0, 0],
        [1, 0, 0],
      ]).period,
    ).toBe(2);
  });

  it('marks transient states and counts closed classes', () => {
    const oneClosed = structureOf([
      [0.5, 0.5, 0],
      [0, 0.5, 0.5],
      [0, 0.5, 0.5],
    ]);
    expect(oneClosed.closedClasses).toBe(1);
    expect(Array.from(oneClosed.recurrent)).toEqual([0, 1, 1]);
    const twoClosed = structureOf([
      [1, 0, 0],
      [0.3, 0.4, 0.3],
      [0, 0, 1],
    ]);
    expect(twoClosed.closedClasses).toBe(2);
    expect(Array.from(twoClosed.recurrent)).toEqual([1, 0, 1]);
    expect(twoClosed.period).toBe(0);
  });
});
