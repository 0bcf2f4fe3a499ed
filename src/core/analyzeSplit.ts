import { analyzeScannedSequence, scanOptionsOf, validateSettings, type AnalysisHooks } from './analyze';
import type { AnalysisResult, AnalysisSettings, InputSummary } from './result/analysisResult';
import type { ScanRunner } from './returns/scanJobs';
import { scanReturnsSplit } from './returns/splitScan';
import type { Sequence } from './sequence/sequence';

/**
 * analyzeSequence with the scan shared among `groups` threads (scanReturnsSplit); `run` decides
 * where its jobs run (worker threads in hosts, this process in tests).
 * @param afterScan called once the scan is done, before the estimates: hosts end their threads
 *   there, so that the threads' memory is free for the rest of the analysis
 * @throws RangeError for invalid settings; ScanCancelled when hooks.shouldStop returns true
 */
export async function analyzeSequenceSplit(
  sequence: Sequence,
  input: Omit<InputSummary, 'symbols' | 'alphabetSize'>,
  settings: AnalysisSettings,
  groups: number,
  run: ScanRunner,
  hooks: AnalysisHooks = {},
  afterScan?: () => void,
): Promise<AnalysisResult> {
  validateSettings(settings, sequence.symbols.length);
  const scan = await scanReturnsSplit(sequence.symbols, sequence.alphabet.length, scanOptionsOf(settings, hooks), groups, run);
  afterScan?.();
  return analyzeScannedSequence(sequence, scan, input, settings, hooks);
}
