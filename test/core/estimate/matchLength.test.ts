import { describe, expect, it } from 'vitest';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { uniformInt } from 'pure-rand/distribution/uniformInt';
import { bruteScan } from '../../helpers/bruteScan';
import { matchLength } from '../../../src/core/estimate/matchLength';

/** Lambda_i = 1 + longest l <= maxN with x[i..i+l) also starting in [i - W, i - 1], from the definition. */
function lambdas(x: Uint8Array, W: number, maxN: number): number[] {
  const out: number[] = [];
  for (let i = W; i < x.length - maxN; i++) {
    let best = 0;
    for (let j = i - W; j < i; j++) {
      let l = 0;
      while (l < maxN && x[j + l] === x[i + l]) l++;
      if (l > best) best = l;
    }
    out.push(1 + best);
  }
  return out;
}

describe('matchLength', () => {
  it('equals log W over the mean of Lambda computed from the definition (Kontoyiannis et al. 1998)', () => {
    // source: sliding-window estimate [(1/m) sum Lambda_i / log W]^-1, IEEE Trans. IT 44 (1998) 1319-1327
    const rng = xoroshiro128plus(5);
    const x = new Uint8Array(1500);
    for (let i = 0; i < x.length; i++) x[i] = uniformInt(rng, 0, 3);
    const W = 200;
    const maxN = 12;
    const scan = bruteScan(x, 4, { maxN, batchLength: 16, sampleStride: 64, matchWindow: W });
    const L = lambdas(x, W, maxN);
    const mean = L.reduce((s, v) => s + v, 0) / L.length;
    const r = matchLength(scan);
    expect(scan.matchPositions).toBe(L.length);
    expect(r.estimate).toBeCloseTo(Math.log(W) / mean, 12);
    expect(r.truncated).toBe(L.some((l) => l === maxN + 1));
    expect(r.interval).toBeNull();
  });

  it('flags truncation when matches reach maxN, as on a periodic sequence', () => {
    // source: a period-3 sequence matches to any length one period back
    const x = Uint8Array.from({ length: 120 }, (_, i) => i % 3);
    const scan = bruteScan(x, 3, { maxN: 5, batchLength: 8, sampleStride: 8, matchWindow: 10 });
    const r = matchLength(scan);
    expect(r.truncated).toBe(true);
    expect(r.estimate).toBeCloseTo(Math.log(10) / 6, 12);
  });

  it('does not apply when no position lies after the window', () => {
    // source: API contract
    const x = Uint8Array.from({ length: 20 }, (_, i) => i % 2);
    const scan = bruteScan(x, 2, { maxN: 5, batchLength: 4, sampleStride: 4, matchWindow: 15 });
    expect(matchLength(scan).estimate).toBeNull();
  });
});
