// Sub-worker of the analysis worker when the page is cross-origin isolated: runs the jobs of a
// shared scan (range passes and class groups) and posts each result back, moving the buffers.
import { answerJob } from '../src/core/returns/jobPool';
import type { JobRequest } from '../src/core/returns/jobPool';

self.onmessage = (event: MessageEvent<JobRequest>) => answerJob(event.data, (reply, transfer) => self.postMessage(reply, { transfer }));
