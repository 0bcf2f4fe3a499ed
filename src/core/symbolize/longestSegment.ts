import { recordSequences } from '../sequence/recordSequences';
import type { Sequence } from '../sequence/sequence';
import type { FastaRecord } from '../sequence/sequenceReader';

/**
 * The longest of the segments (the first among equals) as a view into the whole sequence, for a
 * host that shows one result where the command line analyses every segment; null without segments.
 */
export function longestSegment(whole: Sequence, records: readonly FastaRecord[]): { record: FastaRecord; sequence: Sequence } | null {
  let best: { record: FastaRecord; sequence: Sequence } | null = null;
  for (const part of recordSequences(whole, records)) {
    if (best === null || part.sequence.symbols.length > best.sequence.symbols.length) best = part;
  }
  return best;
}
