import { describe, expect, it } from 'vitest';
import { ORDER_ONE_FACTS } from '../helpers/calibrationFacts';
import { calibrationResult } from '../../src/core/calibration/calibrationResult';
import type { ReplicateRecord } from '../../src/core/calibration/surrogateStudy';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import { calibrationFigure } from '../../src/figures/calibrationFigure';

const facts = ORDER_ONE_FACTS;

function record(replicate: number, entropy: number, lo: number, hi: number): ReplicateRecord {
  return { replicate, seed: replicate, entropy, entropyInterval: [lo, hi], entropyMethod: 'return-slope', sigma2: null, sigma2Interval: null };
}

const analysis = { input: { name: 'data', sha256: null, symbols: 1000 }, settings: DEFAULT_SETTINGS, entropy: { estimate: 1.1, ci95: [1.0, 1.2] as const } };

describe('calibrationFigure', () => {
  it('sorts the estimates, splits the intervals into covering and missing, and draws the exact and mean lines', () => {
    const cal = calibrationResult(analysis, facts, [record(0, 1.2, 1.1, 1.3), record(1, 0.95, 0.9, 1.05), record(2, 1.05, 0.98, 1.12)], 3, 1);
    const figure = calibrationFigure(cal, { width: 600, height: 300 });
    if (figure.kind !== 'figure') throw new Error(figure.message);
    const m = figure.model;
    // Points sorted by estimate, at rows 1, 2, 3.
    expect(m.points[0]!.data.map((d) => [d.x, d.y])).toEqual([
      [0.95, 1],
      [1.05, 2],
      [1.2, 3],
    ]);
    const line = (id: string) => m.lines.find((l) => l.id === id)!;
    // Exact value 1 lies in [0.9, 1.05] and [0.98, 1.12], not in [1.1, 1.3].
    expect(line('covering').data.map((d) => d.x)).toEqual([0.9, 1.05, 0.98, 1.12]);
    expect(line('missing').data.map((d) => d.x)).toEqual([1.1, 1.3]);
    expect(line('exact').data.map((d) => d.x)).toEqual([1, 1]);
    // Mean (1.2 + 0.95 + 1.05) / 3 = 1.0666...
    expect(line('mean').data[0]!.x).toBeCloseTo(3.2 / 3, 12);
    expect(m.description).toMatch(/2 of 3 intervals contain it/);
    expect(m.legend.map((l) => l.id)).toEqual(['estimates', 'covering', 'missing', 'exact', 'mean']);
  });

  it('says why there is no figure before the first replicate', () => {
    const cal = calibrationResult(analysis, facts, [], 10, 1);
    expect(calibrationFigure(cal, { width: 600, height: 300 })).toEqual({ kind: 'unavailable', message: 'No surrogate has given an estimate of h yet.' });
  });
});
