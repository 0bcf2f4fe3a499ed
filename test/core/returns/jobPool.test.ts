import { describe, expect, it } from 'vitest';
import { jobPool, type JobPort, type JobReply, type JobRequest } from '../../../src/core/returns/jobPool';
import { runScanJob, type ScanJob } from '../../../src/core/returns/scanJobs';

/** A port that answers after `delay` ms, in this thread, and records what it ran. */
function fakePort(delay: number, ran: number[], fail = false): JobPort {
  let reply: (r: JobReply) => void = () => {};
  return {
    post: (message: JobRequest) => {
      ran.push(message.index);
      setTimeout(() => reply(fail ? { index: message.index, error: 'out of memory' } : { index: message.index, result: runScanJob(message.job) }), delay);
    },
    listen: (onReply) => {
      reply = onReply;
    },
    close: () => {},
  };
}

const countJob = (start: number, end: number): ScanJob => ({
  kind: 'count',
  task: { symbols: Uint8Array.from([0, 1, 1, 0, 1, 0, 0, 1]), alphabetSize: 2, depth: 2, start, end, words: new Uint16Array(0) },
});

describe('jobPool', () => {
  it('gives each free worker the next job and returns results in job order', async () => {
    const fast: number[] = [];
    const slow: number[] = [];
    const pool = jobPool([fakePort(1, fast), fakePort(40, slow)]);
    const jobs = [countJob(0, 1), countJob(1, 2), countJob(2, 3), countJob(3, 4), countJob(4, 5)];
    const results = await pool.run(jobs);
    // The fast worker takes every job after the first two while the slow one holds its first.
    expect(slow).toEqual([1]);
    expect(fast).toEqual([0, 2, 3, 4]);
    expect(results).toEqual(jobs.map(runScanJob));
    // The pool serves the next batch with the same workers.
    expect(await pool.run([countJob(0, 8)])).toEqual([runScanJob(countJob(0, 8))]);
  });

  it('names each job to onDone as it finishes, in the order they finish', async () => {
    // API contract (ScanRunner): the slow worker's job 1 finishes last.
    const pool = jobPool([fakePort(1, []), fakePort(40, [])]);
    const finished: number[] = [];
    await pool.run([countJob(0, 1), countJob(1, 2), countJob(2, 3)], (index) => finished.push(index));
    expect(finished).toEqual([0, 2, 1]);
  });

  it('fails the batch with the worker error, and a batch of no jobs is empty', async () => {
    const pool = jobPool([fakePort(1, [], true)]);
    await expect(pool.run([countJob(0, 1)])).rejects.toThrow('a scan worker failed: out of memory');
    expect(await pool.run([])).toEqual([]);
  });
});
