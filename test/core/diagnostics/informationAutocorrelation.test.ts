import { describe, expect, test } from 'vitest';
import { informationAutocorrelation, informationOrderFor } from '../../../src/core/diagnostics/informationAutocorrelation';
import { iidSource } from '../../../src/core/sources/iidSource';
import { markovSource } from '../../../src/core/sources/markovSource';

describe('informationAutocorrelation', () => {
  test('i.i.d. increments stay inside the +-1.96/sqrt(n) band at almost every lag', () => {
    const seq = iidSource([0.5, 0.3, 0.2]).generate(200_000, 17);
    const r = informationAutocorrelation(seq.symbols, 3, 2);
    expect(r).not.toBeNull();
    if (r === null) return;
    expect(r.lags.length).toBe(50);
    expect(r.band).toBeCloseTo(1.959963984540054 / Math.sqrt(200_000 - 1), 12);
    // Under white noise each lag falls outside with probability 0.05: 2.5 expected among 50, and
    // P(Binomial(50, 0.05) >= 8) = 0.0032, so more than 7 would be a failure of the estimator.
    expect(r.expectedOutside).toBeCloseTo(2.5, 12);
    expect(r.outside).toBeLessThanOrEqual(7);
    for (const a of r.acf) expect(Math.abs(a)).toBeLessThan(2 * r.band);
  });

  test('a two-state chain at k = 1 has ACF lambda^l, lambda = 1 - a - b', () => {
    // For any non-constant function f of a two-state chain, Corr(f(X_0), f(X_l)) = lambda^l with
    // lambda the second eigenvalue 1 - a - b (spectral decomposition of P, from memory); the
    // information -log p(x) at k = 1 is such a function. P = [[0.9, 0.1], [0.4, 0.6]]: lambda = 0.5.
    const seq = markovSource([
      [0.9, 0.1],
      [0.4, 0.6],
    ]).generate(400_000, 23);
    const r = informationAutocorrelation(seq.symbols, 2, 1, 5);
    expect(r).not.toBeNull();
    if (r === null) return;
    // Bartlett's variance of r(l) for an AR(1)-like ACF is below (1 + lambda^2)/(1 - lambda^2)/n
    // = 1.67/n: 5 standard errors = 5 sqrt(1.67/n).
    const tolerance = 5 * Math.sqrt(1.67 / r.positions);
    r.acf.forEach((a, i) => expect(Math.abs(a - Math.pow(0.5, i + 1))).toBeLessThan(tolerance));
  });

  test('the mean increment is the plug-in conditional entropy', () => {
    // Over all positions sum_t Y_t = sum over k-blocks c log(c_prefix / c), the plug-in
    // H_k - H_(k-1) up to the end effect of the last (k-1)-block; here k = 1: H_1 exactly.
    const seq = iidSource([0.25, 0.75]).generate(50_000, 3);
    const r = informationAutocorrelation(seq.symbols, 2, 1);
    const ones = (seq.counts[1] ?? Number.NaN) / 50_000;
    const h1 = -(ones * Math.log(ones) + (1 - ones) * Math.log(1 - ones));
    expect(r?.meanNats).toBeCloseTo(h1, 12);
  });

  test('lowers k until A^k fits the count table', () => {
    expect(informationOrderFor(2, 5)).toBe(5);
    expect(informationOrderFor(5000, 3)).toBe(1);
    expect(informationOrderFor(1000, 2)).toBe(2);
  });
});
