import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { countPrefixes, prefixDepths, prefixTable } from '../../../src/core/returns/prefixLevels';
import { fillWords } from '../../../src/core/returns/packedWords';

describe('range passes: counts and carried words', () => {
  it('counts every n-block of a range and its first position, as a direct count does', () => {
    // Oracle: the definition (the blocks x[p..p+n-1] with p in the range and p + n <= N), counted
    // one by one; common practice, no source.
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 4 }), fc.array(fc.integer({ min: 0, max: 3 }), { minLength: 1, maxLength: 200 }), fc.integer({ min: 1, max: 5 }), fc.nat(), fc.nat(), (a, raw, depth, u, v) => {
        const x = Uint8Array.from(raw.map((s) => s % a));
        const N = x.length;
        const [start, end] = [u % (N + 1), v % (N + 1)].sort((p, q) => p - q) as [number, number];
        const got = countPrefixes({ symbols: x, alphabetSize: a, depth, start, end, words: new Uint16Array(0) });
        const { offsets } = prefixTable(a, depth);
        const counts = new Int32Array(offsets[depth]!);
        const first = new Int32Array(offsets[depth]!).fill(-1);
        for (let n = 1; n <= depth; n++) {
          for (let p = start; p < end && p + n <= N; p++) {
            let id = 0;
            for (let j = 0; j < n; j++) id = id * a + x[p + j]!;
            const t = offsets[n - 1]! + id;
            if (counts[t]!++ === 0) first[t] = p;
          }
        }
        expect(Array.from(got.counts)).toEqual(Array.from(counts));
        expect(Array.from(got.first)).toEqual(Array.from(first));
      }),
      { numRuns: 300 },
    );
  });

  it('fills the carried words of a range: symbol p + j at bits j * bits, zero past the end', () => {
    const x = Uint8Array.from([1, 0, 1, 1, 0, 0, 1]);
    const words = new Uint16Array(7);
    fillWords(x, 2, 2, 5, words);
    // binary: 16 symbols a word; by hand from the definition
    expect(Array.from(words)).toEqual([0, 0, 0b1001101 >> 2, 0b1001101 >> 3, 0b1001101 >> 4, 0, 0]);
    const four = new Uint16Array(3);
    fillWords(Uint8Array.from([3, 1, 2]), 4, 0, 3, four); // 2 bits, 8 symbols a word
    expect(Array.from(four)).toEqual([3 | (1 << 2) | (2 << 4), 1 | (2 << 2), 2]);
  });

  it('chooses depths from the least whose blocks number the classes wanted, within the table limit', () => {
    expect(prefixDepths(2, 40, 32)).toEqual({ least: 5, most: 11 });
    expect(prefixDepths(4, 40, 32)).toEqual({ least: 3, most: 8 }); // 4^8 = 2^16, the table limit
    expect(prefixDepths(2, 6, 32)).toEqual({ least: 5, most: 6 }); // kept to maxN
    expect(prefixDepths(300, 40, 32)).toEqual({ least: 1, most: 1 }); // 300^2 is over the limit
  });
});
