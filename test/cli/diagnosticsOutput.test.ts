import { describe, expect, it } from 'vitest';
import { cli } from './cliHarness';

// Shape only: the numbers are checked in test/core/diagnostics.
describe('analyze prints and writes the diagnostics', () => {
  it('summary has a short diagnostics block with the reading in words', async () => {
    const run = await cli('analyze', '--source', 'markov:0.9,0.1;0.4,0.6', '--length', '20000', '--seed', '4', '--no-table');
    expect(run.code).toBe(0);
    expect(run.stdout).toContain('mixing diagnostics (a finite sample cannot prove mixing)');
    expect(run.stdout).toMatch(/reading \((fast|slow|too-slow|unknown)\): /);
    expect(run.stdout).toContain('ACF of information increments');
    expect(run.stdout).toContain('E[I^6]');
  });
  it('--json includes the diagnostics object', async () => {
    const run = await cli('analyze', '--source', 'coin', '--length', '20000', '--seed', '4', '--json', '-');
    expect(run.code).toBe(0);
    const json = JSON.parse(run.stdout) as { diagnostics?: { beta: { blockLength: number } | null; reading: { verdict: string } } };
    expect(json.diagnostics?.reading.verdict).toBe('fast');
    // 2^(2m) <= 20000 / 1000 = 20: m = 2.
    expect(json.diagnostics?.beta?.blockLength).toBe(2);
  });
});
