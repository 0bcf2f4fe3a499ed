import { MAX_MARKOV_STATES } from './markovEntropy';
import { chainStructure } from './markovStructure';
import { markovSource } from './markovSource';
import type { ReferenceSource } from './referenceSource';

/** Relative change of the Perron vector at which power iteration stops. */
const PERRON_TOLERANCE = 1e-15;
const PERRON_MAX_ITERATIONS = 100_000;

/** The Perron root and a positive right eigenvector of an irreducible non-negative matrix. */
export interface PerronEigen {
  readonly eigenvalue: number;
  /** Right eigenvector, normalized to sum 1. */
  readonly vector: Float64Array;
}

function checkAdjacency(adjacency: readonly (readonly number[])[]): Float64Array {
  const n = adjacency.length;
  if (n < 1) throw new RangeError('adjacency matrix has no rows');
  if (n > MAX_MARKOV_STATES) throw new RangeError(`adjacency matrix has ${n} rows, more than ${MAX_MARKOV_STATES}`);
  const a = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    const row = adjacency[i];
    if (row.length !== n) throw new RangeError(`adjacency row ${i + 1} has ${row.length} entries, expected ${n}`);
    for (let j = 0; j < n; j++) {
      const x = row[j];
      if (x !== 0 && x !== 1) throw new RangeError(`adjacency entry (${i}, ${j}) is ${x}, not 0 or 1`);
      a[i * n + j] = x;
    }
  }
  const structure = chainStructure(a, n);
  let allRecurrent = true;
  for (let i = 0; i < n; i++) if (!structure.recurrent[i]) allRecurrent = false;
  if (structure.closedClasses !== 1 || !allRecurrent) {
    throw new RangeError('adjacency matrix is not irreducible (some symbol cannot reach every other)');
  }
  return a;
}

/**
 * Perron root and right eigenvector of an irreducible 0/1 matrix by power iteration on A + I, which
 * has the same eigenvector and is primitive even when A is periodic (Perron-Frobenius, from memory),
 * until the vector changes by less than 1e-15 relative.
 * @throws RangeError for a matrix that is not square 0/1 irreducible, or when iteration stalls
 */
export function perronEigen(adjacency: readonly (readonly number[])[]): PerronEigen {
  const a = checkAdjacency(adjacency);
  const n = adjacency.length;
  let v = new Float64Array(n).fill(1 / n);
  let w = new Float64Array(n);
  for (let iteration = 0; iteration < PERRON_MAX_ITERATIONS; iteration++) {
    let total = 0;
    for (let i = 0; i < n; i++) {
      let s = v[i];
      for (let j = 0; j < n; j++) if (a[i * n + j] !== 0) s += v[j];
      w[i] = s;
      total += s;
    }
    let change = 0;
    for (let i = 0; i < n; i++) {
      w[i] /= total;
      change = Math.max(change, Math.abs(w[i] - v[i]) / w[i]);
    }
    const t = v;
    v = w;
    w = t;
    if (change <= PERRON_TOLERANCE) {
      // Rayleigh-type estimate (A v)_i / v_i averaged with weights v_i: sum(A v) / sum(v), sum(v) = 1.
      let av = 0;
      for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) if (a[i * n + j] !== 0) av += v[j];
      return { eigenvalue: av, vector: v };
    }
  }
  throw new RangeError(`power iteration did not converge in ${PERRON_MAX_ITERATIONS} steps`);
}

/**
 * The Parry matrix P_ij = A_ij v_j / (lambda v_i) of the maximal-entropy measure of the subshift of
 * finite type with 0/1 adjacency A (Parry, Trans. AMS 112 (1964), from memory).
 */
export function parryMatrix(adjacency: readonly (readonly number[])[]): number[][] {
  const { eigenvalue, vector } = perronEigen(adjacency);
  return adjacency.map((row, i) => row.map((x, j) => (x === 0 ? 0 : vector[j] / (eigenvalue * vector[i]))));
}

/**
 * The maximal-entropy (Parry) measure of the subshift of finite type whose allowed transitions
 * i -> j are the 1s of a 0/1 adjacency matrix, as a stationary Markov chain on symbols '0'..'n-1'.
 * h = log lambda (lambda the Perron root) and sigma^2 = 0: every allowed n-block has probability
 * between fixed multiples of lambda^-n, so -log mu(A_n) - n log lambda stays bounded
 * (Parry, Trans. AMS 112 (1964), from memory). gaussianLimit is false.
 * @throws RangeError unless the matrix is square, 0/1 and irreducible
 */
export function parrySource(adjacency: readonly (readonly number[])[]): ReferenceSource {
  const { eigenvalue } = perronEigen(adjacency);
  const chain = markovSource(parryMatrix(adjacency));
  const spec = adjacency.map((row) => row.join(',')).join(';');
  return {
    ...chain,
    id: `parry:${spec}`,
    label: `Parry measure of the subshift ${spec}`,
    facts: {
      entropyRate: Math.log(eigenvalue),
      sigma2: 0,
      description:
        `Maximal-entropy (Parry) measure of the subshift of finite type with adjacency ${spec}, as a Markov chain ` +
        `P_ij = A_ij v_j / (lambda v_i) with Perron root lambda = ${eigenvalue.toPrecision(15)} from power iteration ` +
        '(converged to 1e-15), started from its stationary law. h = log lambda; sigma^2 = 0 exactly because every ' +
        'allowed n-block has mass within fixed factors of lambda^-n (Parry 1964), so return times follow the ' +
        'exponential law, not a Gaussian one.',
      gaussianLimit: false,
    },
  };
}

/**
 * The golden-mean shift (no two 1s in a row) with its Parry measure: P = [[1/phi, 1/phi^2], [1, 0]],
 * h = log phi, sigma^2 = 0 (THEORY.md section 4).
 */
export function goldenMeanSource(): ReferenceSource {
  return {
    ...parrySource([
      [1, 1],
      [1, 0],
    ]),
    id: 'golden',
    label: 'Golden-mean shift (no 11), Parry measure',
  };
}
