import { analyzeSequence } from '../analyze';
import type { AnalysisSettings } from '../result/analysisResult';
import { fmix32 } from '../sources/fmix32';
import { sequenceFromSymbols } from '../sources/sequenceFromSymbols';
import type { FittedMarkovModel } from './fittedMarkovModel';
import { generateFromModel } from './fittedMarkovModel';

/** What one surrogate analysis gave: plain data, so records from any number of workers merge. */
export interface ReplicateRecord {
  /** Replicate index i (0-based); its seed is replicateSeed(baseSeed, i). */
  readonly replicate: number;
  readonly seed: number;
  /** Headline entropy rate in the settings' unit, null when the analysis gave none. */
  readonly entropy: number | null;
  readonly entropyInterval: readonly [number, number] | null;
  readonly entropyMethod: string;
  /** sigma^2 in the settings' unit squared, null when none. */
  readonly sigma2: number | null;
  readonly sigma2Interval: readonly [number, number] | null;
}

/** Replicate indices stay below this, so seeds built from them stay safe integers. */
export const MAX_REPLICATES = 1 << 20;

/**
 * The seed of replicate i under a base seed: a 32-bit hash of the base seed times 2^20 plus i, so
 * the replicates of one base seed are distinct, and seededRandom hashes each into its own stream.
 * @throws RangeError for a base seed that is not a safe integer or an index outside [0, MAX_REPLICATES)
 */
export function replicateSeed(baseSeed: number, index: number): number {
  if (!Number.isSafeInteger(baseSeed)) throw new RangeError(`seed must be a safe integer; got ${baseSeed}`);
  if (!Number.isInteger(index) || index < 0 || index >= MAX_REPLICATES) {
    throw new RangeError(`replicate index must be an integer from 0 to ${MAX_REPLICATES - 1}; got ${index}`);
  }
  const lo = baseSeed >>> 0;
  const hi = Math.floor(baseSeed / 4294967296) | 0;
  // fmix32 spreads the base seed so that base seeds 1, 2, 3 give unrelated seed families; unsigned here.
  return (fmix32(lo ^ fmix32(hi ^ 0x2545f491)) >>> 0) * MAX_REPLICATES + index;
}

function finiteOrNull(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}

function intervalOrNull(ci: readonly [number, number]): readonly [number, number] | null {
  return Number.isFinite(ci[0]) && Number.isFinite(ci[1]) ? [ci[0], ci[1]] : null;
}

/** Hooks for long studies: cancellation is polled inside each analysis. */
export interface StudyHooks {
  /** Called after each replicate with its record. */
  readonly onReplicate?: (record: ReplicateRecord) => void;
  /** Polled during each scan; returning true abandons the study with ScanCancelled. */
  readonly shouldStop?: () => boolean;
}

/**
 * One surrogate: a path of N symbols of the model under replicate i's seed, with the model's
 * alphabet labels, analysed by analyzeSequence with the same settings as the user's data.
 * @param alphabet labels of the user's symbols (the surrogate has the same alphabet size)
 */
export function runReplicate(
  model: FittedMarkovModel,
  alphabet: readonly string[],
  length: number,
  settings: AnalysisSettings,
  baseSeed: number,
  index: number,
  shouldStop?: () => boolean,
): ReplicateRecord {
  if (alphabet.length !== model.alphabetSize) {
    throw new RangeError(`the model has ${model.alphabetSize} symbols but ${alphabet.length} labels were given`);
  }
  const seed = replicateSeed(baseSeed, index);
  const sequence = sequenceFromSymbols(generateFromModel(model, length, seed), alphabet);
  const result = analyzeSequence(
    sequence,
    { name: `surrogate ${index}`, sha256: null, format: 'generated' },
    settings,
    { pathSamples: 1, ...(shouldStop === undefined ? {} : { shouldStop }) },
  );
  return {
    replicate: index,
    seed,
    entropy: finiteOrNull(result.entropy.estimate),
    entropyInterval: intervalOrNull(result.entropy.ci95),
    entropyMethod: result.entropy.method,
    sigma2: finiteOrNull(result.sigma2.estimate),
    sigma2Interval: intervalOrNull(result.sigma2.ci95),
  };
}

/**
 * The replicates with the given indices, in order. Any split of the indices among workers gives the
 * same records, since each replicate depends only on (model, N, settings, base seed, index).
 */
export function surrogateStudy(
  model: FittedMarkovModel,
  alphabet: readonly string[],
  length: number,
  settings: AnalysisSettings,
  baseSeed: number,
  indices: readonly number[],
  hooks: StudyHooks = {},
): ReplicateRecord[] {
  const records: ReplicateRecord[] = [];
  for (const i of indices) {
    const record = runReplicate(model, alphabet, length, settings, baseSeed, i, hooks.shouldStop);
    records.push(record);
    hooks.onReplicate?.(record);
  }
  return records;
}
