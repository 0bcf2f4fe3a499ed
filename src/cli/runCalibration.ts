import { Worker } from 'node:worker_threads';
import { calibrationModelFacts, calibrationResult, checkReplicates, fitCalibrationModel } from '../core';
import type { AnalysisResult, CalibrationResult, ReplicateRecord, Sequence } from '../core';
import type { CalibrationThreadData, CalibrationThreadReply } from './calibrationThread';
import type { CliIo } from './runCli';

/** Worker threads per calibration (the machines we run on have 2 cores or more). */
export const CALIBRATION_THREADS = 2;

/**
 * Starts one thread: the bundled calibration-thread.mjs next to the bundle (scripts/build-cli.mjs),
 * or, when running from the TypeScript sources, a small script that registers tsx's loader in the
 * thread and then imports calibrationThread.ts (Node 20 does not carry the parent's loader hooks
 * into a worker, so the .ts file cannot be the entry itself).
 */
function startThread(data: CalibrationThreadData): Worker {
  const here = import.meta.url;
  if (!here.endsWith('.ts')) return new Worker(new URL('./calibration-thread.mjs', here), { workerData: data });
  const api = import.meta.resolve('tsx/esm/api');
  const entry = new URL('./calibrationThread.ts', here).href;
  const script = `import(${JSON.stringify(api)}).then((m) => { m.register(); return import(${JSON.stringify(entry)}); });`;
  return new Worker(script, { eval: true, workerData: data });
}

/**
 * Runs replicates 0..R-1 on `threads` Node worker threads, handing out one index at a time; resolves
 * with the records in finishing order. The first failure terminates every thread and rejects with
 * the core's message.
 */
function runOnThreads(data: CalibrationThreadData, replicates: number, threads: number, onRecord: (r: ReplicateRecord) => void): Promise<ReplicateRecord[]> {
  const workers: Worker[] = [];
  const records: ReplicateRecord[] = [];
  return new Promise<ReplicateRecord[]>((resolve, reject) => {
    let next = 0;
    let finished = false;
    const end = (error: Error | null): void => {
      if (finished) return;
      finished = true;
      for (const w of workers) void w.terminate();
      if (error === null) resolve(records);
      else reject(error);
    };
    const feed = (w: Worker): void => {
      if (next < replicates) w.postMessage(next++);
    };
    for (let t = 0; t < Math.min(threads, replicates); t++) {
      const w = startThread(data);
      workers.push(w);
      w.on('message', (reply: CalibrationThreadReply) => {
        if (reply.kind === 'error') return end(new RangeError(reply.message));
        records.push(reply.record);
        onRecord(reply.record);
        if (records.length === replicates) end(null);
        else feed(w);
      });
      w.on('error', (error) => end(error));
      w.on('exit', (code) => {
        if (!finished) end(new Error(`a calibration thread stopped unexpectedly (exit code ${code})`));
      });
      feed(w);
    }
  });
}

/**
 * `analyze --calibrate R`: fits the chain here, runs the surrogates on CALIBRATION_THREADS worker
 * threads and merges their records.
 * @param progress write "replicate i of R" to standard error
 */
export async function runCalibration(
  sequence: Sequence,
  analysis: AnalysisResult,
  replicates: number,
  baseSeed: number,
  progress: boolean,
  io: CliIo,
): Promise<CalibrationResult> {
  checkReplicates(replicates);
  const fitted = fitCalibrationModel(sequence);
  const facts = calibrationModelFacts(fitted, analysis.settings);
  const data: CalibrationThreadData = {
    model: fitted.model,
    alphabet: sequence.alphabet,
    length: sequence.symbols.length,
    settings: analysis.settings,
    baseSeed,
  };
  let done = 0;
  const records = await runOnThreads(data, replicates, CALIBRATION_THREADS, () => {
    done++;
    if (progress) io.stderr.write(`\rreturnrate: calibration replicate ${done} of ${replicates}   `);
  });
  if (progress) io.stderr.write('\n');
  return calibrationResult(analysis, facts, records, replicates, baseSeed);
}
