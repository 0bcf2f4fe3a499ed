import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { DOMParser } from '@xmldom/xmldom';
import { afterAll, describe, expect, it } from 'vitest';
import type { CalibrationResult } from '../../src/core/calibration/calibrationResult';
import { cli, tempFolder } from './cliHarness';

const folder = tempFolder('calibrate-exports');
afterAll(() => folder.remove());

describe('returnrate analyze --calibrate R with --figures and --report', () => {
  it('writes calibration.svg and .csv beside the other figures, and the report holds the calibration section with its numbers', async () => {
    const figures = join(folder.dir, 'figs');
    const report = join(folder.dir, 'report.html');
    const json = join(folder.dir, 'out.json');
    const run = await cli(
      'analyze', '--source', 'markov:0.9,0.1;0.4,0.6', '--length', '4000', '--seed', '2', '--max-n', '14',
      '--calibrate', '10', '--calibrate-seed', '4', '--quiet', '--figures', figures, '--report', report, '--json', json,
    );
    expect([run.code, run.stderr]).toEqual([0, '']);
    const files = readdirSync(figures);
    expect(files).toEqual(expect.arrayContaining(['calibration.svg', 'calibration.csv', 'convergence.svg']));
    const calibration = (JSON.parse(readFileSync(json, 'utf8')) as { calibration: CalibrationResult }).calibration;
    const svg = readFileSync(join(figures, 'calibration.svg'), 'utf8');
    const errors: string[] = [];
    new DOMParser({ onError: (level, message) => errors.push(`${level}: ${message}`) }).parseFromString(svg, 'image/svg+xml');
    expect(errors).toEqual([]);
    expect(svg).toContain('calibration by Markov surrogates: 10 of 10 replicates, base seed 4');
    const csv = readFileSync(join(figures, 'calibration.csv'), 'utf8');
    // One "points" row per surrogate estimate.
    const estimates = calibration.records.filter((r) => r.entropy !== null).length;
    expect(csv.split('\r\n').filter((l) => l.startsWith('points,estimates,')).length).toBe(estimates);
    const html = readFileSync(report, 'utf8');
    expect(html).toContain('<section id="calibration">');
    expect(html).toContain(`data-value="${String(calibration.summary.entropy.bias)}"`);
    expect(html).toContain(`data-value="${String(calibration.model.entropyRate)}"`);
    expect(html).not.toMatch(/<script/i);
  });

  it('without --calibrate neither the figure nor the section appears', async () => {
    const figures = join(folder.dir, 'plain');
    const report = join(folder.dir, 'plain.html');
    const run = await cli('analyze', '--source', 'coin', '--length', '2000', '--max-n', '10', '--quiet', '--figures', figures, '--report', report);
    expect(run.code).toBe(0);
    expect(readdirSync(figures)).not.toContain('calibration.svg');
    expect(readFileSync(report, 'utf8')).not.toContain('id="calibration"');
  });
});
