import betaQuantile from '@stdlib/stats-base-dists-beta-quantile';
import normalCdf from '@stdlib/stats-base-dists-normal-cdf';
import normalQuantile from '@stdlib/stats-base-dists-normal-quantile';
import { sortedFinite } from './sortedFinite';

/** Points of a normal Q-Q plot with a pointwise band, possibly a subset of all order statistics. */
export interface NormalQuantilePlot {
  /** Sample size m (all values, also those not drawn). */
  readonly size: number;
  /** Pointwise coverage of the band, e.g. 0.95. */
  readonly level: number;
  /** Order index i (1-based) of each drawn point, increasing. */
  readonly rank: Int32Array;
  /** N(0,1) quantile at Blom's plotting position (i - 3/8)/(m + 1/4): the x of each point. */
  readonly theoretical: Float64Array;
  /** The i-th smallest sample value: the y of each point. */
  readonly sample: Float64Array;
  /** Band for the i-th smallest of m N(0,1) values: Phi^-1 of the Beta(i, m-i+1) quantiles. */
  readonly lower: Float64Array;
  readonly upper: Float64Array;
}

/** Options of normalQuantilePlot. */
export interface NormalQuantilePlotOptions {
  /** At most this many points are returned (>= 2); default 512. */
  readonly maxPoints?: number;
  /** Pointwise coverage of the band, in (0, 1); default 0.95. */
  readonly level?: number;
}

/**
 * Blom's plotting position (i - 3/8)/(m + 1/4): Phi^-1 of it approximates the expected i-th order
 * statistic of m N(0,1) values closely (Blom, Statistical Estimates and Transformed Beta-Variables,
 * 1958, from memory); it is the default of R's qqnorm for m <= 10 (from memory).
 */
function blom(i: number, m: number): number {
  return (i - 0.375) / (m + 0.25);
}

/**
 * Normal Q-Q plot model: sorted sample against N(0,1) quantiles at Blom's plotting positions, with
 * a pointwise band from the law of order statistics: if U_(i) is the i-th smallest of m uniforms
 * then U_(i) ~ Beta(i, m - i + 1) (David & Nagaraja, Order Statistics, 3rd ed. 2003, section 2.1),
 * and Phi^-1 is increasing, so the i-th smallest of m N(0,1) values lies between Phi^-1 of the
 * (1 -/+ level)/2 Beta quantiles with probability `level`. The band is pointwise, not simultaneous:
 * some of many points fall outside it by chance.
 *
 * Downsampling for drawing: when m > maxPoints, maxPoints targets are spread evenly along the
 * theoretical axis between the smallest and largest plotting position, and each picks its nearest
 * order statistic; repeats are dropped. Points that would overlap in the crowded middle go, every
 * extreme point in the sparse tails stays (always the first and the last).
 * @param sample finite values (not modified)
 * @throws RangeError when the sample is empty or not finite, or options are out of range
 */
export function normalQuantilePlot(sample: ArrayLike<number>, options: NormalQuantilePlotOptions = {}): NormalQuantilePlot {
  const maxPoints = options.maxPoints ?? 512;
  const level = options.level ?? 0.95;
  if (!Number.isInteger(maxPoints) || maxPoints < 2) throw new RangeError(`maxPoints must be an integer >= 2; got ${maxPoints}`);
  if (!(level > 0 && level < 1)) throw new RangeError(`level must be in (0, 1); got ${level}`);
  const x = sortedFinite(sample);
  const m = x.length;
  const rank = pickRanks(m, maxPoints);
  const k = rank.length;
  const theoretical = new Float64Array(k);
  const values = new Float64Array(k);
  const lower = new Float64Array(k);
  const upper = new Float64Array(k);
  const lo = (1 - level) / 2;
  const hi = 1 - lo;
  for (let j = 0; j < k; j++) {
    const i = rank[j];
    theoretical[j] = normalQuantile(blom(i, m), 0, 1);
    values[j] = x[i - 1];
    lower[j] = normalQuantile(betaQuantile(lo, i, m - i + 1), 0, 1);
    upper[j] = normalQuantile(betaQuantile(hi, i, m - i + 1), 0, 1);
  }
  return { size: m, level, rank, theoretical, sample: values, lower, upper };
}

/** The order indices to draw (1-based, increasing): all when m <= maxPoints, see above otherwise. */
function pickRanks(m: number, maxPoints: number): Int32Array {
  if (m <= maxPoints) {
    const all = new Int32Array(m);
    for (let i = 0; i < m; i++) all[i] = i + 1;
    return all;
  }
  const first = normalQuantile(blom(1, m), 0, 1);
  const last = -first; // Blom's positions are symmetric
  const out = new Int32Array(maxPoints);
  let count = 0;
  for (let j = 0; j < maxPoints; j++) {
    const t = first + ((last - first) * j) / (maxPoints - 1);
    const p = normalCdf(t, 0, 1);
    // invert p = (i - 3/8)/(m + 1/4) and round to the nearest order index
    let i = Math.round(p * (m + 0.25) + 0.375);
    if (j === 0) i = 1;
    if (j === maxPoints - 1) i = m;
    i = Math.min(m, Math.max(1, i));
    if (count === 0 || i > out[count - 1]) out[count++] = i;
  }
  return out.slice(0, count);
}
