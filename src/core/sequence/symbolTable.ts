import { ReadError } from './readError';

/** Most distinct symbols a sequence may have: ids must fit an Int32Array. */
export const MAX_ALPHABET_SIZE = 2 ** 31;

/**
 * V8 refuses to grow one Map past 2^24 entries ("RangeError: Map maximum size exceeded", seen on
 * Node 20), so the table opens a further Map when one is full.
 */
const DEFAULT_MAP_CAPACITY = 2 ** 24;

/**
 * Interns symbol labels: the first label seen gets id 0, the next new one id 1, and so on (order of
 * first appearance). Up to 2^31 distinct labels.
 */
export class SymbolTable {
  /** Label of each id. */
  readonly labels: string[] = [];
  private readonly maps: Map<string, number>[] = [new Map()];
  private readonly mapCapacity: number;

  /** @param mapCapacity entries per Map before another one is opened (default 2^24; tests lower it). */
  constructor(mapCapacity = DEFAULT_MAP_CAPACITY) {
    if (!(Number.isInteger(mapCapacity) && mapCapacity >= 1)) {
      throw new RangeError(`mapCapacity must be an integer >= 1, got ${mapCapacity}`);
    }
    this.mapCapacity = mapCapacity;
  }

  /** Number of distinct labels so far. */
  get size(): number {
    return this.labels.length;
  }

  /** The id of `label`, giving it the next free id when it is new. */
  intern(label: string): number {
    const maps = this.maps;
    for (let i = 0; i < maps.length; i++) {
      const id = maps[i].get(label);
      if (id !== undefined) return id;
    }
    const id = this.labels.length;
    if (id >= MAX_ALPHABET_SIZE) {
      throw new ReadError('too-many-symbols', `more than ${MAX_ALPHABET_SIZE} distinct symbols`);
    }
    let last = maps[maps.length - 1];
    if (last.size >= this.mapCapacity) {
      last = new Map();
      maps.push(last);
    }
    last.set(label, id);
    this.labels.push(label);
    return id;
  }
}
