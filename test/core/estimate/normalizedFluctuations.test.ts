import { describe, expect, it } from 'vitest';
import { normalizedFluctuations } from '../../../src/core/estimate/normalizedFluctuations';

// Bernoulli(0.3): h = 0.610864302055 nats, sigma^2 = 0.150761869486 (THEORY.md section 2 [calc],
// sigma^2 = p(1-p) log^2(p/(1-p)))
const H = 0.610864302055;
const SIGMA = Math.sqrt(0.150761869486);

describe('normalizedFluctuations', () => {
  it('centres by n h and scales by sigma sqrt(n), skipping missing values', () => {
    // source: by hand from the definition (log R_n - n h)/(sigma sqrt n)
    const n = 9;
    const logR = [5.5, Number.NaN, 4.0, 7.25];
    const out = normalizedFluctuations(logR, [0, 10, 20, 30], n, H, SIGMA);
    const z = (v: number) => (v - 9 * 0.610864302055) / (Math.sqrt(0.150761869486) * 3);
    expect(Array.from(out.values)).toEqual([z(5.5), z(4.0), z(7.25)].map((v) => expect.closeTo(v, 13)));
    expect(Array.from(out.positions)).toEqual([0, 20, 30]);
    expect(out.missing).toBe(1);
    expect(out.thinned).toBe(0);
  });

  it('keeps positions at least gap apart, greedily from the first with a value', () => {
    // source: by hand: positions 3, 5, 8, 9, 14, 15 with gap 5 (5 is missing): keep 3, 8, 14
    const logR = [1, Number.NaN, 1, 1, 1, 1];
    const out = normalizedFluctuations(logR, [3, 5, 8, 9, 14, 15], 1, 0, 1, 5);
    expect(Array.from(out.positions)).toEqual([3, 8, 14]);
    expect(out.missing).toBe(1);
    expect(out.thinned).toBe(2);
    expect(out.values.length + out.missing + out.thinned).toBe(6);
  });

  it('accepts typed arrays and an empty sample', () => {
    const out = normalizedFluctuations(new Float64Array(0), new Int32Array(0), 4, H, SIGMA, 3);
    expect(out.values.length).toBe(0);
  });

  it('rejects bad parameters with the bad value in the message', () => {
    const ok = [[1], [0]] as const;
    expect(() => normalizedFluctuations(...ok, 4, H, 0)).toThrow(/sigma.*0/);
    expect(() => normalizedFluctuations(...ok, 4, H, -1)).toThrow(RangeError);
    expect(() => normalizedFluctuations(...ok, 4, H, Number.NaN)).toThrow(RangeError);
    expect(() => normalizedFluctuations(...ok, 4, H, SIGMA, 0)).toThrow(/gap.*0/);
    expect(() => normalizedFluctuations(...ok, 4, H, SIGMA, 1.5)).toThrow(RangeError);
    expect(() => normalizedFluctuations(...ok, 0, H, SIGMA)).toThrow(/n must/);
    expect(() => normalizedFluctuations(...ok, 4, Infinity, SIGMA)).toThrow(RangeError);
    expect(() => normalizedFluctuations([1, 2], [0], 4, H, SIGMA)).toThrow(/same length/);
    expect(() => normalizedFluctuations([1, 2], [5, 5], 4, H, SIGMA)).toThrow(/increasing/);
    expect(() => normalizedFluctuations([Infinity], [0], 4, H, SIGMA)).toThrow(RangeError);
  });
});
