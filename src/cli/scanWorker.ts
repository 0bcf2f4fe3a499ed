// Worker thread of `analyze --threads W`: refines one group of classes (scanGroup) and posts its
// per-level sums back, moving the buffers instead of copying them.
import { parentPort } from 'node:worker_threads';
import { scanGroup } from '../core';
import type { ScanGroupTask } from '../core';

const port = parentPort;
if (port === null) throw new Error('scanWorker.ts runs only as a worker thread');
port.on('message', (task: ScanGroupTask) => {
  const result = scanGroup(task);
  const buffers = [result.paths.buffer, result.pathCounts.buffer, ...result.sums.flatMap((s) => [s.batches.buffer, s.histogram.buffer])];
  port.postMessage(result, buffers as ArrayBuffer[]);
});
