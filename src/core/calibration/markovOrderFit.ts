import type { SymbolArray } from '../sequence/sequence';
import { MAX_MARKOV_STATES } from '../sources/markovEntropy';

/**
 * Orders are considered up to the largest k whose A^(k+1) cells hold at least this many
 * observations on average (common practice, no source: the same "20 per cell" the plug-in block
 * entropies use for "well sampled").
 */
export const MIN_MEAN_PER_CELL = 20;
/** Highest order ever considered (A = 2 at N = 1e8 would otherwise allow k = 21). */
export const MAX_FITTED_ORDER = 10;

/** One candidate order k. */
export interface OrderScore {
  readonly order: number;
  /** Maximized conditional log-likelihood, nats, over the same n observations for every k. */
  readonly logLikelihood: number;
  /** Free parameters (A - 1) A^k. */
  readonly parameters: number;
  /** -2 logLikelihood + parameters log n (Schwarz 1978's criterion; smaller is better). */
  readonly bic: number;
}

/** Counts of the (k+1)-blocks for the chosen k, with the criterion for every k considered. */
export interface MarkovOrderFit {
  readonly alphabetSize: number;
  /** The order with the smallest BIC (the smaller order on a tie). */
  readonly order: number;
  /** Highest order considered, and why it stops there. */
  readonly maxOrder: number;
  readonly capReason: string;
  /** Observations behind every likelihood: N - maxOrder (the first maxOrder symbols are conditioned on). */
  readonly observations: number;
  readonly scores: readonly OrderScore[];
  /**
   * Counts of the (order+1)-blocks x_{t-k}..x_t for t = order..N-1 (every transition in the data,
   * not only those after maxOrder: the fitted model uses them all), indexed as a base-A number with
   * the most recent symbol least significant, i.e. context * A + next symbol.
   */
  readonly counts: Float64Array;
}

/**
 * The largest order k with A^(k+1) <= n / MIN_MEAN_PER_CELL, A^k <= MAX_MARKOV_STATES (the exact
 * h and sigma^2 use a dense solver on the contexts) and k <= MAX_FITTED_ORDER; order 0 is always
 * allowed.
 */
export function orderCap(alphabetSize: number, length: number): { maxOrder: number; reason: string } {
  let k = 0;
  for (;;) {
    const next = k + 1;
    if (next > MAX_FITTED_ORDER) return { maxOrder: k, reason: `orders above ${MAX_FITTED_ORDER} are never considered` };
    if (alphabetSize ** next > MAX_MARKOV_STATES) {
      return { maxOrder: k, reason: `order ${next} would have ${alphabetSize}^${next} contexts, more than ${MAX_MARKOV_STATES}` };
    }
    if (alphabetSize ** (next + 1) * MIN_MEAN_PER_CELL > length - next) {
      return {
        maxOrder: k,
        reason: `order ${next} would leave fewer than ${MIN_MEAN_PER_CELL} observations per cell on average (${alphabetSize}^${next + 1} cells)`,
      };
    }
    k = next;
  }
}

/** Counts of (k+1)-blocks ending at t = from..N-1, indexed as described for MarkovOrderFit.counts. */
export function blockCounts(symbols: SymbolArray, alphabetSize: number, order: number, from = order): Float64Array {
  const cells = alphabetSize ** (order + 1);
  const counts = new Float64Array(cells);
  const n = symbols.length;
  if (n <= order) return counts;
  let index = 0;
  // Prime the block ending at from - 1 (its oldest digit falls out at the first step).
  for (let t = from - order; t < from; t++) index = (index * alphabetSize + symbols[t]) % cells;
  for (let t = from; t < n; t++) {
    index = (index * alphabetSize + symbols[t]) % cells;
    counts[index]++;
  }
  return counts;
}

/** Maximized log-likelihood sum n(c,j) log(n(c,j)/n(c)) of (k+1)-block counts. */
export function conditionalLogLikelihood(counts: Float64Array, alphabetSize: number): number {
  let total = 0;
  for (let c = 0; c < counts.length; c += alphabetSize) {
    let row = 0;
    for (let j = 0; j < alphabetSize; j++) row += counts[c + j];
    if (row === 0) continue;
    for (let j = 0; j < alphabetSize; j++) {
      const m = counts[c + j];
      if (m > 0) total += m * Math.log(m / row);
    }
  }
  return total;
}

/**
 * Chooses the order k of a Markov chain for a sequence by BIC: -2 log L_k + (A - 1) A^k log n, with
 * every k's likelihood conditioned on the same first maxOrder symbols so that they compare over the
 * same n observations. BIC is a strongly consistent Markov order estimator (Csiszár & Shields,
 * Ann. Statist. 28 (2000) 1601-1619, volume and pages from memory; their theorem is also announced
 * in Electron. Res. Announc. AMS 5 (1999) 123-127), where AIC overestimates the order with positive
 * probability at every n (Katz, Technometrics 23 (1981) 243-249, from memory). The counts at the
 * top order are marginalized for the lower ones (a (k+1)-block's index is the top block's index
 * modulo A^(k+1)), so the data are read once.
 * @param alphabetSize A, every symbol id below it
 * @throws RangeError when the sequence has fewer than 2 symbols or the alphabet is too large for
 *   even order 0 (A > MAX_MARKOV_STATES)
 */
export function markovOrderFit(symbols: SymbolArray, alphabetSize: number): MarkovOrderFit {
  const N = symbols.length;
  if (N < 2) throw new RangeError(`a Markov chain needs at least 2 symbols to fit; got ${N}`);
  if (!Number.isInteger(alphabetSize) || alphabetSize < 1 || alphabetSize > MAX_MARKOV_STATES) {
    throw new RangeError(`a Markov chain can be fitted to at most ${MAX_MARKOV_STATES} distinct symbols; got ${alphabetSize}`);
  }
  const { maxOrder, reason } = orderCap(alphabetSize, N);
  const top = blockCounts(symbols, alphabetSize, maxOrder);
  const n = N - maxOrder;
  const logN = Math.log(n);
  const scores: OrderScore[] = [];
  let best = 0;
  for (let k = 0; k <= maxOrder; k++) {
    const cells = alphabetSize ** (k + 1);
    let counts = top;
    if (k < maxOrder) {
      counts = new Float64Array(cells);
      for (let i = 0; i < top.length; i++) counts[i % cells] += top[i];
    }
    const logLikelihood = conditionalLogLikelihood(counts, alphabetSize);
    const parameters = (alphabetSize - 1) * alphabetSize ** k;
    const bic = -2 * logLikelihood + parameters * logN;
    scores.push({ order: k, logLikelihood, parameters, bic });
    if (bic < scores[best].bic) best = k;
  }
  return {
    alphabetSize,
    order: best,
    maxOrder,
    capReason: reason,
    observations: n,
    scores,
    counts: blockCounts(symbols, alphabetSize, best),
  };
}
