import { calibrationModelFacts, calibrationResult, checkReplicates, fitCalibrationModel, surrogateStudy } from '../core';
import type { AnalysisResult, CalibrationResult, Sequence } from '../core';
import type { CliIo } from './runCli';

/**
 * `analyze --calibrate R`: the surrogates run one after another in this thread. Node worker_threads
 * would need a separately bundled worker entry for the installed command (dist-cli is one esbuild
 * file) and, under tsx, a loader in the worker; not done yet.
 * @param progress write "replicate i of R" to standard error
 */
export function runCalibration(
  sequence: Sequence,
  analysis: AnalysisResult,
  replicates: number,
  baseSeed: number,
  progress: boolean,
  io: CliIo,
): CalibrationResult {
  checkReplicates(replicates);
  const fitted = fitCalibrationModel(sequence);
  const facts = calibrationModelFacts(fitted, analysis.settings);
  const indices = Array.from({ length: replicates }, (_, i) => i);
  let done = 0;
  const records = surrogateStudy(fitted.model, sequence.alphabet, sequence.symbols.length, analysis.settings, baseSeed, indices, {
    onReplicate: () => {
      done++;
      if (progress) io.stderr.write(`\rreturnrate: calibration replicate ${done} of ${replicates}   `);
    },
  });
  if (progress) io.stderr.write('\n');
  return calibrationResult(analysis, facts, records, replicates, baseSeed);
}
