import { describe, expect, it } from 'vitest';
import type { ComparisonResult } from '../../../src/core';
import { comparisonLines, comparisonProgressText, comparisonProgressView, sideText } from '../../../src/ui/view/comparisonView';

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
    expect(sideText({ kind: 'input' })).toBe('the input loaded above (read when the comparison starts)');
    expect(sideText({ kind: 'demo', id: 'x', label: 'Valley', length: 30000 })).toBe('Valley, 30,000 symbols');
  });

  it('shows progress like the Run panel: block length n of maxN on the bar, and the elapsed time', () => {
    const base = { sideA: null, sideB: null, message: null, startedAtMs: 1_000 };
    const running = { ...base, status: 'running' as const, progress: { stage: 'entropy-a' as const, done: 7, total: 40 } };
    expect(comparisonProgressView(running, 4_000)).toEqual({
      status: 'Running',
      detail: 'Entropy rate of A: block length n = 7 of at most 40',
      value: 7,
      max: 40,
      elapsed: expect.stringMatching(/elapsed$/),
    });
    expect(comparisonProgressView({ ...running, progress: { stage: 'read', done: 0, total: 2 } }, 4_000).value).toBeNull();
    expect(comparisonProgressView({ ...base, status: 'idle', progress: null }, 4_000)).toMatchObject({ status: 'Idle', elapsed: null });
    expect(comparisonProgressView({ ...base, status: 'cancelled', progress: null }, 4_000).status).toBe('Stopped');
  });
});
