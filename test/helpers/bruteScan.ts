import { HISTOGRAM_BINS_PER_NAT, type LevelStats, type ReturnScan } from '../../src/core/returns/levelStats';

export interface BruteScanOptions {
  /** Largest block length, 1 <= maxN <= N. */
  readonly maxN: number;
  /** Positions per fine batch (a power of two). */
  readonly batchLength: number;
  /** Sampled paths start at the multiples of this stride. */
  readonly sampleStride: number;
  /** Window of the sliding-window match lengths. */
  readonly matchWindow: number;
}

/**
 * Every LevelStats field straight from its definition in src/core/returns/levelStats.ts, with
 * O(N^2) loops and no cleverness: the oracle for the fast engine and the input of the estimator unit
 * tests. Meant for N up to a few thousand.
 *
 * Conventions (the same as the engine's): levels n = 1..maxN are always all present; `exhausted` is
 * true when some level below maxN already had every block unique; the match-length positions are
 * [matchWindow, N - maxN) with the requested maxN.
 */
export function bruteScan(symbols: ArrayLike<number>, alphabetSize: number, options: BruteScanOptions): ReturnScan {
  const N = symbols.length;
  const { maxN, batchLength, sampleStride, matchWindow } = options;
  if (!Number.isInteger(maxN) || maxN < 1 || maxN > N) throw new RangeError(`maxN must be in [1, ${N}]; got ${maxN}`);
  if (!Number.isInteger(batchLength) || batchLength < 1 || (batchLength & (batchLength - 1)) !== 0) {
    throw new RangeError(`batchLength must be a power of two; got ${batchLength}`);
  }
  if (!Number.isInteger(sampleStride) || sampleStride < 1) throw new RangeError(`sampleStride must be >= 1; got ${sampleStride}`);
  if (!Number.isInteger(matchWindow) || matchWindow < 1) throw new RangeError(`matchWindow must be >= 1; got ${matchWindow}`);

  const batchCount = Math.ceil(N / batchLength);
  const bins = Math.floor(HISTOGRAM_BINS_PER_NAT * Math.log(Math.max(N, 2))) + 2;
  const same = (i: number, j: number, n: number): boolean => {
    for (let t = 0; t < n; t++) if (symbols[i + t] !== symbols[j + t]) return false;
    return true;
  };

  const sampleCount = Math.ceil(N / sampleStride);
  const samplePositions = new Int32Array(sampleCount);
  for (let s = 0; s < sampleCount; s++) samplePositions[s] = s * sampleStride;
  const forwardPaths = new Float64Array(sampleCount * maxN);
  const countPaths = new Float64Array(sampleCount * maxN);

  const levels: LevelStats[] = [];
  for (let n = 1; n <= maxN; n++) {
    const M = N - n + 1;
    const half = Math.floor(M / 2);
    const count = new Float64Array(M);
    const forward = new Float64Array(M); // 0 = censored
    const backward = new Float64Array(M); // 0 = no earlier occurrence
    for (let i = 0; i < M; i++) {
      for (let j = 0; j < M; j++) if (same(i, j, n)) count[i]! += 1;
      for (let j = i + 1; j < M; j++) {
        if (same(i, j, n)) {
          forward[i] = j - i;
          break;
        }
      }
      for (let j = i - 1; j >= 0; j--) {
        if (same(i, j, n)) {
          backward[i] = i - j;
          break;
        }
      }
    }

    let distinctBlocks = 0;
    let singletons = 0;
    let sumCountLogCount = 0;
    for (let i = 0; i < M; i++) {
      let first = true;
      for (let j = 0; j < i && first; j++) if (same(i, j, n)) first = false;
      if (!first) continue;
      distinctBlocks++;
      const c = count[i]!;
      if (c === 1) singletons++;
      sumCountLogCount += c * Math.log(c);
    }

    let forwardObserved = 0;
    let forwardSumLog = 0;
    let forwardSumLog2 = 0;
    let observed = 0;
    let sumLog = 0;
    let sumLog2 = 0;
    let sumLogRc = 0;
    let sumLogRc2 = 0;
    const histogram = new Float64Array(bins);
    const batchObserved = new Float64Array(batchCount);
    const batchSumLog = new Float64Array(batchCount);
    const batchSumLog2 = new Float64Array(batchCount);
    const batchSumLogCount = new Float64Array(batchCount);
    for (let i = 0; i < M; i++) {
      const b = Math.floor(i / batchLength);
      const c = count[i]!;
      const f = forward[i]!;
      batchSumLogCount[b]! += Math.log(c);
      if (f > 0) {
        const l = Math.log(f);
        forwardObserved++;
        forwardSumLog += l;
        forwardSumLog2 += l * l;
      }
      const R = i < half ? f : backward[i]!;
      if (R > 0) {
        const l = Math.log(R);
        const lrc = Math.log(R * c);
        observed++;
        sumLog += l;
        sumLog2 += l * l;
        sumLogRc += lrc;
        sumLogRc2 += lrc * lrc;
        histogram[Math.min(Math.floor(l * HISTOGRAM_BINS_PER_NAT), bins - 1)]! += 1;
        batchObserved[b]! += 1;
        batchSumLog[b]! += l;
        batchSumLog2[b]! += l * l;
      }
    }

    let matchCount = 0;
    for (let i = matchWindow; i < N - maxN; i++) {
      for (let j = i - matchWindow; j < i; j++) {
        if (same(i, j, n)) {
          matchCount++;
          break;
        }
      }
    }

    for (let s = 0; s < sampleCount; s++) {
      const p = samplePositions[s]!;
      forwardPaths[s * maxN + n - 1] = p > N - n ? 0 : forward[p]! > 0 ? forward[p]! : -(N - n - p + 1);
      countPaths[s * maxN + n - 1] = p > N - n ? 0 : count[p]!;
    }

    levels.push({
      n,
      positions: M,
      distinctBlocks,
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
    });
  }

  return {
    length: N,
    alphabetSize,
    maxN,
    levels,
    batchLength,
    batchCount,
    matchWindow,
    matchPositions: Math.max(0, N - maxN - matchWindow),
    paths: { positions: samplePositions, forward: forwardPaths, counts: countPaths, maxN },
    exhausted: levels.some((l) => l.n < maxN && l.distinctBlocks === l.positions),
    captured: null,
  };
}
