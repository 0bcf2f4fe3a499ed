import { describe, expect, it } from 'vitest';
import type { ComparisonResult } from '../../../src/core';
import { comparisonLines, comparisonProgressText, sideText } from '../../../src/ui/view/comparisonView';

const rate = (estimate: number | null, ci: [number, number] | null) => ({ estimate, ci95: ci, standardError: null, lengthsUsed: null, note: 'n' });

describe('comparison view', () => {
  it('writes the three rates with four decimals, their intervals, and the exact values when known', () => {
    const result = {
      crossEntropy: rate(0.69312, [0.6, 0.78]),
      entropyA: { ...rate(0.61, [0.6, 0.62]), method: 'plugin-conditional' },
      relativeEntropy: rate(null, null),
      exact: { source: 's', crossEntropy: Math.LN2, entropyA: 0.610864302055, relativeEntropy: 0.08, sigma2Cross: 0 },
    } as unknown as ComparisonResult;
    const lines = comparisonLines(result);
    expect(lines.map((l) => [l.id, l.estimate, l.interval, l.exact])).toEqual([
      ['cross', '0.6931', '0.6000 to 0.7800', '0.6931'],
      ['entropy-a', '0.6100', '0.6000 to 0.6200', '0.6109'],
      ['relative', '—', 'no interval', '0.0800'],
    ]);
  });

  it('says what each side holds and how far a comparison is', () => {
    expect(sideText(null)).toBe('nothing chosen');
    expect(sideText({ kind: 'file', name: 'a.txt', bytes: 1234 })).toBe('file “a.txt” (1,234 bytes)');
    expect(sideText({ kind: 'source', spec: 'coin', label: 'Fair coin', length: 200000 })).toBe('Fair coin, 200,000 symbols');
    expect(comparisonProgressText({ stage: 'waiting', done: 3, total: 32 })).toBe('Waiting times of A in B: segment pair 3 of 32');
  });
});
