import { describe, expect, it } from 'vitest';
import { compareSequences } from '../../src/core/cross/compareSequences';
import { crossReferenceOfSpecs } from '../../src/core/cross/crossReferenceOfSpecs';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import { parseSourceSpec } from '../../src/core/sources/catalog';
import { comparisonConvergenceFigure, comparisonQuantileFigure, WAITING_FLUCTUATION_LABEL } from '../../src/figures/comparisonFigures';

const size = { width: 640, height: 360 };

function comparison(withExact: boolean) {
  const a = parseSourceSpec('bernoulli:0.3').generate(30_000, 1);
  const b = parseSourceSpec('coin').generate(30_000, 2);
  const exact = crossReferenceOfSpecs('bernoulli:0.3', 'coin')!;
  const facts = { name: 'x', sha256: null, format: 'generated' };
  return compareSequences(a, b, facts, facts, { ...DEFAULT_SETTINGS, maxN: 20 }, withExact ? { exact } : {});
}

describe('comparison figures', () => {
  const withExact = comparison(true);

  it('convergence: one point per block length, the estimate and the exact cross entropy as level lines', () => {
    const figure = comparisonConvergenceFigure(withExact, size);
    expect(figure.kind).toBe('figure');
    if (figure.kind !== 'figure') return;
    const ids = figure.model.lines.map((l) => l.id);
    expect(ids).toEqual(['mean', 'estimate', 'exact']);
    const mean = figure.model.lines[0]!;
    expect(mean.data).toHaveLength(withExact.lengths.length);
    expect(mean.data[3]!.y).toBeCloseTo(withExact.lengths[3]!.ratePerSymbol!, 12);
    expect(figure.model.lines[2]!.data[0]!.y).toBeCloseTo(Math.LN2, 12);
    expect(figure.model.spans).toHaveLength(1);
  });

  it('Q-Q: sorted waiting-time fluctuations with their own axis label; absent without fluctuations', () => {
    const figure = comparisonQuantileFigure(withExact, size);
    expect(figure.kind).toBe('figure');
    if (figure.kind !== 'figure') return;
    expect(figure.model.y.label).toBe(WAITING_FLUCTUATION_LABEL);
    const points = figure.model.points[0]!.data.map((d) => d.y!);
    for (let i = 1; i < points.length; i++) expect(points[i]!).toBeGreaterThanOrEqual(points[i - 1]!);
    // Against a fair coin -log Q(A_1^n) = n log 2 exactly: the exact sigma^2 is 0, so the estimate scales.
    expect(withExact.fluctuations?.basis).toBe('estimate');
    const none = comparisonQuantileFigure({ ...withExact, fluctuations: null }, size);
    expect(none.kind).toBe('unavailable');
  });
});
