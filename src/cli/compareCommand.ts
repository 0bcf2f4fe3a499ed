import { basename } from 'node:path';
import { compareSequences, crossReferenceOfSpecs, parseSourceSpec } from '../core';
import type { AnalysisSettings, ComparisonResult, CrossReferenceFacts, RateEstimate, Sequence } from '../core';
import { guessFileFormat } from './guessFileFormat';
import { isPositiveInteger, numberOption, readerOptionsFrom, settingsFrom } from './options';
import { openOutput } from './outputStream';
import { readInputFile } from './readInput';
import type { CliIo } from './runCli';
import { UsageError } from './usageError';

type Values = Record<string, string | boolean | undefined>;

interface Side {
  sequence: Sequence;
  input: { name: string; sha256: string | null; format: string };
  /** Canonical source spec when generated, for the exact values. */
  spec: string | null;
}

/** One side from a file or from a reference source (--source/--length/--seed, or the -b options). */
async function loadSide(file: string | undefined, values: Values, suffix: '' | '-b', io: CliIo): Promise<Side> {
  const spec = values[`source${suffix}`];
  if (spec !== undefined) {
    const source = parseSourceSpec(String(spec));
    const length = numberOption(values, `length${suffix}`, isPositiveInteger, 'a whole number of at least 1');
    if (length === undefined) throw new UsageError(`--source${suffix} needs --length${suffix}`);
    const seed = numberOption(values, `seed${suffix}`, Number.isSafeInteger, 'a whole number') ?? (suffix === '' ? 1 : 2);
    return {
      sequence: source.generate(length, seed),
      input: { name: `${source.id} (length ${length}, seed ${seed})`, sha256: null, format: 'generated' },
      spec: source.id,
    };
  }
  if (file === undefined) throw new UsageError('compare needs two inputs: FILE_A FILE_B, or --source/--source-b with --length/--length-b');
  const options = readerOptionsFrom(values, values.format === undefined ? await guessFileFormat(file) : 'chars');
  const read = await readInputFile(file, options);
  for (const w of read.warnings) io.stderr.write(`returnrate: note: ${basename(file)}: ${w.message}\n`);
  return { sequence: read.sequence, input: { name: basename(file), sha256: read.sha256, format: options.format }, spec: null };
}

function fmt(x: number | null, digits = 4): string {
  return x === null || !Number.isFinite(x) ? '-' : x.toFixed(digits);
}

function line(label: string, r: RateEstimate, exact: number | null): string {
  const ci = r.ci95 === null ? '-' : `[${fmt(r.ci95[0])}, ${fmt(r.ci95[1])}]`;
  return `${label.padEnd(26)}${fmt(r.estimate).padStart(10)}  ${ci.padEnd(22)}${exact === null ? '' : fmt(exact).padStart(10)}`;
}

/** The short text summary of a comparison. */
export function comparisonText(r: ComparisonResult): string {
  const level = `${Math.round(r.confidence * 100)}% interval`;
  const out = [
    `A: ${r.inputA.name} (${r.inputA.symbols} symbols)`,
    `B: ${r.inputB.name} (${r.inputB.symbols} symbols)`,
    `${''.padEnd(26)}${`${r.unit}`.padStart(10)}  ${level.padEnd(22)}${r.exact === null ? '' : 'exact'.padStart(10)}`,
    line('cross entropy H(A, B)', r.crossEntropy, r.exact?.crossEntropy ?? null),
    line('entropy rate h(A)', r.entropyA, r.exact?.entropyA ?? null),
    line('relative entropy D(A||B)', r.relativeEntropy, r.exact?.relativeEntropy ?? null),
  ];
  out.push(
    r.trustedRange === null
      ? 'block lengths: none trusted'
      : `block lengths ${r.trustedRange.lo}..${r.trustedRange.hi}; ${r.pairs} segment pairs for the intervals`,
  );
  for (const w of r.warnings) out.push(`warning: ${w.message}`);
  return out.join('\n') + '\n';
}

function fitMaxN(settings: AnalysisSettings, N: number, given: boolean): AnalysisSettings {
  if (N < 2 || settings.maxN <= N - 1) return settings;
  if (given) throw new RangeError(`--max-n ${settings.maxN} is too large for A of ${N} symbols: block lengths go up to N - 1 = ${N - 1}`);
  return { ...settings, maxN: N - 1 };
}

/**
 * `returnrate compare FILE_A FILE_B [options]`: cross entropy rate of A against B from waiting
 * times, h(A) and the relative entropy rate, each with its interval; JSON with --json.
 */
export async function compareCommand(first: string | undefined, second: string | undefined, values: Values, io: CliIo): Promise<void> {
  const options = settingsFrom(values);
  const files = [first, second].filter((f): f is string => f !== undefined);
  const a = await loadSide(values.source === undefined ? files.shift() : undefined, values, '', io);
  const b = await loadSide(values['source-b'] === undefined ? files.shift() : undefined, values, '-b', io);
  if (files.length > 0) throw new UsageError(`unexpected argument "${files[0]}"`);
  const settings = fitMaxN(options, a.sequence.symbols.length, values['max-n'] !== undefined);
  let exact: CrossReferenceFacts | null = null;
  if (a.spec !== null && b.spec !== null) exact = crossReferenceOfSpecs(a.spec, b.spec);
  const result = compareSequences(a.sequence, b.sequence, a.input, b.input, settings, exact === null ? {} : { exact });
  const target = values.json === undefined ? undefined : String(values.json);
  if (target !== undefined) {
    const out = openOutput(target, io.stdout);
    await out.write(JSON.stringify(result, null, 2) + '\n');
    await out.close();
  }
  if (target !== '-' && values.quiet !== true) io.stdout.write(comparisonText(result));
}
