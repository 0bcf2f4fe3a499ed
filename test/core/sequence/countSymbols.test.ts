import { describe, expect, it } from 'vitest';
import { countSymbols } from '../../../src/core/sequence/countSymbols';

describe('countSymbols', () => {
  it('counts each id, zero for ids that never occur', () => {
    const counts = countSymbols(Uint16Array.from([2, 0, 2, 2]), 4);
    expect(Array.from(counts)).toEqual([1, 0, 3, 0]); // by hand
  });
});
