import { describe, expect, it } from 'vitest';
import {
  CONTINUED_FRACTION_ENTROPY,
  continuedFractionDigitProbability,
  continuedFractionSource,
  gaussKuzminProbability,
} from '../../../src/core/sources/continuedFractionSource';

describe('continuedFractionSource facts', () => {
  it('states h = pi^2/(6 ln 2) and sigma^2 = 3.44858814952674 with a Gaussian limit', () => {
    const { facts, id } = continuedFractionSource();
    expect(id).toBe('cf');
    // h = 2.37313822083125 nats, THEORY.md section 4 [pub]
    expect(facts.entropyRate).toBeCloseTo(2.37313822083125, 13);
    expect(CONTINUED_FRACTION_ENTROPY).toBe(facts.entropyRate);
    // THEORY.md section 4 [calc: second derivative of the pressure]
    expect(facts.sigma2).toBe(3.44858814952674);
    expect(facts.gaussianLimit).toBe(true);
  });
});

describe('gaussKuzminProbability', () => {
  it('matches THEORY.md section 4 for k = 1, 2, 3, 10', () => {
    // Gauss-Kuzmin values, THEORY.md section 4 [pub]
    expect(gaussKuzminProbability(1)).toBeCloseTo(0.415037499279, 12);
    expect(gaussKuzminProbability(2)).toBeCloseTo(0.169925001442, 12);
    expect(gaussKuzminProbability(3)).toBeCloseTo(0.0931094043915, 12);
    expect(gaussKuzminProbability(10)).toBeCloseTo(0.0119726416661, 12);
    expect(() => gaussKuzminProbability(0)).toThrow(RangeError);
  });

  it('is the conditional digit law averaged over the Gauss density of the past', () => {
    // integral_0^1 P(a = k | s) / ((1 + s) ln 2) ds by Simpson's rule, 2000 panels.
    for (const k of [1, 2, 7]) {
      const m = 2000;
      let integral = 0;
      for (let i = 0; i <= m; i++) {
        const s = i / m;
        const w = i === 0 || i === m ? 1 : i % 2 === 1 ? 4 : 2;
        integral += (w * continuedFractionDigitProbability(k, s)) / ((1 + s) * Math.LN2);
      }
      expect(integral / (3 * m)).toBeCloseTo(gaussKuzminProbability(k), 12);
    }
  });
});

describe('continuedFractionDigitProbability', () => {
  it('sums to 1 over all digits for any past (telescoping: sum up to K is (1+s)(1/(1+s) - 1/(K+1+s)))', () => {
    for (const s of [0, 0.3, 0.999]) {
      let total = 0;
      for (let k = 1; k <= 100_000; k++) total += continuedFractionDigitProbability(k, s);
      expect(total).toBeCloseTo(1 - (1 + s) / (100_001 + s), 12);
    }
  });
});

describe('continuedFractionSource generation', () => {
  it('labels symbols by digit value, ids in increasing value', () => {
    const seq = continuedFractionSource().generate(10_000, 1);
    const values = seq.alphabet.map(Number);
    for (const v of values) expect(Number.isInteger(v) && v >= 1).toBe(true);
    for (let k = 1; k < values.length; k++) expect(values[k]!).toBeGreaterThan(values[k - 1]!);
    expect(seq.alphabet[0]).toBe('1');
    expect(seq.counts.reduce((a, b) => a + b, 0)).toBe(10_000);
    for (let k = 0; k < seq.alphabet.length; k++) expect(seq.counts[k]).toBeGreaterThan(0);
  });

  it('uses the narrowest symbol array for the digits that occur', () => {
    expect(continuedFractionSource().generate(50, 2).symbols).toBeInstanceOf(Uint8Array);
    expect(continuedFractionSource().generate(400_000, 2).symbols).toBeInstanceOf(Uint16Array);
  });

  it('is reproducible and gives the same digits whatever the requested detail', () => {
    const source = continuedFractionSource();
    const a = source.generate(5000, 3);
    const b = source.generateDetailed!(5000, 3);
    expect(Array.from(b.sequence.symbols)).toEqual(Array.from(a.symbols));
    expect(b.sequence.alphabet).toEqual(a.alphabet);
    expect(b.warnings).toEqual([]);
  });

  it('gives information -log P(a_t | past) that is positive and finite', () => {
    const { information } = continuedFractionSource().generateDetailed!(1000, 4);
    for (const x of information) expect(x > 0 && Number.isFinite(x)).toBe(true);
  });
});
