import { describe, expect, it } from 'vitest';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import { barsPath, fluctuationHistogramFigure, fluctuationQuantileFigure, fluctuationStatistics } from '../../src/figures/fluctuationFigure';
import { pValueText } from '../../src/figures/pValueText';
import { fakeResult } from '../ui/fixtures';

/**
 * Hand-made fixture: h = 0.5 nat/symbol and sigma^2 = 0.25 nat^2/symbol, so at n = 4 the shift is
 * n h = 2 and the scale sigma sqrt(n) = 1, and (log R_4 - 2)/1 is just log R_4 - 2. Columns 1-3
 * are filler; column 4 holds log R_4 = 1, 2, 7, missing, 3 at positions 0, 10, 15, 30, 40, i.e.
 * normalized values -1, 0, 5, (censored), 1.
 */
function fixture(unit: 'nat' | 'bit' = 'nat', negligible = false) {
  const f = unit === 'bit' ? 1 / Math.LN2 : 1;
  const row = (v: number | null) => [0.1, 0.2, 0.3, v];
  return fakeResult({
    settings: { ...DEFAULT_SETTINGS, unit },
    entropy: { ...fakeResult().entropy, estimate: 0.5 * f },
    sigma2: { ...fakeResult().sigma2, estimate: 0.25 * f * f, negligible },
    paths: { positions: [0, 10, 15, 30, 40], logReturn: [row(1), row(2), row(7), row(null), row(3)] },
  });
}
const size = { width: 400, height: 300 };

describe('fluctuationStatistics', () => {
  it('normalizes by n h and sigma sqrt(n) and counts censored and thinned positions', () => {
    const all = fluctuationStatistics(fixture(), 4, 1);
    expect(Array.from(all.fluctuations?.values ?? [])).toEqual([-1, 0, 5, 1]);
    expect(all.fluctuations).toMatchObject({ missing: 1, thinned: 0 });
    // gap 10: position 15 lies 5 after the kept 10 and is thinned; 30 is missing and does not block 40.
    const thin = fluctuationStatistics(fixture(), 4, 10);
    expect(Array.from(thin.fluctuations?.values ?? [])).toEqual([-1, 0, 1]);
    expect(thin.fluctuations).toMatchObject({ missing: 1, thinned: 1 });
  });

  it('gives the same values when the result is in bits (h and sigma are turned back to nats)', () => {
    const values = Array.from(fluctuationStatistics(fixture('bit'), 4, 10).fluctuations?.values ?? []);
    expect(values.map((v) => Math.round(v * 1e9) / 1e9)).toEqual([-1, 0, 1]);
  });

  it('tests {-1, 0, 1} against N(0,1): KS D = 1/3 - Phi(-1), AD A^2 = 0.1895', () => {
    const t = fluctuationStatistics(fixture(), 4, 10).tests;
    // Phi(-1) = 0.15865525 (Abramowitz & Stegun 1964, table 26.1): D = max_i(i/3 - Phi(x_i), Phi(x_i) - (i-1)/3) = 0.1746781.
    expect(t?.kolmogorovSmirnov.statistic).toBeCloseTo(1 / 3 - 0.15865525, 6);
    // A^2 = -3 - (1/3)[1*2 log Phi(-1) + 3*2 log 0.5 + 5*2 log Phi(1)] = 0.18949 (Anderson & Darling 1954 formula, worked by hand).
    expect(t?.andersonDarling.statistic).toBeCloseTo(0.18949, 4);
    expect(t?.caveat).toMatch(/only indicative/);
  });

  it('puts the Q-Q points at Blom positions with the Beta order-statistic band', () => {
    const q = fluctuationStatistics(fixture(), 4, 10).quantiles;
    // Phi^-1((1 - 3/8)/(3 + 1/4)) = Phi^-1(0.19231) = -0.8694 (normal table, interpolated by hand).
    expect(q?.theoretical[0]).toBeCloseTo(-0.8694, 3);
    expect(q?.theoretical[1]).toBeCloseTo(0, 12);
    // Middle of 3: Beta(2, 2) with CDF 3u^2 - 2u^3 = 0.025 at u = 0.0943, Phi^-1(0.0943) = -1.315 (by hand).
    expect(q?.lower[1]).toBeCloseTo(-1.315, 2);
    expect(q?.upper[1]).toBeCloseTo(1.315, 2);
  });

  it('bins {-1, 0, 1} by Freedman-Diaconis: IQR 1, width 2 * 3^(-1/3) = 1.3867, counts 2 and 1', () => {
    const h = fluctuationStatistics(fixture(), 4, 10).histogram;
    expect(h?.binWidth).toBeCloseTo(2 / Math.cbrt(3), 10);
    expect(Array.from(h?.counts ?? [])).toEqual([2, 1]);
  });

  it('says so in words when sigma^2 is negligible, and when too few values remain', () => {
    const neg = fluctuationStatistics(fixture('nat', true), 4, 1);
    expect(neg.problem).toMatch(/negligible/);
    expect(fluctuationQuantileFigure(neg, size)).toMatchObject({ kind: 'unavailable' });
    const few = fluctuationStatistics(fixture(), 4, 40);
    expect(few.problem).toMatch(/only 2 sampled positions have an observed return \(1 censored or past the end, 2 thinned\)/);
    expect(fluctuationHistogramFigure(few, size)).toMatchObject({ kind: 'unavailable' });
  });
});

describe('fluctuation figures', () => {
  const statistics = fluctuationStatistics(fixture(), 4, 10);

  it('Q-Q figure: three points, the band, the identity line through the plot corners, a legend', () => {
    const f = fluctuationQuantileFigure(statistics, size);
    if (f.kind !== 'figure') throw new Error(f.message);
    const m = f.model;
    expect(m.points[0]?.points).toHaveLength(3);
    // x and y share the domain, so the identity runs from the bottom-left to the top-right corner.
    expect(m.x.domain).toEqual(m.y.domain);
    const { left, top, width, height } = m.plot;
    expect(m.lines[0]?.path).toBe(`M${left},${top + height}L${left + width},${top}`);
    // The middle point (0, 0) lies on the identity: its pixels are the corners' affine image of 0.
    const mid = m.points[0]?.points[1];
    const [d0, d1] = m.x.domain;
    expect(mid?.x).toBeCloseTo(left + (width * (0 - d0)) / (d1 - d0), 1);
    expect(mid?.y).toBeCloseTo(top + height - (height * (0 - d0)) / (d1 - d0), 1);
    expect(m.legend.map((e) => e.kind)).toEqual(['points', 'band', 'line']);
    // One read-out stop per drawn point, at its pixel x, naming the N(0,1) quantile and the sorted value.
    expect(m.readout).toHaveLength(3);
    expect(m.readout[1]?.x).toBe(mid?.x);
    expect(m.readout[1]?.heading).toEqual({ id: 'quantile', label: 'N(0,1) quantile', value: '0' });
    expect(m.readout[0]?.heading?.value).toBe('−0.8694');
    expect(m.readout[1]?.rows[0]?.value).toBe('0');
    expect(f).toMatchSnapshot();
  });

  it('histogram figure: one rectangle per filled bin, the N(0,1) curve scaled to counts', () => {
    const f = fluctuationHistogramFigure(statistics, size);
    if (f.kind !== 'figure') throw new Error(f.message);
    const m = f.model;
    expect(m.bands[0]?.path.match(/Z/g)).toHaveLength(2);
    // Highest bar 2, times 1.05 headroom = 2.1, rounded up to d3's nice step 0.5.
    expect(m.y).toMatchObject({ label: 'Count', domain: [0, 2.5] });
    // Peak of the curve: m w phi(0) = 3 * 1.38672 * 0.398942 = 1.65967 counts (phi(0) = 1/sqrt(2 pi)).
    const [y0, y1] = m.y.domain;
    const top = Math.min(...(m.lines[1]?.path.match(/,-?[\d.]+/g) ?? []).map((c) => Number(c.slice(1))));
    expect(top).toBeCloseTo(m.plot.top + m.plot.height * (1 - (1.65967 - y0) / (y1 - y0)), 0);
    // One read-out stop per bin, with the bar's count: [2, 1] as worked out above.
    expect(m.readout.map((r) => r.rows[0]?.value)).toEqual(['2', '1']);
    expect(m.readout[0]?.heading?.label).toBe('Bin');
    expect(f).toMatchSnapshot();
  });

  it('barsPath draws a rectangle from zero to each count and skips empty bins', () => {
    const id = (v: number) => v;
    const flip = (v: number) => 100 - 10 * v;
    expect(barsPath([0, 1, 2, 3], [2, 0, 1], id, flip)).toBe('M0,100V80H1V100ZM2,100V90H3V100Z');
  });
});

describe('pValueText', () => {
  it('writes p below 1e-4 as "< 1e-4" and others with three significant digits', () => {
    expect(pValueText(0.00004)).toBe('< 1e-4');
    expect(pValueText(0.0001)).toBe('0.0001');
    expect(pValueText(0.123456)).toBe('0.123');
    expect(pValueText(Number.NaN)).toBe('—');
  });
});
