import type { SymbolArray } from '../sequence/sequence';
import { poissonMeanDeviation } from './poissonMeanDeviation';

/** Rule for the block length: at least this many pairs per joint cell on average (keeps the noise floor near 0.01 or below). */
export const PAIRS_PER_CELL = 1000;
/** Largest block length tried. */
export const MAX_MIXING_BLOCK = 12;
/** At most this many (block, block) pairs per gap; longer sequences are sampled with a stride.
 * 2^18 keeps the diagnostics under 10% of an analysis at N = 1e6 (DEVELOPERS.md, Cost); the floor
 * grows as 1/sqrt(pairs), from about 0.003 to 0.006 for 256 cells, and the block-length rule gives
 * the same m for alphabets of 2, 4 and 8 symbols at 2^18 as at 2^20. */
export const MAX_MIXING_PAIRS = 1 << 18;
/** Lags (in units of the stride) over which the serial dependence of each block process is summed
 * for the noise floor's variance inflation: every lag up to this, read at the gap grid
 * (mixingGaps) and interpolated linearly between its points. */
export const INFLATION_LAGS = 32;
/** At most this many sampled positions start the lag pairs of the inflation estimate (every r-th
 * pair start): autocorrelations of indicators with p >= 1/16 are then within about 1/64 per lag. */
export const INFLATION_POSITIONS = 1 << 16;
/** Smallest variance inflation used: the exact factor is a spectral integral, never negative, but
 * its truncated estimate can be; this keeps the floor positive. */
const MIN_INFLATION = 0.1;
/** Largest gap k. */
export const MAX_MIXING_GAP = 1024;
/** A coefficient counts as signal (used by the decay fits) when above this multiple of its noise floor. */
export const SIGNAL_FACTOR = 2;
/** Positions per chunk of rolling block codes. */
const CHUNK = 1 << 16;

/** Estimated beta-mixing coefficients, one per gap. */
export interface BetaMixingEstimate {
  /** Block length m of both blocks. */
  readonly blockLength: number;
  /** Symbols after coarsening: the most frequent symbolsKept - 1 keep their identity, the rest
   * share one class. Equal to the alphabet size when nothing was merged. */
  readonly symbolsKept: number;
  /** Joint cells, symbolsKept^(2m). */
  readonly cells: number;
  /** Every stride-th position starts a pair (1 = all positions). */
  readonly stride: number;
  /** Gaps k: the second block starts at t + m - 1 + k, k symbols after the last symbol of the first. */
  readonly gaps: readonly number[];
  /** Estimated beta(k) per gap. */
  readonly beta: readonly number[];
  /** Expected estimate under independence with the same marginals and pairs, per gap. */
  readonly noiseFloor: readonly number[];
  /** Pairs counted per gap. */
  readonly pairs: readonly number[];
  /** Ratio of the noise floor to the one that treats the pairs as independent (mean over gaps):
   * the variance inflation from the serial dependence of the blocks, on the scale of the floor. */
  readonly floorInflation: number;
}

/**
 * Gaps 1..8, then steps of about 25% (rounded, distinct) up to maxGap: even on a log axis, so the
 * power-law fit is not dominated by the short gaps.
 */
export function mixingGaps(maxGap: number): number[] {
  if (!Number.isInteger(maxGap) || maxGap < 1) throw new RangeError(`maxGap must be an integer >= 1; got ${maxGap}`);
  const out: number[] = [];
  for (let k = 1; k <= Math.min(8, maxGap); k++) out.push(k);
  let x = 8;
  for (;;) {
    x *= 1.25;
    const k = Math.round(x);
    if (k > maxGap) break;
    if (k > out[out.length - 1]) out.push(k);
  }
  return out;
}

/** Lags at which the indicator autocorrelations are counted, and the weights that turn values at them
 * into the sum over every integer lag 1..last (linear interpolation between grid points). */
const LAG_GRID = mixingGaps(INFLATION_LAGS);
const LAG_WEIGHTS = ((): Float64Array => {
  const w = new Float64Array(LAG_GRID.length);
  for (let i = 0; i + 1 < LAG_GRID.length; i++) {
    const a = LAG_GRID[i];
    const b = LAG_GRID[i + 1];
    for (let v = a; v < b; v++) {
      w[i] += (b - v) / (b - a);
      w[i + 1] += (v - a) / (b - a);
    }
  }
  w[LAG_GRID.length - 1] += 1;
  return w;
})();

/**
 * Symbols kept and block length for N positions and alphabet size A (the stated rule): with
 * M = pairs per gap (N sampled down to at most MAX_MIXING_PAIRS), the number of joint cells must be
 * at most M / PAIRS_PER_CELL. If even A^2 is too many, the alphabet is coarsened to
 * L = floor(sqrt(M / PAIRS_PER_CELL)) classes (the L - 1 most frequent symbols and "all others");
 * then m = the largest block length with L^(2m) <= M / PAIRS_PER_CELL, at most MAX_MIXING_BLOCK.
 * Returns null when even L = 2, m = 1 is too many cells (fewer than 400 pairs).
 */
export function mixingBlockPlan(pairs: number, alphabetSize: number): { readonly symbols: number; readonly blockLength: number } | null {
  const budget = pairs / PAIRS_PER_CELL;
  if (budget < 4) return null;
  const symbols = alphabetSize * alphabetSize <= budget ? alphabetSize : Math.max(2, Math.floor(Math.sqrt(budget)));
  let m = 1;
  while (m < MAX_MIXING_BLOCK && Math.pow(symbols, 2 * (m + 1)) <= budget) m++;
  return { symbols, blockLength: m };
}

/** Maps symbol ids to classes 0..L-1: the L-1 most frequent keep a class each, the rest share L-1. */
function symbolClasses(symbols: SymbolArray, alphabetSize: number, kept: number): Int32Array {
  const map = new Int32Array(alphabetSize);
  if (kept >= alphabetSize) {
    for (let a = 0; a < alphabetSize; a++) map[a] = a;
    return map;
  }
  const counts = new Float64Array(alphabetSize);
  for (let t = 0; t < symbols.length; t++) counts[symbols[t]]++;
  // The kept - 1 most frequent symbols by insertion into a short sorted list (kept is at most a few
  // dozen), not a sort of the whole alphabet, which may hold millions of tokens.
  const top = kept - 1;
  const order = new Int32Array(top).fill(-1);
  for (let a = 0; a < alphabetSize; a++) {
    const c = counts[a];
    if (order[top - 1] >= 0 && c <= counts[order[top - 1]]) continue;
    let j = top - 1;
    while (j > 0 && (order[j - 1] < 0 || c > counts[order[j - 1]])) {
      order[j] = order[j - 1];
      j--;
    }
    order[j] = a;
  }
  map.fill(kept - 1);
  for (let r = 0; r < top; r++) if (order[r] >= 0) map[order[r]] = r;
  return map;
}

/**
 * Counts of the block codes at the lag-pair starts (every r-th sampled position, at most
 * INFLATION_POSITIONS) and of equal codes LAG_GRID[j] * stride later: enough for the
 * autocorrelation of the indicator of each block value at those lags.
 */
class IndicatorLags {
  readonly single: Float64Array;
  readonly same: Int32Array;
  readonly pairsAt: Float64Array;
  constructor(
    readonly perBlock: number,
    readonly lags: number,
  ) {
    this.single = new Float64Array(perBlock);
    // One spare slot at the end takes the non-matches (branch-free counting).
    this.same = new Int32Array((lags + 1) * perBlock + 1);
    this.pairsAt = new Float64Array(lags + 1);
  }

  /** rho_a at the j-th counted lag (1-based): the autocorrelation of 1{code = a} (0 when a is never or always seen). */
  rho(a: number, j: number): number {
    const n = this.pairsAt[0];
    const p = this.single[a] / n;
    if (p <= 0 || p >= 1 || this.pairsAt[j] <= 0) return 0;
    return (this.same[j * this.perBlock + a] / this.pairsAt[j] - p * p) / (p * (1 - p));
  }
}

/**
 * The plug-in histogram estimator of the beta-mixing coefficient (McDonald, Shalizi & Schervish,
 * AISTATS 2011 and Electron. J. Stat. 9 (2015)): for each gap k, half the total-variation distance
 * between the empirical joint law of (m-block at t, m-block at t + m - 1 + k) and the product of its
 * two empirical marginals, over the pairs t = 0, s, 2s, ... (s = stride).
 *
 * Noise floor: the expected estimate when the two blocks are independent. The residual of cell
 * (a, b), X_ab - M p^_a q^_b, is exactly M times the sample cross-covariance of the indicator series
 * 1{first block = a} and 1{second block = b} (the estimated marginals are the sample means). For two
 * independent stationary series its variance is
 *   M p_a (1 - p_a) q_b (1 - q_b) F_ab,  F_ab = sum over all lags v of rho_a(v) rho_b(v)
 * (Bartlett, J. R. Stat. Soc. Suppl. 98 (1935); Box & Jenkins, Time Series Analysis, the cross
 * correlation of two independent series; from memory), rho the autocorrelations of the indicators.
 * Pairs of an i.i.d. sequence have F = 1 (only v = 0), which is the multinomial variance; a
 * persistent sequence has F > 1 because neighbouring pairs repeat each other, and treating the
 * pairs as independent set the floor too low (by about 30% on the eight-state wind chain of the
 * demo). F_ab is estimated from the data, 1 + 2 sum_{j=1..INFLATION_LAGS} rho^_a(js) rho^_b(js)
 * (lags between sampled pairs are multiples of the stride; the sum runs over every lag up to
 * INFLATION_LAGS, counted on the gap grid and interpolated), and floored at MIN_INFLATION. Each
 * cell's E|X - lambda| is that of a quasi-Poisson count with variance F lambda,
 * F * E|Poisson(lambda / F) - lambda / F| (F = 1 gives the Poisson value; large lambda the normal
 * sqrt(2 F lambda / pi)), lambda = M p q (1 - p)(1 - q); floor = (1/2M) sum of these.
 * Within one sequence the two block series are the same process shifted, so one set of rho serves
 * both; with `partner` the second block is read from the partner sequence (then beta is exactly 0
 * when the two sequences are independent, which is how the floor is checked).
 *
 * A function of the blocks never mixes more slowly than the blocks, so after coarsening the
 * alphabet the estimate is of a lower bound on the beta of the full alphabet.
 * Cost: one pass per chunk of rolling codes plus one counting pass per gap and one per inflation
 * lag over at most MAX_MIXING_PAIRS pairs.
 */
export function estimateBetaMixing(
  symbols: SymbolArray,
  alphabetSize: number,
  options: {
    readonly gaps?: readonly number[];
    readonly blockLength?: number;
    readonly maxPairs?: number;
    /** Read the second block of each pair from this sequence (same length and alphabet). */
    readonly partner?: SymbolArray;
  } = {},
): BetaMixingEstimate | null {
  const N = symbols.length;
  if (!Number.isInteger(alphabetSize) || alphabetSize < 1) throw new RangeError(`alphabetSize must be >= 1; got ${alphabetSize}`);
  const partner = options.partner;
  if (partner !== undefined && partner.length !== N) throw new RangeError(`partner must have the same length ${N}; got ${partner.length}`);
  const maxPairs = options.maxPairs ?? MAX_MIXING_PAIRS;
  const stride = Math.max(1, Math.ceil(N / maxPairs));
  const plan = mixingBlockPlan(Math.floor(N / stride), alphabetSize);
  if (plan === null) return null;
  const m = options.blockLength ?? plan.blockLength;
  if (!Number.isInteger(m) || m < 1) throw new RangeError(`blockLength must be an integer >= 1; got ${m}`);
  const L = plan.symbols;
  const gaps = options.gaps ?? mixingGaps(Math.min(MAX_MIXING_GAP, Math.floor(N / 8)));
  const usable = gaps.filter((k) => Number.isInteger(k) && k >= 1 && N - (2 * m - 1 + k) >= 0);
  if (usable.length !== gaps.length) throw new RangeError(`every gap must be an integer >= 1 and fit in N = ${N} with m = ${m}`);
  if (usable.length === 0) return null;
  const perBlock = Math.pow(L, m);
  const cells = perBlock * perBlock;
  if (cells > 1 << 26) throw new RangeError(`${L}^${2 * m} = ${cells} joint cells are too many`);
  const map = symbolClasses(symbols, alphabetSize, L);
  const maxGap = usable.reduce((a, b) => Math.max(a, b), 0);
  const G = usable.length;
  const table = new Int32Array(G * cells);
  const lagSpan = LAG_GRID[LAG_GRID.length - 1] * stride;
  const span = Math.max(m - 1 + maxGap, lagSpan);
  const codes = new Int32Array(CHUNK + span);
  const partnerCodes = partner === undefined ? codes : new Int32Array(CHUNK + span);
  const lagGrid = LAG_GRID;
  const first = new IndicatorLags(perBlock, lagGrid.length);
  const second = partner === undefined ? first : new IndicatorLags(perBlock, lagGrid.length);
  const high = (perBlock / L) | 0;
  const every = Math.max(1, Math.ceil(N / stride / INFLATION_POSITIONS));
  const rollCodes = (source: SymbolArray, out: Int32Array, start: number, end: number): void => {
    let code = 0;
    for (let j = 0; j < m - 1; j++) code = code * L + map[source[start + j]];
    for (let p = start; p < end; p++) {
      code = ((code % high) * L + map[source[p + m - 1]]) | 0;
      out[p - start] = code;
    }
  };
  const countLags = (c: Int32Array, lags: IndicatorLags, start: number, firstT: number, end: number): void => {
    const lastT = Math.min(start + CHUNK - 1, end - 1);
    const step = stride * every;
    const t0 = Math.ceil(firstT / step) * step;
    const single = lags.single;
    const same = lags.same;
    const pairsAt = lags.pairsAt;
    const spare = same.length - 1;
    for (let t = t0; t <= lastT; t += step) single[c[t - start]]++;
    for (let i = 0; i < lagGrid.length; i++) {
      const d = lagGrid[i] * stride;
      const top = Math.min(lastT, end - 1 - d);
      const row = (i + 1) * perBlock;
      let n = 0;
      // Branch-free: adds 1 to the row of a when the code d later is a, else to a spare slot.
      for (let t = t0 - start; t <= top - start; t += step) {
        const a = c[t];
        same[c[t + d] === a ? row + a : spare]++;
        n++;
      }
      pairsAt[i + 1] += n;
    }
    pairsAt[0] += lastT >= t0 ? Math.floor((lastT - t0) / step) + 1 : 0;
  };
  // Chunks of CHUNK pair starts; codes[i] = code of the m-block at start + i.
  for (let start = 0; start < N; start += CHUNK) {
    const end = Math.min(N - m + 1, start + CHUNK + span);
    if (end <= start) break;
    rollCodes(symbols, codes, start, end);
    if (partner !== undefined) rollCodes(partner, partnerCodes, start, end);
    const firstT = Math.ceil(start / stride) * stride;
    for (let g = 0; g < G; g++) {
      const offset = m - 1 + usable[g];
      const lastT = Math.min(start + CHUNK - 1, N - m - offset);
      const base = g * cells;
      for (let t = firstT; t <= lastT; t += stride) table[base + codes[t - start] * perBlock + partnerCodes[t - start + offset]]++;
    }
    countLags(codes, first, start, firstT, end);
    if (partner !== undefined) countLags(partnerCodes, second, start, firstT, end);
  }
  // F_ab = 1 + 2 sum_v rho_a(v) rho_b(v) over v = 1..last lag, through the per-lag vectors of rho.
  const J = lagGrid.length;
  const rhoFirst = new Float64Array(J * perBlock);
  const rhoSecond = new Float64Array(J * perBlock);
  for (let j = 0; j < J; j++) {
    for (let a = 0; a < perBlock; a++) {
      rhoFirst[j * perBlock + a] = LAG_WEIGHTS[j] * first.rho(a, j + 1);
      rhoSecond[j * perBlock + a] = second.rho(a, j + 1);
    }
  }
  const inflation = new Float64Array(cells);
  for (let a = 0; a < perBlock; a++) {
    for (let b = 0; b < perBlock; b++) {
      let f = 1;
      for (let j = 0; j < J; j++) f += 2 * rhoFirst[j * perBlock + a] * rhoSecond[j * perBlock + b];
      inflation[a * perBlock + b] = Math.max(MIN_INFLATION, f);
    }
  }
  const beta: number[] = [];
  const noiseFloor: number[] = [];
  const pairs: number[] = [];
  let inflationSum = 0;
  const rowSum = new Float64Array(perBlock);
  const colSum = new Float64Array(perBlock);
  for (let g = 0; g < G; g++) {
    rowSum.fill(0);
    colSum.fill(0);
    const base = g * cells;
    let M = 0;
    for (let a = 0; a < perBlock; a++) {
      for (let b = 0; b < perBlock; b++) {
        const c = table[base + a * perBlock + b];
        rowSum[a] += c;
        colSum[b] += c;
        M += c;
      }
    }
    let distance = 0;
    let floor = 0;
    let plain = 0;
    for (let a = 0; a < perBlock; a++) {
      const p = rowSum[a] / M;
      if (p === 0) continue;
      for (let b = 0; b < perBlock; b++) {
        const q = colSum[b] / M;
        if (q === 0) continue;
        distance += Math.abs(table[base + a * perBlock + b] / M - p * q);
        const lambda = M * p * q * (1 - p) * (1 - q);
        const F = inflation[a * perBlock + b];
        floor += F * poissonMeanDeviation(lambda / F);
        plain += poissonMeanDeviation(lambda);
      }
    }
    beta.push(distance / 2);
    noiseFloor.push(floor / (2 * M));
    pairs.push(M);
    inflationSum += plain > 0 ? floor / plain : 1;
  }
  return { blockLength: m, symbolsKept: L, cells, stride, gaps: usable, beta, noiseFloor, pairs, floorInflation: inflationSum / G };
}
