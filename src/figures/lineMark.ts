import type { ScaleLinear } from 'd3-scale';
import { curvePath, vertexPoints, type CurvePoint } from './curvePath';
import { curveRows } from './dataRows';
import type { LineMark, SeriesStyle } from './figureModel';

/** A line through the points, with marker positions when its style has a marker. */
export function lineMark(
  id: string,
  label: string,
  style: SeriesStyle,
  points: readonly CurvePoint[],
  x: ScaleLinear<number, number>,
  y: ScaleLinear<number, number>,
): LineMark {
  return { id, label, style, path: curvePath(points, x, y), vertices: style.marker === null ? [] : vertexPoints(points, x, y), data: curveRows(points) };
}
