import normalQuantile from '@stdlib/stats-base-dists-normal-quantile';
import { uniformStream, type UniformStream } from '../../../src/core/sources/seededRandom';

/** A fixed-seed stream of uniforms for the statistical tests (the project's own xoroshiro128+). */
export function uniforms(seed: number): UniformStream {
  return uniformStream(seed);
}

/** Half the spacing of the stream's uniforms (multiples of 2^-53): moves them into (0, 1). */
const HALF_STEP = 2 ** -54;

/** m standard normal values by inversion of uniforms in (0, 1) (the standard method, from memory). */
export function normalSample(stream: UniformStream, m: number): Float64Array {
  const out = new Float64Array(m);
  for (let i = 0; i < m; i++) out[i] = normalQuantile(stream.next() + HALF_STEP, 0, 1);
  return out;
}

/** m Exp(1) values by inversion, -log(U) with U in (0, 1]. */
export function exponentialSample(stream: UniformStream, m: number): Float64Array {
  const out = new Float64Array(m);
  for (let i = 0; i < m; i++) out[i] = -Math.log(stream.nextPositive());
  return out;
}
