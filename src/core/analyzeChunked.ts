import { analyzeFromScan, validateSettings, type AnalysisHooks } from './analyze';
import type { AnalysisResult, AnalysisSettings, InputSummary } from './result/analysisResult';
import { alphabetSummary } from './result/alphabetSummary';
import { checkPartsAgree, type PartFileContents } from './result/partFile';
import { chunkPlan, mergeScanParts, scanChunked, scanChunkedOn, type ChunkPlan } from './returns/chunkedScan';
import type { ScanRunner } from './returns/scanJobs';
import type { ReturnScan } from './returns/levelStats';
import type { Sequence } from './sequence/sequence';

/** The warning every chunked result carries: what the one approximation of a chunked run is. */
export function chunkedWarning(plan: ChunkPlan): { code: string; message: string } {
  return {
    code: 'chunked',
    message:
      `Analysed as ${plan.chunkCount} chunk(s) of ${plan.chunkSize} symbols (the last takes the remainder), merged: ` +
      `returns that would reach into another chunk are censored at the chunk's end, and block frequencies are each chunk's own. ` +
      `Returns longer than about ${Math.floor(plan.chunkSize / 2)} symbols are therefore not seen. ` +
      `The mixing diagnostics are not computed: the merged statistics are sums, and the diagnostics need the symbols.`,
  };
}

function withChunkWarning(result: AnalysisResult, plan: ChunkPlan): AnalysisResult {
  return plan.chunkCount === 1 ? result : { ...result, warnings: [...result.warnings, chunkedWarning(plan)] };
}

/**
 * analyzeSequence in chunks of `chunkSize` symbols (rounded up to the batch grid; see chunkPlan),
 * merged exactly: memory is that of one chunk's scan besides the symbols.
 * @throws RangeError for invalid settings or chunk size
 */
export function analyzeSequenceChunked(
  sequence: Sequence,
  input: Omit<InputSummary, 'symbols' | 'alphabetSize'>,
  settings: AnalysisSettings,
  chunkSize: number,
  hooks: AnalysisHooks = {},
): AnalysisResult {
  const plan = checkedPlan(sequence, settings, chunkSize, hooks);
  const { onLevel, onLevelStats } = hooks;
  const scan = scanChunked(sequence.symbols, sequence.alphabet.length, plan, {
    onLevel: (level, active) => {
      onLevel?.(level.n, active);
      onLevelStats?.(level, active);
    },
    ...(hooks.shouldStop === undefined ? {} : { shouldStop: hooks.shouldStop }),
  });
  return chunkedResult(sequence, scan, plan, input, settings, hooks);
}

/**
 * analyzeSequenceChunked with the chunks as jobs for `run` (scanChunkedOn: worker threads in hosts,
 * each taking the next chunk), so that a chunked run uses every core. The result is that of
 * analyzeSequenceChunked: the same chunks, merged the same way.
 * @throws RangeError for invalid settings or chunk size
 */
export async function analyzeSequenceChunkedOn(
  sequence: Sequence,
  input: Omit<InputSummary, 'symbols' | 'alphabetSize'>,
  settings: AnalysisSettings,
  chunkSize: number,
  threads: number,
  run: ScanRunner,
  hooks: AnalysisHooks = {},
): Promise<AnalysisResult> {
  const plan = checkedPlan(sequence, settings, chunkSize, hooks);
  const scan = await scanChunkedOn(sequence.symbols, sequence.alphabet.length, plan, threads, run);
  return chunkedResult(sequence, scan, plan, input, settings, hooks);
}

function checkedPlan(sequence: Sequence, settings: AnalysisSettings, chunkSize: number, hooks: AnalysisHooks): ChunkPlan {
  validateSettings(settings, sequence.symbols.length);
  return chunkPlan(sequence.symbols.length, chunkSize, settings.maxN, hooks.pathSamples);
}

/** The analysis of a merged chunked scan, with the chunk warning. */
function chunkedResult(
  sequence: Sequence,
  scan: ReturnScan,
  plan: ChunkPlan,
  input: Omit<InputSummary, 'symbols' | 'alphabetSize'>,
  settings: AnalysisSettings,
  hooks: AnalysisHooks,
): AnalysisResult {
  const N = sequence.symbols.length;
  const listed = alphabetSummary(sequence);
  const summary: InputSummary = {
    ...input,
    symbols: N,
    alphabetSize: sequence.alphabet.length,
    alphabet: listed.symbols,
    alphabetUnlisted: listed.unlisted,
  };
  const result = analyzeFromScan(scan, summary, settings, hooks.reference === undefined ? {} : { reference: hooks.reference });
  return withChunkWarning(result, plan);
}

/**
 * The analysis of a complete set of part files (any order, made anywhere).
 * @param names the files' names for the messages
 * @throws PartFileError when the parts disagree; RangeError when one is missing or repeated
 */
export function analyzeParts(contents: readonly PartFileContents[], names: readonly string[]): { result: AnalysisResult; scan: ReturnScan } {
  checkPartsAgree(contents, names);
  const first = contents[0];
  const scan = mergeScanParts(contents.map((c) => c.part));
  const result = analyzeFromScan(scan, first.input, first.settings);
  return { result: withChunkWarning(result, first.part.plan), scan };
}
