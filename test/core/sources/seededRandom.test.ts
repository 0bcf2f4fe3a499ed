import { describe, expect, it } from 'vitest';
import { UniformStream, seededRandom, uniformStream } from '../../../src/core/sources/seededRandom';

describe('seededRandom', () => {
  it('gives the same stream for the same seed and unrelated streams for neighbouring seeds', () => {
    const a = seededRandom(5);
    const b = seededRandom(5);
    const c = seededRandom(6);
    const xs = Array.from({ length: 8 }, () => a.next());
    expect(Array.from({ length: 8 }, () => b.next())).toEqual(xs);
    const ys = Array.from({ length: 8 }, () => c.next());
    for (let k = 0; k < 8; k++) expect(ys[k]).not.toBe(xs[k]);
  });

  it('uses both 32-bit halves of a large seed', () => {
    const lo = seededRandom(3).next();
    const hi = seededRandom(3 + 2 ** 32).next();
    expect(hi).not.toBe(lo);
  });

  it('rejects seeds that are not safe integers', () => {
    expect(() => seededRandom(1.5)).toThrow(RangeError);
    expect(() => seededRandom(Number.NaN)).toThrow(/seed/);
    expect(() => seededRandom(2 ** 60)).toThrow(RangeError);
  });
});

describe('UniformStream', () => {
  it('returns multiples of 2^-53 in [0, 1), and nextPositive values in (0, 1]', () => {
    const uniforms = uniformStream(1);
    let bad = 0;
    for (let k = 0; k < 10_000; k++) {
      const u = uniforms.next();
      if (!(u >= 0 && u < 1 && Number.isInteger(u * 2 ** 53))) bad++;
      const v = uniforms.nextPositive();
      if (!(v > 0 && v <= 1)) bad++;
    }
    expect(bad).toBe(0);
  });

  it('has mean 1/2 and variance 1/12 within 4 standard errors', () => {
    const uniforms = uniformStream(2);
    const n = 200_000;
    let s = 0;
    let s2 = 0;
    for (let k = 0; k < n; k++) {
      const u = uniforms.next();
      s += u;
      s2 += (u - 0.5) ** 2;
    }
    // Uniform law: mean 1/2, variance 1/12, Var((U - 1/2)^2) = 1/80 - 1/144 (from memory).
    expect(Math.abs(s / n - 0.5)).toBeLessThan(4 * Math.sqrt(1 / 12 / n));
    expect(Math.abs(s2 / n - 1 / 12)).toBeLessThan(4 * Math.sqrt((1 / 80 - 1 / 144) / n));
  });

  it('builds each uniform from the high bits of two generator outputs, in order across refills', () => {
    const rng = seededRandom(3);
    const uniforms = new UniformStream(seededRandom(3));
    for (let k = 0; k < 3000; k++) {
      const a = rng.next() >>> 5;
      const b = rng.next() >>> 6;
      // genrand_res53: (a 2^26 + b) / 2^53 (Matsumoto & Nishimura 1998, from memory)
      expect(uniforms.next()).toBe((a * 2 ** 26 + b) / 2 ** 53);
    }
  });
});
