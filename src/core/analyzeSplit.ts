import { analyzeFromScan, validateSettings, type AnalysisHooks } from './analyze';
import type { AnalysisResult, AnalysisSettings, InputSummary } from './result/analysisResult';
import { alphabetSummary } from './result/alphabetSummary';
import type { ScanOptions } from './returns/scanReturns';
import { scanReturnsSplit, type GroupRunner } from './returns/splitScan';
import type { Sequence } from './sequence/sequence';

/**
 * analyzeSequence with the scan shared among `groups` after the first levels (scanReturnsSplit);
 * `runGroups` decides where the groups run (worker threads in hosts, this process in tests).
 * @throws RangeError for invalid settings; ScanCancelled when hooks.shouldStop returns true
 */
export async function analyzeSequenceSplit(
  sequence: Sequence,
  input: Omit<InputSummary, 'symbols' | 'alphabetSize'>,
  settings: AnalysisSettings,
  groups: number,
  runGroups: GroupRunner,
  hooks: AnalysisHooks = {},
): Promise<AnalysisResult> {
  const N = sequence.symbols.length;
  validateSettings(settings, N);
  const { onLevel, onLevelStats } = hooks;
  const options: ScanOptions = {
    maxN: settings.maxN,
    ...(hooks.pathSamples === undefined ? {} : { sampleTarget: hooks.pathSamples }),
    onLevel: (level, active) => {
      onLevel?.(level.n, active);
      onLevelStats?.(level, active);
    },
    ...(hooks.shouldStop === undefined ? {} : { shouldStop: hooks.shouldStop }),
  };
  const scan = await scanReturnsSplit(sequence.symbols, sequence.alphabet.length, options, groups, runGroups);
  const listed = alphabetSummary(sequence);
  const summary: InputSummary = {
    ...input,
    symbols: N,
    alphabetSize: sequence.alphabet.length,
    alphabet: listed.symbols,
    alphabetUnlisted: listed.unlisted,
  };
  return analyzeFromScan(scan, summary, settings, hooks.reference === undefined ? {} : { reference: hooks.reference });
}
