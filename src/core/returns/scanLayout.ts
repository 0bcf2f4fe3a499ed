import { HISTOGRAM_BINS_PER_NAT } from './levelStats';

/** Smallest power of two >= x (x >= 1). */
export function powerOfTwoAtLeast(x: number): number {
  let p = 1;
  while (p < x) p *= 2;
  return p;
}

/** Bins of the log R histogram: log R <= log N, plus one spare bin. */
export function histogramBinCount(N: number): number {
  return Math.floor(HISTOGRAM_BINS_PER_NAT * Math.log(Math.max(N, 2))) + 2;
}

/** Default window of the sliding-window match lengths: half the sequence. */
export function matchWindowFor(N: number): number {
  return Math.max(1, Math.floor(N / 2));
}
