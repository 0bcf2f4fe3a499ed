import type { SymbolArray } from '../sequence/sequence';
import { wordLayout } from './packedWords';

/** Buffers of the class refinement, owned by one scan and reused across levels. */
export interface RefinementBuffers {
  readonly symbols: SymbolArray;
  /** Small alphabets: carried words (see scanReturns); empty when symbols are read directly. */
  readonly packed: boolean;
  readonly symbolMask: number;
  /** Per-symbol counts inside one class (all zero between classes), touched symbols. */
  readonly counts: Int32Array;
  readonly touched: Int32Array;
  /** Symbol of each entry at the current offset, when not packed. */
  readonly scratch: SymbolArray;
}

/** The refinement's buffers for `symbols`: per-symbol counters, and `scratch` (the symbol of each
 * entry, needed only when symbols are not packed into carried words). */
export function refinementBuffers(symbols: SymbolArray, alphabetSize: number, scratch: SymbolArray): RefinementBuffers {
  const { bits, packed } = wordLayout(alphabetSize);
  return {
    symbols,
    packed,
    symbolMask: (1 << bits) - 1,
    counts: new Int32Array(alphabetSize),
    touched: new Int32Array(Math.min(alphabetSize, symbols.length) + 1),
    scratch,
  };
}

/** What one partition pass reports besides the new order. */
export interface PartitionOutcome {
  /** Entries of the new order (positions still in play). */
  readonly active: number;
  /** Positions whose block became unique at this level. */
  readonly newSingletons: number;
  /** True when the position N - n + 1 (its n-block runs past the end) was still in play and left. */
  readonly droppedFromActive: boolean;
}

/**
 * Split every class of `order[0, activeLength)` by the symbol at offset n-1 of its members, stably,
 * into `next`: the start of each class carries the marker ~position. Blocks left with one member
 * leave the active set; sampled ones among them are written to `sample` as censored, count 1.
 *
 * Class refinement (ARCHITECTURE.md): a counting pass per class, then a stable scatter, so every
 * subclass stays sorted by position.
 */
export function partitionLevel(
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
  const { symbols, packed, symbolMask, counts, touched, scratch } = buffers;
  const N = symbols.length;
  const offset = n - 1;
  const dropPosition = N - n + 1;
  const { mask: sampleMask, shift: strideShift, maxN, forward, counts: pathCounts } = sample;
  let droppedFromActive = false;
  let newSingletons = 0;
  let out = 0;
  let s = 0;
  let sinceCheck = 0;
  while (s < activeLength) {
    // The class is [s, e); its first entry carries the start marker. Its end is found while counting
    // the symbol at offset n-1 of every member, in one pass.
    let touchedCount = 0;
    let e = s;
    if (packed) {
      do {
        const sym = (words[e] >>> wordShift) & symbolMask;
        if (counts[sym]++ === 0) touched[touchedCount++] = sym;
        e++;
      } while (e < activeLength && order[e] >= 0);
    } else {
      do {
        let p = order[e];
        if (p < 0) p = ~p;
        // The position whose n-block runs past the end has no symbol at offset n-1; it is dropped below.
        const sym = p < dropPosition ? symbols[p + offset] : 0;
        scratch[e] = sym;
        if (counts[sym]++ === 0) touched[touchedCount++] = sym;
        e++;
      } while (e < activeLength && order[e] >= 0);
    }
    const classEnd = e;
    let last = order[e - 1];
    if (last < 0) last = ~last;
    if (last === dropPosition) {
      // Its n-block would run past the end: it leaves uncounted (a touched symbol may be left at 0).
      e--;
      droppedFromActive = true;
      counts[packed ? (words[e] >>> wordShift) & symbolMask : scratch[e]]--;
    }
    // Lay out the surviving subclasses in touched order; unique blocks leave here. counts[sym]
    // becomes 1 + the write cursor of its subclass, or 0 for a unique block; each subclass start is
    // marked once its members are in.
    let cursor = out;
    for (let t = 0; t < touchedCount; t++) {
      const sym = touched[t];
      const c = counts[sym];
      if (c >= 2) {
        counts[sym] = cursor + 1;
        cursor += c;
      } else {
        counts[sym] = 0;
      }
    }
    const firstOut = out;
    if (packed) {
      for (let k = s; k < e; k++) {
        let p = order[k];
        if (p < 0) p = ~p;
        const w = words[k];
        const sym = (w >>> wordShift) & symbolMask;
        const d = counts[sym];
        if (d > 0) {
          next[d - 1] = p;
          nextWords[d - 1] = w;
          counts[sym] = d + 1;
        } else {
          newSingletons++;
          if ((p & sampleMask) === 0) {
            forward[(p >>> strideShift) * maxN + offset] = -(N - n - p + 1);
            pathCounts[(p >>> strideShift) * maxN + offset] = 1;
          }
        }
      }
    } else {
      for (let k = s; k < e; k++) {
        let p = order[k];
        if (p < 0) p = ~p;
        const sym = scratch[k];
        const d = counts[sym];
        if (d > 0) {
          next[d - 1] = p;
          counts[sym] = d + 1;
        } else {
          newSingletons++;
          if ((p & sampleMask) === 0) {
            forward[(p >>> strideShift) * maxN + offset] = -(N - n - p + 1);
            pathCounts[(p >>> strideShift) * maxN + offset] = 1;
          }
        }
      }
    }
    // Mark subclass starts in layout order: the first subclass starts at firstOut, each next one
    // where the previous one's cursor stopped.
    let start = firstOut;
    for (let t = 0; t < touchedCount; t++) {
      const sym = touched[t];
      const d = counts[sym];
      if (d > 0) {
        next[start] = ~next[start];
        start = d - 1;
      }
      counts[sym] = 0;
    }
    out = cursor;
    sinceCheck += classEnd - s;
    s = classEnd;
    if (sinceCheck >= POLL_EVERY) {
      sinceCheck = 0;
      if (shouldStop !== undefined && shouldStop()) throw new ScanCancelled();
    }
  }
  return { active: out, newSingletons, droppedFromActive };
}

/** Where sampled positions' returns and block counts are written: row-major [sample][n - 1]. */
export interface SampleSink {
  /** stride - 1, stride a power of two: position p is sampled when (p & mask) === 0. */
  readonly mask: number;
  readonly shift: number;
  readonly maxN: number;
  readonly forward: Float64Array;
  readonly counts: Float64Array;
}

/** Positions processed between two polls of shouldStop. */
export const POLL_EVERY = 1 << 20;

/** The scan was stopped by its caller; nothing it computed is returned. */
export class ScanCancelled extends Error {
  override readonly name = 'ScanCancelled';
  constructor() {
    super('the computation was cancelled');
  }
}
