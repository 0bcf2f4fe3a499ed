import type { SymbolArray } from '../sequence/sequence';
import { poissonMeanDeviation } from './poissonMeanDeviation';

/** Rule for the block length: at least this many pairs per joint cell on average (keeps the noise floor near 0.01 or below). */
export const PAIRS_PER_CELL = 1000;
/** Largest block length tried. */
export const MAX_MIXING_BLOCK = 12;
/** At most this many (block, block) pairs per gap; longer sequences are sampled with a stride. */
export const MAX_MIXING_PAIRS = 1 << 20;
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
 * The plug-in histogram estimator of the beta-mixing coefficient (McDonald, Shalizi & Schervish,
 * AISTATS 2011 and Electron. J. Stat. 9 (2015)): for each gap k, half the total-variation distance
 * between the empirical joint law of (m-block at t, m-block at t + m - 1 + k) and the product of its
 * two empirical marginals, over the pairs t = 0, s, 2s, ... (s = stride). It is biased upward when
 * N is small against the number of cells; `noiseFloor` is that bias under independence:
 * (1/2M) sum_ab E|X_ab - lambda_ab| with X_ab Poisson of mean (and variance)
 * lambda_ab = M p_a q_b (1 - p_a)(1 - q_b), which matches the variance of the cell count minus its
 * fitted value under independence (multinomial sampling; overlapping pairs are treated as
 * independent, so the floor is approximate).
 * A function of the blocks never mixes more slowly than the blocks, so after coarsening the
 * alphabet the estimate is of a lower bound on the beta of the full alphabet.
 * Cost: one pass per chunk of rolling codes plus one counting pass per gap over at most
 * MAX_MIXING_PAIRS pairs.
 */
export function estimateBetaMixing(
  symbols: SymbolArray,
  alphabetSize: number,
  options: { readonly gaps?: readonly number[]; readonly blockLength?: number; readonly maxPairs?: number } = {},
): BetaMixingEstimate | null {
  const N = symbols.length;
  if (!Number.isInteger(alphabetSize) || alphabetSize < 1) throw new RangeError(`alphabetSize must be >= 1; got ${alphabetSize}`);
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
  const span = m - 1 + maxGap;
  const codes = new Int32Array(CHUNK + span);
  const high = (perBlock / L) | 0;
  // Chunks of CHUNK pair starts; codes[i] = code of the m-block at start + i.
  for (let start = 0; start < N; start += CHUNK) {
    const end = Math.min(N - m + 1, start + CHUNK + span);
    if (end <= start) break;
    let code = 0;
    for (let j = 0; j < m - 1; j++) code = code * L + map[symbols[start + j]];
    for (let p = start; p < end; p++) {
      code = ((code % high) * L + map[symbols[p + m - 1]]) | 0;
      codes[p - start] = code;
    }
    const firstT = Math.ceil(start / stride) * stride;
    for (let g = 0; g < G; g++) {
      const offset = m - 1 + usable[g];
      const lastT = Math.min(start + CHUNK - 1, N - m - offset);
      const base = g * cells;
      for (let t = firstT; t <= lastT; t += stride) table[base + codes[t - start] * perBlock + codes[t - start + offset]]++;
    }
  }
  const beta: number[] = [];
  const noiseFloor: number[] = [];
  const pairs: number[] = [];
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
    for (let a = 0; a < perBlock; a++) {
      const p = rowSum[a] / M;
      if (p === 0) continue;
      for (let b = 0; b < perBlock; b++) {
        const q = colSum[b] / M;
        if (q === 0) continue;
        distance += Math.abs(table[base + a * perBlock + b] / M - p * q);
        floor += poissonMeanDeviation(M * p * q * (1 - p) * (1 - q));
      }
    }
    beta.push(distance / 2);
    noiseFloor.push(floor / (2 * M));
    pairs.push(M);
  }
  return { blockLength: m, symbolsKept: L, cells, stride, gaps: usable, beta, noiseFloor, pairs };
}
