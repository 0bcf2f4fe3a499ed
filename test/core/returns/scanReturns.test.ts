import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { scanReturns, ScanCancelled } from '../../../src/core/returns/scanReturns';

/** R_n(i) straight from the definition; -(N - n - i + 1) when no later occurrence exists. */
function bruteForward(x: ArrayLike<number>, n: number): number[] {
  const N = x.length;
  const out: number[] = [];
  for (let i = 0; i + n <= N; i++) {
    let r = -(N - n - i + 1);
    for (let j = 1; i + j + n <= N; j++) {
      let same = true;
      for (let t = 0; t < n && same; t++) same = x[i + t] === x[i + j + t];
      if (same) {
        r = j;
        break;
      }
    }
    out.push(r);
  }
  return out;
}

function forwardFromPaths(scan: ReturnType<typeof scanReturns>, n: number): number[] {
  const { positions, forward, maxN } = scan.paths;
  const out: number[] = [];
  for (let s = 0; s < positions.length; s++) {
    const p = positions[s]!;
    if (p <= scan.length - n) out.push(forward[s * maxN + n - 1]!);
  }
  return out;
}

const sequences = fc.oneof(
  { weight: 6, arbitrary: fc.integer({ min: 1, max: 5 }).chain((a) => fc.array(fc.integer({ min: 0, max: a - 1 }), { minLength: 1, maxLength: 300 }).map((xs) => ({ a, xs }))) },
  // periodic and constant sequences: every block recurs at the period
  { weight: 2, arbitrary: fc.tuple(fc.array(fc.integer({ min: 0, max: 2 }), { minLength: 1, maxLength: 7 }), fc.integer({ min: 1, max: 200 })).map(([motif, len]) => ({ a: 3, xs: Array.from({ length: len }, (_, i) => motif[i % motif.length]!) })) },
);

describe('scanReturns', () => {
  it('gives the published small example: "abracadabra" forward returns at n = 1 and n = 4', () => {
    // source: THEORY.md section 9 [calc], checked by hand from the definition of R_n
    const text = 'abracadabra';
    const ids = new Map<string, number>();
    const x = Uint8Array.from([...text].map((c) => (ids.has(c) ? ids.get(c)! : (ids.set(c, ids.size), ids.size - 1))));
    const scan = scanReturns(x, ids.size, { maxN: 4, sampleTarget: x.length });
    expect(forwardFromPaths(scan, 1)).toEqual([3, 7, 7, 2, -7, 2, -5, 3, -3, -2, -1]);
    expect(forwardFromPaths(scan, 4)).toEqual([7, -7, -6, -5, -4, -3, -2, -1]);
  });

  it('equals the brute-force definition of R_n, censoring included, on random, periodic and constant sequences', () => {
    fc.assert(
      fc.property(sequences, fc.integer({ min: 1, max: 12 }), ({ a, xs }, nWanted) => {
        const x = Uint8Array.from(xs);
        const maxN = Math.min(nWanted, x.length);
        const scan = scanReturns(x, a, { maxN, sampleTarget: x.length });
        for (let n = 1; n <= maxN; n++) expect(forwardFromPaths(scan, n)).toEqual(bruteForward(xs, n));
        const captured = scanReturns(x, a, { maxN, captureLevel: maxN }).captured!;
        expect(Array.from(captured)).toEqual(bruteForward(xs, maxN));
      }),
      { numRuns: 2000, seed: 20261201 },
    );
  });

  it('counts distinct blocks, singletons and the plug-in sum c log c like a direct tally', () => {
    fc.assert(
      fc.property(sequences, ({ a, xs }) => {
        const x = Uint8Array.from(xs);
        const maxN = Math.min(8, x.length);
        const scan = scanReturns(x, a, { maxN });
        for (let n = 1; n <= maxN; n++) {
          const tally = new Map<string, number>();
          for (let i = 0; i + n <= xs.length; i++) {
            const key = xs.slice(i, i + n).join(',');
            tally.set(key, (tally.get(key) ?? 0) + 1);
          }
          const level = scan.levels[n - 1]!;
          const counts = [...tally.values()];
          expect(level.positions).toBe(xs.length - n + 1);
          expect(level.distinctBlocks).toBe(tally.size);
          expect(level.singletons).toBe(counts.filter((c) => c === 1).length);
          expect(level.sumCountLogCount).toBeCloseTo(counts.reduce((s, c) => s + c * Math.log(c), 0), 9);
        }
      }),
      { numRuns: 500, seed: 7 },
    );
  });

  it('widens to 16- and 32-bit symbol arrays without changing the answer', () => {
    const xs = Array.from({ length: 400 }, (_, i) => (i * 7919) % 13);
    const small = scanReturns(Uint8Array.from(xs), 13, { maxN: 6, sampleTarget: 400 });
    const wide = scanReturns(Int32Array.from(xs.map((v) => v * 100000)), 1_300_001, { maxN: 6, sampleTarget: 400 });
    expect(Array.from(wide.paths.forward)).toEqual(Array.from(small.paths.forward));
  });

  it('reports each level as it finishes and stops when asked', () => {
    const x = Uint8Array.from({ length: 5000 }, (_, i) => (i * i) % 3);
    const seen: number[] = [];
    scanReturns(x, 3, { maxN: 5, onLevel: (level) => seen.push(level.n) });
    expect(seen).toEqual([1, 2, 3, 4, 5]);
    let calls = 0;
    expect(() => scanReturns(x, 3, { maxN: 5, shouldStop: () => ++calls > 2 })).toThrow(ScanCancelled);
  });

  it('rejects a block length of 0 or beyond the data with the bad value in the message', () => {
    const x = Uint8Array.from([0, 1, 0]);
    expect(() => scanReturns(x, 2, { maxN: 0 })).toThrow(/got 0/);
    expect(() => scanReturns(x, 2, { maxN: 4 })).toThrow(/got 4/);
  });
});
