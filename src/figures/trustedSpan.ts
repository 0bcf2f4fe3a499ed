import type { ScaleLinear } from 'd3-scale';
import type { AnalysisResult } from '../core';
import { round2 } from './linearAxis';
import type { SpanMark } from './figureModel';

/** The trusted block lengths lo..hi as a shaded stretch, half a step beyond each end, kept inside the axis. */
export function trustedSpan(result: Pick<AnalysisResult, 'trustedRange'>, x: ScaleLinear<number, number>): SpanMark[] {
  const range = result.trustedRange;
  if (range === null) return [];
  const [d0, d1] = x.domain() as [number, number];
  const from = Math.max(d0, range.lo - 0.5);
  const to = Math.min(d1, range.hi + 0.5);
  if (!(to > from)) return [];
  const label = range.lo === range.hi ? `Trusted n = ${range.lo}` : `Trusted n = ${range.lo}–${range.hi}`;
  return [{ id: 'trusted', label, from: round2(x(from)), to: round2(x(to)) }];
}
