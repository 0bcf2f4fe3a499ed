import { DEFAULT_SETTINGS, MISSING_POLICIES, parseSymbolizeSpec } from '../core';
import type { AnalysisSettings, EntropyUnit, InputFormat, ReaderOptions } from '../core';
import { UsageError } from './usageError';

/** Options shared by the commands that read a file. */
export const READ_OPTIONS = {
  format: { type: 'string', short: 'f' },
  column: { type: 'string', short: 'c' },
  delimiter: { type: 'string' },
  'no-header': { type: 'boolean' },
  'keep-whitespace': { type: 'boolean' },
  'fasta-records': { type: 'string' },
  ambiguity: { type: 'string' },
  symbolize: { type: 'string' },
  missing: { type: 'string' },
} as const;

/** Options of the analysis itself. */
export const ANALYSIS_OPTIONS = {
  'max-n': { type: 'string', short: 'n' },
  unit: { type: 'string', short: 'u' },
  interval: { type: 'string' },
  confidence: { type: 'string' },
  'max-censored': { type: 'string' },
} as const;

const FORMATS: readonly InputFormat[] = ['chars', 'tokens', 'fasta', 'csv', 'bytes', 'numbers'];

type Values = Record<string, string | boolean | undefined>;

function oneOf<T extends string>(value: string, allowed: readonly T[], option: string): T {
  if ((allowed as readonly string[]).includes(value)) return value as T;
  throw new UsageError(`--${option} must be one of ${allowed.join(', ')}; got "${value}"`);
}

/** A number option, checked against a predicate with a plain description of what is allowed. */
export function numberOption(values: Values, option: string, check: (x: number) => boolean, expected: string): number | undefined {
  const raw = values[option];
  if (raw === undefined) return undefined;
  const text = String(raw).trim();
  const x = Number(text);
  if (text === '' || !Number.isFinite(x) || !check(x)) throw new UsageError(`--${option} must be ${expected}; got "${String(raw)}"`);
  return x;
}

export const isPositiveInteger = (x: number): boolean => Number.isInteger(x) && x >= 1;

/** Reader options from the command line; the format falls back to `guessed`. */
export function readerOptionsFrom(values: Values, guessed: InputFormat): ReaderOptions {
  // With --symbolize and no --format: a CSV file by its guess, anything else one number per line.
  const fallback = values.symbolize !== undefined ? (guessed === 'csv' ? 'csv' : 'numbers') : guessed;
  const format = values.format === undefined ? fallback : oneOf(String(values.format), FORMATS, 'format');
  const options: ReaderOptions = { format };
  symbolizeOptions(values, options);
  if (values.column !== undefined) {
    const c = String(values.column);
    options.column = /^\d+$/.test(c) ? Number(c) : c;
  }
  if (values.delimiter !== undefined) {
    const d = String(values.delimiter) === '\\t' || String(values.delimiter) === 'tab' ? '\t' : String(values.delimiter);
    if ([...d].length !== 1) throw new UsageError(`--delimiter must be one character (or "tab"); got "${d}"`);
    options.delimiter = d;
  }
  if (values['no-header'] === true) options.hasHeader = false;
  if (values['keep-whitespace'] === true) options.keepWhitespace = true;
  if (values['fasta-records'] !== undefined) options.fastaRecords = oneOf(String(values['fasta-records']), ['concatenate', 'separate'] as const, 'fasta-records');
  if (values.ambiguity !== undefined) options.ambiguity = oneOf(String(values.ambiguity), ['skip', 'symbol', 'error'] as const, 'ambiguity');
  return options;
}

/** Analysis settings from the command line, defaults from DEFAULT_SETTINGS. */
export function settingsFrom(values: Values): AnalysisSettings {
  const maxN = numberOption(values, 'max-n', isPositiveInteger, 'a whole number of at least 1') ?? DEFAULT_SETTINGS.maxN;
  const unit: EntropyUnit = values.unit === undefined ? DEFAULT_SETTINGS.unit : oneOf(String(values.unit), ['nat', 'bit'] as const, 'unit');
  const interval = numberOption(values, 'interval', (x) => x > 0, 'a positive number of seconds per symbol') ?? null;
  const confidence = numberOption(values, 'confidence', (x) => x > 0 && x < 1, 'a probability strictly between 0 and 1') ?? DEFAULT_SETTINGS.confidence;
  const maxCensored = numberOption(values, 'max-censored', (x) => x > 0 && x < 1, 'a fraction strictly between 0 and 1') ?? DEFAULT_SETTINGS.maxCensoredFraction;
  return { ...DEFAULT_SETTINGS, maxN, unit, intervalSeconds: interval, confidence, maxCensoredFraction: maxCensored };
}

/** --symbolize SPEC and --missing skip|split: numbers in, symbols out (format numbers or csv). */
function symbolizeOptions(values: Values, options: ReaderOptions): void {
  if (values.symbolize === undefined) {
    if (options.format === 'numbers') throw new UsageError('--format numbers needs --symbolize quantile:K | threshold:T1,T2,... | ordinal:D[:TAU]');
    if (values.missing !== undefined) throw new UsageError('--missing applies to a real-valued series: give --symbolize too');
    return;
  }
  if (options.format !== 'numbers' && options.format !== 'csv') {
    throw new UsageError(`--symbolize reads numbers: use --format numbers (one per line) or --format csv --column C, not ${options.format}`);
  }
  try {
    options.symbolize = parseSymbolizeSpec(String(values.symbolize));
  } catch (e) {
    throw new UsageError(`--symbolize: ${e instanceof Error ? e.message : String(e)}`);
  }
  if (values.missing !== undefined) options.missing = oneOf(String(values.missing), MISSING_POLICIES, 'missing');
}
