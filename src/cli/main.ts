import { parseArgs } from 'node:util';
import { PROGRAM_VERSION } from '../core/result/version';
import { SOURCE_SPEC_FORMS } from '../core/sources/catalog';
import { analyzeCommand } from './analyzeCommand';
import { describeFailure } from './failure';
import { generateCommand } from './generateCommand';
import { ANALYSIS_OPTIONS, READ_OPTIONS } from './options';
import { returnsCommand } from './returnsCommand';
import { UsageError } from './usageError';

const HELP = `returnrate ${PROGRAM_VERSION}: entropy rate of a symbol sequence from the return times of its blocks

usage
  returnrate analyze FILE [reading options] [analysis options] [--json PATH|-] [--no-table] [--quiet]
  returnrate analyze --source SPEC --length L [--seed S] [analysis options]
  returnrate returns FILE --n N [reading options] [--out PATH]
  returnrate generate SOURCE --length L [--seed S] [--out PATH]

reading options
  -f, --format chars|tokens|fasta|csv|bytes   default: by extension, else tokens when fields are
                                              longer than one character, else chars
  -c, --column NAME|INDEX    CSV column, by header name or 0-based index
      --delimiter C          CSV delimiter (default: detected; "tab" for a tab)
      --no-header            CSV has no header row
      --keep-whitespace      chars: spaces and tabs are symbols too
      --fasta-records concatenate|separate
      --ambiguity skip|symbol|error   FASTA ambiguity codes (N, R, Y, ...) and gaps

analysis options
  -n, --max-n N              largest block length (default 40)
  -u, --unit nat|bit         unit of entropies (default nat)
      --interval SECONDS     sampling interval: rates also per second
      --confidence P         level of every interval (default 0.95)
      --max-censored F       largest censored fraction inside the trusted range (default 0.01)
      --timing               print timing and peak memory as one JSON line on standard error

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
  'no-table': { type: 'boolean' },
  quiet: { type: 'boolean', short: 'q' },
  timing: { type: 'boolean' },
  source: { type: 'string' },
  length: { type: 'string', short: 'l' },
  seed: { type: 'string', short: 's' },
  out: { type: 'string', short: 'o' },
  n: { type: 'string' },
  help: { type: 'boolean', short: 'h' },
  version: { type: 'boolean', short: 'v' },
} as const;

async function main(argv: string[]): Promise<void> {
  let parsed;
  try {
    parsed = parseArgs({ args: argv, options: OPTIONS, allowPositionals: true, strict: true });
  } catch (error) {
    // parseArgs explains unknown or malformed options in its message.
    throw new UsageError(error instanceof Error ? error.message.split('\n')[0]! : String(error));
  }
  const { values, positionals } = parsed;
  if (values.version === true) {
    process.stdout.write(`${PROGRAM_VERSION}\n`);
    return;
  }
  const [command, target, ...rest] = positionals;
  if (values.help === true || command === undefined || command === 'help') {
    process.stdout.write(HELP);
    return;
  }
  if (rest.length > 0) throw new UsageError(`unexpected argument "${rest[0]}"`);
  const v = values as Record<string, string | boolean | undefined>;
  switch (command) {
    case 'analyze':
      return analyzeCommand(target, v);
    case 'returns':
      return returnsCommand(target, v);
    case 'generate':
      return generateCommand(target, v);
    default:
      throw new UsageError(`unknown command "${command}"; the commands are analyze, returns, generate`);
  }
}

main(process.argv.slice(2)).catch((error: unknown) => {
  const { line, exitCode } = describeFailure(error);
  process.stderr.write(`returnrate: ${line}\n`);
  if (process.env.RETURNRATE_DEBUG === '1' && error instanceof Error) process.stderr.write(`${error.stack}\n`);
  process.exitCode = exitCode;
});
