/** The Kaplan-Meier estimate of a survival function P(T > t) from right-censored data. */
export interface KaplanMeierCurve {
  /** Observations used (events + censored). */
  readonly size: number;
  readonly events: number;
  readonly censored: number;
  /** Distinct event times, increasing. */
  readonly times: Float64Array;
  /** Observations still at risk (time >= t) at each event time. */
  readonly atRisk: Float64Array;
  /** Events at each event time. */
  readonly deaths: Float64Array;
  /** S(t) at each event time (just after the drop). */
  readonly survival: Float64Array;
  /** Greenwood's standard error of S(t) at each event time. */
  readonly standardError: Float64Array;
  /** Smallest and largest observation, event or censored. */
  readonly firstTime: number;
  readonly lastTime: number;
}

/**
 * Kaplan-Meier product-limit estimator (Kaplan & Meier, J. Am. Stat. Assoc. 53 (1958) 457-481):
 * S(t) = prod_{t_j <= t} (1 - d_j / n_j) over the distinct event times t_j, with d_j events at t_j
 * and n_j observations whose time is >= t_j. A censored observation tied with an event counts as at
 * risk at that time (censoring just after the event, Kaplan & Meier's convention). Standard error by
 * Greenwood's formula S(t) sqrt(sum_{t_j <= t} d_j / (n_j (n_j - d_j))) (Greenwood 1926; Klein &
 * Moeschberger, Survival Analysis, 2nd ed. 2003, eq. 4.2.2, from memory), 0 once S reaches 0.
 * Times may be any real numbers (e.g. logarithms): only their order matters.
 * @param times observed times: the event time, or for a censored observation the time it was last
 *   seen (the true time is larger)
 * @param censored truthy where the observation is censored; same length as times
 * @throws RangeError on mismatched lengths or non-finite times
 */
export function kaplanMeier(times: ArrayLike<number>, censored: ArrayLike<boolean | number>): KaplanMeierCurve {
  const m = times.length;
  if (censored.length !== m) throw new RangeError(`times and censored must have the same length; got ${m} and ${censored.length}`);
  const order = new Int32Array(m);
  let nCensored = 0;
  for (let i = 0; i < m; i++) {
    if (!Number.isFinite(times[i])) throw new RangeError(`times must be finite; got ${times[i]} at index ${i}`);
    order[i] = i;
    if (censored[i]) nCensored++;
  }
  // by time, events before censorings at equal times
  order.sort((a, b) => times[a] - times[b] || (censored[a] ? 1 : 0) - (censored[b] ? 1 : 0));
  const eventTimes: number[] = [];
  const atRisk: number[] = [];
  const deaths: number[] = [];
  let k = 0;
  while (k < m) {
    const t = times[order[k]];
    let d = 0;
    let seen = 0;
    while (k + seen < m && times[order[k + seen]] === t) {
      if (!censored[order[k + seen]]) d++;
      seen++;
    }
    if (d > 0) {
      eventTimes.push(t);
      atRisk.push(m - k);
      deaths.push(d);
    }
    k += seen;
  }
  const j = eventTimes.length;
  const survival = new Float64Array(j);
  const standardError = new Float64Array(j);
  let s = 1;
  let greenwood = 0;
  for (let i = 0; i < j; i++) {
    const n = atRisk[i];
    const d = deaths[i];
    s *= 1 - d / n;
    greenwood += n > d ? d / (n * (n - d)) : 0;
    survival[i] = s;
    standardError[i] = s > 0 ? s * Math.sqrt(greenwood) : 0;
  }
  return {
    size: m,
    events: m - nCensored,
    censored: nCensored,
    times: Float64Array.from(eventTimes),
    atRisk: Float64Array.from(atRisk),
    deaths: Float64Array.from(deaths),
    survival,
    standardError,
    firstTime: m > 0 ? times[order[0]] : Number.NaN,
    lastTime: m > 0 ? times[order[m - 1]] : Number.NaN,
  };
}

/**
 * Index of the last event time <= t (-1 when none): the curve's value at t is survival[index], or 1
 * when the index is -1. Binary search over the increasing event times.
 */
export function kaplanMeierIndex(curve: KaplanMeierCurve, t: number): number {
  let lo = 0;
  let hi = curve.times.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (curve.times[mid] <= t) lo = mid + 1;
    else hi = mid;
  }
  return lo - 1;
}

/**
 * S(t) = P(T > t) from the curve; NaN past the last observation when it was censored (the estimate
 * says nothing there), and for an empty curve.
 */
export function kaplanMeierAt(curve: KaplanMeierCurve, t: number): number {
  if (curve.size === 0) return Number.NaN;
  const last = curve.times.length - 1;
  const lastIsEvent = last >= 0 && curve.times[last] === curve.lastTime;
  if (t > curve.lastTime && !lastIsEvent) return Number.NaN;
  const i = kaplanMeierIndex(curve, t);
  return i < 0 ? 1 : curve.survival[i];
}

/** The mean of T under the Kaplan-Meier law, restricted to the observed range, and its standard error. */
export interface RestrictedMean {
  readonly mean: number;
  readonly standardError: number;
  /** Upper end of the range (the last observation); the mean is of min(T, tau). */
  readonly tau: number;
}

/**
 * Restricted mean firstTime + integral_{firstTime}^{tau} S(u) du with tau the last observation,
 * and the variance sum_j A_j^2 d_j / (n_j (n_j - d_j)) with A_j = integral_{t_j}^{tau} S(u) du
 * (Kaplan & Meier 1958, section 8; Klein & Moeschberger 2003, eqs. 4.5.1-4.5.2, from memory).
 * Without censoring this is the sample mean, with standard error sqrt(sum (x - mean)^2) / m.
 * When the largest observation is censored the mean of T itself is larger: this is a lower bound.
 */
export function kaplanMeierMean(curve: KaplanMeierCurve): RestrictedMean {
  const tau = curve.lastTime;
  const j = curve.times.length;
  if (curve.size === 0) return { mean: Number.NaN, standardError: Number.NaN, tau };
  // area[i] = integral of S from times[i] to tau
  const area = new Float64Array(j);
  let acc = 0;
  for (let i = j - 1; i >= 0; i--) {
    const next = i + 1 < j ? curve.times[i + 1] : tau;
    acc += curve.survival[i] * (next - curve.times[i]);
    area[i] = acc;
  }
  const firstEvent = j > 0 ? curve.times[0] : tau;
  const mean = curve.firstTime + (firstEvent - curve.firstTime) + (j > 0 ? area[0] : 0);
  let variance = 0;
  for (let i = 0; i < j; i++) {
    const n = curve.atRisk[i];
    const d = curve.deaths[i];
    if (n > d) variance += (area[i] * area[i] * d) / (n * (n - d));
  }
  return { mean, standardError: Math.sqrt(variance), tau };
}
