import type { ScaleLinear } from 'd3-scale';
import type { AnalysisResult } from '../core';
import { curvePath, segmentCount, type CurvePoint } from './curvePath';
import { curveRows } from './dataRows';
import type { PathLayer, SeriesStyle } from './figureModel';

/** Above this many line segments the sample paths go to a canvas: SVG slows down past a few thousand nodes. */
export const CANVAS_SEGMENT_LIMIT = 4000;

/** What to plot for sampled position s at block length n, from log R_n in nats; null leaves a gap. */
export type PathValue = (n: number, logReturnNats: number) => number;

/** The sampled paths as curves in data units (gaps where log R_n is null: censored or past the end). */
export function pathCurves(paths: AnalysisResult['paths'], value: PathValue, maxN: number): CurvePoint[][] {
  return paths.logReturn.map((row) => {
    const points: CurvePoint[] = [];
    for (let n = 1; n <= Math.min(maxN, row.length); n++) {
      const v = row[n - 1];
      points.push({ x: n, y: v === null || v === undefined ? null : value(n, v) });
    }
    return points;
  });
}

/** Thin lines for every sampled path, with the renderer chosen by the number of segments. */
export function pathLayer(
  curves: readonly CurvePoint[][],
  x: ScaleLinear<number, number>,
  y: ScaleLinear<number, number>,
  style: SeriesStyle,
  label: string,
  canvasLimit = CANVAS_SEGMENT_LIMIT,
): PathLayer | null {
  if (curves.length === 0) return null;
  let segments = 0;
  const paths: string[] = [];
  const data = curves.map(curveRows);
  for (const c of curves) {
    segments += segmentCount(c);
    paths.push(curvePath(c, x, y));
  }
  return { id: 'paths', label, style, paths, data, segments, render: segments > canvasLimit ? 'canvas' : 'svg' };
}
