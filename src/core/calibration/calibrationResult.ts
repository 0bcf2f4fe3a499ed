import type { AnalysisResult, AnalysisSettings } from '../result/analysisResult';
import { entropyFromNats, varianceFromNats } from '../estimate/units';
import type { Sequence } from '../sequence/sequence';
import type { CalibrationSummary } from './calibrationSummary';
import { calibrationSummary } from './calibrationSummary';
import type { FittedMarkovModel } from './fittedMarkovModel';
import { fittedMarkovModel } from './fittedMarkovModel';
import type { MarkovOrderFit, OrderScore } from './markovOrderFit';
import { markovOrderFit } from './markovOrderFit';
import type { ReplicateRecord, StudyHooks } from './surrogateStudy';
import { surrogateStudy } from './surrogateStudy';

export const CALIBRATION_SCHEMA = 'returnrate.calibration/1';
/** Fewest replicates a calibration accepts. */
export const MIN_CALIBRATION_REPLICATES = 10;

/** What the calibration says about the fitted chain (rates in the output unit). */
export interface CalibrationModelFacts {
  readonly order: number;
  readonly maxOrder: number;
  readonly capReason: string;
  readonly criterion: 'BIC';
  readonly observations: number;
  readonly scores: readonly OrderScore[];
  readonly states: number;
  readonly transientStates: number;
  readonly droppedTransitions: number;
  readonly period: number;
  readonly entropyRate: number;
  readonly sigma2: number;
  /** How unseen transitions and contexts are treated, in plain words. */
  readonly rule: string;
}

/** A finished (or partial) calibration of one analysis: plain data, saved and exported as JSON. */
export interface CalibrationResult {
  readonly schema: typeof CALIBRATION_SCHEMA;
  /** The analysis it calibrates: the input's name and SHA-256 (null for generated input) and settings. */
  readonly input: { readonly name: string; readonly sha256: string | null; readonly symbols: number };
  readonly settings: AnalysisSettings;
  readonly baseSeed: number;
  readonly replicatesRequested: number;
  /** True when fewer replicates finished than were requested (cancelled). */
  readonly partial: boolean;
  readonly model: CalibrationModelFacts;
  readonly records: readonly ReplicateRecord[];
  readonly summary: CalibrationSummary;
}

export const FIT_RULE =
  'Maximum likelihood: a transition never seen has probability 0 and a context never seen has no row; ' +
  'transitions into a context with no observed continuation (only possible at the end of the data) are dropped, ' +
  'and surrogates start from the stationary law of the one closed class, so transient contexts never occur.';

/** The order chosen by BIC and the chain fitted at that order. */
export interface CalibrationModel {
  readonly fit: MarkovOrderFit;
  readonly model: FittedMarkovModel;
}

/**
 * Fits the Markov chain the surrogates come from (markovOrderFit, fittedMarkovModel).
 * @throws RangeError for sequences that are too short or alphabets too large to fit
 */
export function fitCalibrationModel(sequence: Sequence): CalibrationModel {
  const fit = markovOrderFit(sequence.symbols, sequence.alphabet.length);
  return { fit, model: fittedMarkovModel(fit.counts, fit.alphabetSize, fit.order) };
}

export function calibrationModelFacts(fitted: CalibrationModel, settings: AnalysisSettings): CalibrationModelFacts {
  const { fit, model } = fitted;
  return {
    order: fit.order,
    maxOrder: fit.maxOrder,
    capReason: fit.capReason,
    criterion: 'BIC',
    observations: fit.observations,
    scores: fit.scores,
    states: model.states,
    transientStates: model.transientStates,
    droppedTransitions: model.droppedTransitions,
    period: model.period,
    entropyRate: entropyFromNats(model.entropyRateNats, settings.unit),
    sigma2: varianceFromNats(model.sigma2Nats, settings.unit),
    rule: FIT_RULE,
  };
}

/** Checks a requested number of replicates. */
export function checkReplicates(replicates: number): void {
  if (!Number.isInteger(replicates) || replicates < MIN_CALIBRATION_REPLICATES || replicates > 100000) {
    throw new RangeError(`the number of replicates must be a whole number from ${MIN_CALIBRATION_REPLICATES} to 100000; got ${replicates}`);
  }
}

/** What a calibration needs of the analysis it calibrates (an AnalysisResult has all of it). */
export interface CalibratedAnalysis {
  readonly input: Pick<AnalysisResult['input'], 'name' | 'sha256' | 'symbols'>;
  readonly settings: AnalysisSettings;
  readonly entropy: Pick<AnalysisResult['entropy'], 'estimate' | 'ci95'>;
}

/** Assembles the calibration of `analysis` from the model and the merged records of any workers. */
export function calibrationResult(
  analysis: CalibratedAnalysis,
  facts: CalibrationModelFacts,
  records: readonly ReplicateRecord[],
  replicatesRequested: number,
  baseSeed: number,
): CalibrationResult {
  const summary = calibrationSummary(
    records,
    { entropy: facts.entropyRate, sigma2: facts.sigma2 },
    {
      estimate: Number.isFinite(analysis.entropy.estimate) ? analysis.entropy.estimate : null,
      interval: Number.isFinite(analysis.entropy.ci95[0]) && Number.isFinite(analysis.entropy.ci95[1]) ? analysis.entropy.ci95 : null,
    },
    analysis.settings.confidence,
    facts.order,
  );
  const sorted = [...records].sort((a, b) => a.replicate - b.replicate);
  return {
    schema: CALIBRATION_SCHEMA,
    input: { name: analysis.input.name, sha256: analysis.input.sha256, symbols: analysis.input.symbols },
    settings: analysis.settings,
    baseSeed,
    replicatesRequested,
    partial: summary.replicates < replicatesRequested,
    model: facts,
    records: sorted,
    summary,
  };
}

/**
 * The whole calibration in one thread: fit, R surrogates of the data's length analysed with the
 * data's settings, summary. Hosts with workers call fitCalibrationModel and surrogateStudy
 * themselves and merge with calibrationResult.
 * @throws RangeError for a bad number of replicates or data that cannot be fitted; ScanCancelled
 */
export function calibrateSequence(
  sequence: Sequence,
  analysis: AnalysisResult,
  replicates: number,
  baseSeed: number,
  hooks: StudyHooks = {},
): CalibrationResult {
  checkReplicates(replicates);
  const fitted = fitCalibrationModel(sequence);
  const facts = calibrationModelFacts(fitted, analysis.settings);
  const indices = Array.from({ length: replicates }, (_, i) => i);
  const records = surrogateStudy(fitted.model, sequence.alphabet, sequence.symbols.length, analysis.settings, baseSeed, indices, hooks);
  return calibrationResult(analysis, facts, records, replicates, baseSeed);
}
