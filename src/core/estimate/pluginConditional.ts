import type { LevelStats } from '../returns/levelStats';
import { batchMeansInterval, type BatchPlan } from './batchMeans';
import { millerMadowBlockEntropy } from './blockEntropy';
import { batchSizes, conditionalInformationSums, wellSampledLength } from './conditionalInformation';
import { notApplicable, type EstimatorResult } from './estimatorResult';

/** Well-sampled rule, part 1: at least 20 occurrences per distinct k-block on average. */
export const PLUGIN_MIN_MEAN_COUNT = 20;
/** Well-sampled rule, part 2: at most 0.1% of positions in blocks seen once. */
export const PLUGIN_MAX_SINGLETON_SHARE = 0.001;

/** Plug-in conditional entropy with what the headline rule needs to judge it. */
export interface PluginConditionalResult extends EstimatorResult {
  /** Block length k used (0 when the sequence is empty). */
  readonly k: number;
  /** Largest well-sampled block length (0 when even k = 1 is not well sampled). */
  readonly wellSampled: number;
  /** Step into k, h_(k-1) - h_k (nats), and its standard error; null for k = 1. */
  readonly step: number | null;
  readonly stepStandardError: number | null;
  /** True when a plateau was found (see pluginConditional for the rule). */
  readonly converged: boolean;
}

function conditional(levels: readonly LevelStats[], k: number): number {
  return millerMadowBlockEntropy(levels[k - 1]) - (k >= 2 ? millerMadowBlockEntropy(levels[k - 2]) : 0);
}

function batchMeansOf(sums: Float64Array, sizes: Float64Array): Float64Array {
  const out = new Float64Array(sums.length);
  for (let g = 0; g < sums.length; g++) out[g] = sums[g] / sizes[g];
  return out;
}

/**
 * Entropy rate as the Miller-Madow corrected conditional block entropy h_k = H_k - H_(k-1) (Miller
 * 1955; THEORY.md section 7), nats. h_k decreases to h (Cover & Thomas, 2nd ed., Thm 4.2.1) and
 * equals h once k exceeds the memory of a Markov source; the plug-in is biased downward when blocks
 * are undersampled.
 *
 * Rule: among the well-sampled k (wellSampledLength with PLUGIN_MIN_MEAN_COUNT and
 * PLUGIN_MAX_SINGLETON_SHARE, largest k_top), take the smallest k with 2 <= k < k_top at which both
 * steps h_(k-1) - h_k and h_k - h_(k+1) are within two of their standard errors of zero: the
 * conditional entropies have stopped falling, and the smallest such k carries the least sampling
 * bias. Asking for two flat steps guards somewhat against slowly decaying h_k (long memory), whose
 * single steps drown in noise before the decline ends. Without a plateau,
 * report k = k_top (least memory bias), or k = 1 when not even that is well sampled; then
 * `converged` is false. Interval and standard errors come from batch means of the empirical
 * conditional information, whose mean is h_k (conditionalInformation.ts), so they respect dependence.
 * @param planAt coarse batches inside the first `positions` positions
 */
export function pluginConditional(
  levels: readonly LevelStats[],
  planAt: (positions: number) => BatchPlan,
  confidence: number,
): PluginConditionalResult {
  if (levels.length === 0) {
    return { ...notApplicable('No levels.'), k: 0, wellSampled: 0, step: null, stepStandardError: null, converged: false };
  }
  const wellSampled = wellSampledLength(levels, PLUGIN_MIN_MEAN_COUNT, PLUGIN_MAX_SINGLETON_SHARE);
  let k = Math.max(1, wellSampled);
  let step: number | null = null;
  let stepStandardError: number | null = null;
  let converged = false;
  // Step h_(j-1) - h_j and its batch-means standard error, for j = 2..wellSampled.
  const steps: { d: number; se: number | null }[] = [];
  for (let j = 2; j <= wellSampled; j++) {
    const plan = planAt(levels[j - 1].positions);
    const sizes = batchSizes(plan);
    const here = conditionalInformationSums(levels, j, plan);
    const before = conditionalInformationSums(levels, j - 1, plan);
    for (let g = 0; g < plan.count; g++) before[g] -= here[g];
    const d = conditional(levels, j - 1) - conditional(levels, j);
    const ci = batchMeansInterval(d, batchMeansOf(before, sizes), sizes, confidence);
    steps.push({ d, se: ci === null ? null : ci.standardError });
  }
  const flat = (j: number): boolean => {
    const s = steps[j - 2];
    return s !== undefined && s.se !== null && Math.abs(s.d) <= 2 * s.se;
  };
  for (let j = 2; j < wellSampled; j++) {
    if (flat(j) && flat(j + 1)) {
      k = j;
      converged = true;
      break;
    }
  }
  if (!converged && wellSampled >= 2) k = wellSampled;
  if (k >= 2) {
    step = steps[k - 2].d;
    stepStandardError = steps[k - 2].se;
  }
  const estimate = conditional(levels, k);
  const plan = planAt(levels[k - 1].positions);
  const sizes = batchSizes(plan);
  const ci = batchMeansInterval(estimate, batchMeansOf(conditionalInformationSums(levels, k, plan), sizes), sizes, confidence);
  const stepText =
    step === null
      ? 'no smaller k to compare with'
      : `h_${k - 1} - h_${k} = ${step.toPrecision(3)}${stepStandardError === null ? '' : ` +- ${stepStandardError.toPrecision(2)}`}`;
  const how = converged
    ? `the first well-sampled k where the conditional entropies stop falling (${stepText})`
    : wellSampled === 0
      ? `k = 1 although single symbols are undersampled (${levels[0].singletons} seen once): expect a downward bias`
      : `the largest well-sampled k; no plateau yet (${stepText})`;
  return {
    estimate,
    standardError: ci === null ? null : ci.standardError,
    interval: ci === null ? null : [ci.lower, ci.upper],
    lengthsUsed: [k, k],
    note: `Miller-Madow H_${k} - H_${k - 1} at ${how}.`,
    k,
    wellSampled,
    step,
    stepStandardError,
    converged,
  };
}
