import { describe, expect, it } from 'vitest';
import { checkLength, indexLabels, sequenceFromSymbols } from '../../../src/core/sources/sequenceFromSymbols';

describe('sequenceFromSymbols', () => {
  it('counts symbols in 8-, 16- and 32-bit arrays alike', () => {
    const ids = [0, 2, 2, 1, 2, 0];
    for (const symbols of [Uint8Array.from(ids), Uint16Array.from(ids), Int32Array.from(ids)]) {
      const seq = sequenceFromSymbols(symbols, ['a', 'b', 'c']);
      expect(Array.from(seq.counts)).toEqual([2, 1, 3]);
      expect(seq.symbols).toBe(symbols);
    }
  });

  it('labels indices as decimal strings and checks lengths', () => {
    expect(indexLabels(3)).toEqual(['0', '1', '2']);
    expect(() => checkLength(-1)).toThrow(/length must be a non-negative integer, got -1/);
    expect(() => checkLength(Number.POSITIVE_INFINITY)).toThrow(RangeError);
    expect(() => checkLength(0)).not.toThrow();
  });
});
