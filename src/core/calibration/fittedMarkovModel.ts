import { allocateSymbols, type SymbolArray } from '../sequence/sequence';
import { cumulativeLaw } from '../sources/iidSource';
import {
  MAX_MARKOV_STATES,
  checkTransitionMatrix,
  entropyRateOfChecked,
  functionalMomentsOfChecked,
  informationFunctional,
  stationaryOfChecked,
} from '../sources/markovEntropy';
import { snapSigma2 } from '../sources/referenceSource';
import { uniformStream } from '../sources/seededRandom';

/**
 * A Markov chain of order k fitted to data, as an order-1 chain on the contexts it keeps. Plain
 * data (typed arrays and numbers), so hosts can send it to workers.
 */
export interface FittedMarkovModel {
  readonly alphabetSize: number;
  /** The order k of the fit (0 = i.i.d.). */
  readonly order: number;
  /** Digits per context: max(k, 1). An i.i.d. law is lifted to order 1 with equal rows, so that
   * the information -log p(x_t) stays a function of the transitions of the lifted chain. */
  readonly contextLength: number;
  /** Contexts kept. */
  readonly states: number;
  /** Context of each state: its contextLength symbols as a base-A number, most recent last. */
  readonly contexts: Int32Array;
  /** P(next symbol j | state s) at s * A + j. */
  readonly rows: Float64Array;
  /** The state after emitting j in state s at s * A + j; -1 where P = 0. */
  readonly nextState: Int32Array;
  /** Stationary law of the states (0 on transient ones). */
  readonly stationary: Float64Array;
  /** Exact h (nats/symbol) and sigma^2 (nats^2/symbol) of the fitted chain. */
  readonly entropyRateNats: number;
  readonly sigma2Nats: number;
  /** Period of the closed class (1 = aperiodic). */
  readonly period: number;
  /** Kept states with stationary mass 0 (seen only before the chain settles into its closed class). */
  readonly transientStates: number;
  /** Observed transitions dropped because they lead into a context that has no observed continuation. */
  readonly droppedTransitions: number;
}

/**
 * Conditional laws per context before pruning: law[c * A + j], with rowTotal[c] = 0 for a context
 * that has no row.
 */
interface ContextLaws {
  readonly contextLength: number;
  readonly contexts: number;
  readonly law: Float64Array;
  readonly rowTotal: Float64Array;
}

function lawsOfCounts(counts: Float64Array, alphabetSize: number, order: number): ContextLaws {
  const a = alphabetSize;
  if (counts.length !== a ** (order + 1)) {
    throw new RangeError(`an order-${order} fit on ${a} symbols needs ${a ** (order + 1)} counts; got ${counts.length}`);
  }
  if (order === 0) {
    // Lift to order 1: every symbol seen is a context, all with the same row (the symbol law).
    const law = new Float64Array(a * a);
    const rowTotal = new Float64Array(a);
    for (let c = 0; c < a; c++) {
      if (counts[c] === 0) continue;
      law.set(counts, c * a);
      for (let j = 0; j < a; j++) rowTotal[c] += counts[j];
    }
    return { contextLength: 1, contexts: a, law, rowTotal };
  }
  const contexts = a ** order;
  const rowTotal = new Float64Array(contexts);
  for (let c = 0; c < contexts; c++) for (let j = 0; j < a; j++) rowTotal[c] += counts[c * a + j];
  return { contextLength: order, contexts, law: Float64Array.from(counts), rowTotal };
}

/**
 * The fitted chain from counts of (k+1)-blocks (markovOrderFit's counts): maximum likelihood,
 * P(j | c) = n(c, j) / n(c), so a transition never seen has probability 0 and a context never seen
 * has no row. Only one context can be reached without having been seen as a context: the last k
 * symbols of the data. Transitions into a context without a row are dropped and their row
 * renormalized, repeatedly (a context whose every transition is dropped loses its row too); this
 * changes at most the few transitions at the very end of the data and is counted in
 * droppedTransitions. What remains has one closed class (every context seen reaches the last one
 * kept along the data's own path); contexts outside it are transient, get stationary mass 0 and are
 * never generated. Exact h and sigma^2 come from markovEntropy.ts on the order-1 chain of contexts.
 * @throws RangeError for counts of the wrong shape, no transitions at all, or too many contexts
 */
export function fittedMarkovModel(counts: Float64Array, alphabetSize: number, order: number): FittedMarkovModel {
  if (!Number.isInteger(order) || order < 0) throw new RangeError(`order must be an integer >= 0; got ${order}`);
  return modelOfLaws(lawsOfCounts(counts, alphabetSize, order), alphabetSize, order);
}

/**
 * The model of a known order-k chain given as A^k rows of A probabilities (row r = context r, most
 * recent symbol last, as markovSource takes them), for tests and reference runs.
 * @throws RangeError for a bad shape or a chain without a unique stationary law
 */
export function markovModelOfRows(rows: readonly (readonly number[])[], order: number): FittedMarkovModel {
  if (!Number.isInteger(order) || order < 1) throw new RangeError(`order must be an integer >= 1; got ${order}`);
  const a = rows[0]?.length ?? 0;
  if (a < 1 || rows.length !== a ** order) throw new RangeError(`an order-${order} chain on ${a} symbols needs ${a ** order} rows; got ${rows.length}`);
  const law = new Float64Array(rows.length * a);
  const rowTotal = new Float64Array(rows.length);
  rows.forEach((row, c) => {
    if (row.length !== a) throw new RangeError(`row ${c + 1} has ${row.length} entries, expected ${a}`);
    for (let j = 0; j < a; j++) {
      if (!(row[j] >= 0)) throw new RangeError(`entry (${c}, ${j}) is ${row[j]}, not a probability`);
      law[c * a + j] = row[j];
      rowTotal[c] += row[j];
    }
  });
  return modelOfLaws({ contextLength: order, contexts: rows.length, law, rowTotal }, a, order);
}

function modelOfLaws(laws: ContextLaws, a: number, order: number): FittedMarkovModel {
  const { contextLength: k, contexts, law, rowTotal } = laws;
  const keep = contexts / a;
  const kept = new Uint8Array(contexts);
  for (let c = 0; c < contexts; c++) kept[c] = rowTotal[c] > 0 ? 1 : 0;
  let dropped = 0;
  // Prune transitions into contexts without a row until nothing changes.
  for (let changed = true; changed; ) {
    changed = false;
    for (let c = 0; c < contexts; c++) {
      if (!kept[c]) continue;
      let left = 0;
      for (let j = 0; j < a; j++) {
        const next = (c % keep) * a + j;
        if (law[c * a + j] > 0 && !kept[next]) {
          dropped += law[c * a + j];
          law[c * a + j] = 0;
        }
        left += law[c * a + j];
      }
      rowTotal[c] = left;
      if (left === 0) {
        kept[c] = 0;
        changed = true;
      }
    }
  }
  const index = new Int32Array(contexts).fill(-1);
  let states = 0;
  for (let c = 0; c < contexts; c++) if (kept[c]) index[c] = states++;
  if (states === 0) throw new RangeError('the data hold no transition to fit a Markov chain to');
  if (states > MAX_MARKOV_STATES) throw new RangeError(`the fitted chain has ${states} contexts, more than ${MAX_MARKOV_STATES}`);
  const stateContexts = new Int32Array(states);
  const rows = new Float64Array(states * a);
  const nextState = new Int32Array(states * a).fill(-1);
  const lifted: Float64Array[] = [];
  for (let c = 0; c < contexts; c++) {
    const s = index[c];
    if (s < 0) continue;
    stateContexts[s] = c;
    const out = new Float64Array(states);
    for (let j = 0; j < a; j++) {
      const p = law[c * a + j] / rowTotal[c];
      if (p === 0) continue;
      const next = index[(c % keep) * a + j];
      rows[s * a + j] = p;
      nextState[s * a + j] = next;
      out[next] += p;
    }
    lifted.push(out);
  }
  const chain = checkTransitionMatrix(lifted);
  const stationary = stationaryOfChecked(chain);
  const entropyRateNats = entropyRateOfChecked(chain, stationary);
  const { variance } = functionalMomentsOfChecked(chain, stationary, informationFunctional(chain));
  let transientStates = 0;
  for (let s = 0; s < states; s++) if (stationary[s] === 0) transientStates++;
  return {
    alphabetSize: a,
    order,
    contextLength: k,
    states,
    contexts: stateContexts,
    rows,
    nextState,
    stationary,
    entropyRateNats,
    sigma2Nats: snapSigma2(variance, entropyRateNats),
    period: chain.period,
    transientStates,
    droppedTransitions: dropped,
  };
}

/**
 * A stationary path of the fitted chain: the first context from the stationary law (its digits
 * oldest first), then each symbol by a search of the cumulative row with a 53-bit uniform, as
 * markovSource does for chains given by all A^k rows (that source needs a row for every context,
 * which a fitted chain does not have).
 * @param length number of symbols, a non-negative safe integer
 * @param seed any safe integer
 */
export function generateFromModel(model: FittedMarkovModel, length: number, seed: number): SymbolArray {
  if (!Number.isSafeInteger(length) || length < 0) throw new RangeError(`length must be a non-negative integer, got ${length}`);
  const { alphabetSize: a, contextLength: k, states, rows, nextState, contexts } = model;
  const symbols = allocateSymbols(length, a);
  const cumulative = new Float64Array(states * a);
  for (let s = 0; s < states; s++) cumulativeLaw(rows.subarray(s * a, (s + 1) * a), cumulative, s * a);
  const start = new Float64Array(states);
  cumulativeLaw(model.stationary, start, 0);
  const uniforms = uniformStream(seed);
  const u0 = uniforms.next();
  let s = 0;
  while (s < states - 1 && u0 >= start[s]) s++;
  let divisor = a ** (k - 1);
  for (let t = 0; t < k && t < length; t++) {
    symbols[t] = Math.floor(contexts[s] / divisor) % a;
    divisor /= a;
  }
  for (let t = k; t < length; t++) {
    const u = uniforms.next();
    const base = s * a;
    let lo = base;
    let hi = base + a - 1;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (u < cumulative[mid]) hi = mid;
      else lo = mid + 1;
    }
    symbols[t] = lo - base;
    s = nextState[lo];
  }
  return symbols;
}
