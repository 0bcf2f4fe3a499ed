import { analyzeScannedSequence, scanOptionsOf, validateSettings, type AnalysisHooks } from './analyze';
import type { AnalysisResult, AnalysisSettings, InputSummary } from './result/analysisResult';
import type { DiagnosticsTask, ScanRunner } from './returns/scanJobs';
import type { ScanFreeDiagnostics } from './diagnostics/mixingDiagnostics';
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
  const along = withDiagnostics(run, { symbols: sequence.symbols, alphabetSize: sequence.alphabet.length });
  const scan = await scanReturnsSplit(sequence.symbols, sequence.alphabet.length, scanOptionsOf(settings, hooks), groups, along.run);
  afterScan?.();
  return analyzeScannedSequence(sequence, scan, input, settings, hooks, along.result());
}

/**
 * `run` with the scan-free diagnostics added to the scan's batch of class groups, as its last job:
 * sorted largest first, the groups are taken before it, and the thread that runs out of groups
 * first takes it while the others finish theirs. They would otherwise run on this thread alone
 * after the scan (about 0.35 s of a 4 s analysis at 1e7 symbols on two threads, measured). A scan
 * that never shares its classes has no such batch; the diagnostics then run after it, as before.
 */
function withDiagnostics(run: ScanRunner, task: DiagnosticsTask): { run: ScanRunner; result: () => ScanFreeDiagnostics | undefined } {
  let done: ScanFreeDiagnostics | undefined;
  const along: ScanRunner = async (jobs, onDone) => {
    if (done !== undefined || jobs[0]?.kind !== 'group') return run(jobs, onDone);
    // Progress counts the groups only: the diagnostics job is not one of the scan's.
    const results = await run([...jobs, { kind: 'diagnostics', task }], onDone === undefined ? undefined : (index) => index < jobs.length && onDone(index));
    done = results.pop() as ScanFreeDiagnostics;
    return results;
  };
  return { run: along, result: () => done };
}
