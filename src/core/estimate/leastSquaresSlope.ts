/**
 * Ordinary least-squares slope of y against x: sum (x - xbar)(y - ybar) / sum (x - xbar)^2.
 * Entries where y is not finite are skipped.
 * @returns NaN when fewer than two usable points or all x equal
 */
export function leastSquaresSlope(x: ArrayLike<number>, y: ArrayLike<number>): number {
  let m = 0;
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < x.length; i++) {
    if (!Number.isFinite(y[i])) continue;
    m++;
    sx += x[i];
    sy += y[i];
  }
  if (m < 2) return Number.NaN;
  const xbar = sx / m;
  const ybar = sy / m;
  let sxy = 0;
  let sxx = 0;
  for (let i = 0; i < x.length; i++) {
    if (!Number.isFinite(y[i])) continue;
    const dx = x[i] - xbar;
    sxy += dx * (y[i] - ybar);
    sxx += dx * dx;
  }
  return sxx > 0 ? sxy / sxx : Number.NaN;
}
