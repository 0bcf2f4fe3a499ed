import { area, line } from 'd3-shape';
import type { ScaleLinear } from 'd3-scale';

/** A point of a curve in data units; a null y is a gap. */
export interface CurvePoint {
  readonly x: number;
  readonly y: number | null;
}

interface Defined {
  readonly x: number;
  readonly y: number;
}

const isDefined = (p: CurvePoint): p is Defined => p.y !== null && Number.isFinite(p.y);

/** SVG path data of a polyline through the points, broken where y is null; '' when nothing is drawn. */
export function curvePath(points: readonly CurvePoint[], x: ScaleLinear<number, number>, y: ScaleLinear<number, number>): string {
  const generator = line<CurvePoint>()
    .defined(isDefined)
    .x((p) => x(p.x))
    .y((p) => y(p.y as number))
    .digits(2);
  return generator(points as CurvePoint[]) ?? '';
}

/** A point of a band: lower and upper value at x; null where the band is undefined. */
export interface BandPoint {
  readonly x: number;
  readonly lower: number | null;
  readonly upper: number | null;
}

/** SVG path data of the region between lower and upper, one closed shape per stretch where both are defined. */
export function bandPath(points: readonly BandPoint[], x: ScaleLinear<number, number>, y: ScaleLinear<number, number>): string {
  const generator = area<BandPoint>()
    .defined((p) => p.lower !== null && p.upper !== null && Number.isFinite(p.lower) && Number.isFinite(p.upper))
    .x((p) => x(p.x))
    .y0((p) => y(p.lower as number))
    .y1((p) => y(p.upper as number))
    .digits(2);
  return generator(points as BandPoint[]) ?? '';
}

/** Number of line segments a polyline with gaps draws: pairs of consecutive defined points. */
export function segmentCount(points: readonly CurvePoint[]): number {
  let count = 0;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1];
    const b = points[i];
    if (a !== undefined && b !== undefined && isDefined(a) && isDefined(b)) count++;
  }
  return count;
}

/** Pixel positions of the defined points (two decimals), for markers on a line. */
export function vertexPoints(points: readonly CurvePoint[], x: ScaleLinear<number, number>, y: ScaleLinear<number, number>): { x: number; y: number }[] {
  const out: { x: number; y: number }[] = [];
  for (const p of points) if (isDefined(p)) out.push({ x: Math.round(x(p.x) * 100) / 100, y: Math.round(y(p.y) * 100) / 100 });
  return out;
}
