import { inThisThread, type ScanRunner } from './scanJobs';
import { scanReturnsSplit } from './splitScan';

/** Symbols of each warm-up sequence: enough to pass every branch of the scan's loops. */
const WARM_UP_SYMBOLS = 2048;

/** A fixed xorshift32 sequence over `alphabetSize` symbols (warm-up input only; common practice, no source). */
function warmUpSymbols(alphabetSize: number): Uint8Array {
  let s = 0x9e3779b9;
  const x = new Uint8Array(WARM_UP_SYMBOLS);
  for (let i = 0; i < x.length; i++) {
    s ^= s << 13;
    s >>>= 0;
    s ^= s >>> 17;
    s ^= s << 5;
    s >>>= 0;
    x[i] = s % alphabetSize;
  }
  return x;
}

/**
 * Runs every job kind of a shared scan once on small inputs (two symbols, and five), so that a
 * fresh worker has seen every branch of the hot loops before its first real job. V8 compiles a hot
 * loop while it runs; a branch the loop has not taken yet has no type feedback, and taking it later
 * throws the compiled code away and falls back to the interpreter for a while. In a fresh worker
 * that cost a thread's first class group 80-130 ms more than its later ones (measured at 1e7 symbols),
 * and every thread pays it; the warm-up costs about 70 ms and runs while the host still reads the
 * input (scanThreads.ts, analysis.worker.ts). Its results are thrown away.
 * @param run where the jobs run: this thread (tests watch them through it)
 */
export async function warmUpScan(run: ScanRunner = inThisThread): Promise<void> {
  // Two symbols take the binary partition, five the general one; one class per group is enough to share.
  for (const alphabetSize of [2, 5]) {
    await scanReturnsSplit(warmUpSymbols(alphabetSize), alphabetSize, { maxN: 24, batchTarget: 16, sampleTarget: 64 }, 2, run, 1);
  }
}
