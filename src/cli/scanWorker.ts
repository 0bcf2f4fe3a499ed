// Worker thread of `analyze --threads W`: runs the jobs of a shared scan (range passes and class
// groups) and posts each result back, moving the buffers instead of copying them.
import { parentPort } from 'node:worker_threads';
// The engine files themselves rather than the core's barrel: the thread then loads a small part of
// the bundle instead of the whole core (half a megabyte, 0.2-0.4 s to start on this machine).
import { answerJob, type JobRequest } from '../core/returns/jobPool';

const port = parentPort;
if (port === null) throw new Error('scanWorker.ts runs only as a worker thread');
port.on('message', (request: JobRequest) => answerJob(request, (reply, transfer) => port.postMessage(reply, transfer)));
