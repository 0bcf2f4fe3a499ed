// A Node worker thread of `analyze --calibrate`: receives replicate indices one at a time and answers
// each with its record (or the core's error message). Bundled as dist-cli/calibration-thread.mjs.
import { parentPort, workerData } from 'node:worker_threads';
import { runReplicate } from '../core';
import type { AnalysisSettings, FittedMarkovModel, ReplicateRecord } from '../core';

/** What every thread of one calibration shares, sent once as workerData. */
export interface CalibrationThreadData {
  readonly model: FittedMarkovModel;
  readonly alphabet: readonly string[];
  readonly length: number;
  readonly settings: AnalysisSettings;
  readonly baseSeed: number;
}

export type CalibrationThreadReply = { readonly kind: 'record'; readonly record: ReplicateRecord } | { readonly kind: 'error'; readonly message: string };

const port = parentPort;
if (port !== null) {
  const data = workerData as CalibrationThreadData;
  port.on('message', (index: number) => {
    let reply: CalibrationThreadReply;
    try {
      reply = { kind: 'record', record: runReplicate(data.model, data.alphabet, data.length, data.settings, data.baseSeed, index) };
    } catch (error) {
      reply = { kind: 'error', message: error instanceof Error ? error.message : String(error) };
    }
    port.postMessage(reply);
  });
}
