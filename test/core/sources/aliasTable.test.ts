import { describe, expect, it } from 'vitest';
import { buildAliasTable } from '../../../src/core/sources/aliasTable';

/** The law an alias table draws: column k gets threshold[k]/K from its own cell and the rest of cells aliased to it. */
function lawOf(threshold: Float64Array, alias: Int32Array): number[] {
  const k = threshold.length;
  const law = new Array<number>(k).fill(0);
  for (let i = 0; i < k; i++) {
    law[i]! += threshold[i]! / k;
    law[alias[i]!]! += (1 - threshold[i]!) / k;
  }
  return law;
}

describe('buildAliasTable', () => {
  it('represents the law exactly (up to rounding) and never returns a zero-probability symbol', () => {
    const weights = [5, 0, 1, 3, 0, 7, 2, 2, 0, 9, 1];
    const total = weights.reduce((a, b) => a + b, 0);
    const law = weights.map((w) => w / total);
    const { threshold, alias } = buildAliasTable(law);
    const drawn = lawOf(threshold, alias);
    for (let k = 0; k < law.length; k++) expect(drawn[k]).toBeCloseTo(law[k]!, 14);
    for (let k = 0; k < law.length; k++) {
      if (law[k] === 0) {
        expect(threshold[k]).toBe(0);
        expect(law[alias[k]!]).toBeGreaterThan(0);
      }
    }
  });

  it('keeps every cell for a uniform law', () => {
    const { threshold, alias } = buildAliasTable([0.25, 0.25, 0.25, 0.25]);
    expect(Array.from(threshold)).toEqual([1, 1, 1, 1]);
    expect(Array.from(alias)).toEqual([0, 1, 2, 3]);
  });
});
