import { describe, expect, it } from 'vitest';
import { cli, tempFolder } from './cliHarness';
import { markovSource } from '../../src/core/sources/markovSource';
import { TWO_STATE } from '../helpers/referenceChains';

describe('returnrate analyze --calibrate', () => {
  it('prints the calibration block after the summary and adds calibration to the JSON', async () => {
    const folder = tempFolder('calibrate');
    try {
      const seq = markovSource(TWO_STATE).generate(10000, 4);
      const file = folder.file('chain.txt', Array.from(seq.symbols).join(''));
      const text = await cli('analyze', file, '--calibrate', '10', '--calibrate-seed', '3', '--max-n', '20', '--progress', '--no-table');
      expect(text.code).toBe(0);
      expect(text.stdout).toMatch(/calibration at N = 10,000: 10 of 10 surrogates, base seed 3/);
      expect(text.stdout).toMatch(/fitted Markov chain of order 1 \(BIC over k = 0\.\.\d+/);
      expect(text.stdout).toMatch(/coverage of the 95% interval: [\d.]+ ± [\d.]+ \(\d+ of 10\)/);
      expect(text.stdout).toMatch(/corrected by Markov surrogates of order 1; valid to the extent the data resemble the fitted chain/);
      expect(text.stdout.indexOf('calibration at N')).toBeGreaterThan(text.stdout.indexOf('entropy rate'));
      expect(text.stderr).toMatch(/replicate 10 of 10/);

      const json = await cli('analyze', file, '--calibrate', '10', '--calibrate-seed', '3', '--max-n', '20', '--json', '-');
      expect(json.code).toBe(0);
      const parsed = JSON.parse(json.stdout) as { calibration: { schema: string; records: unknown[]; input: { sha256: string }; summary: { replicates: number } } };
      expect(parsed.calibration.schema).toBe('returnrate.calibration/1');
      expect(parsed.calibration.records).toHaveLength(10);
      expect(parsed.calibration.summary.replicates).toBe(10);
      expect(parsed.calibration.input.sha256).toMatch(/^[0-9a-f]{64}$/);
    } finally {
      folder.remove();
    }
  });

  it('refuses fewer than 10 replicates with a usage error', async () => {
    const run = await cli('analyze', '--source', 'coin', '--length', '1000', '--calibrate', '5');
    expect(run.code).toBe(2);
    expect(run.stderr).toBe('returnrate: --calibrate must be a whole number of replicates from 10 to 100000; got "5" (see returnrate --help)\n');
  });
});
