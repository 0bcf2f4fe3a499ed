import { allocateSymbols, type SymbolArray } from '../sequence/sequence';
import { HISTOGRAM_BINS_PER_NAT, type LevelStats, type ReturnScan, type SampledPaths } from './levelStats';
import { logOfPositive } from './logOfPositive';
import { histogramBinCount, matchWindowFor, powerOfTwoAtLeast } from './scanLayout';

export interface ScanOptions {
  /** Largest block length, 1 <= maxN <= N. */
  readonly maxN: number;
  /** Number of fine batches of consecutive positions to aim for (rounded so the batch length is a
   * power of two); default 256, enough for estimators that merge them into a few dozen. */
  readonly batchTarget?: number;
  /** Number of sampled forward paths to aim for (every stride-th position, stride a power of two);
   * default 256. */
  readonly sampleTarget?: number;
  /** Window of the sliding-window match lengths; default floor(N/2). */
  readonly matchWindow?: number;
  /** Called after each level with its statistics and the number of positions still in play. */
  readonly onLevel?: (level: LevelStats, active: number) => void;
  /** Polled between classes; returning true abandons the scan with ScanCancelled. */
  readonly shouldStop?: () => boolean;
  /** Keep the forward return of every position at this one block length (see ReturnScan.captured). */
  readonly captureLevel?: number;
}

/** The scan was stopped by its caller; nothing it computed is returned. */
export class ScanCancelled extends Error {
  override readonly name = 'ScanCancelled';
  constructor() {
    super('the computation was cancelled');
  }
}

/** Positions processed between two polls of shouldStop. */
const POLL_EVERY = 1 << 20;

/**
 * First returns of every n-block, n = 1..maxN, at every position, summarized per level.
 *
 * Class refinement: all positions still in play are kept sorted by (class of their n-block,
 * position). Going from n-1 to n each class is split stably by the symbol at offset n-1 (a counting
 * pass per class). Inside a class, the forward return of a member is the distance to the next member,
 * its backward return the distance to the previous one, and the class size is the block's count.
 * A position whose block becomes unique can never return at a larger n and leaves the active set,
 * so the work per level is proportional to the positions still in play, which shrink geometrically
 * once e^{nh} passes N. Memory: the symbols, two Int32 order arrays and one scratch symbol array,
 * reused across levels (about 10 bytes per symbol for a byte alphabet).
 */
export function scanReturns(symbols: SymbolArray, alphabetSize: number, options: ScanOptions): ReturnScan {
  const N = symbols.length;
  const maxN = options.maxN;
  if (!Number.isInteger(maxN) || maxN < 1 || maxN > N) {
    throw new RangeError(`maxN must be an integer from 1 to the sequence length ${N}; got ${maxN}`);
  }
  if (!Number.isInteger(alphabetSize) || alphabetSize < 1) {
    throw new RangeError(`alphabetSize must be a positive integer; got ${alphabetSize}`);
  }
  const batchLength = powerOfTwoAtLeast(Math.ceil(N / Math.max(1, options.batchTarget ?? 256)));
  const batchShift = Math.log2(batchLength);
  const batchCount = Math.ceil(N / batchLength);
  const stride = powerOfTwoAtLeast(Math.ceil(N / Math.max(1, options.sampleTarget ?? 256)));
  const strideShift = Math.log2(stride);
  const sampleMask = stride - 1;
  const sampleCount = Math.ceil(N / stride);
  const matchWindow = options.matchWindow ?? matchWindowFor(N);
  if (!Number.isInteger(matchWindow) || matchWindow < 1) {
    throw new RangeError(`matchWindow must be a positive integer; got ${matchWindow}`);
  }
  const matchEnd = N - maxN;
  const bins = histogramBinCount(N);
  const maxBin = bins - 1;
  const shouldStop = options.shouldStop;
  const captureLevel = options.captureLevel ?? 0;
  if (!Number.isInteger(captureLevel) || captureLevel < 0 || captureLevel > maxN) {
    throw new RangeError(`captureLevel must be an integer from 1 to maxN ${maxN}; got ${captureLevel}`);
  }
  // Positions not reached at the captured level are unique blocks: censored at N - n - i.
  let captured: Int32Array | null = null;
  if (captureLevel > 0) {
    captured = new Int32Array(N - captureLevel + 1);
    for (let i = 0; i < captured.length; i++) captured[i] = -(N - captureLevel - i + 1);
  }

  // Sampled forward paths start unset (NaN) and are completed once the scan ends.
  const paths = new Float64Array(sampleCount * maxN).fill(NaN);

  let order = new Int32Array(N);
  let next = new Int32Array(N);
  // Small alphabets: each entry carries the next `perWord` symbols of its position packed in 16 bits,
  // refreshed from the sequence once every perWord levels. This turns the random read of
  // x[p + n - 1] (the dominant cost once classes are scattered over the sequence) into a sequential
  // read of the carried word on all other levels.
  const bits = Math.max(1, Math.ceil(Math.log2(alphabetSize)));
  const perWord = bits <= 8 ? Math.floor(16 / bits) : 1;
  const packed = perWord > 1;
  const symbolMask = (1 << bits) - 1;
  let words = new Uint16Array(packed ? N : 0);
  let nextWords = new Uint16Array(packed ? N : 0);
  const scratch = allocateSymbols(packed ? 0 : N, alphabetSize);
  for (let i = 0; i < N; i++) order[i] = i;
  if (N > 0) order[0] = ~0;
  let activeLength = N;
  // Per-symbol counts inside one class, reset through the touched list.
  const counts = new Int32Array(alphabetSize);
  const touched = new Int32Array(Math.min(alphabetSize, N) + 1);
  const sizes = new Int32Array(Math.min(alphabetSize, N) + 1);

  const levels: LevelStats[] = [];
  let removedAlive = 0; // positions whose block became unique earlier and still have an n-block
  let sinceCheck = 0;
  let n = 1;
  for (; n <= maxN && activeLength > 0; n++) {
    if (shouldStop !== undefined && shouldStop()) throw new ScanCancelled();
    const offset = n - 1;
    const positions = N - n + 1;
    const half = positions >>> 1;
    const dropPosition = N - n + 1; // its n-block would run past the end
    const capture = n === captureLevel ? captured : null;
    const wordShift = (offset % perWord) * bits;
    const refresh = wordShift === 0;
    let droppedFromActive = false;

    let classes = 0;
    let newSingletons = 0;
    let sumCountLogCount = 0;
    let forwardObserved = 0;
    let forwardSumLog = 0;
    let forwardSumLog2 = 0;
    let observed = 0;
    let sumLog = 0;
    let sumLog2 = 0;
    let sumLogRc = 0;
    let sumLogRc2 = 0;
    let matchCount = 0;
    const histogram = new Float64Array(bins);
    // Per batch b: [observed, sum log R, sum (log R)^2, sum log count] at 4b..4b+3, one cache line
    // per batch instead of four.
    const batchAcc = new Float64Array(4 * batchCount);

    if (packed && refresh) refreshWords(symbols, offset, bits, perWord, order, activeLength, words, nextWords);

    let out = 0;
    let s = 0;
    while (s < activeLength) {
      // The class is [s, e); its first entry carries the start marker.
      let e = s + 1;
      while (e < activeLength && order[e] >= 0) e++;
      const classEnd = e;
      let last = order[e - 1];
      if (last < 0) last = ~last;
      if (last === dropPosition) {
        e--;
        droppedFromActive = true;
      }
      // Counting pass: the symbol at offset n-1 of every member.
      let touchedCount = 0;
      if (!packed) {
        for (let k = s; k < e; k++) {
          let p = order[k];
          if (p < 0) p = ~p;
          const sym = symbols[p + offset];
          scratch[k] = sym;
          if (counts[sym]++ === 0) touched[touchedCount++] = sym;
        }
      } else {
        for (let k = s; k < e; k++) {
          const sym = (words[k] >>> wordShift) & symbolMask;
          if (counts[sym]++ === 0) touched[touchedCount++] = sym;
        }
      }
      // Lay out the surviving subclasses in touched order; unique blocks leave here.
      let subclasses = 0;
      let cursor = out;
      for (let t = 0; t < touchedCount; t++) {
        const sym = touched[t];
        const c = counts[sym];
        if (c >= 2) {
          counts[sym] = cursor + 1;
          cursor += c;
          sizes[subclasses++] = c;
        } else {
          counts[sym] = 0;
        }
      }
      // Stable scatter; singletons are recorded as they pass.
      for (let k = s; k < e; k++) {
        let p = order[k];
        if (p < 0) p = ~p;
        let sym: number;
        let w = 0;
        if (packed) {
          w = words[k];
          sym = (w >>> wordShift) & symbolMask;
        } else {
          sym = scratch[k];
        }
        const d = counts[sym];
        if (d > 0) {
          next[d - 1] = p;
          if (packed) nextWords[d - 1] = w;
          counts[sym] = d + 1;
        } else {
          newSingletons++;
          if ((p & sampleMask) === 0) paths[(p >>> strideShift) * maxN + offset] = -(N - n - p + 1);
        }
      }
      for (let t = 0; t < touchedCount; t++) counts[touched[t]] = 0;

      // Statistics of each surviving subclass; then mark its start. Members are in increasing
      // position, so each consecutive pair (p, q) gives one return R = q - p: the forward return of p
      // and the backward return of q. The nearer-history view takes it for p when p < half and for q
      // when q >= half; both tests flip once along the class, so the branches stay predictable.
      let a = out;
      for (let t = 0; t < subclasses; t++) {
        const c = sizes[t];
        const b = a + c;
        const logc = logOfPositive(c);
        sumCountLogCount += c * logc;
        classes++;
        let used = 0;
        let usedSum = 0;
        let usedSum2 = 0;
        let p = next[a];
        for (let k = a + 1; k < b; k++) {
          const q = next[k];
          const R = q - p;
          const logR = logOfPositive(R);
          const logR2 = logR * logR;
          forwardSumLog += logR;
          forwardSumLog2 += logR2;
          const batchP = (p >>> batchShift) << 2;
          batchAcc[batchP + 3] += logc;
          // How many of p (forward) and q (backward) take this return in the nearer-history view.
          let weight = 0;
          if (p < half) {
            weight = 1;
            batchAcc[batchP]++;
            batchAcc[batchP + 1] += logR;
            batchAcc[batchP + 2] += logR2;
          }
          if (q >= half) {
            weight++;
            const batchQ = (q >>> batchShift) << 2;
            batchAcc[batchQ]++;
            batchAcc[batchQ + 1] += logR;
            batchAcc[batchQ + 2] += logR2;
          }
          if (weight > 0) {
            let bin = (logR * HISTOGRAM_BINS_PER_NAT) | 0;
            if (bin > maxBin) bin = maxBin;
            histogram[bin] += weight;
            used += weight;
            usedSum += weight * logR;
            usedSum2 += weight * logR2;
          }
          if (q >= matchWindow && q < matchEnd && R <= matchWindow) matchCount++;
          if ((p & sampleMask) === 0) paths[(p >>> strideShift) * maxN + offset] = R;
          if (capture !== null) capture[p] = R;
          p = q;
        }
        // p is now the last member: its forward return is censored.
        batchAcc[((p >>> batchShift) << 2) + 3] += logc;
        if ((p & sampleMask) === 0) paths[(p >>> strideShift) * maxN + offset] = -(N - n - p + 1);
        forwardObserved += c - 1;
        observed += used;
        sumLog += usedSum;
        sumLog2 += usedSum2;
        // sum of (log R + log c) and of its square over the used returns of this class
        sumLogRc += usedSum + used * logc;
        sumLogRc2 += usedSum2 + 2 * logc * usedSum + used * logc * logc;
        next[a] = ~next[a];
        a = b;
      }
      out = cursor;

      sinceCheck += classEnd - s;
      s = classEnd;
      if (sinceCheck >= POLL_EVERY) {
        sinceCheck = 0;
        if (shouldStop !== undefined && shouldStop()) throw new ScanCancelled();
      }
    }
    if (!droppedFromActive && n >= 2) removedAlive--; // the dropped position had become unique before
    const batchObserved = new Float64Array(batchCount);
    const batchSumLog = new Float64Array(batchCount);
    const batchSumLog2 = new Float64Array(batchCount);
    const batchSumLogCount = new Float64Array(batchCount);
    for (let b = 0; b < batchCount; b++) {
      batchObserved[b] = batchAcc[4 * b];
      batchSumLog[b] = batchAcc[4 * b + 1];
      batchSumLog2[b] = batchAcc[4 * b + 2];
      batchSumLogCount[b] = batchAcc[4 * b + 3];
    }
    const singletons = removedAlive + newSingletons;
    removedAlive += newSingletons;
    const level: LevelStats = {
      n,
      positions,
      distinctBlocks: classes + singletons,
      singletons,
      sumCountLogCount,
      forwardObserved,
      forwardSumLog,
      forwardSumLog2,
      observed,
      sumLog,
      sumLog2,
      sumLogRc,
      sumLogRc2,
      histogram,
      matchCount,
      batchObserved,
      batchSumLog,
      batchSumLog2,
      batchSumLogCount,
    };
    levels.push(level);
    activeLength = out;
    const swap = order;
    order = next;
    next = swap;
    const swapWords = words;
    words = nextWords;
    nextWords = swapWords;
    options.onLevel?.(level, activeLength);
  }
  const exhausted = n <= maxN;
  // Every block is unique from here on: nothing returns, nothing matches.
  for (; n <= maxN; n++) {
    const positions = N - n + 1;
    const level = uniqueLevel(n, positions, bins, batchCount);
    levels.push(level);
    options.onLevel?.(level, 0);
  }
  return {
    length: N,
    alphabetSize,
    maxN,
    levels,
    batchLength,
    batchCount,
    matchWindow,
    matchPositions: Math.max(0, matchEnd - matchWindow),
    paths: completePaths(paths, N, maxN, stride, sampleCount),
    exhausted,
    captured,
  };
}

/**
 * Load into words[k] the next perWord symbols (from offset on) of the position at order[k].
 * First every position's word is built in position order with a rolling window (sequential), then
 * gathered in class order: one random read per entry instead of perWord, and independent reads, so
 * the processor overlaps their cache misses. `spare` is overwritten.
 */
function refreshWords(
  symbols: SymbolArray,
  offset: number,
  bits: number,
  perWord: number,
  order: Int32Array,
  activeLength: number,
  words: Uint16Array,
  spare: Uint16Array,
): void {
  const N = symbols.length;
  const wordMask = (1 << (bits * perWord)) - 1;
  let w = 0;
  for (let p = N - 1; p >= 0; p--) {
    const q = p + offset;
    w = ((w << bits) | (q < N ? symbols[q] : 0)) & wordMask;
    spare[p] = w;
  }
  for (let k = 0; k < activeLength; k++) {
    let p = order[k];
    if (p < 0) p = ~p;
    words[k] = spare[p];
  }
}

/** A level at which every block occurs once. */
function uniqueLevel(n: number, positions: number, bins: number, batchCount: number): LevelStats {
  return {
    n,
    positions,
    distinctBlocks: positions,
    singletons: positions,
    sumCountLogCount: 0,
    forwardObserved: 0,
    forwardSumLog: 0,
    forwardSumLog2: 0,
    observed: 0,
    sumLog: 0,
    sumLog2: 0,
    sumLogRc: 0,
    sumLogRc2: 0,
    histogram: new Float64Array(bins),
    matchCount: 0,
    batchObserved: new Float64Array(batchCount),
    batchSumLog: new Float64Array(batchCount),
    batchSumLog2: new Float64Array(batchCount),
    batchSumLogCount: new Float64Array(batchCount),
  };
}

/** Entries never reached were unique blocks (censored) or lie past the end (0). */
function completePaths(paths: Float64Array, N: number, maxN: number, stride: number, sampleCount: number): SampledPaths {
  const positions = new Int32Array(sampleCount);
  for (let s = 0; s < sampleCount; s++) {
    const p = s * stride;
    positions[s] = p;
    for (let n = 1; n <= maxN; n++) {
      const k = s * maxN + n - 1;
      if (Number.isNaN(paths[k])) paths[k] = p <= N - n ? -(N - n - p + 1) : 0;
    }
  }
  return { positions, forward: paths, maxN };
}
