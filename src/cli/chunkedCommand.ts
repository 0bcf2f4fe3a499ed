import { createHash } from 'node:crypto';
import { readFile, writeFile } from 'node:fs/promises';
import { basename, join } from 'node:path';
import { analyzeParts, analyzeSequenceChunked, analyzeSequenceChunkedOn, chunkBounds, chunkPlan, partFileJson, readPartFile, reserveScanWorkspace, scanChunk, sharedSymbols } from '../core';
import type { AnalysisHooks, AnalysisResult, AnalysisSettings, InputSummary, PartFileContents, ReferenceFacts, Sequence } from '../core';
import { alphabetSummary } from '../core';
import { makeFolder } from './makeFolder';
import { startScanThreads } from './scanThreads';
import { isPositiveInteger, numberOption } from './options';
import { OutputError } from './outputStream';
import type { CliIo } from './runCli';
import { UsageError } from './usageError';

type Values = Record<string, string | boolean | undefined>;

/** What analyzeCommand has loaded, as far as a chunked run needs it. */
export interface ChunkInput {
  readonly sequence: Sequence;
  readonly input: { name: string; sha256: string | null; format: string };
  readonly reference: ReferenceFacts | undefined;
}

/** Writes a result the way `analyze` does (JSON, summaries, figures, report). */
export type Emit = (result: AnalysisResult) => Promise<void>;

/** --chunk SIZE as a number: a whole number, written plainly or as 1e6. */
export function chunkSizeOption(values: Values): number | undefined {
  return numberOption(values, 'chunk', isPositiveInteger, 'a whole number of symbols per chunk');
}

/**
 * `analyze FILE --chunk SIZE [--plan | --parts-out DIR [--part I]]`: the chunked run in this
 * process (its chunks shared among `threads` worker threads), the plan as one JSON line, or part
 * files for `merge`.
 */
export async function chunkedAnalyze(loaded: ChunkInput, settings: AnalysisSettings, size: number, threads: number, values: Values, io: CliIo, emit: Emit): Promise<void> {
  const { sequence } = loaded;
  const N = sequence.symbols.length;
  const plan = chunkPlan(N, size, settings.maxN);
  if (values.plan === true) {
    io.stdout.write(`${JSON.stringify({ symbols: N, chunkSize: plan.chunkSize, parts: plan.chunkCount })}\n`);
    return;
  }
  const partOption = numberOption(values, 'part', (x) => Number.isInteger(x) && x >= 0, 'a part number from 0');
  if (values['parts-out'] === undefined) {
    if (partOption !== undefined) throw new UsageError('--part needs --parts-out DIR');
    const hooks = loaded.reference === undefined ? {} : { reference: loaded.reference };
    await emit(threads > 1 ? await chunksOnThreads(loaded, settings, size, threads, hooks) : analyzeSequenceChunked(sequence, loaded.input, settings, size, hooks));
    return;
  }
  if (partOption !== undefined && partOption >= plan.chunkCount) {
    throw new RangeError(`there is no part ${partOption}: at --chunk ${size} the input has parts 0 to ${plan.chunkCount - 1}`);
  }
  const dir = String(values['parts-out']);
  try {
    await makeFolder(dir);
  } catch (e) {
    throw new OutputError(`${dir}: cannot make the folder for the part files: ${e instanceof Error ? e.message : String(e)}`, { cause: e });
  }
  const listed = alphabetSummary(sequence);
  const input: InputSummary = {
    ...loaded.input,
    symbols: N,
    alphabetSize: sequence.alphabet.length,
    alphabet: listed.symbols,
    alphabetUnlisted: listed.unlisted,
  };
  const indices = partOption === undefined ? Array.from({ length: plan.chunkCount }, (_, k) => k) : [partOption];
  const workspace = {}; // one set of working arrays for every part (ScanWorkspace), sized for the longest
  reserveScanWorkspace(workspace, Math.max(...indices.map((k) => chunkBounds(plan, k).length)), sequence.alphabet.length);
  for (const k of indices) {
    const { offset, length } = chunkBounds(plan, k);
    const symbols = sequence.symbols.subarray(offset, offset + length);
    const part = scanChunk(symbols, sequence.alphabet.length, plan, k, { workspace });
    const path = join(dir, partFileName(loaded.input.name, k, plan.chunkCount));
    await writeFile(path, partFileJson(part, { input, settings, chunkSha256: chunkDigest(symbols) }));
    io.stderr.write(`returnrate: wrote ${path} (part ${k} of 0 to ${plan.chunkCount - 1})\n`);
  }
}

/** The chunked run with its chunks as jobs of `threads` worker threads, which end before it is written. */
async function chunksOnThreads(loaded: ChunkInput, settings: AnalysisSettings, size: number, threads: number, hooks: AnalysisHooks): Promise<AnalysisResult> {
  const pool = startScanThreads(threads);
  try {
    return await analyzeSequenceChunkedOn({ ...loaded.sequence, symbols: sharedSymbols(loaded.sequence.symbols) }, loaded.input, settings, size, threads, pool.run, hooks);
  } finally {
    pool.close();
  }
}

/** NAME.part-0007-of-0012.json: sorts in part order. */
export function partFileName(inputName: string, index: number, count: number): string {
  const width = Math.max(4, String(count - 1).length);
  const safe = basename(inputName).replace(/[^A-Za-z0-9._-]/g, '_') || 'input';
  return `${safe}.part-${String(index).padStart(width, '0')}-of-${String(count).padStart(width, '0')}.json`;
}

/** SHA-256 of a chunk's symbol ids as little-endian 32-bit integers. */
function chunkDigest(symbols: ArrayLike<number>): string {
  const hash = createHash('sha256');
  const block = new DataView(new ArrayBuffer(4 * 65536));
  for (let start = 0; start < symbols.length; start += 65536) {
    const end = Math.min(symbols.length, start + 65536);
    for (let i = start; i < end; i++) block.setInt32(4 * (i - start), symbols[i]!, true);
    hash.update(new Uint8Array(block.buffer, 0, 4 * (end - start)));
  }
  return hash.digest('hex');
}

/** `returnrate merge PARTS... [--json PATH] [--report PATH] [--figures DIR]`. */
export async function mergeCommand(files: readonly string[], emit: Emit): Promise<void> {
  if (files.length === 0) throw new UsageError('merge needs the part files (written by analyze FILE --chunk SIZE --parts-out DIR)');
  const contents: PartFileContents[] = [];
  for (const file of files) {
    let text: string;
    try {
      text = await readFile(file, 'utf8');
    } catch (e) {
      const code = (e as NodeJS.ErrnoException | null)?.code ?? 'error';
      throw new RangeError(`${file}: cannot be read (${code === 'ENOENT' ? 'no such file' : code})`, { cause: e });
    }
    contents.push(readPartFile(text, file));
  }
  await emit(analyzeParts(contents, files).result);
}
