import type { BandPoint, CurvePoint } from './curvePath';
import type { DataRow } from './figureModel';

const finite = (v: number | null): v is number => v !== null && Number.isFinite(v);

/** The defined points of a curve (the ones a line is drawn through), in data units. */
export function curveRows(points: readonly CurvePoint[]): DataRow[] {
  const out: DataRow[] = [];
  for (const p of points) if (finite(p.y)) out.push({ x: p.x, x2: null, y: p.y, lower: null, upper: null });
  return out;
}

/** The points of a band where both ends are defined (the stretch that is filled), in data units. */
export function bandRows(points: readonly BandPoint[]): DataRow[] {
  const out: DataRow[] = [];
  for (const p of points) if (finite(p.lower) && finite(p.upper)) out.push({ x: p.x, x2: null, y: null, lower: p.lower, upper: p.upper });
  return out;
}
