import { capturedReturnsCsv, scanReturns } from '../core';
import { guessFileFormat } from './guessFileFormat';
import { isPositiveInteger, numberOption, readerOptionsFrom } from './options';
import { openOutput } from './outputStream';
import { readInputFile } from './readInput';
import type { CliIo } from './runCli';
import { UsageError } from './usageError';

type Values = Record<string, string | boolean | undefined>;

/**
 * `returnrate returns FILE --n N`: CSV `position,return_time,censored` for every position (0-based).
 * A censored row holds the lower bound N - n - i and censored = 1.
 */
export async function returnsCommand(file: string | undefined, values: Values, io: CliIo): Promise<void> {
  if (file === undefined) throw new UsageError('returns needs a FILE');
  const n = numberOption(values, 'n', isPositiveInteger, 'a whole number of at least 1');
  if (n === undefined) throw new UsageError('returns needs --n N, the block length');
  const options = readerOptionsFrom(values, values.format === undefined ? await guessFileFormat(file) : 'chars');
  // One table of returns would let blocks cross the cuts between segments.
  if (options.missing === 'split') throw new UsageError('returns reads one sequence: use --missing skip (or analyze, which takes the segments apart)');
  const { sequence } = await readInputFile(file, options);
  const N = sequence.symbols.length;
  if (n > N) throw new RangeError(`--n ${n} is longer than the sequence (${N} symbols)`);
  const scan = scanReturns(sequence.symbols, sequence.alphabet.length, { maxN: n, captureLevel: n, batchTarget: 1, sampleTarget: 1 });
  const captured = scan.captured!;
  const out = openOutput(values.out === undefined ? '-' : String(values.out), io.stdout);
  for (const chunk of capturedReturnsCsv(captured)) await out.write(chunk);
  await out.close();
}
