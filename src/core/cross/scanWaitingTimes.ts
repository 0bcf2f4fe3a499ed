import { logOfPositive } from '../returns/logOfPositive';
import { ScanCancelled } from '../returns/partitionLevel';

/** What is recorded per block length n about the waiting times W_n(i) of A's blocks in B. */
export interface WaitingLevel {
  readonly n: number;
  /** Positions of A with an n-block: N - n + 1. */
  readonly positions: number;
  /** Positions whose block occurs in B (W observed). */
  readonly observed: number;
  /** Positions whose block never occurs in B: only W > M - n + 1 is known. */
  readonly censored: number;
  /** log of the least value a censored W can take, M - n + 2 (0 when B is shorter than n). */
  readonly logCensoredBound: number;
  /** Sums of log W and (log W)^2 over observed positions, nats. */
  readonly sumLog: number;
  readonly sumLog2: number;
  /** Per fine batch of A positions (batch b = positions [b, b+1) * batchLength). */
  readonly batchObserved: Float64Array;
  readonly batchCensored: Float64Array;
  readonly batchSumLog: Float64Array;
  readonly batchSumLog2: Float64Array;
}

/** log W_n for a systematic sample of A positions. */
export interface WaitingSample {
  /** Sampled A positions (multiples of a power-of-two stride). */
  readonly positions: Int32Array;
  /** Row s, column n - 1: log W_n at positions[s], nats; NaN when censored or past A's end. */
  readonly logWait: Float64Array;
  /** Same layout: 1 where the block never occurs in B. */
  readonly censored: Uint8Array;
}

export interface WaitingScan {
  readonly lengthA: number;
  readonly lengthB: number;
  readonly maxN: number;
  readonly batchLength: number;
  readonly batchCount: number;
  readonly levels: readonly WaitingLevel[];
  readonly sample: WaitingSample;
}

export interface WaitingScanOptions {
  /** Largest block length, 1 <= maxN <= |A|. */
  readonly maxN: number;
  /** About this many fine batches over A (rounded so the batch length is a power of two); default 256. */
  readonly batchTarget?: number;
  /** About this many sampled positions of A; default 256. */
  readonly sampleTarget?: number;
  /**
   * Called after each level with its statistics and the per-position waits of A: waits[i] = W_n(i)
   * (1 + first index in B) or 0 when the block never occurs in B, valid for i <= |A| - n. The array
   * is the scan's working buffer, overwritten at the next level: copy what you keep.
   */
  readonly onLevel?: (level: WaitingLevel, waits: Int32Array) => void;
  /** Polled between levels and every POLL_SEGMENTS classes; true abandons the scan (ScanCancelled). */
  readonly shouldStop?: () => boolean;
}

const POLL_SEGMENTS = 1 << 14;

function powerOfTwoAtLeast(x: number): number {
  let p = 1;
  while (p < x) p *= 2;
  return p;
}

/**
 * Waiting times of the n-blocks of A in B for n = 1..maxN: W_n(i) = 1 + the least j with
 * B[j..j+n) = A[i..i+n) (Wyner & Ziv, IEEE Trans. IT 35 (1989), from memory; Kontoyiannis,
 * J. Theoret. Probab. 11 (1998) 795-811, for the strong approximation log W_n ~ -log Q(A_1^n)).
 *
 * Class refinement over the positions of A and B together (the same idea as the return-time engine,
 * ARCHITECTURE.md): positions are kept grouped by the class of their (n-1)-block, each class in
 * increasing position with A's positions (ids 0..N-1) before B's (ids N..N+M-1). Level n drops the
 * positions whose n-block runs past the end of their own sequence and splits each class stably by
 * the symbol at offset n - 1. In a new class the A members come first, so the first B member is the
 * least B position holding the block: every A member waits that long. A class without A members
 * can never matter again; a class without B members means its blocks (and all their extensions)
 * never occur in B, so its A members stay censored for every larger n and leave the active set.
 * Work per level is proportional to the active positions plus one pass over A for the statistics:
 * O((|A| + |B|) maxN) at worst, memory a few 32-bit arrays of length |A| + |B|.
 *
 * Symbols must already be in one shared alphabet (sharedAlphabet.ts).
 * @param a symbol ids of A; b symbol ids of B, all in [0, alphabetSize)
 * @throws RangeError on bad parameters; ScanCancelled when shouldStop returns true
 */
export function scanWaitingTimes(
  a: ArrayLike<number>,
  b: ArrayLike<number>,
  alphabetSize: number,
  options: WaitingScanOptions,
): WaitingScan {
  const N = a.length;
  const M = b.length;
  const { maxN, onLevel, shouldStop } = options;
  if (N < 1) throw new RangeError('sequence A is empty');
  if (M < 1) throw new RangeError('sequence B is empty');
  if (!Number.isInteger(maxN) || maxN < 1 || maxN > N) throw new RangeError(`maxN must be an integer from 1 to |A| = ${N}; got ${maxN}`);
  if (!Number.isInteger(alphabetSize) || alphabetSize < 1) throw new RangeError(`alphabetSize must be a positive integer; got ${alphabetSize}`);
  const T = N + M;
  const symbols = new Int32Array(T);
  for (let i = 0; i < N; i++) symbols[i] = a[i];
  for (let j = 0; j < M; j++) symbols[N + j] = b[j];
  for (let p = 0; p < T; p++) {
    const s = symbols[p];
    if (!(s >= 0 && s < alphabetSize)) throw new RangeError(`symbol ${s} at ${p < N ? `A[${p}]` : `B[${p - N}]`} is outside [0, ${alphabetSize})`);
  }

  const batchLength = powerOfTwoAtLeast(Math.ceil(N / Math.max(1, options.batchTarget ?? 256)));
  const batchShift = Math.log2(batchLength);
  const batchCount = Math.ceil(N / batchLength);
  const stride = powerOfTwoAtLeast(Math.ceil(N / Math.max(1, options.sampleTarget ?? 256)));
  const sampleCount = Math.ceil(N / stride);
  const sample: WaitingSample = {
    positions: new Int32Array(sampleCount),
    logWait: new Float64Array(sampleCount * maxN).fill(Number.NaN),
    censored: new Uint8Array(sampleCount * maxN),
  };
  for (let s = 0; s < sampleCount; s++) sample.positions[s] = s * stride;

  // Level 0: one class holding every position, in increasing order.
  let order = new Int32Array(T);
  let next = new Int32Array(T);
  let bounds = new Int32Array(T + 1);
  let nextBounds = new Int32Array(T + 1);
  for (let p = 0; p < T; p++) order[p] = p;
  bounds[0] = 0;
  bounds[1] = T;
  let segments = 1;
  const counts = new Int32Array(alphabetSize);
  const offsets = new Int32Array(alphabetSize);
  const touched = new Int32Array(Math.min(alphabetSize, T));
  const waits = new Int32Array(N);
  const levels: WaitingLevel[] = [];

  for (let n = 1; n <= maxN; n++) {
    if (shouldStop?.()) throw new ScanCancelled();
    let w = 0;
    let nextSegments = 0;
    for (let g = 0; g < segments; g++) {
      if ((g & (POLL_SEGMENTS - 1)) === POLL_SEGMENTS - 1 && shouldStop?.()) throw new ScanCancelled();
      const s = bounds[g];
      const e = bounds[g + 1];
      // Count the next symbol of each member whose n-block fits in its own sequence.
      let kinds = 0;
      for (let k = s; k < e; k++) {
        const p = order[k];
        if (p < N ? p + n > N : p - N + n > M) continue;
        const c = symbols[p + n - 1];
        if (counts[c] === 0) touched[kinds++] = c;
        counts[c]++;
      }
      let at = w;
      for (let t = 0; t < kinds; t++) {
        const c = touched[t];
        offsets[c] = at;
        at += counts[c];
      }
      for (let k = s; k < e; k++) {
        const p = order[k];
        if (p < N ? p + n > N : p - N + n > M) continue;
        next[offsets[symbols[p + n - 1]]++] = p;
      }
      // Sub-classes lie in touched order; keep those with members of both sequences, compacting
      // them leftwards (each kept range moves to a lower or equal index, so copyWithin is safe).
      let start = w;
      for (let t = 0; t < kinds; t++) {
        const c = touched[t];
        const size = counts[c];
        counts[c] = 0;
        const from = start;
        start += size;
        let aMembers = 0;
        while (aMembers < size && next[from + aMembers] < N) aMembers++;
        if (aMembers === 0) continue;
        if (aMembers === size) {
          for (let k = from; k < from + size; k++) waits[next[k]] = 0;
          continue;
        }
        const wait = next[from + aMembers] - N + 1;
        for (let k = from; k < from + aMembers; k++) waits[next[k]] = wait;
        if (from !== w) next.copyWithin(w, from, from + size);
        nextBounds[nextSegments++] = w;
        w += size;
      }
    }
    nextBounds[nextSegments] = w;
    [order, next] = [next, order];
    [bounds, nextBounds] = [nextBounds, bounds];
    segments = nextSegments;

    const level = levelStatistics(n, N, M, waits, batchShift, batchCount);
    levels.push(level);
    for (let s = 0; s < sampleCount; s++) {
      const i = sample.positions[s];
      if (i > N - n) break;
      const k = s * maxN + n - 1;
      const v = waits[i];
      if (v > 0) sample.logWait[k] = logOfPositive(v);
      else sample.censored[k] = 1;
    }
    onLevel?.(level, waits);
  }
  return { lengthA: N, lengthB: M, maxN, batchLength, batchCount, levels, sample };
}

/** One pass over A's positions 0..N-n: counts and sums of log W, whole and per fine batch. */
function levelStatistics(n: number, N: number, M: number, waits: Int32Array, batchShift: number, batchCount: number): WaitingLevel {
  const batchObserved = new Float64Array(batchCount);
  const batchCensored = new Float64Array(batchCount);
  const batchSumLog = new Float64Array(batchCount);
  const batchSumLog2 = new Float64Array(batchCount);
  let observed = 0;
  let sumLog = 0;
  let sumLog2 = 0;
  const positions = N - n + 1;
  for (let i = 0; i < positions; i++) {
    const v = waits[i];
    const batch = i >> batchShift;
    if (v > 0) {
      const l = logOfPositive(v);
      observed++;
      sumLog += l;
      sumLog2 += l * l;
      batchObserved[batch]++;
      batchSumLog[batch] += l;
      batchSumLog2[batch] += l * l;
    } else {
      batchCensored[batch]++;
    }
  }
  return {
    n,
    positions,
    observed,
    censored: positions - observed,
    logCensoredBound: Math.log(Math.max(1, M - n + 2)),
    sumLog,
    sumLog2,
    batchObserved,
    batchCensored,
    batchSumLog,
    batchSumLog2,
  };
}
