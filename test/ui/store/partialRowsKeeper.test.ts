import { describe, expect, it } from 'vitest';
import { memoryStorage } from '../../../src/ui/store/memoryStorage';
import { keepPartialRows, parsePartialRows, PARTIAL_ROWS_KEY } from '../../../src/ui/store/partialRowsKeeper';
import { fakeResult, lengthRow } from '../fixtures';
import { testStore } from './testStore';

const now = (then: () => void) => then();
/** Lets the keeper's read of the storage (a promise) settle. */
const settle = () => new Promise((r) => setTimeout(r, 0));

describe('keepPartialRows', () => {
  it('a reload during a run brings back every row shown so far, marked interrupted by a reload', async () => {
    const storage = memoryStorage();
    const before = testStore(storage);
    keepPartialRows(before.store, storage, now);
    await settle();
    const id = before.beginRun('“chain.txt”', 30);
    before.addPartialRows(id, [lengthRow(1), lengthRow(2)]);
    before.addPartialRows(id, [lengthRow(3)]);
    expect(JSON.parse(storage.getItem(PARTIAL_ROWS_KEY) as string).rows).toHaveLength(3);

    // The reload: a fresh store on the same storage.
    const after = testStore(storage);
    keepPartialRows(after.store, storage, now);
    await settle();
    const partial = after.store.getState().partial;
    expect(partial).toMatchObject({ label: '“chain.txt”', maxN: 30, status: 'interrupted' });
    expect(partial?.rows.map((r) => r.n)).toEqual([1, 2, 3]);
    expect(partial?.rows[2]).toEqual(lengthRow(3));
  });

  it('a completed run leaves nothing to restore; a run started before the rows are read is not overwritten', async () => {
    const storage = memoryStorage();
    const a = testStore(storage);
    keepPartialRows(a.store, storage, now);
    await settle();
    const id = a.beginRun('x', 10);
    a.addPartialRows(id, [lengthRow(1)]);
    a.completeRun(id, fakeResult());
    expect(storage.getItem(PARTIAL_ROWS_KEY)).toBeNull();

    const b = testStore(storage);
    const id2 = b.beginRun('y', 10);
    b.addPartialRows(id2, [lengthRow(1)]);
    storage.setItem(PARTIAL_ROWS_KEY, JSON.stringify({ runId: 9, label: 'old', unit: 'nat', maxN: 10, rows: [lengthRow(1)], status: 'running' }));
    keepPartialRows(b.store, storage, now);
    await settle();
    expect(b.store.getState().partial).toMatchObject({ label: 'y', status: 'running' });
  });

  it('ignores saved rows that are damaged or of another shape', () => {
    expect(parsePartialRows(null)).toBeNull();
    expect(parsePartialRows('{')).toBeNull();
    expect(parsePartialRows(JSON.stringify({ runId: 1, label: 'x', unit: 'nat', maxN: 10, rows: [lengthRow(2)], status: 'running' }))).toBeNull();
    expect(parsePartialRows(JSON.stringify({ runId: 1, label: 'x', unit: 'furlong', maxN: 10, rows: [lengthRow(1)], status: 'running' }))).toBeNull();
    expect(parsePartialRows(JSON.stringify({ runId: 1, label: 'x', unit: 'nat', maxN: 10, rows: [lengthRow(1)], status: 'running' }))).not.toBeNull();
  });
});
