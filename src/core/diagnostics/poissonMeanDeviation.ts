/** Above this mean the normal approximation sqrt(2 lambda / pi) is used (relative error < 0.5%). */
const NORMAL_FROM = 30;

/**
 * Mean absolute deviation E|X - lambda| of a Poisson(lambda) variable:
 * 2 e^-lambda lambda^(f+1) / f!, f = floor(lambda) (a classical closed form, from memory; it follows
 * from sum_{x <= f} (lambda - x) P(x) = lambda P(f)). For large lambda, sqrt(2 lambda / pi), the
 * normal value, which the exact form approaches.
 */
export function poissonMeanDeviation(lambda: number): number {
  if (!(lambda >= 0) || !Number.isFinite(lambda)) throw new RangeError(`lambda must be finite and >= 0; got ${lambda}`);
  if (lambda === 0) return 0;
  if (lambda >= NORMAL_FROM) return Math.sqrt((2 * lambda) / Math.PI);
  const f = Math.floor(lambda);
  let logTerm = -lambda + (f + 1) * Math.log(lambda);
  for (let j = 2; j <= f; j++) logTerm -= Math.log(j);
  return 2 * Math.exp(logTerm);
}
