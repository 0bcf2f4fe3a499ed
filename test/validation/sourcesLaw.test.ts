import { describe, expect, it } from 'vitest';
import chisquareQuantile from '@stdlib/stats-base-dists-chisquare-quantile';
import type { SymbolArray } from '../../src/core/sequence/sequence';
import { sourceCatalog } from '../../src/core/sources/catalog';
import { continuedFractionSource } from '../../src/core/sources/continuedFractionSource';
import { fairCoinSource } from '../../src/core/sources/fairCoinSource';
import { iidSource } from '../../src/core/sources/iidSource';
import { markovFunctionalMoments, stationaryDistribution } from '../../src/core/sources/markovEntropy';
import { liftMarkovOrder, markovSource } from '../../src/core/sources/markovSource';
import { goldenMeanSource } from '../../src/core/sources/parrySource';
import { renewalMeanGap } from '../../src/core/sources/renewalLaw';
import { renewalSource } from '../../src/core/sources/renewalSource';
import { TWO_STATE, THREE_STATE, ORDER_TWO } from '../helpers/referenceChains';

/** Every statistical check allows 4 standard errors (two-sided miss probability 6e-5 each). */
const Z = 4;

function indicatorFunctional(size: number, test: (i: number, j: number) => boolean): number[][] {
  return Array.from({ length: size }, (_, i) => Array.from({ length: size }, (_, j) => (test(i, j) ? 1 : 0)));
}

/**
 * Checks symbol and transition frequencies of a sample path of an order-1 chain against pi_j and
 * pi_i P_ij. The standard error is sqrt(v / N) with v the exact long-run variance of the count
 * (Kemeny-Snell fundamental matrix, markovFunctionalMoments), which accounts for the dependence.
 */
function expectChainFrequencies(p: number[][], symbols: SymbolArray): void {
  const k = p.length;
  const n = symbols.length;
  const pairs = new Float64Array(k * k);
  const singles = new Float64Array(k);
  for (let t = 0; t < n; t++) singles[symbols[t]!]!++;
  for (let t = 0; t + 1 < n; t++) pairs[symbols[t]! * k + symbols[t + 1]!]!++;
  const pi = stationaryDistribution(p);
  for (let j = 0; j < k; j++) {
    const { mean, variance } = markovFunctionalMoments(p, indicatorFunctional(k, (_, b) => b === j));
    expect(mean).toBeCloseTo(pi[j]!, 12);
    expect(Math.abs(singles[j]! / n - mean)).toBeLessThan(Z * Math.sqrt(variance / n));
  }
  for (let i = 0; i < k; i++) {
    for (let j = 0; j < k; j++) {
      const { mean, variance } = markovFunctionalMoments(p, indicatorFunctional(k, (a, b) => a === i && b === j));
      expect(mean).toBeCloseTo(pi[i]! * p[i]![j]!, 12);
      // A forbidden transition has mean and variance 0: then the count must be exactly 0.
      expect(Math.abs(pairs[i * k + j]! / (n - 1) - mean)).toBeLessThanOrEqual(Z * Math.sqrt(variance / (n - 1)));
    }
  }
}

/**
 * Mean with a batch-means standard error (THEORY.md section 6): sigma^2 = b/(a-1) sum (Ybar_k -
 * Ybar)^2 over a = floor(n/b) batches. Continued-fraction digits decorrelate geometrically (ratio
 * about 0.3 per digit, Wirsing's constant, from memory), so batches of 2000 are effectively
 * independent and the 1000 batches give the SE to about 2%.
 */
function batchMeans(values: ArrayLike<number>, batch: number): { mean: number; se: number; longRunVariance: number } {
  const a = Math.floor(values.length / batch);
  const means = new Float64Array(a);
  let total = 0;
  for (let k = 0; k < a; k++) {
    let s = 0;
    for (let t = k * batch; t < (k + 1) * batch; t++) s += values[t]!;
    means[k] = s / batch;
    total += s;
  }
  const mean = total / (a * batch);
  let ss = 0;
  for (let k = 0; k < a; k++) ss += (means[k]! - mean) ** 2;
  const longRunVariance = (batch * ss) / (a - 1);
  return { mean, se: Math.sqrt(longRunVariance / (a * batch)), longRunVariance };
}

/** Binomial standard error of a frequency over m independent trials. */
function binomialSe(p: number, m: number): number {
  return Math.sqrt((p * (1 - p)) / m);
}

describe('Markov chain sources reproduce their transition law', () => {
  it('two-state chain: symbol and transition frequencies within 4 SE', () => {
    const seq = markovSource(TWO_STATE).generate(1_000_000, 11);
    expectChainFrequencies(TWO_STATE, seq.symbols);
  });

  it('three-state chain: symbol and transition frequencies within 4 SE', () => {
    const seq = markovSource(THREE_STATE).generate(1_000_000, 12);
    expectChainFrequencies(THREE_STATE, seq.symbols);
  });

  it('order-2 chain: context (x_{t-2}, x_{t-1}) read with the most recent symbol last', () => {
    // Rows: contexts 00, 01, 10, 11 (row = 2 x_{t-2} + x_{t-1}); invented test values.
    const rows = ORDER_TWO;
    const n = 1_000_000;
    const { symbols } = markovSource(rows, 2).generate(n, 13);
    const lift = liftMarkovOrder(rows, 2);
    const lifted = lift.lifted.map((r) => Array.from(r));
    const counts = new Float64Array(8);
    for (let t = 2; t < n; t++) counts[(2 * symbols[t - 2]! + symbols[t - 1]!) * 2 + symbols[t]!]!++;
    const pi = stationaryDistribution(lifted);
    for (let r = 0; r < 4; r++) {
      for (let j = 0; j < 2; j++) {
        // The transition r -> (2r mod 4) + j of the context chain emits j.
        const target = ((2 * r) % 4) + j;
        const { mean, variance } = markovFunctionalMoments(
          lifted,
          indicatorFunctional(4, (a, b) => a === r && b === target),
        );
        expect(mean).toBeCloseTo(pi[r]! * rows[r]![j]!, 12);
        expect(Math.abs(counts[r * 2 + j]! / (n - 2) - mean)).toBeLessThan(Z * Math.sqrt(variance / (n - 2)));
      }
    }
  });

  it('fair coin and Bernoulli(0.3): frequencies of symbols and pairs within 4 SE', () => {
    const coin = [
      [0.5, 0.5],
      [0.5, 0.5],
    ];
    expectChainFrequencies(coin, fairCoinSource().generate(1_000_000, 14).symbols);
    const bernoulli = [
      [0.7, 0.3],
      [0.7, 0.3],
    ];
    expectChainFrequencies(bernoulli, iidSource([0.7, 0.3]).generate(1_000_000, 15).symbols);
  });

  it('a 40-symbol i.i.d. law (alias table) passes a chi-square test at level 1e-4', () => {
    const weights = Array.from({ length: 40 }, (_, k) => (k % 7 === 3 ? 0 : k + 1));
    const total = weights.reduce((a, b) => a + b, 0);
    const law = weights.map((w) => w / total);
    const n = 1_000_000;
    const { counts } = iidSource(law).generate(n, 16);
    let chi2 = 0;
    let cells = 0;
    for (let k = 0; k < law.length; k++) {
      if (law[k] === 0) {
        expect(counts[k]).toBe(0);
        continue;
      }
      chi2 += (counts[k]! - n * law[k]!) ** 2 / (n * law[k]!);
      cells++;
    }
    // Pearson's chi-square with cells - 1 degrees of freedom (Pearson 1900, from memory).
    expect(chi2).toBeLessThan(chisquareQuantile(1 - 1e-4, cells - 1));
  });

  it('starts in the stationary law: first and fourth symbols over 4000 seeds match pi', () => {
    const source = markovSource(TWO_STATE);
    const seeds = 4000;
    let first = 0;
    let fourth = 0;
    for (let seed = 0; seed < seeds; seed++) {
      const { symbols } = source.generate(4, seed);
      first += symbols[0]!;
      fourth += symbols[3]!;
    }
    // pi_1 = 0.2 (THEORY.md section 2 [calc]); seeds give independent streams, so binomial SE.
    expect(Math.abs(first / seeds - 0.2)).toBeLessThan(Z * binomialSe(0.2, seeds));
    expect(Math.abs(fourth / seeds - 0.2)).toBeLessThan(Z * binomialSe(0.2, seeds));
  });

  it('order-2 chain starts with its first two symbols drawn from the stationary context law', () => {
    const rows = ORDER_TWO;
    const source = markovSource(rows, 2);
    const pi = stationaryDistribution(liftMarkovOrder(rows, 2).lifted.map((r) => Array.from(r)));
    const seeds = 4000;
    const counts = new Float64Array(4);
    for (let seed = 0; seed < seeds; seed++) {
      const { symbols } = source.generate(2, seed);
      counts[2 * symbols[0]! + symbols[1]!]!++;
    }
    for (let r = 0; r < 4; r++) {
      expect(Math.abs(counts[r]! / seeds - pi[r]!)).toBeLessThan(Z * binomialSe(pi[r]!, seeds));
    }
  });
});

describe('golden-mean shift', () => {
  const { symbols } = goldenMeanSource().generate(200_000, 21);

  it('never emits 11', () => {
    let pairs = 0;
    for (let t = 0; t + 1 < symbols.length; t++) if (symbols[t] === 1 && symbols[t + 1] === 1) pairs++;
    expect(pairs).toBe(0);
  });

  it('shows exactly F_{n+2} distinct n-blocks, the number of allowed words (Kac: mean return time)', () => {
    // Fibonacci F_1 = F_2 = 1 (from memory); the number of binary words of length n without 11
    // is F_{n+2} (from memory), confirmed by enumeration below.
    const fib = [0, 1, 1];
    while (fib.length < 20) fib.push(fib[fib.length - 1]! + fib[fib.length - 2]!);
    for (let n = 1; n <= 14; n++) {
      let allowed = 0;
      for (let w = 0; w < 1 << n; w++) if ((w & (w >>> 1)) === 0) allowed++;
      expect(allowed).toBe(fib[n + 2]);
      const seen = new Set<number>();
      let code = 0;
      const mask = (1 << n) - 1;
      for (let t = 0; t < symbols.length; t++) {
        code = ((code << 1) | symbols[t]!) & mask;
        if (t >= n - 1) seen.add(code);
      }
      // Every allowed 14-block has mass >= pi_1 phi^-13 / phi ~ 2e-4 here, seen ~50 times in 2e5.
      expect(seen.size).toBe(fib[n + 2]);
    }
  });

  it('has symbol and pair frequencies of its Parry chain within 4 SE', () => {
    const phi = (1 + Math.sqrt(5)) / 2;
    // P from THEORY.md section 4
    expectChainFrequencies(
      [
        [1 / phi, 1 / (phi * phi)],
        [1, 0],
      ],
      symbols,
    );
  });
});

describe('continued-fraction digits', () => {
  const source = continuedFractionSource();
  const n = 2_000_000;
  const detailed = source.generateDetailed!(n, 31);
  const { symbols, alphabet } = detailed.sequence;

  it('follow the Gauss-Kuzmin law p(1), p(2), p(3), p(10) within 4 batch-means SE', () => {
    // Gauss-Kuzmin values from THEORY.md section 4 [pub]
    const expected: [string, number][] = [
      ['1', 0.415037499279],
      ['2', 0.169925001442],
      ['3', 0.0931094043915],
      ['10', 0.0119726416661],
    ];
    for (const [digit, p] of expected) {
      const id = alphabet.indexOf(digit);
      expect(id).toBeGreaterThanOrEqual(0);
      const indicator = new Float64Array(n);
      for (let t = 0; t < n; t++) indicator[t] = symbols[t] === id ? 1 : 0;
      const { mean, se } = batchMeans(indicator, 2000);
      expect(Math.abs(mean - p)).toBeLessThan(Z * se);
    }
  });

  it('carry exact information per digit whose mean is pi^2/(6 ln 2) within 4 SE', () => {
    const { mean, se } = batchMeans(detailed.information, 2000);
    // h = pi^2/(6 ln 2) = 2.37313822083125, THEORY.md section 4 [pub]
    expect(Math.abs(mean - 2.37313822083125)).toBeLessThan(Z * se);
  });

  it('have a long-run information variance consistent with sigma^2 = 3.44858814952674', () => {
    const { longRunVariance } = batchMeans(detailed.information, 2000);
    // sigma^2 from THEORY.md section 4 [calc: second derivative of the pressure]. The batch-means
    // estimate from a = 1000 near-Gaussian batch sums has relative SE sqrt(2/(a-1)) (chi-square);
    // its O(1/b) bias is far smaller.
    const sigma2 = 3.44858814952674;
    expect(Math.abs(longRunVariance - sigma2)).toBeLessThan(Z * sigma2 * Math.sqrt(2 / 999));
  });

  it('start in the Gauss measure: the first digit over 4000 seeds is 1 with probability p(1)', () => {
    const seeds = 4000;
    let ones = 0;
    for (let seed = 0; seed < seeds; seed++) {
      const seq = source.generate(1, seed);
      if (seq.alphabet[seq.symbols[0]!] === '1') ones++;
    }
    // p(1) = 0.415037499279, THEORY.md section 4 [pub]
    expect(Math.abs(ones / seeds - 0.415037499279)).toBeLessThan(Z * binomialSe(0.415037499279, seeds));
  });
});

describe('renewal process', () => {
  it('has i.i.d. gaps with P(T >= m) = m^-1.5 within 4 binomial SE', () => {
    const alpha = 1.5;
    const { symbols } = renewalSource(alpha).generate(2_000_000, 41);
    const gaps: number[] = [];
    let last = -1;
    for (let t = 0; t < symbols.length; t++) {
      if (symbols[t] === 1) {
        if (last >= 0) gaps.push(t - last);
        last = t;
      }
    }
    const m = gaps.length;
    // Gaps between 1s after the first are i.i.d. by construction, so binomial SEs are exact.
    const checks: [string, (g: number) => boolean, number][] = [
      ['T = 1', (g) => g === 1, 1 - 2 ** -alpha],
      ['T = 2', (g) => g === 2, 2 ** -alpha - 3 ** -alpha],
      ['T >= 10', (g) => g >= 10, 10 ** -alpha],
      ['T >= 1000', (g) => g >= 1000, 1000 ** -alpha],
    ];
    for (const [, test, p] of checks) {
      const f = gaps.filter(test).length / m;
      expect(Math.abs(f - p)).toBeLessThan(Z * binomialSe(p, m));
    }
  });

  it('starts in the delayed (stationary) law: P(x_0 = 1), P(x_0 x_1 = 01), P(first 10 are 0) over 4000 seeds', () => {
    const alpha = 1.5;
    const source = renewalSource(alpha);
    // zeta(1.5) = 2.612375348685488 (from memory); P(D = d) = (d+1)^-alpha / zeta(alpha)
    const zeta = 2.612375348685488;
    const seeds = 4000;
    let one = 0;
    let zeroOne = 0;
    let tenZeros = 0;
    for (let seed = 0; seed < seeds; seed++) {
      const { symbols } = source.generate(10, seed);
      if (symbols[0] === 1) one++;
      if (symbols[0] === 0 && symbols[1] === 1) zeroOne++;
      if (symbols.every((x) => x === 0)) tenZeros++;
    }
    const pOne = 1 / zeta;
    const pZeroOne = 2 ** -alpha / zeta;
    let pTen = 1;
    for (let d = 0; d < 10; d++) pTen -= (d + 1) ** -alpha / zeta;
    expect(Math.abs(one / seeds - pOne)).toBeLessThan(Z * binomialSe(pOne, seeds));
    expect(Math.abs(zeroOne / seeds - pZeroOne)).toBeLessThan(Z * binomialSe(pZeroOne, seeds));
    expect(Math.abs(tenZeros / seeds - pTen)).toBeLessThan(Z * binomialSe(pTen, seeds));
  });

  it('with alpha = 3 has a frequency of 1s of 1/zeta(3) within 4 renewal-CLT SE', () => {
    const n = 2_000_000;
    const { counts } = renewalSource(3).generate(n, 42);
    // zeta(3) = 1.2020569031595942 (Apery's constant, from memory) is the mean gap. Renewal CLT
    // (Feller vol. 2, XI.5, from memory): Var(number of 1s) ~ n Var(T) / E[T]^3, with
    // E[T^2] = sum (2m - 1) P(T >= m) = 2 zeta(2) - zeta(3) and zeta(2) = pi^2/6 (Euler).
    const mu = 1.2020569031595942;
    const varT = 2 * (Math.PI ** 2 / 6) - mu - mu * mu;
    expect(renewalMeanGap(3)).toBeCloseTo(mu, 14);
    const se = Math.sqrt((n * varT) / mu ** 3) / n;
    expect(Math.abs(counts[1]! / n - 1 / mu)).toBeLessThan(Z * se);
  });
});

describe('every catalog source', () => {
  it('gives the same path for the same seed and different paths for different seeds', () => {
    for (const source of sourceCatalog()) {
      const a = source.generate(2000, 7);
      const b = source.generate(2000, 7);
      const c = source.generate(2000, 8);
      expect(Array.from(b.symbols)).toEqual(Array.from(a.symbols));
      expect(b.alphabet).toEqual(a.alphabet);
      const labelsA = Array.from(a.symbols, (s) => a.alphabet[s]);
      const labelsC = Array.from(c.symbols, (s) => c.alphabet[s]);
      expect(labelsC).not.toEqual(labelsA);
    }
  });
});
