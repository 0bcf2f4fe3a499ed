/** Fewer points than this above the noise floor give no fit. */
export const MIN_FIT_POINTS = 3;

/** A straight-line fit of log beta, with its quality on the log scale. */
export interface DecayFit {
  readonly kind: 'exponential' | 'power';
  /** beta(k) ~ C exp(-k / tau) or C k^-rate. */
  readonly C: number;
  /** tau (exponential, in symbols) or the rate p (power law); null when beta does not fall (kept
   * finite so the result survives JSON). */
  readonly scale: number | null;
  /** Coefficient of determination of the line on the log scale. */
  readonly rSquared: number;
  /** Residual standard deviation of log beta (n - 2 degrees of freedom). */
  readonly residualSd: number;
  /** Number of gaps used. */
  readonly points: number;
  /** Gaps used, [first, last]. */
  readonly gapRange: readonly [number, number];
}

interface Line {
  readonly intercept: number;
  readonly slope: number;
  readonly rSquared: number;
  readonly residualSd: number;
}

/** Ordinary least squares y = a + b x with R^2 and the residual SD (common practice, no source). */
function line(x: readonly number[], y: readonly number[]): Line {
  const n = x.length;
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < n; i++) {
    sx += x[i];
    sy += y[i];
  }
  const xbar = sx / n;
  const ybar = sy / n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    sxx += (x[i] - xbar) * (x[i] - xbar);
    sxy += (x[i] - xbar) * (y[i] - ybar);
    syy += (y[i] - ybar) * (y[i] - ybar);
  }
  const slope = sxx > 0 ? sxy / sxx : 0;
  const intercept = ybar - slope * xbar;
  let sse = 0;
  for (let i = 0; i < n; i++) {
    const r = y[i] - intercept - slope * x[i];
    sse += r * r;
  }
  return { intercept, slope, rSquared: syy > 0 ? 1 - sse / syy : 1, residualSd: n > 2 ? Math.sqrt(sse / (n - 2)) : 0 };
}

/**
 * The gaps to fit: those where beta(k) is above `threshold`(k) (SIGNAL_FACTOR times the noise floor
 * in the diagnostics), taken from the first gap up to the first one that falls below (later
 * excursions above the threshold are noise and would flatten the fit).
 */
export function gapsAboveFloor(beta: readonly number[], threshold: readonly number[]): number {
  let n = 0;
  while (n < beta.length && beta[n] > threshold[n] && beta[n] > 0) n++;
  return n;
}

function fit(kind: 'exponential' | 'power', gaps: readonly number[], beta: readonly number[], count: number): DecayFit | null {
  if (count < MIN_FIT_POINTS) return null;
  const x: number[] = [];
  const y: number[] = [];
  for (let i = 0; i < count; i++) {
    x.push(kind === 'exponential' ? gaps[i] : Math.log(gaps[i]));
    y.push(Math.log(beta[i]));
  }
  const l = line(x, y);
  const scale = l.slope < 0 ? (kind === 'exponential' ? -1 / l.slope : -l.slope) : null;
  return {
    kind,
    C: Math.exp(l.intercept),
    scale,
    rSquared: l.rSquared,
    residualSd: l.residualSd,
    points: count,
    gapRange: [gaps[0], gaps[count - 1]],
  };
}

/**
 * Exponential decay beta(k) ~ C exp(-k / tau): least squares of log beta on k over the first
 * `count` gaps. Null with fewer than MIN_FIT_POINTS points.
 */
export function fitExponentialDecay(gaps: readonly number[], beta: readonly number[], count = gaps.length): DecayFit | null {
  return fit('exponential', gaps, beta, count);
}

/**
 * Power-law decay beta(k) ~ C k^-p: least squares of log beta on log k over the first `count` gaps.
 * Null with fewer than MIN_FIT_POINTS points.
 */
export function fitPowerDecay(gaps: readonly number[], beta: readonly number[], count = gaps.length): DecayFit | null {
  return fit('power', gaps, beta, count);
}
