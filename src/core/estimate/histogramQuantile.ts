import { HISTOGRAM_BINS_PER_NAT } from '../returns/levelStats';

/**
 * The p-quantile of log R (nats) from the engine's fixed-grid histogram, interpolating linearly
 * inside the bin where the cumulative count reaches p * total (the usual grouped-data quantile,
 * e.g. Hyndman & Fan, Am. Stat. 50 (1996), applied to bins; resolution 1/64 nat).
 * @param histogram counts per bin, bin k = [k, k+1) / HISTOGRAM_BINS_PER_NAT
 * @param p probability in [0, 1]
 * @returns null when the histogram is empty
 */
export function histogramQuantile(histogram: Float64Array, p: number): number | null {
  if (!(p >= 0 && p <= 1)) throw new RangeError(`p must be in [0, 1]; got ${p}`);
  let total = 0;
  for (let k = 0; k < histogram.length; k++) total += histogram[k];
  if (total <= 0) return null;
  const target = p * total;
  let below = 0;
  for (let k = 0; k < histogram.length; k++) {
    const c = histogram[k];
    if (c > 0 && below + c >= target) {
      const inside = Math.max(0, target - below) / c;
      return (k + inside) / HISTOGRAM_BINS_PER_NAT;
    }
    below += c;
  }
  return histogram.length / HISTOGRAM_BINS_PER_NAT;
}
