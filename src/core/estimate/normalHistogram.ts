import normalCdf from '@stdlib/stats-base-dists-normal-cdf';
import { sortedFinite } from './sortedFinite';

/** Bin-width rules. */
export type BinRule = 'freedman-diaconis' | 'scott';

/** Equal-width histogram of a sample with the N(0,1) law scaled to counts. */
export interface NormalHistogram {
  readonly size: number;
  /** The rule actually used ('scott' when the interquartile range is 0). */
  readonly rule: BinRule;
  readonly binWidth: number;
  /** Bin edges, length bins + 1; bin k is [edges[k], edges[k+1]), the last one closed. */
  readonly edges: Float64Array;
  readonly counts: Float64Array;
  readonly centres: Float64Array;
  /** m * (Phi(right edge) - Phi(left edge)): expected count per bin under N(0,1). */
  readonly expected: Float64Array;
  /** m * width * phi(centre): the N(0,1) density at each bin centre on the count scale. */
  readonly densityAtCentres: Float64Array;
  /** A smooth curve m * width * phi(x), x evenly spaced over [min(edges[0], -4), max(last edge, 4)]. */
  readonly curveX: Float64Array;
  readonly curveY: Float64Array;
}

/** Options of normalHistogram. */
export interface NormalHistogramOptions {
  /** Default 'freedman-diaconis'. */
  readonly rule?: BinRule;
  /** Upper limit on the number of bins (>= 1); default 200. */
  readonly maxBins?: number;
  /** Points of the density curve (>= 2); default 201. */
  readonly curvePoints?: number;
}

const INV_SQRT_2PI = 1 / Math.sqrt(2 * Math.PI);

/** Quantile of a sorted sample by linear interpolation (Hyndman & Fan, Am. Stat. 50 (1996), type 7). */
function quantileSorted(x: Float64Array, p: number): number {
  const h = (x.length - 1) * p;
  const lo = Math.floor(h);
  return lo + 1 < x.length ? x[lo] + (h - lo) * (x[lo + 1] - x[lo]) : x[lo];
}

/**
 * Histogram of (normalized) values with the N(0,1) law for comparison.
 * Bin width: Freedman & Diaconis, Z. Wahrsch. verw. Gebiete 57 (1981) 453-476: 2 IQR m^(-1/3); or
 * Scott, Biometrika 66 (1979) 605-610: 3.49 s m^(-1/3) with s the sample standard deviation
 * (divisor m - 1). Freedman-Diaconis falls back to Scott when the IQR is 0. The bin count is
 * ceil(range / width) (as in d3-array's threshold rules), at least 1 and at most maxBins (wider
 * bins then); bins start at the smallest value. A sample of equal values gets one bin of width 1
 * centred on them.
 * @param sample finite values (not modified)
 * @throws RangeError when the sample is empty or not finite, or options are out of range
 */
export function normalHistogram(sample: ArrayLike<number>, options: NormalHistogramOptions = {}): NormalHistogram {
  const maxBins = options.maxBins ?? 200;
  const curvePoints = options.curvePoints ?? 201;
  let rule: BinRule = options.rule ?? 'freedman-diaconis';
  if (rule !== 'freedman-diaconis' && rule !== 'scott') throw new RangeError(`rule must be 'freedman-diaconis' or 'scott'; got ${String(rule)}`);
  if (!Number.isInteger(maxBins) || maxBins < 1) throw new RangeError(`maxBins must be a positive integer; got ${maxBins}`);
  if (!Number.isInteger(curvePoints) || curvePoints < 2) throw new RangeError(`curvePoints must be an integer >= 2; got ${curvePoints}`);
  const x = sortedFinite(sample);
  const m = x.length;
  const min = x[0];
  const max = x[m - 1];
  const range = max - min;
  let width: number;
  let bins: number;
  let start: number;
  if (range === 0) {
    width = 1;
    bins = 1;
    start = min - 0.5;
  } else {
    width = rule === 'freedman-diaconis' ? 2 * (quantileSorted(x, 0.75) - quantileSorted(x, 0.25)) * Math.cbrt(1 / m) : 0;
    if (!(width > 0)) {
      rule = 'scott';
      let mean = 0;
      for (let i = 0; i < m; i++) mean += x[i];
      mean /= m;
      let ss = 0;
      for (let i = 0; i < m; i++) ss += (x[i] - mean) ** 2;
      width = 3.49 * Math.sqrt(ss / Math.max(1, m - 1)) * Math.cbrt(1 / m);
    }
    bins = Math.min(maxBins, Math.max(1, Math.ceil(range / width)));
    width = Math.max(width, range / bins);
    start = min;
  }
  const edges = new Float64Array(bins + 1);
  for (let k = 0; k <= bins; k++) edges[k] = start + k * width;
  const counts = new Float64Array(bins);
  for (let i = 0; i < m; i++) {
    const k = Math.min(bins - 1, Math.floor((x[i] - start) / width));
    counts[k]++;
  }
  const centres = new Float64Array(bins);
  const expected = new Float64Array(bins);
  const densityAtCentres = new Float64Array(bins);
  for (let k = 0; k < bins; k++) {
    const c = start + (k + 0.5) * width;
    centres[k] = c;
    expected[k] = m * (normalCdf(edges[k + 1], 0, 1) - normalCdf(edges[k], 0, 1));
    densityAtCentres[k] = m * width * INV_SQRT_2PI * Math.exp(-0.5 * c * c);
  }
  const from = Math.min(edges[0], -4);
  const to = Math.max(edges[bins], 4);
  const curveX = new Float64Array(curvePoints);
  const curveY = new Float64Array(curvePoints);
  for (let j = 0; j < curvePoints; j++) {
    const t = from + ((to - from) * j) / (curvePoints - 1);
    curveX[j] = t;
    curveY[j] = m * width * INV_SQRT_2PI * Math.exp(-0.5 * t * t);
  }
  return { size: m, rule, binWidth: width, edges, counts, centres, expected, densityAtCentres, curveX, curveY };
}
