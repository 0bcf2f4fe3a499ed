import { describe, expect, it } from 'vitest';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import { envelopeFigure, envelopeStatistics } from '../../src/figures/envelopeFigure';
import { fakeResult, lengthRow } from '../ui/fixtures';

const OPTIONS = { z: 2, delta: 0.5, errorC: 0.25 };
const SIZE = { width: 480, height: 320 };
// h = 0.5 nat, sigma^2 = 0.04 (sigma = 0.2); paths log R_n: deviations log R_n - 0.5 n worked by hand below.
const result = fakeResult({
  lengths: [1, 2, 3, 4].map((n) => lengthRow(n)),
  entropy: { ...fakeResult().entropy, estimate: 0.5 },
  sigma2: { ...fakeResult().sigma2, estimate: 0.04 },
  paths: {
    positions: [0, 8],
    logReturn: [
      [0.5, 1.1, 1.0, null], // deviations 0, 0.1, -0.5
      [1.0, 1.0, 2.0, null], // deviations 0.5, 0, 0.5
    ],
  },
});

describe('envelopeStatistics', () => {
  it('takes h and sigma from the result in nats and counts paths outside each band', () => {
    const s = envelopeStatistics(result, OPTIONS);
    expect(s.hNats).toBe(0.5);
    expect(s.sigmaNats).toBeCloseTo(0.2, 12);
    // Gaussian 2 * 0.2 * sqrt(n): 0.4, 0.566, 0.693; error term 0.25 (delta 1/2); LIL at n = 3: 0.2 * 0.7511903 = 0.150.
    expect(s.exceedance.slice(0, 3).map((r) => [r.used, r.leftOut, r.outside])).toEqual([
      [2, 0, { gaussian: 1 / 2, iteratedLog: null, errorTerm: 1 / 2 }],
      [2, 0, { gaussian: 0, iteratedLog: null, errorTerm: 0 }],
      [2, 0, { gaussian: 0, iteratedLog: 1, errorTerm: 1 }],
    ]);
    expect(s.exceedance[3]).toEqual({ n: 4, used: 0, leftOut: 2, outside: { gaussian: null, iteratedLog: null, errorTerm: null } });
  });

  it('gives the same shares for a result in bits (estimates converted back to nats)', () => {
    const bits = fakeResult({
      ...result,
      settings: { ...DEFAULT_SETTINGS, unit: 'bit' },
      entropy: { ...result.entropy, estimate: 0.5 / Math.LN2 },
      sigma2: { ...result.sigma2, estimate: 0.04 / Math.LN2 ** 2 },
    });
    const a = envelopeStatistics(result, OPTIONS).exceedance;
    const b = envelopeStatistics(bits, OPTIONS).exceedance;
    expect(b).toEqual(a);
  });
});

describe('envelopeFigure', () => {
  it('draws up to the last n with data (at least 3), with labelled bands and a read-out of shares', () => {
    const f = envelopeFigure(result, SIZE, OPTIONS);
    if (f.kind !== 'figure') throw new Error(f.message);
    expect(f.model.x.domain).toEqual([1, 3]);
    expect(f.model.y).toMatchObject({ label: 'log R_n − n ĥ', unit: 'nat' });
    expect(f.model.legend.map((e) => e.label)).toEqual(['Sampled positions (2)', '±2 σ̂ √n', '±σ̂ √(2 n log log n)', '±0.25 n^(1/2 − 0.5)', 'Trusted n = 2–3']);
    expect(f.model.readout[2]?.rows.map((r) => r.value)).toEqual(['2 / 0', '±0.6928, 0.0% outside', '±0.1502, 100.0% outside', '±0.2500, 100.0% outside']);
    expect(f).toMatchSnapshot();
  });

  it('leaves out the sigma bands when the result has no sigma^2, and says so', () => {
    const f = envelopeFigure(fakeResult({ ...result, sigma2: { ...result.sigma2, estimate: Number.NaN } }), SIZE, OPTIONS);
    if (f.kind !== 'figure') throw new Error(f.message);
    expect(f.model.lines.map((l) => l.id)).toEqual(['zero', 'errorTerm']);
    expect(f.model.notes).toEqual(['The result has no σ̂², so only the error-term band is drawn.']);
  });

  it('explains why there is no figure without sampled paths', () => {
    const f = envelopeFigure(fakeResult({ ...result, paths: { positions: [], logReturn: [] } }), SIZE, OPTIONS);
    expect(f.kind).toBe('unavailable');
    if (f.kind === 'unavailable') expect(f.message).toMatch(/no sampled paths/);
  });
});
