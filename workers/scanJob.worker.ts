// Sub-worker of the analysis worker when the page is cross-origin isolated: runs the jobs of a
// shared scan (range passes and class groups) and posts each result back, moving the buffers.
import { answerJob } from '../src/core/returns/jobPool';
import type { JobRequest } from '../src/core/returns/jobPool';

import { warmUpScan } from '../src/core/returns/warmUpScan';

// Jobs that arrive during the warm-up wait for it, in order; a failed warm-up only costs its time.
const ready = warmUpScan().catch(() => undefined);
self.onmessage = (event: MessageEvent<JobRequest>) => void ready.then(() => answerJob(event.data, (reply, transfer) => self.postMessage(reply, { transfer })));
