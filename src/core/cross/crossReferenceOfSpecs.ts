import { parseSourceSpec } from '../sources/catalog';
import { markovCrossFacts } from '../sources/markovCrossEntropy';
import type { CrossReferenceFacts } from './compareSequences';

const NUMBER_LIST = /^[^;]+$/;

/**
 * The first-order transition matrix of a reference source given by its spec, when it has one:
 * 'coin', 'bernoulli:P' and 'iid:...' (every row the law), 'markov:...' (order 1). Other sources
 * (higher order, Parry, continued fractions, renewal) give null: their pairs have no closed form here.
 */
export function transitionRowsOfSpec(spec: string): number[][] | null {
  const id = parseSourceSpec(spec).id;
  if (id === 'coin') {
    return [
      [0.5, 0.5],
      [0.5, 0.5],
    ];
  }
  const colon = id.indexOf(':');
  if (colon < 0) return null;
  const name = id.slice(0, colon);
  const body = id.slice(colon + 1);
  if (name === 'iid' && NUMBER_LIST.test(body)) {
    const law = body.split(',').map(Number);
    return law.map(() => law.slice());
  }
  if (name === 'markov') return body.split(';').map((row) => row.split(',').map(Number));
  return null;
}

/**
 * Exact cross entropy, h(A), relative entropy and sigma^2 of the cross information for sequence A
 * from source specA against B from specB (markovCrossFacts), in nats; null when either source has
 * no first-order matrix or their alphabets differ in size. Symbols of both are labelled '0', '1',
 * ..., so equal labels are equal states.
 * @throws RangeError for a bad spec
 */
export function crossReferenceOfSpecs(specA: string, specB: string): CrossReferenceFacts | null {
  const p = transitionRowsOfSpec(specA);
  const q = transitionRowsOfSpec(specB);
  if (p === null || q === null || p.length !== q.length) return null;
  const facts = markovCrossFacts(p, q);
  if (!Number.isFinite(facts.crossEntropyRate)) return null;
  return {
    source: `${parseSourceSpec(specA).id} against ${parseSourceSpec(specB).id}`,
    crossEntropyNats: facts.crossEntropyRate,
    entropyANats: facts.entropyRate,
    relativeEntropyNats: facts.relativeEntropyRate,
    sigma2CrossNats: facts.crossSigma2,
  };
}
