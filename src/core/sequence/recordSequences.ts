import type { Sequence } from './sequence';
import type { FastaRecord } from './sequenceReader';

/**
 * One sequence per FASTA record, as views into the whole (no copy), so that each record can be
 * analysed on its own and no block crosses a record boundary. Labels are shared; counts are each
 * record's own.
 */
export function recordSequences(whole: Sequence, records: readonly FastaRecord[]): { record: FastaRecord; sequence: Sequence }[] {
  return records.map((record) => {
    if (record.start < 0 || record.length < 0 || record.start + record.length > whole.symbols.length) {
      throw new RangeError(`record "${record.name}" [${record.start}, ${record.start + record.length}) lies outside the sequence of ${whole.symbols.length}`);
    }
    const symbols = whole.symbols.subarray(record.start, record.start + record.length);
    const counts = new Float64Array(whole.alphabet.length);
    for (let i = 0; i < symbols.length; i++) counts[symbols[i]]++;
    return { record, sequence: { symbols, alphabet: whole.alphabet, counts } };
  });
}
