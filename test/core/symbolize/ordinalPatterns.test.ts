import { describe, expect, it } from 'vitest';
import { uniformStream } from '../../../src/core/sources/seededRandom';
import { ordinalLabel, ordinalPatterns } from '../../../src/core/symbolize/ordinalPatterns';
import { symbolizeSeries } from '../../../src/core/symbolize/symbolizeSeries';
import type { NumericSeries } from '../../../src/core/symbolize/seriesCollector';
import type { FastaRecord } from '../../../src/core/sequence/sequenceReader';

// Method: Bandt & Pompe, Phys. Rev. Lett. 88 (2002) 174102 (ordinal patterns as argsort permutations).

function labels(values: number[], order: number, delay = 1): string[] {
  return Array.from(ordinalPatterns(Float64Array.from(values), order, delay), (r) => ordinalLabel(r, order));
}

function entropyBits(counts: number[]): number {
  const total = counts.reduce((a, b) => a + b, 0);
  return -counts.reduce((s, c) => (c === 0 ? s : s + (c / total) * Math.log2(c / total)), 0);
}

function tally(items: string[]): Record<string, number> {
  const out: Record<string, number> = {};
  for (const x of items) out[x] = (out[x] ?? 0) + 1;
  return out;
}

describe('ordinalPatterns', () => {
  const x = [4, 7, 9, 10, 6, 11, 3];

  it('order 2 of the worked example gives 4 up, 2 down, 0.918295834 bits', () => {
    // [calc] THEORY.md section 8
    const got = tally(labels(x, 2));
    expect(got).toEqual({ '01': 4, '10': 2 });
    expect(entropyBits(Object.values(got))).toBeCloseTo(0.918295834, 8);
  });

  it('order 3 of the worked example gives 012 x2, 201 x2, 102 x1, 1.521928095 bits', () => {
    // [calc] THEORY.md section 8
    expect(labels(x, 3)).toEqual(['012', '012', '201', '102', '201']);
    const got = tally(labels(x, 3));
    expect(entropyBits(Object.values(got))).toBeCloseTo(1.521928095, 8);
  });

  it('ranks permutations lexicographically and labels them by their digits', () => {
    // The 6 permutations of 3 in lexicographic order (definition of the Lehmer code; common practice, no source).
    expect([0, 1, 2, 3, 4, 5].map((r) => ordinalLabel(r, 3))).toEqual(['012', '021', '102', '120', '201', '210']);
    expect(labels([3, 2, 1], 3)).toEqual(['210']);
    expect(labels([1, 3, 2], 3)).toEqual(['021']);
    expect(ordinalLabel(40319, 8)).toBe('76543210');
  });

  it('breaks ties by order of occurrence: the earlier of two equal values ranks lower', () => {
    // The stated tie rule (a stable argsort), checked by hand.
    expect(labels([5, 5, 5], 3)).toEqual(['012']);
    expect(labels([2, 1, 1], 3)).toEqual(['120']);
    expect(labels([1, 1, 0], 3)).toEqual(['201']);
  });

  it('uses the delay tau between the window elements', () => {
    // x_t, x_{t+2}: (4,9) up, (7,10) up, (9,6) down, (10,11) up, (6,3) down, by hand.
    expect(labels(x, 2, 2)).toEqual(['01', '01', '10', '01', '10']);
    expect(labels([1, 2], 3)).toEqual([]);
  });

  it('rejects orders outside 2..8 and delays below 1', () => {
    expect(() => ordinalPatterns(new Float64Array(10), 1, 1)).toThrow(RangeError);
    expect(() => ordinalPatterns(new Float64Array(10), 9, 1)).toThrow(RangeError);
    expect(() => ordinalPatterns(new Float64Array(10), 3, 0)).toThrow(RangeError);
  });

  it('the logistic map x -> 4x(1-x) at order 3 never shows 210 and shows the others at 1/3, 1/15, 2/15, 1/5, 4/15', () => {
    // Forbidden pattern: Amigó, Zambrano & Sanjuán, EPL 79 (2007) 50001. Frequencies: [calc] THEORY.md
    // section 8. Orbits are exact in law: x_t = sin^2(pi y_t) with y_t = 0.b_t b_(t+1) ... b_(t+51),
    // fair coin bits b (the conjugacy of the logistic map with the doubling map), so no floating-point
    // iteration of the map is involved. Each sample is an independent triple (x_0, x_1, x_2), so the
    // pattern counts are multinomial and the binomial standard error is exact; tolerance 4 SE.
    const samples = 60000;
    const bitsPerPoint = 52;
    const rand = uniformStream(20261201);
    const values = new Float64Array(3 * samples);
    const segments: FastaRecord[] = [];
    const bits = new Uint8Array(bitsPerPoint + 2);
    for (let s = 0; s < samples; s++) {
      for (let k = 0; k < bits.length; k++) bits[k] = rand.next() < 0.5 ? 0 : 1;
      for (let t = 0; t < 3; t++) {
        let y = 0;
        for (let k = bitsPerPoint - 1; k >= 0; k--) y = (y + (bits[t + k] ?? 0)) / 2;
        values[3 * s + t] = Math.sin(Math.PI * y) ** 2;
      }
      segments.push({ name: `sample ${s}`, start: 3 * s, length: 3 });
    }
    const series: NumericSeries = { values, segments, missing: 0, missingPolicy: 'split', firstMissingLine: 0 };
    const { record } = symbolizeSeries(series, { kind: 'ordinal', order: 3, delay: 1 });
    const counts = Object.fromEntries(record.cells.map((c) => [c.label, c.count]));
    expect(counts['210']).toBe(0);
    const expected: Record<string, number> = { '012': 1 / 3, '021': 1 / 15, '102': 2 / 15, '120': 1 / 5, '201': 4 / 15 };
    for (const [label, p] of Object.entries(expected)) {
      const se = Math.sqrt((p * (1 - p)) / samples);
      expect(Math.abs((counts[label] ?? 0) / samples - p), label).toBeLessThan(4 * se);
    }
    expect(record.segments).toBe(samples);
  });
});
