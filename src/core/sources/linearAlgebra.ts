/**
 * Dense linear algebra for the small systems of the reference sources (up to about a thousand
 * unknowns). Matrices are row-major Float64Arrays of n*n entries.
 */

/** The factors P A = L U of a square matrix; L has a unit diagonal and shares storage with U. */
export interface LuFactors {
  readonly n: number;
  /** L below the diagonal, U on and above it, row-major. */
  readonly lu: Float64Array;
  /** Row i of P A is row pivots[i] of A. */
  readonly pivots: Int32Array;
}

/**
 * LU factorization with partial pivoting (Gaussian elimination, Golub & Van Loan, Matrix
 * Computations, 3rd ed., Alg. 3.4.1, from memory). Does not modify its input.
 * @throws RangeError when the matrix is not n*n or is singular to working precision (a pivot no
 *   larger than n * 2^-52 times the largest entry).
 */
export function luDecompose(matrix: Float64Array, n: number): LuFactors {
  if (!Number.isInteger(n) || n < 1 || matrix.length !== n * n) {
    throw new RangeError(`expected an ${n}x${n} matrix, got ${matrix.length} entries`);
  }
  const lu = Float64Array.from(matrix);
  const pivots = new Int32Array(n);
  let scale = 0;
  for (let i = 0; i < lu.length; i++) {
    const a = Math.abs(lu[i]);
    if (!Number.isFinite(a)) throw new RangeError(`matrix has a non-finite entry ${lu[i]} at index ${i}`);
    if (a > scale) scale = a;
  }
  const tiny = n * Number.EPSILON * scale;
  for (let i = 0; i < n; i++) pivots[i] = i;
  for (let k = 0; k < n; k++) {
    let best = k;
    let bestAbs = Math.abs(lu[k * n + k]);
    for (let i = k + 1; i < n; i++) {
      const a = Math.abs(lu[i * n + k]);
      if (a > bestAbs) {
        bestAbs = a;
        best = i;
      }
    }
    if (!(bestAbs > tiny)) throw new RangeError(`matrix is singular (pivot ${bestAbs} in column ${k})`);
    if (best !== k) {
      for (let j = 0; j < n; j++) {
        const t = lu[k * n + j];
        lu[k * n + j] = lu[best * n + j];
        lu[best * n + j] = t;
      }
      const p = pivots[k];
      pivots[k] = pivots[best];
      pivots[best] = p;
    }
    const pivot = lu[k * n + k];
    for (let i = k + 1; i < n; i++) {
      const factor = lu[i * n + k] / pivot;
      lu[i * n + k] = factor;
      if (factor === 0) continue;
      for (let j = k + 1; j < n; j++) lu[i * n + j] -= factor * lu[k * n + j];
    }
  }
  return { n, lu, pivots };
}

/** Solves A x = b from the factors of A; returns a new array. */
export function luSolve(factors: LuFactors, b: ArrayLike<number>): Float64Array {
  const { n, lu, pivots } = factors;
  if (b.length !== n) throw new RangeError(`right-hand side has ${b.length} entries, expected ${n}`);
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = b[pivots[i]];
    for (let j = 0; j < i; j++) s -= lu[i * n + j] * x[j];
    x[i] = s;
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = x[i];
    for (let j = i + 1; j < n; j++) s -= lu[i * n + j] * x[j];
    x[i] = s / lu[i * n + i];
  }
  return x;
}

/** Solves x A = b (a row vector times A) from the factors of A, via A^T x^T = b^T. */
export function luSolveTransposed(factors: LuFactors, b: ArrayLike<number>): Float64Array {
  const { n, lu, pivots } = factors;
  if (b.length !== n) throw new RangeError(`right-hand side has ${b.length} entries, expected ${n}`);
  // A = P^T L U, so A^T y = b is U^T L^T P y = b: solve U^T z = b, L^T w = z, then y = P^T w.
  const z = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = b[i];
    for (let j = 0; j < i; j++) s -= lu[j * n + i] * z[j];
    z[i] = s / lu[i * n + i];
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = z[i];
    for (let j = i + 1; j < n; j++) s -= lu[j * n + i] * z[j];
    z[i] = s;
  }
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) y[pivots[i]] = z[i];
  return y;
}

/** Solves A x = b for a square row-major A (n*n entries). */
export function solveLinearSystem(matrix: Float64Array, n: number, b: ArrayLike<number>): Float64Array {
  return luSolve(luDecompose(matrix, n), b);
}

/** Copies nested rows into a row-major Float64Array; every row must have `columns` entries. */
export function matrixFromRows(rows: readonly (readonly number[])[], columns: number): Float64Array {
  const out = new Float64Array(rows.length * columns);
  for (let i = 0; i < rows.length; i++) {
    const row = rows[i];
    if (row.length !== columns) {
      throw new RangeError(`row ${i + 1} has ${row.length} entries, expected ${columns}`);
    }
    for (let j = 0; j < columns; j++) out[i * columns + j] = row[j];
  }
  return out;
}
