// Worker thread of `analyze --threads W`: runs the jobs of a shared scan (range passes and class
// groups) and posts each result back, moving the buffers instead of copying them.
import { parentPort } from 'node:worker_threads';
// The engine files themselves rather than the core's barrel: the thread then loads a small part of
// the bundle instead of the whole core (half a megabyte, 0.2-0.4 s to start on this machine).
import { answerJob, type JobRequest } from '../core/returns/jobPool';
import { warmUpScan } from '../core/returns/warmUpScan';

const port = parentPort;
if (port === null) throw new Error('scanWorker.ts runs only as a worker thread');
// Jobs that arrive during the warm-up wait for it, in order; a failed warm-up only costs its time.
const ready = warmUpScan().catch(() => undefined);
port.on('message', (request: JobRequest) => void ready.then(() => answerJob(request, (reply, transfer) => port.postMessage(reply, transfer))));
