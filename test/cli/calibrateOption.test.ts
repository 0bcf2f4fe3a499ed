import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli, tempFolder } from './cliHarness';
import { calibrateSequence } from '../../src/core/calibration/calibrationResult';
import type { CalibrationResult } from '../../src/core/calibration/calibrationResult';
import { analyzeSequence } from '../../src/core/analyze';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import { markovSource } from '../../src/core/sources/markovSource';
import { TWO_STATE } from '../helpers/referenceChains';

describe('returnrate analyze --calibrate', () => {
  it('prints the calibration block after the summary and adds calibration to the JSON', async () => {
    const folder = tempFolder('calibrate');
    try {
      const seq = markovSource(TWO_STATE).generate(10000, 4);
      const file = folder.file('chain.txt', Array.from(seq.symbols).join(''));
      const jsonPath = join(folder.dir, 'out.json');
      const run = await cli('analyze', file, '--calibrate', '10', '--calibrate-seed', '3', '--max-n', '20', '--progress', '--no-table', '--json', jsonPath);
      expect(run.code).toBe(0);
      expect(run.stdout).toMatch(/calibration at N = 10,000: 10 of 10 surrogates, base seed 3/);
      expect(run.stdout).toMatch(/fitted Markov chain of order 1 \(BIC over k = 0\.\.\d+/);
      expect(run.stdout).toMatch(/coverage of the 95% interval: [\d.]+ ± [\d.]+ \(\d+ of 10\)/);
      expect(run.stdout).toMatch(/corrected by Markov surrogates of order 1; valid to the extent the data resemble the fitted chain/);
      expect(run.stdout.indexOf('calibration at N')).toBeGreaterThan(run.stdout.indexOf('entropy rate'));
      expect(run.stderr).toMatch(/replicate 10 of 10/);
      const parsed = JSON.parse(readFileSync(jsonPath, 'utf8')) as { calibration: CalibrationResult };
      expect(parsed.calibration.schema).toBe('returnrate.calibration/1');
      expect(parsed.calibration.records).toHaveLength(10);
      expect(parsed.calibration.summary.replicates).toBe(10);
      expect(parsed.calibration.input.sha256).toMatch(/^[0-9a-f]{64}$/);
    } finally {
      folder.remove();
    }
  });

  it('the records from two worker threads are those of the single-thread study', async () => {
    const run = await cli('analyze', '--source', 'markov:0.9,0.1;0.4,0.6', '--length', '5000', '--seed', '2', '--max-n', '16', '--calibrate', '10', '--json', '-');
    expect(run.code).toBe(0);
    const fromThreads = (JSON.parse(run.stdout) as { calibration: CalibrationResult }).calibration;
    const seq = markovSource(TWO_STATE).generate(5000, 2);
    const analysis = analyzeSequence(seq, { name: 'x', sha256: null, format: 'generated' }, { ...DEFAULT_SETTINGS, maxN: 16 });
    const here = calibrateSequence(seq, analysis, 10, 1);
    expect(fromThreads.records).toEqual(JSON.parse(JSON.stringify(here.records)));
    expect(fromThreads.summary.entropy.bias).toBeCloseTo(here.summary.entropy.bias!, 14);
  });

  it('refuses fewer than 10 replicates with a usage error', async () => {
    const run = await cli('analyze', '--source', 'coin', '--length', '1000', '--calibrate', '5');
    expect(run.code).toBe(2);
    expect(run.stderr).toBe('returnrate: --calibrate must be a whole number of replicates from 10 to 100000; got "5" (see returnrate --help)\n');
  });
});
