import { basename } from 'node:path';
import { ANALYSIS_SET_SCHEMA, analyzeSequence, chunkPlan, estimatePeakMemory, isShared, parseSourceSpec, recordSequences } from '../core';
import type { AnalysisHooks, AnalysisResult, AnalysisSettings, FastaRecord, ReferenceFacts, Sequence, ShareProgress, SymbolizationRecord } from '../core';
import { calibrationText } from './calibrationText';
import { chunkedAnalyze, chunkSizeOption } from './chunkedCommand';
import { guessFileFormat } from './guessFileFormat';
import { checkMemory, fitsMemory } from './memoryBudget';
import { analyzeOnThreads, chunkThreadsOption, threadsAhead, threadsOption, type EarlyThreads } from './scanThreads';
import { numberOption, isPositiveInteger, readerOptionsFrom, settingsFrom } from './options';
import { openOutput } from './outputStream';
import { readInputFile } from './readInput';
import { runCalibration } from './runCalibration';
import type { CliIo } from './runCli';
import { summaryText } from './summaryText';
import { UsageError } from './usageError';
import { writeFigures } from './writeFigures';
import { writeReport } from './writeReport';

type Values = Record<string, string | boolean | undefined>;

interface Loaded {
  sequence: Sequence;
  input: { name: string; sha256: string | null; format: string; symbolization?: SymbolizationRecord };
  reference: ReferenceFacts | undefined;
  readSeconds: number;
  /** FASTA records to analyse one by one (--fasta-records separate), else null. */
  separate: FastaRecord[] | null;
}

/** @param shared read the symbols into shared memory, for threads started ahead (threadsAhead) */
async function load(file: string | undefined, values: Values, io: CliIo, shared = false): Promise<Loaded> {
  const t0 = performance.now();
  if (values.source !== undefined) {
    if (file !== undefined) throw new UsageError('give either a FILE or --source, not both');
    const source = parseSourceSpec(String(values.source));
    const length = numberOption(values, 'length', isPositiveInteger, 'a whole number of at least 1');
    if (length === undefined) throw new UsageError('--source needs --length');
    const seed = numberOption(values, 'seed', Number.isSafeInteger, 'a whole number') ?? 1;
    const sequence = source.generate(length, seed);
    return {
      sequence,
      input: { name: `${source.id} (length ${length}, seed ${seed})`, sha256: null, format: 'generated' },
      reference: { source: source.id, entropyRateNats: source.facts.entropyRate, sigma2Nats: source.facts.sigma2 },
      readSeconds: (performance.now() - t0) / 1000,
      separate: null,
    };
  }
  if (file === undefined) throw new UsageError('analyze needs a FILE (or --source SPEC --length L)');
  const options = { ...readerOptionsFrom(values, values.format === undefined ? await guessFileFormat(file) : 'chars'), ...(shared ? { sharedMemory: true } : {}) };
  const read = await readInputFile(file, options);
  for (const w of read.warnings) io.stderr.write(`returnrate: note: ${w.message}\n`);
  return {
    sequence: read.sequence,
    input: { name: basename(file), sha256: read.sha256, format: options.format, ...(read.symbolization === undefined ? {} : { symbolization: read.symbolization }) },
    reference: undefined,
    readSeconds: (performance.now() - t0) / 1000,
    // FASTA records analysed apart, and the segments of a series cut at missing values (--missing split).
    separate: ((options.format === 'fasta' && options.fastaRecords === 'separate') || options.missing === 'split') && read.records !== undefined ? read.records : null,
  };
}

/**
 * The largest block length fitted to a sequence of N symbols: without --max-n the default is cut
 * to N - 1 so that a short file still runs; a --max-n the data cannot take is refused in the
 * option's own name (the core's message speaks of maxN). N < 2 is left to the core's message.
 */
function fitMaxN(settings: AnalysisSettings, N: number, given: boolean): AnalysisSettings {
  if (N < 2 || settings.maxN <= N - 1) return settings;
  if (given) throw new RangeError(`--max-n ${settings.maxN} is too large for a sequence of ${N} symbols: block lengths go up to N - 1 = ${N - 1}`);
  return { ...settings, maxN: N - 1 };
}

/**
 * `--fasta-records separate`: every record analysed on its own (no block crosses a boundary); JSON
 * is an ANALYSIS_SET_SCHEMA object holding one result per record. Records too short for any block
 * length are named on standard error and left out.
 */
async function analyzeRecords(loaded: Loaded, records: FastaRecord[], options: AnalysisSettings, values: Values, io: CliIo): Promise<void> {
  const results: AnalysisResult[] = [];
  for (const { record, sequence } of recordSequences(loaded.sequence, records)) {
    if (sequence.symbols.length < 2) {
      const what = loaded.input.format === 'fasta' ? 'record ' : '';
      io.stderr.write(`returnrate: note: ${what}"${record.name}" has ${sequence.symbols.length} symbol(s) and is left out\n`);
      continue;
    }
    const settings = fitMaxN(options, sequence.symbols.length, false);
    const input = { ...loaded.input, name: `${loaded.input.name} > ${record.name || '(no header)'}` };
    results.push(analyzeSequence(sequence, input, settings));
  }
  if (results.length === 0) throw new RangeError(`no ${loaded.input.format === 'fasta' ? 'FASTA record' : 'segment'} holds at least 2 symbols`);
  await emit({ schema: ANALYSIS_SET_SCHEMA, records: results }, results, values, io);
}

/** The JSON (--json PATH or -) and, unless it went to standard output or --quiet, the summaries. */
async function emit(json: unknown, results: readonly AnalysisResult[], values: Values, io: CliIo): Promise<void> {
  const target = values.json === undefined ? undefined : String(values.json);
  if (target !== undefined) {
    const out = openOutput(target, io.stdout);
    await out.write(JSON.stringify(json, null, 2) + '\n');
    await out.close();
  }
  if (target !== '-' && values.quiet !== true) {
    io.stdout.write(results.map((r) => summaryText(r, { table: values['no-table'] !== true })).join('\n'));
  }
}

/**
 * A progress reporter for long runs: one line on standard error, rewritten after each block length,
 * when --progress is given or standard error is a terminal; null otherwise (pipes and tests stay
 * clean).
 */
function progressLine(io: CliIo, values: Values, maxN: number, started: number): ProgressLine | null {
  const terminal = (io.stderr as { isTTY?: boolean }).isTTY === true;
  if (values.progress !== true && !terminal) return null;
  const seconds = (): string => ((performance.now() - started) / 1000).toFixed(1);
  return {
    level: (n, active) => io.stderr.write(`\rreturnrate: block length ${n} of ${maxN}, ${active.toLocaleString('en-US')} positions still in play, ${seconds()} s   `),
    // While the threads' class groups run, no level completes: count the groups instead.
    shares: ({ done, total, firstN }) => io.stderr.write(`\rreturnrate: block lengths ${firstN} to ${maxN} on the threads, ${done} of ${total} groups done, ${seconds()} s   `),
  };
}

interface ProgressLine {
  level(n: number, active: number): void;
  shares(progress: ShareProgress): void;
}

/** A result's JSON, summary, figures and report, as `analyze` writes them (also for chunked runs and `merge`). */
export async function emitAnalysis(result: AnalysisResult, values: Values, io: CliIo): Promise<void> {
  await emit(result, [result], values, io);
  if (values.figures !== undefined) await writeFigures(result, String(values.figures), (line) => io.stderr.write(`${line}\n`));
  if (values.report !== undefined) await writeReport(result, String(values.report));
}

/** `returnrate analyze FILE [options]`: the estimate with its intervals, as text or JSON. */
export async function analyzeCommand(file: string | undefined, values: Values, io: CliIo): Promise<void> {
  const early = threadsAhead(file, values);
  try {
    await analyzeWith(file, values, io, early);
  } finally {
    early?.pool.close();
  }
}

async function analyzeWith(file: string | undefined, values: Values, io: CliIo, early: EarlyThreads | null): Promise<void> {
  const options = settingsFrom(values);
  const calibrate = numberOption(values, 'calibrate', (x) => Number.isInteger(x) && x >= 10 && x <= 100000, 'a whole number of replicates from 10 to 100000');
  const calibrateSeed = numberOption(values, 'calibrate-seed', Number.isSafeInteger, 'a whole number') ?? 1;
  const loaded = await load(file, values, io, early !== null);
  if (loaded.separate !== null && calibrate !== undefined) throw new UsageError('--calibrate works on one sequence, not with --fasta-records separate');
  if (loaded.separate !== null) {
    early?.pool.close(); // records are analysed one by one on this thread
    return analyzeRecords(loaded, loaded.separate, options, values, io);
  }
  const settings = fitMaxN(options, loaded.sequence.symbols.length, values['max-n'] !== undefined);
  const chunk = chunkSizeOption(values);
  const N = loaded.sequence.symbols.length;
  const need = { symbols: N, alphabetSize: loaded.sequence.alphabet.length, maxN: settings.maxN, chunkSize: chunk ?? null, symbolsShared: isShared(loaded.sequence.symbols) };
  // Chunked runs give each thread one chunk at a time; the default thread count yields to memory.
  let threads = chunk === undefined ? threadsOption(values, N) : chunkThreadsOption(values, N, chunkPlan(N, chunk, settings.maxN).chunkCount);
  if (threads > 1 && values.threads === undefined && !fitsMemory({ ...need, threads }, values)) threads = 1;
  // Threads started during the read that this run will not use end now, not with the run.
  if (early !== null && early.count !== threads) early.pool.close();
  checkMemory({ ...need, threads }, values);
  if (chunk !== undefined) {
    const started = performance.now();
    await chunkedAnalyze(loaded, settings, chunk, threads, values, io, (r) => emitAnalysis(r, values, io));
    if (values.timing === true) {
      const timing = {
        symbols: N,
        readSeconds: loaded.readSeconds,
        analysisSeconds: (performance.now() - started) / 1000,
        peakRssBytes: process.resourceUsage().maxRSS * 1024,
        threads,
        estimatedPeakBytes: estimatePeakMemory({ ...need, threads }).totalBytes,
      };
      io.stderr.write(`timing ${JSON.stringify(timing)}\n`);
    }
    return;
  }
  const t1 = performance.now();
  // A position-level is one position still in play at one n: N at n = 1, then what each level leaves.
  let positionLevels = loaded.sequence.symbols.length;
  let lastActive = 0;
  const progress = progressLine(io, values, settings.maxN, t1);
  const hooks: AnalysisHooks = {
    onLevel: (n, active) => {
      positionLevels += active;
      lastActive = active;
      progress?.level(n, active);
    },
    ...(progress === null ? {} : { onShares: progress.shares }),
    ...(loaded.reference === undefined ? {} : { reference: loaded.reference }),
  };
  const result = threads > 1 ? await analyzeOnThreads(loaded.sequence, loaded.input, settings, threads, hooks, early) : analyzeSequence(loaded.sequence, loaded.input, settings, hooks);
  const analysisSeconds = (performance.now() - t1) / 1000;
  if (progress !== null) io.stderr.write('\n');
  const calibration =
    calibrate === undefined ? null : await runCalibration(loaded.sequence, result, calibrate, calibrateSeed, progress !== null, io);
  await emit(calibration === null ? result : { ...result, calibration }, [result], values, io);
  if (calibration !== null && values.json !== '-' && values.quiet !== true) {
    io.stdout.write(calibrationText(calibration, result.entropy.unit, result.sigma2.unit));
  }
  if (values.figures !== undefined) {
    await writeFigures(result, String(values.figures), (line) => io.stderr.write(`${line}\n`), calibration);
  }
  if (values.report !== undefined) await writeReport(result, String(values.report), values.column === undefined ? [] : [String(values.column)], calibration);
  if (values.timing === true) {
    // For the benchmark: one JSON line on standard error.
    const timing = {
      symbols: loaded.sequence.symbols.length,
      readSeconds: loaded.readSeconds,
      analysisSeconds,
      positionLevels: positionLevels - lastActive,
      peakRssBytes: process.resourceUsage().maxRSS * 1024,
      threads,
      estimatedPeakBytes: estimatePeakMemory({ ...need, threads }).totalBytes,
    };
    io.stderr.write(`timing ${JSON.stringify(timing)}\n`);
  }
}
