// Sub-worker of the analysis worker when the page is cross-origin isolated: refines one group of
// classes (scanGroup) and posts its per-level sums back, moving the buffers.
import { scanGroup } from '../src/core';
import type { ScanGroupTask } from '../src/core';

self.onmessage = (event: MessageEvent<ScanGroupTask>) => {
  const result = scanGroup(event.data);
  const buffers = [result.paths.buffer, result.pathCounts.buffer, ...result.sums.flatMap((s) => [s.batches.buffer, s.histogram.buffer])];
  self.postMessage(result, { transfer: buffers as ArrayBuffer[] });
};
