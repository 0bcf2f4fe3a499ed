import { describe, expect, it } from 'vitest';
import { analyzeSequence } from '../../src/core/analyze';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import { markovSource } from '../../src/core/sources/markovSource';
import { fittedVarianceLine, varianceGrowthFigure } from '../../src/figures/varianceGrowthFigure';
import { fakeResult, lengthRow } from '../ui/fixtures';

describe('fittedVarianceLine', () => {
  it('through two points it is the line through them: (2, 3.1), (3, 4.2) give slope 1.1, intercept 0.9', () => {
    const fit = fittedVarianceLine([2, 3.1, 4.2, 5], 1.1, 2, 3);
    expect(fit?.intercept).toBeCloseTo(0.9, 12);
  });

  it('over three points it is the least-squares intercept, worked by hand', () => {
    // (1, 1), (2, 2.5), (3, 2.9): mean n = 2, mean v = 6.4/3; slope = ((-1)(1 - 6.4/3) + (1)(2.9 - 6.4/3)) / 2 = 0.95,
    // intercept = 6.4/3 - 0.95 * 2 = 0.2333... (normal equations of simple linear regression).
    expect(fittedVarianceLine([1, 2.5, 2.9], 0.95, 1, 3)?.intercept).toBeCloseTo(0.23333333, 7);
  });

  it('is null when a fitted level has no variance', () => {
    expect(fittedVarianceLine([1, null, 3], 1, 1, 3)).toBeNull();
  });

  it('uses the variances the core regressed: its slope refitted from the rows equals the reported slope', () => {
    // Two-state chain with stay probabilities 0.8 and 0.7 (invented parameters; only self-consistency is checked).
    const source = markovSource([
      [0.8, 0.2],
      [0.3, 0.7],
    ]);
    const r = analyzeSequence(source.generate(20_000, 11), { name: 'chain', sha256: null, format: 'generated' }, { ...DEFAULT_SETTINGS, maxN: 20 });
    const growth = r.sigma2.alternatives['variance-growth'];
    expect(growth?.estimate).not.toBeNull();
    const [from, to] = growth?.lengthsUsed ?? [0, 0];
    const ns: number[] = [];
    const vs: number[] = [];
    for (let n = from; n <= to; n++) {
      ns.push(n);
      vs.push(r.lengths[n - 1]?.varLogReturnCorrected ?? Number.NaN);
    }
    const nBar = ns.reduce((a, b) => a + b, 0) / ns.length;
    const vBar = vs.reduce((a, b) => a + b, 0) / vs.length;
    let sxy = 0;
    let sxx = 0;
    ns.forEach((n, i) => {
      sxy += (n - nBar) * ((vs[i] ?? 0) - vBar);
      sxx += (n - nBar) ** 2;
    });
    expect(sxy / sxx).toBeCloseTo(growth?.estimate ?? Number.NaN, 10);
  });
});

describe('varianceGrowthFigure', () => {
  const rows = [1, 2, 3, 4].map((n) => lengthRow(n, { varLogReturnCorrected: 1 + 0.5 * n }));
  const result = fakeResult({
    lengths: rows,
    trustedRange: { lo: 2, hi: 3, reason: '' },
    sigma2: {
      ...fakeResult().sigma2,
      alternatives: {
        'variance-growth': { estimate: 0.5, ci95: null, label: 'Slope', note: 'a note', standardError: null, lengthsUsed: [2, 3] },
      },
    },
    reference: { source: 's', entropyRate: 1, sigma2: 0.4 },
  });
  const size = { width: 500, height: 320 };

  it('plots one point per n and reads out the fitted line 1 + 0.5 n', () => {
    const f = varianceGrowthFigure(result, size);
    if (f.kind !== 'figure') throw new Error(f.message);
    expect(f.model.points[0]?.points).toHaveLength(4);
    expect(f.model.readout.map((s) => s.rows.map((r) => r.value))).toEqual([
      ['1.500', '1.500'],
      ['2.000', '2.000'],
      ['2.500', '2.500'],
      ['3.000', '3.000'],
    ]);
    expect(f.model.lines.map((l) => l.id)).toEqual(['fit-extended', 'headline', 'exact', 'fit']);
    expect(f.model.y).toMatchObject({ label: 'Var(log R_n)', unit: 'nat²' });
    expect(f).toMatchSnapshot();
  });

  it('converts variances to bits squared: 1.5 nat² is 1.5 / (log 2)² = 3.122 bit²', () => {
    const f = varianceGrowthFigure({ ...result, settings: { ...DEFAULT_SETTINGS, unit: 'bit' } }, size);
    if (f.kind !== 'figure') throw new Error(f.message);
    expect(f.model.readout[0]?.rows[0]?.value).toBe('3.122');
  });

  it('explains a missing fitted line and still plots the points', () => {
    const f = varianceGrowthFigure(fakeResult({ lengths: rows }), size);
    if (f.kind !== 'figure') throw new Error(f.message);
    expect(f.model.notes[0]).toMatch(/^No fitted line/);
    expect(f.model.points[0]?.points).toHaveLength(4);
  });
});
