import { chainStructure } from './markovStructure';
import { luDecompose, luSolve, luSolveTransposed } from './linearAlgebra';

/**
 * A transition matrix P as rows (P[i][j] = probability of going from state i to state j). Rows may
 * be plain arrays or typed-array views.
 */
export type TransitionMatrix = readonly ArrayLike<number>[];

/** Largest number of states the dense solvers accept (an LU of this size takes about a second). */
export const MAX_MARKOV_STATES = 1024;

/** Row sums may differ from 1 by this much (then rows are rescaled to sum to 1 exactly-ish). */
export const ROW_SUM_TOLERANCE = 1e-9;

/** A checked, row-normalized transition matrix with its structure. */
export interface CheckedChain {
  readonly size: number;
  /** Row-major n*n, each row rescaled by its sum. */
  readonly transitions: Float64Array;
  /** 1 = aperiodic; > 1 the chain is stationary and ergodic but not mixing. */
  readonly period: number;
  /** recurrent[i] = 0 for transient states (they have zero stationary mass). */
  readonly recurrent: Uint8Array;
}

/**
 * Validates P: square, at most MAX_MARKOV_STATES states, finite non-negative entries, rows summing
 * to 1 within ROW_SUM_TOLERANCE, and exactly one closed class (irreducible, or irreducible plus
 * transient states), so the stationary law is unique.
 * @throws RangeError naming the offending row, entry or structure
 */
export function checkTransitionMatrix(matrix: TransitionMatrix): CheckedChain {
  const n = matrix.length;
  if (n < 1) throw new RangeError('transition matrix has no rows');
  if (n > MAX_MARKOV_STATES) {
    throw new RangeError(`transition matrix has ${n} states, more than ${MAX_MARKOV_STATES}`);
  }
  const transitions = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    const row = matrix[i];
    if (row.length !== n) throw new RangeError(`row ${i + 1} has ${row.length} entries, expected ${n}`);
    let sum = 0;
    for (let j = 0; j < n; j++) {
      const p = row[j];
      if (!Number.isFinite(p) || p < 0) throw new RangeError(`entry (${i}, ${j}) is ${p}, not a probability`);
      sum += p;
    }
    if (!(Math.abs(sum - 1) <= ROW_SUM_TOLERANCE)) throw new RangeError(`row ${i + 1} sums to ${sum}, not 1`);
    for (let j = 0; j < n; j++) transitions[i * n + j] = row[j] / sum;
  }
  const structure = chainStructure(transitions, n);
  if (structure.closedClasses !== 1) {
    throw new RangeError(
      `transition matrix is reducible with ${structure.closedClasses} closed classes; the stationary law is not unique`,
    );
  }
  return { size: n, transitions, period: structure.period, recurrent: structure.recurrent };
}

/**
 * The stationary law pi (pi P = pi, sum pi = 1) of a checked chain: pi M = e_last where M is I - P
 * with its last column replaced by ones (one balance equation is redundant for a chain with one
 * closed class, so the normalization takes its place).
 */
export function stationaryOfChecked(chain: CheckedChain): Float64Array {
  const { size: n, transitions } = chain;
  const m = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n - 1; j++) m[i * n + j] = (i === j ? 1 : 0) - transitions[i * n + j];
    m[i * n + n - 1] = 1;
  }
  const rhs = new Float64Array(n);
  rhs[n - 1] = 1;
  const pi = luSolveTransposed(luDecompose(m, n), rhs);
  let total = 0;
  for (let i = 0; i < n; i++) {
    // Transient states have mass 0 exactly; rounding may leave -1e-17.
    if (pi[i] < 0 || !chain.recurrent[i]) pi[i] = 0;
    total += pi[i];
  }
  for (let i = 0; i < n; i++) pi[i] /= total;
  return pi;
}

/** -sum_i pi_i sum_j P_ij log P_ij for a checked chain and its stationary law. */
export function entropyRateOfChecked(chain: CheckedChain, pi: Float64Array): number {
  const { size: n, transitions } = chain;
  let h = 0;
  for (let i = 0; i < n; i++) {
    if (pi[i] === 0) continue;
    let rowEntropy = 0;
    for (let j = 0; j < n; j++) {
      const p = transitions[i * n + j];
      if (p > 0) rowEntropy -= p * Math.log(p);
    }
    h += pi[i] * rowEntropy;
  }
  return h;
}

/** Mean and asymptotic variance of an additive functional of the transitions. */
export interface FunctionalMoments {
  /** lim (1/n) E sum_t F(X_t, X_{t+1}). */
  readonly mean: number;
  /** lim (1/n) Var sum_t F(X_t, X_{t+1}). */
  readonly variance: number;
}

/**
 * Asymptotic mean and variance of S_n = sum_{t<n} F(X_t, X_{t+1}) for a stationary chain. With
 * g_i = sum_j P_ij F(i,j), m = pi g, the fundamental matrix Z = (I - P + 1 pi)^-1 (Kemeny & Snell,
 * Finite Markov Chains, 1960, from memory) and u = Z (g - m 1), u solves the Poisson equation
 * (I - P) u = g - m 1, so F(i,j) + u_j - u_i - m are martingale differences and
 * variance = sum_i pi_i sum_j P_ij (F(i,j) + u_j - u_i - m)^2.
 * Expanding the square gives THEORY.md section 2's form
 * sum_i pi_i sum_j P_ij (F(i,j) + u_j)^2 - sum_i pi_i (u_i + m)^2; the centred form used here
 * has no cancellation and is never negative. F is row-major n*n; only entries with P_ij > 0 are read.
 */
export function functionalMomentsOfChecked(
  chain: CheckedChain,
  pi: Float64Array,
  functional: Float64Array,
): FunctionalMoments {
  const { size: n, transitions } = chain;
  const g = new Float64Array(n);
  let mean = 0;
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let j = 0; j < n; j++) {
      const p = transitions[i * n + j];
      if (p > 0) s += p * functional[i * n + j];
    }
    g[i] = s;
    mean += pi[i] * s;
  }
  const z = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) z[i * n + j] = (i === j ? 1 : 0) - transitions[i * n + j] + pi[j];
  }
  const rhs = new Float64Array(n);
  for (let i = 0; i < n; i++) rhs[i] = g[i] - mean;
  const u = luSolve(luDecompose(z, n), rhs);
  let variance = 0;
  for (let i = 0; i < n; i++) {
    if (pi[i] === 0) continue;
    let s = 0;
    for (let j = 0; j < n; j++) {
      const p = transitions[i * n + j];
      if (p > 0) {
        const d = functional[i * n + j] + u[j] - u[i] - mean;
        s += p * d * d;
      }
    }
    variance += pi[i] * s;
  }
  return { mean, variance };
}

/** F(i,j) = -log P_ij (0 where P_ij = 0; those entries are never read). */
export function informationFunctional(chain: CheckedChain): Float64Array {
  const { transitions } = chain;
  const f = new Float64Array(transitions.length);
  for (let k = 0; k < f.length; k++) f[k] = transitions[k] > 0 ? -Math.log(transitions[k]) : 0;
  return f;
}

/**
 * Stationary distribution of an irreducible (or unichain) transition matrix, by solving the balance
 * equations with a dense LU factorization.
 * @throws RangeError for a bad matrix (see checkTransitionMatrix)
 */
export function stationaryDistribution(matrix: TransitionMatrix): Float64Array {
  return stationaryOfChecked(checkTransitionMatrix(matrix));
}

/**
 * Entropy rate h = -sum_i pi_i sum_j P_ij log P_ij of the stationary chain, nats per step (Cover &
 * Thomas, Elements of Information Theory, 2nd ed., Thm 4.2.4, from memory).
 * @throws RangeError for a bad matrix (see checkTransitionMatrix)
 */
export function markovEntropyRate(matrix: TransitionMatrix): number {
  const chain = checkTransitionMatrix(matrix);
  return entropyRateOfChecked(chain, stationaryOfChecked(chain));
}

/**
 * Varentropy rate sigma^2 = lim Var(-log P(X_1..X_n))/n of the stationary chain, nats^2 per step
 * (Kontoyiannis & Verdú, IEEE Trans. IT 60 (2014) 777-795), from the fundamental matrix as in
 * THEORY.md section 2 (see functionalMomentsOfChecked).
 * @throws RangeError for a bad matrix (see checkTransitionMatrix)
 */
export function markovVarentropyRate(matrix: TransitionMatrix): number {
  const chain = checkTransitionMatrix(matrix);
  return functionalMomentsOfChecked(chain, stationaryOfChecked(chain), informationFunctional(chain)).variance;
}

/**
 * Asymptotic mean and variance per step of sum_t F(X_t, X_{t+1}) for the stationary chain, for any
 * transition functional F (rows like P). For example F(i,j) = [j = s] gives the long-run variance
 * of the count of symbol s, which sets the standard error of its empirical frequency.
 * @throws RangeError for a bad matrix or a functional of the wrong shape
 */
export function markovFunctionalMoments(matrix: TransitionMatrix, functional: TransitionMatrix): FunctionalMoments {
  const chain = checkTransitionMatrix(matrix);
  const n = chain.size;
  if (functional.length !== n) throw new RangeError(`functional has ${functional.length} rows, expected ${n}`);
  const f = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    const row = functional[i];
    if (row.length !== n) throw new RangeError(`functional row ${i + 1} has ${row.length} entries, expected ${n}`);
    for (let j = 0; j < n; j++) {
      if (chain.transitions[i * n + j] > 0 && !Number.isFinite(row[j])) {
        throw new RangeError(`functional entry (${i}, ${j}) is ${row[j]}`);
      }
      f[i * n + j] = row[j];
    }
  }
  return functionalMomentsOfChecked(chain, stationaryOfChecked(chain), f);
}
