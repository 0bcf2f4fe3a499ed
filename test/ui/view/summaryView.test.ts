import { describe, expect, it } from 'vitest';
import { summaryView } from '../../../src/ui/view/summaryView';
import { fakeResult } from '../fixtures';

// The fixture's numbers are made up; these tests check how they are printed, not what they are.
describe('summaryView', () => {
  it('prints the headline to the precision of its interval, with the unit and confidence', () => {
    const v = summaryView(fakeResult());
    // Interval 0.6012..0.6234: half-width 0.0111 -> 3 decimals (format.ts rule).
    expect(v.entropy).toMatchObject({ value: '0.612', low: '0.601', high: '0.623', unit: 'nat/symbol', method: 'return-slope' });
    expect(v.confidenceLabel).toBe('95% interval');
    // Interval 0.1..0.2: half-width 0.05 -> 3 decimals, two significant digits of 0.050.
    expect(v.sigma2).toMatchObject({ value: '0.150', low: '0.100', high: '0.200', unit: 'nat²/symbol' });
    expect(v.lengths).toBe('n = 2 to 3');
    expect(v.inputLine).toBe('123,456 symbols · alphabet of 3 · read as tokens');
    expect(v.entropy.perSecond).toBeNull();
    expect(v.reference).toBeNull();
  });

  it('lists the alternative estimators, with a dash where there is no interval', () => {
    const rows = summaryView(fakeResult()).alternatives;
    expect(rows.map((r) => [r.key, r.estimate, r.interval, r.lengths])).toEqual([
      ['plugin', '0.600', '0.590 to 0.610', 'n = 3'],
      ['match', '0.5800', '—', '—'],
    ]);
  });

  it('shows per-second rates and the generator’s exact values when the result has them', () => {
    const base = fakeResult();
    const v = summaryView(
      fakeResult({
        entropy: { ...base.entropy, perSecond: { estimate: 61.2, ci95: [60.1, 62.3] }, perSecondUnit: 'nat/s' },
        reference: { source: 'made-up chain', entropyRate: 0.6, sigma2: 0.15 },
      }),
    );
    expect(v.entropy.perSecond).toEqual({ value: '61.2', low: '60.1', high: '62.3', unit: 'nat/s' });
    expect(v.reference).toEqual({ source: 'made-up chain', entropy: '0.600000 nat/symbol', sigma2: '0.150000 nat²/symbol' });
  });
});
