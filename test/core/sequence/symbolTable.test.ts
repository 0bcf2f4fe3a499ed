import { describe, expect, it } from 'vitest';
import { SymbolTable } from '../../../src/core/sequence/symbolTable';

describe('SymbolTable', () => {
  it('numbers labels in order of first appearance', () => {
    const t = new SymbolTable();
    const ids = ['b', 'a', 'b', 'c', 'a'].map((l) => t.intern(l));
    expect(ids).toEqual([0, 1, 0, 2, 1]); // by hand: b first, then a, then c
    expect(t.labels).toEqual(['b', 'a', 'c']);
    expect(t.size).toBe(3);
  });

  it('keeps finding old labels after a full Map spills into the next one', () => {
    const t = new SymbolTable(2);
    const first = ['w', 'x', 'y', 'z', 'v'].map((l) => t.intern(l));
    const again = ['z', 'w', 'v', 'x', 'y'].map((l) => t.intern(l));
    expect(first).toEqual([0, 1, 2, 3, 4]);
    expect(again).toEqual([3, 0, 4, 1, 2]); // by hand from the first pass
    expect(t.size).toBe(5);
  });

  it('refuses a Map capacity below 1', () => {
    expect(() => new SymbolTable(0)).toThrow(RangeError);
  });
});
