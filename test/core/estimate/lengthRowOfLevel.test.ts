import { describe, expect, it } from 'vitest';
import { randomSymbols, stickyChain } from '../../helpers/estimateFixtures';
import { analyzeSequence } from '../../../src/core/analyze';
import { lengthRowOfLevel } from '../../../src/core/estimate/lengthRowOfLevel';
import { lengthTable } from '../../../src/core/estimate/lengthTable';
import { DEFAULT_SETTINGS, type LengthRow } from '../../../src/core/result/analysisResult';
import type { LevelStats } from '../../../src/core/returns/levelStats';
import { scanReturns } from '../../../src/core/returns/scanReturns';
import type { Sequence } from '../../../src/core/sequence/sequence';

function sequenceOf(symbols: Uint8Array, alphabet: number): Sequence {
  const counts = new Float64Array(alphabet);
  for (const s of symbols) counts[s]!++;
  return { symbols, alphabet: Array.from({ length: alphabet }, (_, k) => String(k)), counts };
}

describe('lengthRowOfLevel', () => {
  it('rows built level by level as the scan reports them equal lengthTable rows exactly, in nats and in bits', () => {
    // source: same definitions, one code path (lengthTable maps lengthRowOfLevel over the levels);
    // the check is that the per-level hook sees every level in order, and that nothing later changes them.
    const symbols = randomSymbols(4000, 3, 21);
    for (const unit of ['nat', 'bit'] as const) {
      const seen: LengthRow[] = [];
      let previous: LevelStats | null = null;
      const scan = scanReturns(symbols, 3, {
        maxN: 14,
        onLevel: (level) => {
          seen.push(lengthRowOfLevel(level, previous, unit));
          previous = level;
        },
      });
      expect(seen.length).toBe(14);
      expect(seen).toEqual(lengthTable(scan.levels, unit));
    }
  });

  it('analyzeSequence hands each level to onLevelStats, after onLevel, and the rows equal the result table', () => {
    // source: API contract (analyze.ts AnalysisHooks.onLevelStats)
    const seq = sequenceOf(stickyChain(6000, 3), 2);
    const calls: string[] = [];
    const rows: LengthRow[] = [];
    let previous: LevelStats | null = null;
    const settings = { ...DEFAULT_SETTINGS, maxN: 30, unit: 'bit' as const };
    const result = analyzeSequence(seq, { name: 'chain', sha256: null, format: 'generated' }, settings, {
      onLevel: (n) => calls.push(`n${n}`),
      onLevelStats: (level, active) => {
        calls.push(`s${level.n}`);
        expect(active).toBeGreaterThanOrEqual(0);
        rows.push(lengthRowOfLevel(level, previous, settings.unit));
        previous = level;
      },
    });
    expect(calls.slice(0, 4)).toEqual(['n1', 's1', 'n2', 's2']);
    expect(rows).toEqual(result.lengths);
  });

  it('takes H_0 = 0 for the first level: its conditional entropy is its Miller-Madow block entropy', () => {
    // source: definition h_1 = H_1 - H_0 with H_0 = 0 (THEORY.md section 7)
    const scan = scanReturns(randomSymbols(500, 2, 3), 2, { maxN: 2 });
    const first = lengthRowOfLevel(scan.levels[0]!, null);
    expect(first.conditionalEntropy).toBe(first.blockEntropyMillerMadow);
  });
});
