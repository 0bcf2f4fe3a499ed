import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  luDecompose,
  luSolve,
  luSolveTransposed,
  matrixFromRows,
  solveLinearSystem,
} from '../../../src/core/sources/linearAlgebra';

describe('solveLinearSystem', () => {
  it('solves a 3x3 system whose first pivot is zero (needs a row swap)', () => {
    // Solution (1, 2, 3) chosen by hand; b computed by hand from it.
    const a = matrixFromRows(
      [
        [0, 2, 1],
        [1, 1, 1],
        [2, 0, 3],
      ],
      3,
    );
    const x = solveLinearSystem(a, 3, [7, 6, 11]);
    expect(Array.from(x).map((v) => +v.toFixed(12))).toEqual([1, 2, 3]);
  });

  it('has small residuals on random diagonally dominant systems, for A x = b and x A = b', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 12 }),
        fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 144 + 12, maxLength: 144 + 12 }),
        (n, values) => {
          const a = new Float64Array(n * n);
          for (let i = 0; i < n; i++) {
            for (let j = 0; j < n; j++) a[i * n + j] = values[i * n + j]! + (i === j ? n + 1 : 0);
          }
          const b = values.slice(144, 144 + n);
          const factors = luDecompose(a, n);
          const x = luSolve(factors, b);
          const y = luSolveTransposed(factors, b);
          for (let i = 0; i < n; i++) {
            let ax = 0;
            let ya = 0;
            for (let j = 0; j < n; j++) {
              ax += a[i * n + j]! * x[j]!;
              ya += y[j]! * a[j * n + i]!;
            }
            // Backward-stable elimination: residual ~ n eps ||A|| ||x||; 1e-12 is generous here.
            expect(Math.abs(ax - b[i]!)).toBeLessThan(1e-12);
            expect(Math.abs(ya - b[i]!)).toBeLessThan(1e-12);
          }
        },
      ),
      { numRuns: 200, seed: 42 },
    );
  });

  it('does not modify its input', () => {
    const a = matrixFromRows(
      [
        [2, 1],
        [1, 3],
      ],
      2,
    );
    const copy = Float64Array.from(a);
    solveLinearSystem(a, 2, [1, 2]);
    expect(a).toEqual(copy);
  });

  it('throws RangeError for singular or misshapen matrices', () => {
    const singular = matrixFromRows(
      [
        [1, 2],
        [2, 4],
      ],
      2,
    );
    expect(() => luDecompose(singular, 2)).toThrow(/singular/);
    expect(() => luDecompose(new Float64Array(3), 2)).toThrow(RangeError);
    expect(() => luDecompose(Float64Array.from([1, Number.NaN, 0, 1]), 2)).toThrow(/non-finite/);
    expect(() => luSolve(luDecompose(Float64Array.from([1]), 1), [1, 2])).toThrow(RangeError);
    expect(() => matrixFromRows([[1, 2], [3]], 2)).toThrow(/row 2/);
  });
});
