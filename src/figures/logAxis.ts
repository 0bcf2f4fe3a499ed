import { scaleLinear, type ScaleLinear } from 'd3-scale';
import type { AxisModel } from './figureModel';
import { round2, type AxisSpec } from './linearAxis';

/** Superscript digits for labels like 10⁻³. */
const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

function powerLabel(e: number): string {
  if (e === 0) return '1';
  if (e === 1) return '10';
  return `10${String(e)
    .split('')
    .map((c) => SUPERSCRIPT[c] ?? c)
    .join('')}`;
}

/**
 * A base-10 logarithmic axis over a positive domain, widened outwards to whole powers of ten, with
 * ticks at the powers of ten (labelled 1, 10⁻¹, ...). The returned scale is linear in log10 of the
 * value, so data go through it as log10(v) and the linear path helpers draw them unchanged.
 * A domain within one decade still spans one; at most 12 decades are shown (the lowest are cut).
 * @param pixels [start, end] pixel range (y runs from bottom to top, so start > end there)
 * @throws RangeError when the domain is not positive and finite
 */
export function logAxis(domain: readonly [number, number], pixels: readonly [number, number], spec: AxisSpec): { scale: ScaleLinear<number, number>; axis: AxisModel } {
  const [a, b] = domain;
  if (!(a > 0 && b > 0 && Number.isFinite(a) && Number.isFinite(b))) throw new RangeError(`axis '${spec.label}' needs a positive finite domain; got [${a}, ${b}]`);
  let lo = Math.floor(Math.log10(Math.min(a, b)) + 1e-9);
  const hi = Math.max(lo + 1, Math.ceil(Math.log10(Math.max(a, b)) - 1e-9));
  if (hi - lo > 12) lo = hi - 12;
  const scale = scaleLinear().domain([lo, hi]).range([pixels[0], pixels[1]]);
  const ticks = [];
  for (let e = lo; e <= hi; e++) ticks.push({ value: 10 ** e, position: round2(scale(e)), label: powerLabel(e) });
  return { scale, axis: { label: spec.label, unit: spec.unit, domain: [10 ** lo, 10 ** hi], ticks } };
}
