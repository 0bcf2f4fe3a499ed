import { HISTOGRAM_BINS_PER_NAT } from './levelStats';
import { logOfPositive } from './logOfPositive';
import type { SampleSink } from './partitionLevel';

/** Where one level's returns are summed; filled by collectReturns. */
export interface LevelSums {
  classes: number;
  sumCountLogCount: number;
  forwardObserved: number;
  forwardSumLog: number;
  forwardSumLog2: number;
  observed: number;
  sumLog: number;
  sumLog2: number;
  sumLogRc: number;
  sumLogRc2: number;
  matchCount: number;
  /** [observed, sum log R, sum (log R)^2, sum log count] of batch b at 4b..4b+3: one cache line per
   * batch instead of four. */
  readonly batches: Float64Array;
  readonly histogram: Float64Array;
}

/** Fixed parameters of the return statistics of one scan. */
export interface ReturnGeometry {
  readonly N: number;
  readonly batchShift: number;
  readonly matchWindow: number;
  /** N - maxN: match lengths are counted for positions in [matchWindow, matchEnd). */
  readonly matchEnd: number;
}

/**
 * Sums over every class of `next[0, active)` (classes start at entries carrying ~position): each
 * consecutive pair of members (p, q) gives one return R = q - p, the forward return of p and the
 * backward return of q. The nearer-history view takes it for p when p < half and for q when
 * q >= half; both tests flip once along a class, so the branches stay predictable. The last member's forward return is censored. Sampled positions get their return (or censoring bound) and block count.
 */
export function collectReturns(
  next: Int32Array,
  active: number,
  n: number,
  geometry: ReturnGeometry,
  sample: SampleSink,
  capture: Int32Array | null,
  sums: LevelSums,
): void {
  const { N, batchShift, matchWindow, matchEnd } = geometry;
  const { mask: sampleMask, shift: strideShift, maxN, forward, counts: pathCounts } = sample;
  const offset = n - 1;
  const half = (N - n + 1) >>> 1;
  const batchAcc = sums.batches;
  const histogram = sums.histogram;
  const maxBin = histogram.length - 1;
  let classes = 0;
  let sumCountLogCount = 0;
  let forwardSumLog = 0;
  let forwardSumLog2 = 0;
  let observed = 0;
  let sumLog = 0;
  let sumLog2 = 0;
  let sumLogRc = 0;
  let sumLogRc2 = 0;
  let matchCount = 0;
  let a = 0;
  while (a < active) {
    let b = a + 1;
    while (b < active && next[b] >= 0) b++;
    const c = b - a;
    const logc = logOfPositive(c);
    sumCountLogCount += c * logc;
    classes++;
    let used = 0;
    let usedSum = 0;
    let usedSum2 = 0;
    let p = ~next[a];
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
      if ((p & sampleMask) === 0) {
        forward[(p >>> strideShift) * maxN + offset] = R;
        pathCounts[(p >>> strideShift) * maxN + offset] = c;
      }
      if (capture !== null) capture[p] = R;
      p = q;
    }
    // p is now the last member: its forward return is censored.
    batchAcc[((p >>> batchShift) << 2) + 3] += logc;
    if ((p & sampleMask) === 0) {
      forward[(p >>> strideShift) * maxN + offset] = -(N - n - p + 1);
      pathCounts[(p >>> strideShift) * maxN + offset] = c;
    }
    observed += used;
    sumLog += usedSum;
    sumLog2 += usedSum2;
    // sum of (log R + log c) and of its square over the used returns of this class
    sumLogRc += usedSum + used * logc;
    sumLogRc2 += usedSum2 + 2 * logc * usedSum + used * logc * logc;
    a = b;
  }
  sums.classes = classes;
  sums.sumCountLogCount = sumCountLogCount;
  sums.forwardObserved = active - classes;
  sums.forwardSumLog = forwardSumLog;
  sums.forwardSumLog2 = forwardSumLog2;
  sums.observed = observed;
  sums.sumLog = sumLog;
  sums.sumLog2 = sumLog2;
  sums.sumLogRc = sumLogRc;
  sums.sumLogRc2 = sumLogRc2;
  sums.matchCount = matchCount;
}
