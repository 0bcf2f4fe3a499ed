import { describe, expect, it } from 'vitest';
import type { PartialRows } from '../../../src/ui/store/runSlice';
import { partialLabel } from '../../../src/ui/view/partialLabel';
import { lengthRow } from '../fixtures';

const base: PartialRows = { runId: 1, label: 'Fair coin', unit: 'nat', maxN: 30, rows: [], status: 'running' };

describe('partialLabel', () => {
  it('says which rows have arrived while running, that more may come, and that the result replaces them', () => {
    expect(partialLabel({ ...base, rows: [lengthRow(1), lengthRow(2), lengthRow(3)] })).toBe(
      'partial: n = 1..3 so far (of at most 30) · Fair coin · the final result, with the estimate and sampled paths, replaces these rows.',
    );
  });

  it('says rows appear as levels finish when none has yet', () => {
    expect(partialLabel(base)).toBe('Running Fair coin: rows appear as each block length n finishes.');
  });

  it('says where a cancelled run stopped and that its rows are kept', () => {
    expect(partialLabel({ ...base, status: 'cancelled', rows: [lengthRow(1), lengthRow(2)] })).toBe(
      'Cancelled at n = 2 of 30 · Fair coin: the rows n = 1..2 are kept as computed, with no estimate or trusted range.',
    );
  });

  it('says where a run stopped when its worker died, and when a reload interrupted it', () => {
    const rows = [lengthRow(1), lengthRow(2), lengthRow(3)];
    expect(partialLabel({ ...base, status: 'stopped', rows })).toBe('Stopped unexpectedly at n = 3 of 30 · Fair coin: the rows n = 1..3 are kept as computed, with no estimate or trusted range.');
    expect(partialLabel({ ...base, status: 'interrupted', rows })).toBe('Interrupted by a reload at n = 3 of 30 · Fair coin: the rows n = 1..3 are kept as computed, with no estimate or trusted range.');
  });
});
