import { describe, expect, it } from 'vitest';
import { inThisThread, type ScanJob, type ScanRunner } from '../../../src/core/returns/scanJobs';
import { warmUpScan } from '../../../src/core/returns/warmUpScan';

describe('warmUpScan', () => {
  it('runs every job kind of a shared scan for the binary and the general partition', async () => {
    // common practice, no source: a warm-up that skips a job kind leaves that code cold.
    const seen: { kind: ScanJob['kind']; alphabetSize: number }[] = [];
    const spy: ScanRunner = (jobs) => {
      for (const job of jobs) seen.push({ kind: job.kind, alphabetSize: job.task.alphabetSize });
      return inThisThread(jobs);
    };
    await warmUpScan(spy);
    for (const alphabetSize of [2, 5]) {
      const kinds = new Set(seen.filter((s) => s.alphabetSize === alphabetSize).map((s) => s.kind));
      expect([...kinds].sort()).toEqual(['count', 'group', 'levels']);
    }
  });
});
