import { describe, expect, it } from 'vitest';
import { stickyChain } from '../helpers/estimateFixtures';
import { analyzeSequence } from '../../src/core/analyze';
import { analyzeSequenceSplit } from '../../src/core/analyzeSplit';
import { DEFAULT_SETTINGS, type AnalysisSettings } from '../../src/core/result/analysisResult';
import { inThisThread, type ScanJob, type ScanRunner } from '../../src/core/returns/scanJobs';
import type { Sequence } from '../../src/core/sequence/sequence';
import type { ShareProgress } from '../../src/core/returns/scanReturns';

const settings: AnalysisSettings = { ...DEFAULT_SETTINGS, maxN: 14 };

function sequenceOf(symbols: Uint8Array): Sequence {
  const counts = new Float64Array(2);
  for (const s of symbols) counts[s]!++;
  return { symbols, alphabet: ['0', '1'], counts };
}

const input = { name: 'test', sha256: null, format: 'generated' } as const;

describe('analyzeSequenceSplit', () => {
  it('computes the scan-free diagnostics as the last job of the class-group batch, with the result of the one-thread analysis', async () => {
    // The oracle is analyzeSequence, whose diagnostics are checked against published values in
    // test/core/diagnostics and test/validation.
    const sequence = sequenceOf(stickyChain(40_000, 7));
    const batches: ScanJob['kind'][][] = [];
    const spy: ScanRunner = (jobs, onDone) => {
      batches.push(jobs.map((j) => j.kind));
      return inThisThread(jobs, onDone);
    };
    const shares: ShareProgress[] = [];
    const split = await analyzeSequenceSplit(sequence, input, settings, 2, spy, { onShares: (p) => shares.push(p) });
    const single = analyzeSequence(sequence, input, settings);
    // The groups report from 0 done to all done (the diagnostics job is not counted).
    const groups = batches.find((kinds) => kinds[0] === 'group')!.filter((k) => k === 'group').length;
    expect(shares.map((p) => p.done)).toEqual(Array.from({ length: groups + 1 }, (_, k) => k));
    expect(shares.every((p) => p.total === groups && p.firstN === shares[0]!.firstN)).toBe(true);
    const groupBatch = batches.find((kinds) => kinds[0] === 'group');
    expect(groupBatch?.at(-1)).toBe('diagnostics');
    expect(batches.flat().filter((k) => k === 'diagnostics')).toHaveLength(1);
    // The same computations on the same symbols: equal to the last bit.
    expect(split.diagnostics).toEqual(single.diagnostics);
    expect(split.entropy.estimate).toBeCloseTo(single.entropy.estimate!, 12);
  });

  it('computes the diagnostics after the scan when the classes are never shared', async () => {
    // maxN 3: the range passes reach maxN before any class group is formed.
    const sequence = sequenceOf(stickyChain(5_000, 3));
    const kinds: ScanJob['kind'][] = [];
    const spy: ScanRunner = (jobs) => {
      kinds.push(...jobs.map((j) => j.kind));
      return inThisThread(jobs);
    };
    const few = { ...settings, maxN: 3 };
    const split = await analyzeSequenceSplit(sequence, input, few, 2, spy);
    expect(kinds).not.toContain('diagnostics');
    expect(split.diagnostics).toEqual(analyzeSequence(sequence, input, few).diagnostics);
  });
});
