import { jobTransfers, resultTransfers, runScanJob, type ScanJob, type ScanJobResult, type ScanRunner } from './scanJobs';

/** One worker as the pool sees it: hosts wrap a worker thread or a web worker in this. */
export interface JobPort {
  post(message: JobRequest, transfer: ArrayBuffer[]): void;
  /** Called once with the handler of replies and the handler of the worker's failure. */
  listen(onReply: (reply: JobReply) => void, onFailure: (error: Error) => void): void;
  close(): void;
}

export interface JobRequest {
  readonly index: number;
  readonly job: ScanJob;
}

export type JobReply = { readonly index: number; readonly result: ScanJobResult } | { readonly index: number; readonly error: string };

export interface JobPool {
  readonly run: ScanRunner;
  close(): void;
}

/**
 * A pool of persistent workers: each takes the next job of a batch as soon as it is free, so a
 * batch of more jobs than workers balances itself (the workers start once, before the first batch,
 * and serve every batch of the scan). One batch at a time; a failing worker fails the batch.
 */
export function jobPool(ports: JobPort[]): JobPool {
  let batch: {
    jobs: ScanJob[];
    results: ScanJobResult[];
    next: number;
    done: number;
    onDone: ((index: number) => void) | undefined;
    resolve: (r: ScanJobResult[]) => void;
    reject: (e: Error) => void;
  } | null = null;
  const give = (port: JobPort): void => {
    if (batch === null || batch.next >= batch.jobs.length) return;
    const index = batch.next++;
    const job = batch.jobs[index];
    port.post({ index, job }, jobTransfers(job));
  };
  const fail = (error: Error): void => {
    const failed = batch;
    batch = null;
    failed?.reject(error);
  };
  for (const port of ports) {
    port.listen(
      (reply) => {
        if (batch === null) return;
        if ('error' in reply) return fail(new Error(`a scan worker failed: ${reply.error}`));
        batch.results[reply.index] = reply.result;
        batch.onDone?.(reply.index);
        if (++batch.done === batch.jobs.length) {
          const finished = batch;
          batch = null;
          finished.resolve(finished.results);
        } else give(port);
      },
      fail,
    );
  }
  const run: ScanRunner = (jobs, onDone) =>
    new Promise<ScanJobResult[]>((resolve, reject) => {
      if (batch !== null) throw new Error('jobPool runs one batch at a time');
      if (jobs.length === 0) return resolve([]);
      batch = { jobs, results: new Array<ScanJobResult>(jobs.length), next: 0, done: 0, onDone, resolve, reject };
      for (const port of ports) give(port);
    });
  return { run, close: () => ports.forEach((p) => p.close()) };
}

/** The worker's side: answers each request with its result (buffers moved) or its error. */
export function answerJob(request: JobRequest, reply: (message: JobReply, transfer: ArrayBuffer[]) => void): void {
  try {
    const result = runScanJob(request.job);
    reply({ index: request.index, result }, resultTransfers(result));
  } catch (error) {
    reply({ index: request.index, error: error instanceof Error ? error.message : String(error) }, []);
  }
}
