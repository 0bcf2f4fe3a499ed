import type { Sequence, SymbolArray } from '../sequence/sequence';
import { allocateSymbols } from '../sequence/sequence';
import type { CheckedChain } from './markovEntropy';
import {
  MAX_MARKOV_STATES,
  checkTransitionMatrix,
  entropyRateOfChecked,
  functionalMomentsOfChecked,
  informationFunctional,
  stationaryOfChecked,
} from './markovEntropy';
import { checkProbabilities, cumulativeLaw } from './iidSource';
import type { DetailedSample, ReferenceSource } from './referenceSource';
import { snapSigma2 } from './referenceSource';
import { uniformStream } from './seededRandom';
import { checkLength, indexLabels, sequenceFromSymbols } from './sequenceFromSymbols';

/** Rows with more entries than this are searched by bisection instead of linearly. */
const LINEAR_SEARCH_MAX = 16;

/**
 * A Markov chain of order k over symbols 0..A-1 as rows of its k-context matrix (A^k rows, A
 * columns). Row r is the context x_{t-k}..x_{t-1} read as a base-A number with the most recent
 * symbol last, i.e. least significant: r = sum_m x_{t-k+m} A^(k-1-m). Entry (r, j) = P(x_t = j | r).
 */
export type ContextMatrix = readonly (readonly number[])[];

/** The order-k chain seen as an order-1 chain on its A^k contexts. */
export interface LiftedChain {
  readonly alphabetSize: number;
  readonly order: number;
  /** Number of contexts, A^k. */
  readonly states: number;
  /** Row-normalized context matrix, A^k * A entries, row-major. */
  readonly rows: Float64Array;
  /** nextState[r * A + j]: the context after emitting j in context r. */
  readonly nextState: Int32Array;
  /** The A^k x A^k transition matrix on contexts, as rows (only A entries per row are positive). */
  readonly lifted: Float64Array[];
}

/**
 * Checks a k-context matrix and lifts it to an order-1 chain on the A^k contexts.
 * @param order k >= 1
 * @throws RangeError for a bad order, shape, row, or more than MAX_MARKOV_STATES contexts
 */
export function liftMarkovOrder(matrix: ContextMatrix, order = 1): LiftedChain {
  if (!Number.isInteger(order) || order < 1) throw new RangeError(`order must be an integer >= 1, got ${order}`);
  if (matrix.length < 1) throw new RangeError('transition matrix has no rows');
  const a = matrix[0].length;
  if (a < 1) throw new RangeError('transition matrix has no columns');
  const states = a ** order;
  if (states > MAX_MARKOV_STATES) {
    throw new RangeError(`${a}^${order} = ${states} contexts, more than ${MAX_MARKOV_STATES}`);
  }
  if (matrix.length !== states) {
    throw new RangeError(`an order-${order} chain on ${a} symbols needs ${states} rows, got ${matrix.length}`);
  }
  const rows = new Float64Array(states * a);
  for (let r = 0; r < states; r++) {
    const row = matrix[r];
    if (row.length !== a) throw new RangeError(`row ${r + 1} has ${row.length} entries, expected ${a}`);
    let law: Float64Array;
    try {
      law = checkProbabilities(row);
    } catch (e) {
      throw new RangeError(`row ${r + 1}: ${(e as Error).message}`, { cause: e });
    }
    rows.set(law, r * a);
  }
  const keep = states / a;
  const nextState = new Int32Array(states * a);
  const lifted: Float64Array[] = [];
  for (let r = 0; r < states; r++) {
    const out = new Float64Array(states);
    for (let j = 0; j < a; j++) {
      const next = (r % keep) * a + j;
      nextState[r * a + j] = next;
      out[next] += rows[r * a + j];
    }
    lifted.push(out);
  }
  return { alphabetSize: a, order, states, rows, nextState, lifted };
}

/** Exact stationary quantities of a chain on contexts. */
export interface MarkovExact {
  readonly chain: CheckedChain;
  readonly stationary: Float64Array;
  readonly entropyRate: number;
  readonly sigma2: number;
}

/**
 * pi, h and sigma^2 (nats) of a lifted chain; sigma^2 below rounding noise is reported as 0.
 * @throws RangeError when the context chain has more than one closed class
 */
export function markovExact(lift: LiftedChain): MarkovExact {
  let chain: CheckedChain;
  try {
    chain = checkTransitionMatrix(lift.lifted);
  } catch (e) {
    throw new RangeError(`context chain: ${(e as Error).message}`, { cause: e });
  }
  const stationary = stationaryOfChecked(chain);
  const entropyRate = entropyRateOfChecked(chain, stationary);
  const { variance } = functionalMomentsOfChecked(chain, stationary, informationFunctional(chain));
  return { chain, stationary, entropyRate, sigma2: snapSigma2(variance, entropyRate) };
}

function drawIndex(cumulative: Float64Array, u: number): number {
  let lo = 0;
  let hi = cumulative.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (u < cumulative[mid]) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

/**
 * Fills symbols with a stationary path: the first context from pi, its k digits oldest first,
 * then one cumulative search per symbol. Returns the first context.
 */
function fillChain(
  symbols: SymbolArray,
  lift: LiftedChain,
  cumulativeRows: Float64Array,
  cumulativeStart: Float64Array,
  seed: number,
): number {
  const uniforms = uniformStream(seed);
  const { alphabetSize: a, order: k, nextState } = lift;
  const n = symbols.length;
  const first = drawIndex(cumulativeStart, uniforms.next());
  let divisor = lift.states / a;
  for (let t = 0; t < k && t < n; t++) {
    symbols[t] = Math.floor(first / divisor) % a;
    divisor /= a;
  }
  let s = first;
  if (a <= LINEAR_SEARCH_MAX) {
    for (let t = k; t < n; t++) {
      const u = uniforms.next();
      const base = s * a;
      let j = base;
      while (u >= cumulativeRows[j]) j++;
      symbols[t] = j - base;
      s = nextState[j];
    }
  } else {
    for (let t = k; t < n; t++) {
      const u = uniforms.next();
      let lo = s * a;
      let hi = lo + a - 1;
      while (lo < hi) {
        const mid = (lo + hi) >>> 1;
        if (u < cumulativeRows[mid]) hi = mid;
        else lo = mid + 1;
      }
      symbols[t] = lo - s * a;
      s = nextState[lo];
    }
  }
  return first;
}

function formatRows(rows: ContextMatrix): string {
  return rows.map((row) => row.join(',')).join(';');
}

/**
 * A stationary Markov chain of order k (default 1) on symbols '0'..'A-1', started from its
 * stationary law, with exact h and sigma^2 from the order-1 chain on the A^k contexts
 * (markovEntropy.ts). Requires a unique stationary law (one closed class of contexts; contexts
 * outside it are transient, get pi = 0 and never occur). A periodic chain is accepted: it is
 * stationary and ergodic, so h and sigma^2 hold, but it does not mix, so gaussianLimit is false.
 * @param matrix A^k rows of A probabilities; row order as described for ContextMatrix
 * @param order k >= 1
 * @throws RangeError for a bad order, shape, row, a reducible context chain or too many contexts
 */
export function markovSource(matrix: ContextMatrix, order = 1): ReferenceSource {
  const lift = liftMarkovOrder(matrix, order);
  const exact = markovExact(lift);
  const { alphabetSize: a, states, rows } = lift;
  const cumulativeRows = new Float64Array(states * a);
  for (let r = 0; r < states; r++) cumulativeLaw(rows.subarray(r * a, (r + 1) * a), cumulativeRows, r * a);
  const cumulativeStart = new Float64Array(states);
  cumulativeLaw(exact.stationary, cumulativeStart, 0);
  const alphabet = indexLabels(a);
  const period = exact.chain.period;

  const generate = (length: number, seed: number): Sequence => {
    checkLength(length);
    const symbols = allocateSymbols(length, a);
    fillChain(symbols, lift, cumulativeRows, cumulativeStart, seed);
    return sequenceFromSymbols(symbols, alphabet);
  };

  const generateDetailed = (length: number, seed: number): DetailedSample => {
    checkLength(length);
    const symbols = allocateSymbols(length, a);
    const first = fillChain(symbols, lift, cumulativeRows, cumulativeStart, seed);
    const information = new Float64Array(length);
    // The first k symbols: -log of the ratio of successive prefix masses of pi (contexts sharing a
    // prefix of t digits form a contiguous range of A^(k-t) indices).
    let previousMass = 1;
    let width = states;
    for (let t = 0; t < order && t < length; t++) {
      width /= a;
      const start = Math.floor(first / width) * width;
      let mass = 0;
      for (let r = start; r < start + width; r++) mass += exact.stationary[r];
      information[t] = Math.log(previousMass) - Math.log(mass);
      previousMass = mass;
    }
    let s = first;
    for (let t = order; t < length; t++) {
      const j = symbols[t];
      information[t] = -Math.log(rows[s * a + j]);
      s = lift.nextState[s * a + j];
    }
    return { sequence: sequenceFromSymbols(symbols, alphabet), information, warnings: [] };
  };

  const what = order === 1 ? `${a}-state Markov chain` : `order-${order} Markov chain on ${a} symbols`;
  const notes: string[] = [
    `A stationary ${what}: the first ${order === 1 ? 'symbol is' : `${order} symbols are`} drawn from the exact stationary law, ` +
      'each next symbol by a cumulative search of its row with a 53-bit uniform (xoroshiro128+).',
  ];
  if (order > 1) {
    notes.push(
      `Row r of the matrix is the context of the last ${order} symbols read as a base-${a} number with the most recent symbol last.`,
    );
  }
  notes.push(
    'h = -sum pi_i P_ij log P_ij and sigma^2 from the fundamental matrix of the chain on contexts are exact up to rounding (dense LU solve).',
  );
  if (exact.sigma2 === 0) notes.push('sigma^2 = 0: all paths of a given length are equally likely up to bounded factors, so no Gaussian limit.');
  if (period > 1) notes.push(`The chain has period ${period}: stationary and ergodic but not mixing, so limit laws for return times need not hold.`);
  return {
    id: `${order === 1 ? 'markov' : `markov${order}`}:${formatRows(matrix)}`,
    label: order === 1 ? `Markov chain, ${a} states` : `Markov chain of order ${order}, ${a} symbols`,
    facts: {
      entropyRate: exact.entropyRate,
      sigma2: exact.sigma2,
      description: notes.join(' '),
      gaussianLimit: exact.sigma2 > 0 && period === 1,
    },
    generate,
    generateDetailed,
  };
}
