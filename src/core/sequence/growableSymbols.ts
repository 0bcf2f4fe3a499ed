import { ReadError } from './readError';
import type { SymbolArray } from './sequence';

const MIN_CAPACITY = 1024;

type SymbolArrayType = typeof Uint8Array | typeof Uint16Array | typeof Int32Array;

/**
 * An append-only symbol array that starts as a Uint8Array and widens to Uint16Array, then
 * Int32Array, when an id passes 255, then 65 535, so the result is always the narrowest
 * SymbolArray for its alphabet. Without a size estimate it grows by doubling.
 */
export class GrowableSymbols {
  /** Symbols appended so far. */
  length = 0;
  private data: SymbolArray;
  /** Ids below this fit the current element type. */
  private idLimit = 0x100;
  private readonly maxLength: number;
  private readonly shared: boolean;

  /**
   * @param initialCapacity symbols to allocate at once; pass an upper bound when the input size is
   *   known so that no growth copy is needed (clamped to maxLength).
   * @param maxLength appending more symbols throws ReadError 'too-many-symbols' (default: no limit).
   * @param shared allocate in SharedArrayBuffers where the host has them (ReaderOptions.sharedMemory)
   */
  constructor(initialCapacity = MIN_CAPACITY, maxLength = Infinity, shared = false) {
    if (!(initialCapacity >= 0)) throw new RangeError(`initialCapacity must be >= 0, got ${initialCapacity}`);
    if (!(maxLength >= 1)) throw new RangeError(`maxLength must be >= 1, got ${maxLength}`);
    this.maxLength = maxLength;
    this.shared = shared && typeof SharedArrayBuffer !== 'undefined';
    this.data = this.allocate(Uint8Array, Math.floor(Math.min(initialCapacity, maxLength)));
  }

  /** Appends one symbol id (0 <= id < 2^31). */
  push(id: number): void {
    if (id >= this.idLimit) this.widen(id);
    if (this.length === this.data.length) this.grow();
    this.data[this.length++] = id;
  }

  /**
   * The symbols appended so far. A view of the internal buffer when at most an eighth of it is
   * unused (saves a copy), otherwise a trimmed copy (frees the slack). Stop appending afterwards.
   */
  toSymbolArray(): SymbolArray {
    const { data, length } = this;
    if (length === data.length) return data;
    if (data.length - length <= data.length / 8) return data.subarray(0, length);
    // A shared buffer stays shared: slice would copy into unshared memory.
    if (this.shared) {
      const trimmed = this.allocate(data.constructor as SymbolArrayType, length);
      trimmed.set(data.subarray(0, length));
      return trimmed;
    }
    return data.slice(0, length);
  }

  private widen(id: number): void {
    const capacity = this.data.length;
    const wider: SymbolArray = id < 0x10000 ? this.allocate(Uint16Array, capacity) : this.allocate(Int32Array, capacity);
    wider.set(this.data.subarray(0, this.length));
    this.data = wider;
    this.idLimit = id < 0x10000 ? 0x10000 : 2 ** 31;
  }

  private grow(): void {
    if (this.length >= this.maxLength) {
      throw new ReadError('too-many-symbols', `the input holds more than maxSymbols = ${this.maxLength} symbols`);
    }
    const capacity = Math.min(Math.max(this.data.length * 2, MIN_CAPACITY), this.maxLength);
    const bigger = this.allocate(this.data.constructor as SymbolArrayType, capacity);
    bigger.set(this.data);
    this.data = bigger;
  }

  private allocate(type: SymbolArrayType, length: number): SymbolArray {
    const bytes = length * type.BYTES_PER_ELEMENT;
    return new (type as new (b: ArrayBufferLike) => SymbolArray)(this.shared ? new SharedArrayBuffer(bytes) : new ArrayBuffer(bytes));
  }
}
