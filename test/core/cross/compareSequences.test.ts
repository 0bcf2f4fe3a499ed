import { describe, expect, it } from 'vitest';
import { compareSequences, pairCount } from '../../../src/core/cross/compareSequences';
import { COMPARISON_SCHEMA } from '../../../src/core/cross/comparisonResult';
import { ScanCancelled } from '../../../src/core/returns/partitionLevel';
import { DEFAULT_SETTINGS } from '../../../src/core/result/analysisResult';
import { parseSourceSpec } from '../../../src/core/sources/catalog';
import { sequenceFromSymbols } from '../../../src/core/sources/sequenceFromSymbols';

const facts = (name: string) => ({ name, sha256: null, format: 'generated' });

describe('compareSequences', () => {
  it('returns a versioned result whose rows count positions, waits and censored waits consistently', () => {
    const a = parseSourceSpec('coin').generate(20_000, 1);
    const b = parseSourceSpec('coin').generate(20_000, 2);
    const r = compareSequences(a, b, facts('a'), facts('b'), { ...DEFAULT_SETTINGS, maxN: 16 });
    expect(r.schema).toBe(COMPARISON_SCHEMA);
    expect(r.pairs).toBe(pairCount(20_000, 20_000));
    for (const row of r.lengths) {
      expect(row.observed + row.censored).toBe(row.positions);
      // Each of the K segments of A loses n - 1 positions at level n.
      expect(row.positions).toBe(20_000 - r.pairs * (row.n - 1));
    }
    expect(r.crossEntropy.estimate).not.toBeNull();
    expect(r.relativeEntropy.standardError).toBeCloseTo(r.crossEntropy.standardError! + r.entropyA.standardError!, 12);
    expect(r.trustedRange).not.toBeNull();
  });

  it('warns when A uses a symbol that B never shows, and counts those blocks as censored', () => {
    const a = sequenceFromSymbols(Uint8Array.from({ length: 4000 }, (_, i) => (i % 7 === 0 ? 2 : i % 2)), ['0', '1', 'x']);
    const b = sequenceFromSymbols(Uint8Array.from({ length: 4000 }, (_, i) => (i * 7919) % 3 === 0 ? 1 : 0), ['0', '1']);
    const r = compareSequences(a, b, facts('a'), facts('b'), { ...DEFAULT_SETTINGS, maxN: 8 });
    expect(r.alphabet.missingInB).toEqual(['x']);
    expect(r.warnings.map((w) => w.code)).toContain('symbols-missing-in-b');
    // About 1/7 of A's symbols are 'x': at n = 1 that share of positions is censored.
    expect(r.lengths[0]!.censored).toBe(Math.ceil(4000 / 7));
    expect(r.trustedRange).toBeNull();
    expect(r.warnings.map((w) => w.code)).toContain('many-censored');
  });

  it('stops with ScanCancelled when asked, and names A when it is too short', () => {
    const a = parseSourceSpec('coin').generate(2000, 1);
    expect(() => compareSequences(a, a, facts('a'), facts('b'), DEFAULT_SETTINGS, { shouldStop: () => true })).toThrow(ScanCancelled);
    const one = parseSourceSpec('coin').generate(1, 1);
    expect(() => compareSequences(one, a, facts('a'), facts('b'), DEFAULT_SETTINGS)).toThrow(/sequence A needs at least 2 symbols; got 1/);
  });
});
