import type { FigureSize, PlotArea } from './figureModel';

/** Room for tick labels and axis titles (pixels): left holds y tick labels and the y title. */
export const MARGIN = { top: 14, right: 18, bottom: 50, left: 70 } as const;

/** Smallest figure that still shows a readable plot. */
export const MIN_SIZE: FigureSize = { width: 240, height: 180 };

/**
 * The plotting rectangle of a figure of the given size.
 * @throws RangeError for sizes below MIN_SIZE or not finite
 */
export function plotArea(size: FigureSize): PlotArea {
  const { width, height } = size;
  if (!(Number.isFinite(width) && width >= MIN_SIZE.width) || !(Number.isFinite(height) && height >= MIN_SIZE.height)) {
    throw new RangeError(`a figure needs at least ${MIN_SIZE.width} x ${MIN_SIZE.height} pixels; got ${width} x ${height}`);
  }
  return {
    left: MARGIN.left,
    top: MARGIN.top,
    width: width - MARGIN.left - MARGIN.right,
    height: height - MARGIN.top - MARGIN.bottom,
  };
}
