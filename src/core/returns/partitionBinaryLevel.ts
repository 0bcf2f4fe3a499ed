import type { PartitionOutcome, RefinementBuffers, SampleSink } from './partitionLevel';
import { POLL_EVERY, ScanCancelled } from './partitionLevel';

/**
 * partitionLevel for a two-symbol alphabet (carried words, one bit per symbol): the same split, with
 * the class's counts kept in registers and, when both halves survive, a branch-free scatter
 * (destination c0 + b (c1 - c0)). The general version increments counts[sym] in memory, a chain of
 * dependent loads and stores on one address, and its scatter branches on a symbol that is a coin
 * flip for high-entropy data; at N = 1e7 this version is measured in DEVELOPERS.md.
 */
export function partitionBinaryLevel(
  buffers: RefinementBuffers,
  order: Int32Array,
  words: Uint16Array,
  activeLength: number,
  next: Int32Array,
  nextWords: Uint16Array,
  n: number,
  wordShift: number,
  sample: SampleSink,
  shouldStop: (() => boolean) | undefined,
): PartitionOutcome {
  const N = buffers.symbols.length;
  const offset = n - 1;
  const dropPosition = N - n + 1;
  const { mask: sampleMask, shift: strideShift, maxN, forward, counts: pathCounts } = sample;
  let droppedFromActive = false;
  let newSingletons = 0;
  let out = 0;
  let s = 0;
  let sinceCheck = 0;
  while (s < activeLength) {
    // The class is [s, e); its end is found while counting the 1s at offset n-1.
    let ones = 0;
    let e = s;
    do {
      ones += (words[e] >>> wordShift) & 1;
      e++;
    } while (e < activeLength && order[e] >= 0);
    const classEnd = e;
    let last = order[e - 1];
    if (last < 0) last = ~last;
    if (last === dropPosition) {
      // Its n-block would run past the end: it leaves uncounted.
      e--;
      droppedFromActive = true;
      ones -= (words[e] >>> wordShift) & 1;
    }
    const zeros = e - s - ones;
    if (zeros >= 2 && ones >= 2) {
      let c0 = out;
      let c1 = out + zeros;
      for (let k = s; k < e; k++) {
        let p = order[k];
        if (p < 0) p = ~p;
        const w = words[k];
        const b = (w >>> wordShift) & 1;
        const d = c0 + b * (c1 - c0);
        next[d] = p;
        nextWords[d] = w;
        c0 += 1 - b;
        c1 += b;
      }
      next[out] = ~next[out];
      next[out + zeros] = ~next[out + zeros];
      out = c1;
    } else {
      // At most one half survives; the members of a half of size one leave as unique blocks.
      const keep0 = zeros >= 2;
      const keep1 = ones >= 2;
      let c0 = out;
      let c1 = out + (keep0 ? zeros : 0);
      const start1 = c1;
      for (let k = s; k < e; k++) {
        let p = order[k];
        if (p < 0) p = ~p;
        const w = words[k];
        const b = (w >>> wordShift) & 1;
        if (b === 0 ? keep0 : keep1) {
          if (b === 0) {
            next[c0] = p;
            nextWords[c0++] = w;
          } else {
            next[c1] = p;
            nextWords[c1++] = w;
          }
        } else {
          newSingletons++;
          if ((p & sampleMask) === 0) {
            forward[(p >>> strideShift) * maxN + offset] = -(N - n - p + 1);
            pathCounts[(p >>> strideShift) * maxN + offset] = 1;
          }
        }
      }
      if (keep0) next[out] = ~next[out];
      if (keep1) next[start1] = ~next[start1];
      out = c1;
    }
    sinceCheck += classEnd - s;
    s = classEnd;
    if (sinceCheck >= POLL_EVERY) {
      sinceCheck = 0;
      if (shouldStop !== undefined && shouldStop()) throw new ScanCancelled();
    }
  }
  return { active: out, newSingletons, droppedFromActive };
}
