import type { SymbolArray } from '../sequence/sequence';

/** Highest moment order reported. */
export const MOMENT_ORDER = 6;
/** Batches of consecutive positions for the standard errors of the moments. */
export const MOMENT_BATCHES = 32;
/** Up to this alphabet size the batch sums come from per-batch symbol counts (cheaper per position). */
const BATCH_COUNT_ALPHABET = 4096;
/** The heavy-tail warning fires when the singleton tail carries more than this share of the variance. */
export const TAIL_SHARE_LIMIT = 0.1;

/** A raw moment counts as resolved when the singleton level carries at most this share of it. */
export const RESOLVED_SHARE = 0.05;

/** Moments of the one-symbol information -log p^(x_t), p^ = count / N, in nats. */
export interface InformationMoments {
  /** Raw moments E[I^r] (about zero, not central), r = 1..6, nats^r. */
  readonly raw: readonly number[];
  /** Batch-means standard errors of the raw moments (MOMENT_BATCHES batches of consecutive positions). */
  readonly rawStandardError: readonly number[];
  /** Per order r, (f1/N)(log N)^r / E[I^r]: the share of the moment at the level of symbols seen once. */
  readonly singletonShare: readonly number[];
  /** Per order, singletonShare <= RESOLVED_SHARE. Higher orders weigh the unseen tail more and are
   * biased low when it is not resolved (continued-fraction digits at N = 1e6: -0.1%, -1%, -3%, -10%,
   * -20%, -34% for r = 1..6 against the Gauss-Kuzmin series). */
  readonly resolved: readonly boolean[];
  /** Plug-in variance of I (the central second moment), nats^2. */
  readonly variance: number;
  /** Symbols seen exactly once (f1) and twice (f2). */
  readonly seenOnce: number;
  readonly seenTwice: number;
  /** Good-Turing estimate of the unseen probability mass, f1 / N. */
  readonly unseenMass: number;
  /** Share of the variance at the singleton level: (f1/N)(log N - mean)^2 / variance. */
  readonly tailShare: number;
  /** True when tailShare > TAIL_SHARE_LIMIT. */
  readonly heavyTail: boolean;
}

/**
 * Raw moments of I_t = -log(c(x_t)/N) up to order 6 (exact sums over the symbols, weighted by their
 * counts), with batch-means standard errors (THEORY.md section 6; consecutive positions are
 * dependent, so an i.i.d. formula would understate them), and a heavy-tail check. The standard
 * errors cover sampling noise only: the plug-in cannot see symbols that never occurred, so moments
 * whose tail is not resolved are biased low (see `resolved`).
 *
 * Heavy-tail rule (ours, stated): symbols seen once have I = log N, the largest value the plug-in
 * can give, and by Good's estimate (Good, Biometrika 40 (1953) 237-264) the symbols not seen at all
 * carry about f1/N of the probability, each with I above log N. If
 * tailShare = (f1/N)(log N - mean)^2 / variance exceeds 0.1, a tenth of the variance sits at that
 * level and about as much again is unseen, so the variance estimate depends on a tail the sample
 * does not resolve. With a finite-variance tail (e.g. continued-fraction digits, p(k) ~ k^-2) the
 * share shrinks like N^(-1/2) log^2 N; with an infinite-variance tail (p(k) ~ 1/(k log^3 k)) it stays
 * near 0.2 at every N we tried (simulation, 1e3 to 4e6 symbols).
 */
export function informationMoments(symbols: SymbolArray, alphabetSize: number): InformationMoments | null {
  const N = symbols.length;
  if (N < 2 * MOMENT_BATCHES) return null;
  const counts = new Float64Array(alphabetSize);
  for (let t = 0; t < N; t++) counts[symbols[t]]++;
  // info[a] = I_a; for small alphabets also powers[a * MOMENT_ORDER + r] = I_a^(r+1) (large ones
  // would make that table 48 bytes per symbol).
  const info = new Float64Array(alphabetSize);
  const small = alphabetSize <= BATCH_COUNT_ALPHABET;
  const powers = new Float64Array(small ? alphabetSize * MOMENT_ORDER : 0);
  const logN = Math.log(N);
  let f1 = 0;
  let f2 = 0;
  const raw = new Float64Array(MOMENT_ORDER);
  for (let a = 0; a < alphabetSize; a++) {
    const c = counts[a];
    if (c === 0) continue;
    if (c === 1) f1++;
    else if (c === 2) f2++;
    const I = logN - Math.log(c);
    info[a] = I;
    let power = 1;
    for (let r = 0; r < MOMENT_ORDER; r++) {
      power *= I;
      if (small) powers[a * MOMENT_ORDER + r] = power;
      raw[r] += (c / N) * power;
    }
  }
  // Batch means of I^r over consecutive positions.
  const batchLength = Math.floor(N / MOMENT_BATCHES);
  const used = batchLength * MOMENT_BATCHES;
  const batchMean = new Float64Array(MOMENT_BATCHES * MOMENT_ORDER);
  if (small) {
    // Small alphabets: count symbols per batch (one increment per position), then weight the powers.
    const batchCounts = new Int32Array(MOMENT_BATCHES * alphabetSize);
    for (let b = 0; b < MOMENT_BATCHES; b++) {
      const base = b * alphabetSize;
      for (let t = b * batchLength; t < (b + 1) * batchLength; t++) batchCounts[base + symbols[t]]++;
    }
    for (let b = 0; b < MOMENT_BATCHES; b++) {
      for (let a = 0; a < alphabetSize; a++) {
        const c = batchCounts[b * alphabetSize + a];
        if (c === 0) continue;
        for (let r = 0; r < MOMENT_ORDER; r++) batchMean[b * MOMENT_ORDER + r] += c * powers[a * MOMENT_ORDER + r];
      }
      for (let r = 0; r < MOMENT_ORDER; r++) batchMean[b * MOMENT_ORDER + r] /= batchLength;
    }
  } else {
    for (let b = 0; b < MOMENT_BATCHES; b++) {
      const base = b * MOMENT_ORDER;
      for (let t = b * batchLength; t < (b + 1) * batchLength; t++) {
        const I = info[symbols[t]];
        let power = 1;
        for (let r = 0; r < MOMENT_ORDER; r++) {
          power *= I;
          batchMean[base + r] += power;
        }
      }
      for (let r = 0; r < MOMENT_ORDER; r++) batchMean[base + r] /= batchLength;
    }
  }
  const rawStandardError: number[] = [];
  for (let r = 0; r < MOMENT_ORDER; r++) {
    let mean = 0;
    for (let b = 0; b < MOMENT_BATCHES; b++) mean += batchMean[b * MOMENT_ORDER + r];
    mean /= MOMENT_BATCHES;
    let ss = 0;
    for (let b = 0; b < MOMENT_BATCHES; b++) ss += (batchMean[b * MOMENT_ORDER + r] - mean) ** 2;
    // Standard error of the mean over `used` positions from the spread of the batch means.
    rawStandardError.push(Math.sqrt(ss / (MOMENT_BATCHES - 1) / MOMENT_BATCHES) * Math.sqrt(used / N));
  }
  const variance = Math.max(0, raw[1] - raw[0] * raw[0]);
  const unseenMass = f1 / N;
  const tailShare = variance > 0 ? (unseenMass * (logN - raw[0]) ** 2) / variance : 0;
  const singletonShare: number[] = [];
  for (let r = 0; r < MOMENT_ORDER; r++) singletonShare.push(raw[r] > 0 ? (unseenMass * Math.pow(logN, r + 1)) / raw[r] : 0);
  return {
    raw: Array.from(raw),
    rawStandardError,
    singletonShare,
    resolved: singletonShare.map((x) => x <= RESOLVED_SHARE),
    variance,
    seenOnce: f1,
    seenTwice: f2,
    unseenMass,
    tailShare,
    heavyTail: tailShare > TAIL_SHARE_LIMIT,
  };
}
