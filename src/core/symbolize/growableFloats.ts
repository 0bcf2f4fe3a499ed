const MIN_CAPACITY = 1024;

/** An append-only Float64Array that grows by doubling; `toArray` returns a view of the filled part. */
export class GrowableFloats {
  length = 0;
  private data: Float64Array;

  /** @param initialCapacity values to allocate at once (an upper bound avoids growth copies) */
  constructor(initialCapacity = MIN_CAPACITY) {
    if (!(initialCapacity >= 0)) throw new RangeError(`initialCapacity must be >= 0, got ${initialCapacity}`);
    this.data = new Float64Array(Math.max(1, Math.floor(initialCapacity)));
  }

  push(value: number): void {
    if (this.length === this.data.length) {
      const bigger = new Float64Array(this.data.length * 2);
      bigger.set(this.data);
      this.data = bigger;
    }
    this.data[this.length++] = value;
  }

  /** The values pushed so far (a view sharing memory with the buffer; later pushes may reallocate). */
  toArray(): Float64Array {
    return this.data.subarray(0, this.length);
  }
}
