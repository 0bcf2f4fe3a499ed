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

/**
 * The power law on the later gaps, for the reading: fitted to beta(k) minus its noise floor over the
 * later half, on the log scale, of the first `count` gaps (k >= sqrt(k_first k_last); at least the
 * last MIN_FIT_POINTS of them). Why the later gaps: a slowly mixing process can be pre-asymptotic at
 * short gaps (the renewal chain with tail exponent 2.5 falls locally like k^-0.8 at k = 2 and
 * k^-1.1 to k^-1.2 from k = 16 in a run of 8e6 symbols), and the tail decides summability. Why
 * minus the floor: the plug-in's excess over beta is between 0 and the floor (Jensen, and the
 * triangle inequality cell by cell), and near the floor it flattens the log-log slope; subtracting
 * the whole floor gives the steepest slope the data allow, so a rate p <= 1 after it is not an
 * artefact of the bias. The gaps passed have beta above SIGNAL_FACTOR = 2 floors, so the
 * difference stays positive. Null with fewer than MIN_FIT_POINTS gaps.
 */
export function fitTailPowerDecay(gaps: readonly number[], beta: readonly number[], floor: readonly number[], count = gaps.length): DecayFit | null {
  if (count < MIN_FIT_POINTS) return null;
  const middle = Math.sqrt(gaps[0] * gaps[count - 1]);
  let from = 0;
  while (from < count && gaps[from] < middle) from++;
  from = Math.min(from, count - MIN_FIT_POINTS);
  const g: number[] = [];
  const b: number[] = [];
  for (let i = from; i < count; i++) {
    const excess = beta[i] - floor[i];
    if (!(excess > 0)) return null;
    g.push(gaps[i]);
    b.push(excess);
  }
  return fit('power', g, b, g.length);
}
