import { describe, expect, it } from 'vitest';
import { alphabetSummary } from '../../../src/core/result/alphabetSummary';
import { readAll } from '../../../src/core/sequence/sequenceReader';

describe('alphabetSummary', () => {
  it('lists symbols with their counts, most frequent first, ties in order of first appearance', () => {
    // source: counted by hand in "abracadabra": a 5, b 2, r 2, c 1, d 1
    const { sequence } = readAll(new TextEncoder().encode('abracadabra'), { format: 'chars' });
    expect(alphabetSummary(sequence)).toEqual({
      symbols: [
        { symbol: 'a', count: 5 },
        { symbol: 'b', count: 2 },
        { symbol: 'r', count: 2 },
        { symbol: 'c', count: 1 },
        { symbol: 'd', count: 1 },
      ],
      unlisted: 0,
    });
    expect(alphabetSummary(sequence, 2)).toEqual({ symbols: [{ symbol: 'a', count: 5 }, { symbol: 'b', count: 2 }], unlisted: 3 });
  });
});
