import type { PartialRows } from '../store/runSlice';

/**
 * The label over a partial table or figure: which input, which block lengths, and whether more are
 * coming ("partial: n = 1..k so far") or the run was cancelled ("cancelled at n = k").
 */
export function partialLabel(partial: PartialRows): string {
  const k = partial.rows[partial.rows.length - 1]?.n ?? 0;
  if (partial.status === 'stopped') {
    return `Stopped unexpectedly at n = ${k} of ${partial.maxN} · ${partial.label}: the rows n = 1..${k} are kept as computed, with no estimate or trusted range.`;
  }
  if (partial.status === 'interrupted') {
    return `Interrupted by a reload at n = ${k} of ${partial.maxN} · ${partial.label}: the rows n = 1..${k} are kept as computed, with no estimate or trusted range.`;
  }
  if (partial.status === 'cancelled') {
    return `Cancelled at n = ${k} of ${partial.maxN} · ${partial.label}: the rows n = 1..${k} are kept as computed, with no estimate or trusted range.`;
  }
  if (k === 0) return `Running ${partial.label}: rows appear as each block length n finishes.`;
  return `partial: n = 1..${k} so far (of at most ${partial.maxN}) · ${partial.label} · the final result, with the estimate and sampled paths, replaces these rows.`;
}
