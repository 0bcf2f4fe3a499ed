import { describe, expect, it } from 'vitest';
import { uniformStream } from '../../../src/core/sources/seededRandom';
import { cellsByCuts } from '../../../src/core/symbolize/cellsByCuts';
import { quantileCuts } from '../../../src/core/symbolize/quantileCuts';
import type { NumericSeries } from '../../../src/core/symbolize/seriesCollector';
import { symbolizeSeries } from '../../../src/core/symbolize/symbolizeSeries';

function series(values: number[], segments?: [number, number][]): NumericSeries {
  return {
    values: Float64Array.from(values),
    segments: (segments ?? [[0, values.length]]).map(([start, length], k) => ({ name: `segment ${k + 1}`, start, length })),
    missing: segments === undefined ? 0 : segments.length - 1,
    missingPolicy: segments === undefined ? 'skip' : 'split',
    firstMissingLine: 0,
  };
}

describe('quantileCuts and cellsByCuts', () => {
  it('cuts 8 distinct values into 4 cells of 2 at the order statistics x_(3), x_(5), x_(7)', () => {
    // By hand from the stated definition c_j = sorted[floor(jN/K)]: N = 8, K = 4 -> indices 2, 4, 6.
    const v = Float64Array.from([0.3, 5, -1, 2.5, 7, 1, 4, 6]);
    expect(Array.from(quantileCuts(v, 4))).toEqual([1, 4, 6]);
    expect(Array.from(cellsByCuts(v, quantileCuts(v, 4)))).toEqual([0, 2, 0, 1, 3, 1, 2, 3]);
  });

  it('gives cells of floor or ceil N/K values when K does not divide N', () => {
    // N = 7, K = 3: indices floor(7/3) = 2, floor(14/3) = 4 -> cells of 2, 2, 3 (by hand).
    const v = Float64Array.from([7, 6, 5, 4, 3, 2, 1]);
    expect(Array.from(quantileCuts(v, 3))).toEqual([3, 5]);
    expect(Array.from(cellsByCuts(v, Float64Array.from([3, 5])))).toEqual([2, 2, 2, 1, 1, 0, 0]);
  });

  it('puts a value equal to a cut point into the cell above it', () => {
    // The stated rule: cell = number of cut points <= v.
    expect(Array.from(cellsByCuts(Float64Array.from([0.49, 0.5, 1.19, 1.2, 9]), Float64Array.from([0.5, 1.2])))).toEqual([0, 1, 1, 2, 2]);
  });

  it('leaves the cells between tied cut points empty', () => {
    // 6 values, 4 of them equal: K = 3 -> indices 2, 4 -> both cuts are 1 (by hand).
    const s = symbolizeSeries(series([0, 1, 1, 1, 1, 2]), { kind: 'quantile', cells: 3 });
    expect(s.record.cutPoints).toEqual([1, 1]);
    expect(s.record.cells).toEqual([
      { label: 'q1', count: 1 },
      { label: 'q2', count: 0 },
      { label: 'q3', count: 5 },
    ]);
    expect(s.sequence.alphabet).toEqual(['q1', 'q3']);
  });
});

describe('symbolizeSeries', () => {
  it('threshold cells get half-open interval labels and ids in cell order', () => {
    // By hand: < 0.5 -> 0, [0.5, 1.2) -> 1, >= 1.2 -> 2.
    const s = symbolizeSeries(series([1.5, 0.1, 0.5, 0.7, 2]), { kind: 'threshold', cuts: [0.5, 1.2] });
    expect(s.sequence.alphabet).toEqual(['<0.5', '[0.5,1.2)', '>=1.2']);
    expect(Array.from(s.sequence.symbols)).toEqual([2, 0, 1, 1, 2]);
    expect(Array.from(s.sequence.counts)).toEqual([1, 2, 2]);
    expect(s.record.spec).toBe('threshold:0.5,1.2');
    expect(s.record.cutPoints).toEqual([0.5, 1.2]);
  });

  it('ordinal patterns never span a cut between segments', () => {
    // Segments (4, 7, 9) and (10, 6, 11, 3): order 3 gives 012 | 201, 102 -> 3 patterns, by hand.
    const s = symbolizeSeries(series([4, 7, 9, 10, 6, 11, 3], [[0, 3], [3, 4]]), { kind: 'ordinal', order: 3, delay: 1 });
    expect(s.sequence.symbols.length).toBe(3);
    expect(Array.from(s.sequence.symbols, (id) => s.sequence.alphabet[id])).toEqual(['012', '102', '201']);
    expect(s.records.map((r) => [r.start, r.length])).toEqual([[0, 1], [1, 2]]);
    expect(s.record.segments).toBe(2);
  });

  it('leaves out segments too short for one pattern and counts them', () => {
    const s = symbolizeSeries(series([1, 2, 3, 4, 5, 6], [[0, 2], [2, 4]]), { kind: 'ordinal', order: 3, delay: 1 });
    expect(s.record.segmentsDropped).toBe(1);
    expect(s.records).toEqual([{ name: 'segment 2', start: 0, length: 2 }]);
    expect(() => symbolizeSeries(series([1, 2]), { kind: 'ordinal', order: 3, delay: 1 })).toThrow(/the series holds 2 values, but one ordinal pattern of order 3 with delay 1 needs 3 values/);
  });

  it('quantile:2 on a Gaussian AR(1) with phi = 0.5 keeps the same symbol on consecutive values with probability 2/3', () => {
    // P(same side of the median) = 1/2 + arcsin(phi)/pi = 2/3 for phi = 0.5 (Sheppard's formula,
    // from memory; [mem] THEORY.md section 8). Pairs (x_0, x_1) of the stationary AR(1) are drawn
    // independently and laid end to end, so the within-pair agreements are independent Bernoulli
    // trials and the binomial standard error holds; the median is estimated from all values, which
    // moves P(same) only at second order (the median is its stationary point by symmetry). 4 SE.
    const pairs = 50000;
    const phi = 0.5;
    const rand = uniformStream(7);
    const gauss = (): number => Math.sqrt(-2 * Math.log(rand.nextPositive())) * Math.cos(2 * Math.PI * rand.next());
    const v = new Float64Array(2 * pairs);
    for (let i = 0; i < pairs; i++) {
      const x0 = gauss();
      v[2 * i] = x0;
      v[2 * i + 1] = phi * x0 + Math.sqrt(1 - phi * phi) * gauss();
    }
    const s = symbolizeSeries({ values: v, segments: [{ name: 'series', start: 0, length: v.length }], missing: 0, missingPolicy: 'skip', firstMissingLine: 0 }, { kind: 'quantile', cells: 2 });
    let same = 0;
    for (let i = 0; i < pairs; i++) if (s.sequence.symbols[2 * i] === s.sequence.symbols[2 * i + 1]) same++;
    const p = 2 / 3;
    expect(Math.abs(same / pairs - p)).toBeLessThan(4 * Math.sqrt((p * (1 - p)) / pairs));
    expect(s.record.cells.map((c) => c.count)).toEqual([pairs, pairs]);
  });
});

describe('longestSegment', () => {
  it('picks the longest segment (the first among equals) as a view with its own counts', async () => {
    const { longestSegment } = await import('../../../src/core/symbolize/longestSegment');
    const s = symbolizeSeries(series([1, 2, 3, 4, 5, 6, 7], [[0, 2], [2, 3], [5, 2]]), { kind: 'threshold', cuts: [3.5] });
    const best = longestSegment(s.sequence, s.records);
    expect(best?.record.name).toBe('segment 2');
    // Values 3, 4, 5 against the cut 3.5: one below, two above (by hand).
    expect(Array.from(best?.sequence.counts ?? [])).toEqual([1, 2]);
    expect(longestSegment(s.sequence, [])).toBeNull();
  });
});
