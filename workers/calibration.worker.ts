import { expose } from 'comlink';
import { calibrationModelFacts, createDigestingReader, fitCalibrationModel, runReplicate } from '../src/core';
import type { AnalysisSettings, CalibrationModelFacts, FittedMarkovModel, ReaderOptions, ReplicateRecord, Sequence } from '../src/core';
import { demoScenario } from './demoScenarios';

/** The input of the analysis being calibrated, read again here: a File with its reading options, or a demo. */
export type CalibrationInput =
  | { readonly kind: 'file'; readonly file: Blob; readonly options: ReaderOptions }
  | { readonly kind: 'demo'; readonly id: string; readonly length: number; readonly seed: number };

/** The fitted chain and what the surrogates need besides it; plain data, handed to the other workers. */
export interface FittedInput {
  readonly facts: CalibrationModelFacts;
  readonly model: FittedMarkovModel;
  readonly alphabet: readonly string[];
  readonly length: number;
}

async function readSequence(input: CalibrationInput): Promise<Sequence> {
  if (input.kind === 'demo') return demoScenario(input.id).source.generate(input.length, input.seed);
  const reader = createDigestingReader({ ...input.options, sizeHint: input.file.size });
  const stream = input.file.stream().getReader();
  for (;;) {
    const { done, value } = await stream.read();
    if (done) break;
    reader.push(value);
  }
  return reader.finish().sequence;
}

const api = {
  /** Reads the input again and fits the Markov chain of the order BIC picks. */
  async fit(input: CalibrationInput, settings: AnalysisSettings): Promise<FittedInput> {
    const sequence = await readSequence(input);
    const fitted = fitCalibrationModel(sequence);
    return { facts: calibrationModelFacts(fitted, settings), model: fitted.model, alphabet: sequence.alphabet, length: sequence.symbols.length };
  },

  /** One surrogate of the fitted chain, analysed with the data's settings. */
  replicate(fitted: FittedInput, settings: AnalysisSettings, baseSeed: number, index: number): ReplicateRecord {
    return runReplicate(fitted.model, fitted.alphabet, fitted.length, settings, baseSeed, index);
  },
};

expose(api);

export type CalibrationApi = typeof api;
