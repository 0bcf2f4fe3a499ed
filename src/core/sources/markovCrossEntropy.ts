import {
  checkTransitionMatrix,
  entropyRateOfChecked,
  functionalMomentsOfChecked,
  stationaryOfChecked,
  type TransitionMatrix,
} from './markovEntropy';

/** Exact rates of a stationary chain P measured against a second chain Q (nats per step). */
export interface MarkovCrossFacts {
  /** h(P) = -sum_i pi_i sum_j P_ij log P_ij. */
  readonly entropyRate: number;
  /** H(P, Q) = -sum_i pi_i sum_j P_ij log Q_ij; Infinity when P allows a step that Q forbids. */
  readonly crossEntropyRate: number;
  /** D(P || Q) = H(P, Q) - h(P) >= 0; Infinity as above. */
  readonly relativeEntropyRate: number;
  /** lim Var_P(-log Q(X_1..X_n)) / n; null when H(P, Q) is infinite. */
  readonly crossSigma2: number | null;
}

/**
 * Cross entropy rate, relative entropy rate and the variance rate of the cross information
 * -log Q(X_1..X_n) of a stationary first-order chain P (pi its stationary law) against a chain Q on
 * the same states.
 *
 * H(P, Q) = -sum_i pi_i sum_j P_ij log Q_ij and D(P || Q) = sum_i pi_i sum_j P_ij log(P_ij / Q_ij)
 * (Rached, Alajaji & Campbell, "The Kullback-Leibler divergence rate between Markov sources", IEEE
 * Trans. IT 50 (2004), the formula for irreducible first-order chains; page numbers from memory).
 * The initial term -log q(X_1) is bounded, so it changes neither rate.
 *
 * sigma^2: -log Q(X_1..X_n) = -log q(X_1) + sum_t F(X_t, X_{t+1}) with F(i,j) = -log Q_ij, an
 * additive functional of the P-chain; its variance rate is the martingale (Poisson-equation) formula
 * of THEORY.md section 2 with this F in place of -log P_ij (functionalMomentsOfChecked: Z = (I - P +
 * 1 pi)^-1, u = Z (g - H 1), g_i = sum_j P_ij F(i,j)). This is the sigma^2 of the central limit
 * theorem for log W_n around -log Q(A_1^n) (Kontoyiannis, J. Theoret. Probab. 11 (1998) 795-811,
 * waiting times between realizations of different processes).
 * @throws RangeError when either matrix is bad (checkTransitionMatrix) or their sizes differ
 */
export function markovCrossFacts(p: TransitionMatrix, q: TransitionMatrix): MarkovCrossFacts {
  const chain = checkTransitionMatrix(p);
  const other = checkTransitionMatrix(q);
  const n = chain.size;
  if (other.size !== n) throw new RangeError(`the two chains have ${n} and ${other.size} states; they must match`);
  const pi = stationaryOfChecked(chain);
  const h = entropyRateOfChecked(chain, pi);
  const f = new Float64Array(n * n);
  let infinite = false;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const k = i * n + j;
      if (chain.transitions[k] === 0) continue;
      const qij = other.transitions[k];
      if (qij === 0) {
        // A step P takes from a state it visits and Q never takes: -log Q(X_1..X_n) = Infinity.
        if (pi[i] > 0) infinite = true;
        continue;
      }
      f[k] = -Math.log(qij);
    }
  }
  if (infinite) {
    return { entropyRate: h, crossEntropyRate: Infinity, relativeEntropyRate: Infinity, crossSigma2: null };
  }
  const { mean, variance } = functionalMomentsOfChecked(chain, pi, f);
  // D directly from the ratios, not as H - h, so that it is exactly 0 for P = Q and never negative
  // by rounding.
  let d = 0;
  for (let i = 0; i < n; i++) {
    if (pi[i] === 0) continue;
    let row = 0;
    for (let j = 0; j < n; j++) {
      const k = i * n + j;
      const pij = chain.transitions[k];
      if (pij > 0) row += pij * Math.log(pij / other.transitions[k]);
    }
    d += pi[i] * row;
  }
  return { entropyRate: h, crossEntropyRate: mean, relativeEntropyRate: Math.max(0, d), crossSigma2: variance };
}
