import { SOURCE_SPEC_FORMS, parseSourceSpec } from '../core';
import { isPositiveInteger, numberOption } from './options';
import type { CliIo } from './runCli';
import { UsageError } from './usageError';
import { writeSequence } from './writeSequence';

type Values = Record<string, string | boolean | undefined>;

/** `returnrate generate SOURCE --length L --seed S [--out PATH]`: a sample path of a reference source. */
export async function generateCommand(spec: string | undefined, values: Values, io: CliIo): Promise<void> {
  if (spec === undefined) throw new UsageError(`generate needs a SOURCE, one of: ${SOURCE_SPEC_FORMS.join(' | ')}`);
  const source = parseSourceSpec(spec);
  const length = numberOption(values, 'length', isPositiveInteger, 'a whole number of at least 1');
  if (length === undefined) throw new UsageError('generate needs --length L');
  const seed = numberOption(values, 'seed', Number.isSafeInteger, 'a whole number') ?? 1;
  const sequence = source.generate(length, seed);
  const format = await writeSequence(sequence, values.out === undefined ? '-' : String(values.out), io.stdout);
  if (values.out !== undefined && values.out !== '-') {
    const h = source.facts.entropyRate;
    io.stderr.write(`wrote ${length} symbols of ${source.id} (read back with --format ${format}); exact h = ${h === null ? 'unknown' : `${h} nat`}, sigma^2 = ${source.facts.sigma2 ?? 'not claimed'}\n`);
  }
}
