import type { Sequence } from '../sequence/sequence';
import { allocateSymbols } from '../sequence/sequence';
import { buildAliasTable } from './aliasTable';
import type { DetailedSample, ReferenceSource } from './referenceSource';
import { snapSigma2 } from './referenceSource';
import { uniformStream } from './seededRandom';
import { checkLength, indexLabels, sequenceFromSymbols } from './sequenceFromSymbols';

/** Laws with more symbols than this are drawn with an alias table instead of a linear search. */
const LINEAR_SEARCH_MAX = 16;

/** Probabilities may sum to 1 within this; they are then rescaled by their sum. */
const SUM_TOLERANCE = 1e-9;

/**
 * Checks a finite law: at least one entry, finite non-negative entries summing to 1 within 1e-9.
 * Returns the law rescaled by its sum.
 * @throws RangeError naming the bad entry or the sum
 */
export function checkProbabilities(probabilities: readonly number[]): Float64Array {
  if (probabilities.length < 1) throw new RangeError('a law needs at least one probability');
  let sum = 0;
  for (let k = 0; k < probabilities.length; k++) {
    const p = probabilities[k];
    if (!Number.isFinite(p) || p < 0) throw new RangeError(`probability ${k + 1} is ${p}`);
    sum += p;
  }
  if (!(Math.abs(sum - 1) <= SUM_TOLERANCE)) throw new RangeError(`probabilities sum to ${sum}, not 1`);
  const law = new Float64Array(probabilities.length);
  for (let k = 0; k < law.length; k++) law[k] = probabilities[k] / sum;
  return law;
}

/** Cumulative sums of a law with the last positive entry and everything after it set to exactly 1. */
export function cumulativeLaw(law: ArrayLike<number>, out: Float64Array, offset: number): void {
  let last = 0;
  for (let j = 0; j < law.length; j++) if (law[j] > 0) last = j;
  let s = 0;
  for (let j = 0; j < law.length; j++) {
    s += law[j];
    // A rounded sum below 1 would let a uniform near 1 fall onto a zero-probability symbol.
    out[offset + j] = j >= last ? 1 : s;
  }
}

function fillIid(symbols: Sequence['symbols'], law: Float64Array, seed: number): void {
  const uniforms = uniformStream(seed);
  const k = law.length;
  const n = symbols.length;
  if (k === 1) return;
  if (k <= LINEAR_SEARCH_MAX) {
    const cumulative = new Float64Array(k);
    cumulativeLaw(law, cumulative, 0);
    for (let t = 0; t < n; t++) {
      const u = uniforms.next();
      let j = 0;
      while (u >= cumulative[j]) j++;
      symbols[t] = j;
    }
    return;
  }
  const { threshold, alias } = buildAliasTable(law);
  for (let t = 0; t < n; t++) {
    const x = uniforms.next() * k;
    const j = Math.floor(x);
    symbols[t] = x - j < threshold[j] ? j : alias[j];
  }
}

/**
 * Independent symbols with a fixed law. Symbol k has label String(k) and probability
 * probabilities[k]; h = -sum p log p, sigma^2 = Var(-log p(X)) (exact up to rounding).
 * @param probabilities the law, non-negative, summing to 1 within 1e-9 (rescaled to sum to 1)
 * @throws RangeError for a bad law
 */
export function iidSource(probabilities: readonly number[]): ReferenceSource {
  const law = checkProbabilities(probabilities);
  const k = law.length;
  let h = 0;
  for (let j = 0; j < k; j++) if (law[j] > 0) h -= law[j] * Math.log(law[j]);
  let variance = 0;
  for (let j = 0; j < k; j++) {
    if (law[j] > 0) {
      const d = -Math.log(law[j]) - h;
      variance += law[j] * d * d;
    }
  }
  const sigma2 = snapSigma2(variance, h);
  const alphabet = indexLabels(k);
  const information = new Float64Array(k);
  for (let j = 0; j < k; j++) information[j] = law[j] > 0 ? -Math.log(law[j]) : Infinity;

  const generate = (length: number, seed: number): Sequence => {
    checkLength(length);
    const symbols = allocateSymbols(length, k);
    fillIid(symbols, law, seed);
    return sequenceFromSymbols(symbols, alphabet);
  };
  const generateDetailed = (length: number, seed: number): DetailedSample => {
    const sequence = generate(length, seed);
    const info = new Float64Array(length);
    for (let t = 0; t < length; t++) info[t] = information[sequence.symbols[t]];
    return { sequence, information: info, warnings: [] };
  };
  const shown = Array.from(law, (p) => String(+p.toPrecision(6))).join(', ');
  return {
    id: `iid:${Array.from(law, String).join(',')}`,
    label: k === 2 ? `Bernoulli(${+law[1].toPrecision(6)})` : `i.i.d. law (${shown})`,
    facts: {
      entropyRate: h,
      sigma2,
      description:
        `Independent symbols 0..${k - 1} with probabilities (${shown}), drawn from 53-bit uniforms ` +
        `(xoroshiro128+) by ${k <= LINEAR_SEARCH_MAX ? 'a cumulative search' : 'an alias table'}. ` +
        'h = -sum p log p and sigma^2 = Var(-log p(X)) are exact up to rounding' +
        (sigma2 === 0 ? '; sigma^2 = 0 because every possible symbol is equally likely, so return times follow the exponential law instead of the Gaussian one.' : '.'),
      gaussianLimit: sigma2 > 0,
    },
    generate,
    generateDetailed,
  };
}
