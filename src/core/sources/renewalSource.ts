import type { Sequence } from '../sequence/sequence';
import type { ReferenceSource } from './referenceSource';
import { checkTailExponent, renewalEntropyRate, renewalInformationVariance, renewalMeanGap } from './renewalLaw';
import type { UniformStream } from './seededRandom';
import { uniformStream } from './seededRandom';
import { checkLength, sequenceFromSymbols } from './sequenceFromSymbols';

/** Proposals beyond this stand for "longer than any sample"; the accept step uses its limit there. */
const HUGE = 9007199254740992;

/** Gaps up to this are drawn from a table of P(T >= m); longer ones by inversion with a power. */
const TABLE_GAPS = 32;

/**
 * One draw of the zeta law P(X = m) = m^-alpha / zeta(alpha), m >= 1, by Devroye's rejection method
 * (Non-Uniform Random Variate Generation, 1986, section X.6, from memory). Proposal
 * X = floor(U^(-1/(alpha-1))) has P(X = m) = m^(1-alpha) - (m+1)^(1-alpha); the target/proposal
 * ratio is T / (X (T - 1)) with T = (1 + 1/X)^(alpha-1), largest at X = 1 where it is b / (b - 1),
 * b = 2^(alpha-1); so accept when V X (T - 1) / (b - 1) <= T / b. For X beyond 2^53 (possible
 * when alpha is near 1) the ratio is replaced by its limit 1 / (alpha - 1) and X is returned as is:
 * such a delay exceeds any sample anyway.
 */
function drawZeta(uniforms: UniformStream, alpha: number): number {
  const b = Math.pow(2, alpha - 1);
  for (;;) {
    const u = uniforms.nextPositive();
    const v = uniforms.next();
    const x = Math.floor(Math.pow(u, -1 / (alpha - 1)));
    if (x > HUGE) {
      if (v * (alpha - 1) * b <= b - 1) return x;
      continue;
    }
    const t = Math.pow(1 + 1 / x, alpha - 1);
    if ((v * x * (t - 1)) / (b - 1) <= t / b) return x;
  }
}

/**
 * A slowly mixing renewal process on '0'/'1': runs of 0s of heavy-tailed length L, each followed by
 * a single 1, with gaps T = L + 1 i.i.d., P(T >= m) = m^-alpha for m >= 1 (so
 * P(L >= k) = (k+1)^-alpha), drawn by inversion, T = max{m : U <= m^-alpha} = floor(U^(-1/alpha)) with U uniform on (0, 1].
 *
 * Started in the stationary (delayed) law: the number D of 0s before the first 1 has
 * P(D = d) = P(T >= d + 1) / E[T] = (d+1)^-alpha / zeta(alpha), d >= 0 (the forward recurrence time
 * of a stationary discrete renewal process, Feller, An Introduction to Probability Theory, vol. 1,
 * ch. XIII, from memory), i.e. D + 1 follows the zeta law. The output is therefore stationary from
 * its first symbol; P(1) = 1 / zeta(alpha).
 *
 * h = H(T) / E[T] exactly (Abramov's formula). For alpha >= 2.1 the gap variance is finite and
 * sigma^2 = E[(Y - hT)^2]/E[T] (renewal-reward CLT, renewalInformationVariance) is stated; for
 * alpha <= 2 it is infinite and none is claimed. Mixing is only polynomial for every alpha, and the
 * third moment of the gap is infinite up to alpha = 3, so gaussianLimit is true only beyond 3: below,
 * the Gaussian limit is at best slow (alpha in (2, 3]) or fails (alpha <= 2) at practical n.
 * @param alpha tail exponent, 1 < alpha <= 100 (default 1.5)
 * @throws RangeError for alpha outside (1, 100]
 */
export function renewalSource(alpha = 1.5): ReferenceSource {
  checkTailExponent(alpha);
  const meanGap = renewalMeanGap(alpha);
  const entropyRate = renewalEntropyRate(alpha);
  const sigma2 = renewalInformationVariance(alpha);
  const alphabet = ['0', '1'];
  const inverseAlpha = -1 / alpha;
  // tail[m] = P(T >= m) = m^-alpha: short gaps (most of them) by comparisons instead of a power.
  const tail = new Float64Array(TABLE_GAPS + 1);
  for (let m = 1; m <= TABLE_GAPS; m++) tail[m] = Math.pow(m, -alpha);
  const generate = (length: number, seed: number): Sequence => {
    checkLength(length);
    const uniforms = uniformStream(seed);
    const symbols = new Uint8Array(length);
    let position = drawZeta(uniforms, alpha) - 1;
    while (position < length) {
      symbols[position] = 1;
      // T = max{m : U <= m^-alpha}.
      const u = uniforms.nextPositive();
      let gap = 1;
      while (gap < TABLE_GAPS && u <= tail[gap + 1]) gap++;
      if (gap === TABLE_GAPS) gap = Math.max(TABLE_GAPS, Math.floor(Math.pow(u, inverseAlpha)));
      position += gap;
    }
    return sequenceFromSymbols(symbols, alphabet);
  };
  return {
    id: `renewal:${alpha}`,
    label: `Renewal process, gap tail exponent ${alpha}`,
    facts: {
      entropyRate,
      sigma2,
      description:
        `Runs of 0s each closed by a single 1; the gaps T between 1s are i.i.d. with P(T >= m) = m^-${alpha} ` +
        `(mean ${meanGap.toPrecision(12)}), drawn by inversion from 53-bit uniforms, and the first run has the ` +
        'stationary (delayed) law P(D = d) = (d+1)^-alpha / zeta(alpha), so the output is stationary. ' +
        'h = H(T) / E[T] (Abramov) is exact up to about 1e-15 (direct sum plus Euler-Maclaurin tail). ' +
        (sigma2 === null
          ? `No sigma^2 is claimed: the gap variance is ${alpha <= 2 ? 'infinite' : 'finite but its tail sum converges too slowly to evaluate'}, ` +
            'so the Gaussian limit fails at practical block lengths.'
          : 'sigma^2 = E[(Y - hT)^2]/E[T], Y = -log P(T) (renewal-reward CLT), to about 1e-9 relative. Mixing is only ' +
            `polynomial${alpha <= 3 ? ' and the third moment of the gap is infinite' : ''}, so fluctuations approach the Gaussian slowly.`),
      gaussianLimit: alpha > 3,
    },
    generate,
  };
}
