import type { Writable } from 'node:stream';
import { parseArgs } from 'node:util';
import { PROGRAM_VERSION, SOURCE_SPEC_FORMS } from '../core';
import { analyzeCommand, emitAnalysis } from './analyzeCommand';
import { compareCommand } from './compareCommand';
import { mergeCommand } from './chunkedCommand';
import { describeFailure } from './failure';
import { generateCommand } from './generateCommand';
import { ANALYSIS_OPTIONS, READ_OPTIONS } from './options';
import { returnsCommand } from './returnsCommand';
import { UsageError } from './usageError';

/** Where the command line writes: results to stdout, notes and the failure line to stderr. */
export interface CliIo {
  readonly stdout: Writable;
  readonly stderr: Writable;
}

const HELP = `returnrate ${PROGRAM_VERSION}: entropy rate of a symbol sequence from the return times of its blocks

usage
  returnrate analyze FILE [reading options] [analysis options] [--json PATH|-] [--figures DIR] [--report PATH.html] [--no-table] [--quiet]
  returnrate analyze --source SPEC --length L [--seed S] [analysis options]
  returnrate returns FILE --n N [reading options] [--out PATH]
  returnrate generate SOURCE --length L [--seed S] [--out PATH]
  returnrate compare FILE_A FILE_B [reading options] [analysis options] [--json PATH|-]
  returnrate compare (FILE_A | --source SPEC --length L [--seed S])
                     (FILE_B | --source-b SPEC --length-b L [--seed-b S]) [options]
                             cross entropy rate of A against B from waiting times, the entropy
                             rate of A, and the relative entropy rate, each with its interval
  returnrate merge PART... [--json PATH|-] [--figures DIR] [--report PATH.html] [--no-table] [--quiet]

reading options
  -f, --format chars|tokens|fasta|csv|bytes|numbers   default: by extension, else tokens when
                             fields are longer than one character, else chars (numbers: one real
                             number per line; needs --symbolize)
  -c, --column NAME|INDEX    CSV column, by header name or 0-based index
      --delimiter C          CSV delimiter (default: detected; "tab" for a tab)
      --no-header            CSV has no header row
      --keep-whitespace      chars: spaces and tabs are symbols too
      --fasta-records concatenate|separate
      --ambiguity skip|symbol|error   FASTA ambiguity codes (N, R, Y, ...) and gaps
      --symbolize quantile:K | threshold:T1,T2,... | ordinal:D[:TAU]
                             read real numbers (--format numbers, or csv --column C) and turn them
                             into symbols: K cells of equal mass, cells cut at T1 < T2 < ... (a
                             value equal to a cut goes up), or ordinal patterns of order D (2..8)
                             with delay TAU (default 1); without --format: csv for a .csv file,
                             else numbers
      --missing skip|split   empty cells, NaN and NA: drop them (default), or cut the series there
                             and analyse the segments apart

analysis options
  -n, --max-n N              largest block length (default 40)
  -u, --unit nat|bit         unit of entropies (default nat)
      --interval SECONDS     sampling interval: rates also per second
      --confidence P         level of every interval (default 0.95)
      --max-censored F       largest censored fraction inside the trusted range (default 0.01)
      --progress             show the block length being processed on standard error (the default
                             when standard error is a terminal; Ctrl-C stops the run)
      --figures DIR          write one SVG and one CSV per figure (convergence, envelopes,
                             variance-growth, fluctuations-qq, fluctuations-histogram, return-law)
                             into DIR, made when missing
      --report PATH.html     write a one-file HTML report (estimates, every figure, settings,
                             methods with citations, cautions) that prints to PDF from a browser
      --calibrate R          after the analysis, fit a Markov chain (order by BIC) to the data and analyse
                             R >= 10 surrogates of the same length from it: bias, spread and coverage
                             at this N, and h corrected by the bias (two worker threads; R analyses)
      --calibrate-seed S     base seed of the surrogates (default 1)
      --timing               print timing and peak memory as one JSON line on standard error
      --threads W            share the scan among W worker threads from the first block length on,
                             or with --chunk give each thread the next chunk (default: the number
                             of cores from 5e6 symbols on, fewer when memory is short; results
                             equal the one-thread run)
      --max-memory SIZE      refuse runs whose estimated peak memory exceeds SIZE (e.g. 2G, 512M;
                             default 90% of the machine's or container's memory) and say what fits

chunked runs (merged exactly; returns are censored at chunk ends, block frequencies are per chunk)
      --chunk SIZE           analyse consecutive chunks of SIZE symbols (rounded up to the batch
                             grid) one after another and merge their statistics
      --plan                 with --chunk: print {"symbols", "chunkSize", "parts"} and stop
      --parts-out DIR        with --chunk: write part files (returnrate.part/1) instead of a result
      --part I               with --parts-out: only part I (0-based), e.g. one task of a job array
  returnrate merge PART...   merges the part files of one input into the usual result

reference sources (SPEC / SOURCE)
  ${SOURCE_SPEC_FORMS.join('\n  ')}

Exit status: 0 on success, 1 when the input or the analysis fails, 2 on a usage error.
This is a research tool: results on physiological recordings (EEG, ECG, spike trains) are research
estimates, not clinical measurements.
`;

const OPTIONS = {
  ...READ_OPTIONS,
  ...ANALYSIS_OPTIONS,
  json: { type: 'string' },
  figures: { type: 'string' },
  report: { type: 'string' },
  'no-table': { type: 'boolean' },
  quiet: { type: 'boolean', short: 'q' },
  timing: { type: 'boolean' },
  progress: { type: 'boolean' },
  calibrate: { type: 'string' },
  'calibrate-seed': { type: 'string' },
  chunk: { type: 'string' },
  plan: { type: 'boolean' },
  'parts-out': { type: 'string' },
  'max-memory': { type: 'string' },
  threads: { type: 'string' },
  part: { type: 'string' },
  source: { type: 'string' },
  length: { type: 'string', short: 'l' },
  seed: { type: 'string', short: 's' },
  'source-b': { type: 'string' },
  'length-b': { type: 'string' },
  'seed-b': { type: 'string' },
  out: { type: 'string', short: 'o' },
  n: { type: 'string' },
  help: { type: 'boolean', short: 'h' },
  version: { type: 'boolean', short: 'v' },
} as const;

/** A value after a string option that parseArgs would take for an option of its own. */
const NEGATIVE_NUMBER = /^-(\d|\.\d)/;

/**
 * `--seed -5` as `--seed=-5`: parseArgs refuses a string option's value that starts with a dash as
 * ambiguous, but a negative number is never an option here, and the user should get the option's
 * own check ("--interval must be a positive number ...") rather than a parser complaint.
 */
function joinNegativeValues(argv: readonly string[]): string[] {
  const out: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i]!;
    if (arg === '--') {
      out.push(...argv.slice(i));
      break;
    }
    const name = stringOptionName(arg);
    const next = argv[i + 1];
    if (name !== null && next !== undefined && NEGATIVE_NUMBER.test(next)) {
      out.push(`--${name}=${next}`);
      i++;
    } else {
      out.push(arg);
    }
  }
  return out;
}

/** The long name of a string-valued option written as `--name` or `-x` without a value, else null. */
function stringOptionName(arg: string): string | null {
  for (const [name, spec] of Object.entries(OPTIONS)) {
    if (spec.type !== 'string') continue;
    if (arg === `--${name}` || ('short' in spec && arg === `-${spec.short}`)) return name;
  }
  return null;
}

/** parseArgs' message as one line; an unknown option is named without the parser's advice on '--'. */
function parseFailure(error: unknown): UsageError {
  const message = error instanceof Error ? error.message : String(error);
  const unknown = /^Unknown option '([^']+)'/.exec(message);
  if (unknown !== null) return new UsageError(`unknown option '${unknown[1]}'`);
  return new UsageError(message.split('\n').join(' '));
}

/** What a failure line may name besides the error: the input file of analyze and returns. */
interface RunContext {
  file?: string;
}

async function dispatch(argv: readonly string[], io: CliIo, context: RunContext): Promise<void> {
  let parsed;
  try {
    parsed = parseArgs({ args: joinNegativeValues(argv), options: OPTIONS, allowPositionals: true, strict: true });
  } catch (error) {
    throw parseFailure(error);
  }
  const { values, positionals } = parsed;
  if (values.version === true) {
    io.stdout.write(`${PROGRAM_VERSION}\n`);
    return;
  }
  const [command, target, ...rest] = positionals;
  if (values.help === true || command === undefined || command === 'help') {
    io.stdout.write(HELP);
    return;
  }
  if ((command === 'analyze' || command === 'returns') && target !== undefined) context.file = target;
  const v = values as Record<string, string | boolean | undefined>;
  if (command === 'merge') return mergeCommand(positionals.slice(1), (r) => emitAnalysis(r, v, io));
  if (rest.length > (command === 'compare' ? 1 : 0)) throw new UsageError(`unexpected argument "${rest[command === 'compare' ? 1 : 0]}"`);
  switch (command) {
    case 'analyze':
      return analyzeCommand(target, v, io);
    case 'returns':
      return returnsCommand(target, v, io);
    case 'generate':
      return generateCommand(target, v, io);
    case 'compare':
      return compareCommand(target, rest[0], v, io);
    default:
      throw new UsageError(`unknown command "${command}"; the commands are analyze, returns, generate, compare, merge`);
  }
}

/**
 * Runs the command line on `argv` (the arguments after the program name) and resolves to the exit
 * status: 0 on success, 1 when the input or the analysis fails, 2 on a usage error. A failure is
 * written to `io.stderr` as one line `returnrate: ...`; the stack trace only with
 * RETURNRATE_DEBUG=1 in the environment. Never rejects.
 */
export async function runCli(argv: readonly string[], io: CliIo): Promise<number> {
  const context: RunContext = {};
  try {
    await dispatch(argv, io, context);
    return 0;
  } catch (error) {
    const { line, exitCode } = describeFailure(error, context.file);
    io.stderr.write(`returnrate: ${line}\n`);
    if (process.env.RETURNRATE_DEBUG === '1' && error instanceof Error) io.stderr.write(`${error.stack}\n`);
    return exitCode;
  }
}
