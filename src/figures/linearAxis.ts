import { scaleLinear, type ScaleLinear } from 'd3-scale';
import { format } from 'd3-format';
import type { AxisModel } from './figureModel';

/** About one tick per this many pixels (common practice, no source). */
const PIXELS_PER_X_TICK = 90;
const PIXELS_PER_Y_TICK = 48;

export interface AxisSpec {
  readonly label: string;
  readonly unit: string;
  /** Only whole-number ticks (block lengths). */
  readonly integer?: boolean;
}

/**
 * A linear scale on a "nice" version of the domain and its ticks with labels. A degenerate domain
 * (one value) is widened by one unit each way so the data still sit in the middle of the plot.
 * @param pixels [start, end] pixel range (y runs from bottom to top, so start > end there)
 */
export function linearAxis(
  domain: readonly [number, number],
  pixels: readonly [number, number],
  spec: AxisSpec,
  nice = true,
): { scale: ScaleLinear<number, number>; axis: AxisModel } {
  let [lo, hi] = domain;
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) throw new RangeError(`axis '${spec.label}' needs a finite domain; got [${lo}, ${hi}]`);
  if (lo > hi) [lo, hi] = [hi, lo];
  if (lo === hi) {
    lo -= 1;
    hi += 1;
  }
  const length = Math.abs(pixels[1] - pixels[0]);
  const vertical = pixels[0] > pixels[1];
  const count = Math.max(2, Math.round(length / (vertical ? PIXELS_PER_Y_TICK : PIXELS_PER_X_TICK)));
  const scale = scaleLinear().domain([lo, hi]).range([pixels[0], pixels[1]]);
  if (nice) scale.nice(count);
  let values = scale.ticks(count);
  if (spec.integer === true) values = values.filter((v) => Number.isInteger(v));
  const fmt = spec.integer === true ? format('d') : scale.tickFormat(count);
  const [d0, d1] = scale.domain() as [number, number];
  return {
    scale,
    axis: {
      label: spec.label,
      unit: spec.unit,
      domain: [d0, d1],
      ticks: values.map((value) => ({ value, position: round2(scale(value)), label: fmt(value).replace('-', '−') })),
    },
  };
}

/** Pixel coordinates are kept to two decimals: finer detail is invisible and bloats SVG and snapshots. */
export function round2(v: number): number {
  return Math.round(v * 100) / 100;
}
