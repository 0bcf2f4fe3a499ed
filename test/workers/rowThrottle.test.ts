import { describe, expect, it } from 'vitest';
import { createRowThrottle } from '../../workers/rowThrottle';

// source for every expected batch: the rule in rowThrottle.ts worked by hand (common practice, no source)
describe('createRowThrottle', () => {
  it('sends the first item at once and coalesces later ones until the interval has passed', () => {
    const sent: number[][] = [];
    const t = createRowThrottle<number>(100, (batch) => sent.push(batch));
    t.push(1, 0);
    t.push(2, 30);
    t.push(3, 99);
    expect(sent).toEqual([[1]]);
    t.push(4, 100);
    expect(sent).toEqual([[1], [2, 3, 4]]);
    t.push(5, 150);
    t.push(6, 350);
    expect(sent).toEqual([[1], [2, 3, 4], [5, 6]]);
  });

  it('never sends more than one batch per interval, however many items arrive', () => {
    const sent: { at: number; items: number[] }[] = [];
    let now = 0;
    const t = createRowThrottle<number>(100, (items) => sent.push({ at: now, items }));
    for (let k = 0; k < 1000; k++) {
      now = k * 3; // an item every 3 ms for 3 s
      t.push(k, now);
    }
    t.flush();
    // by hand: batches at 0, 102, 204, ... (the first push at or after each 100 ms mark since the last), then the flush
    for (let i = 1; i < sent.length - 1; i++) expect(sent[i]!.at - sent[i - 1]!.at).toBeGreaterThanOrEqual(100);
    expect(sent.length).toBeLessThanOrEqual(Math.ceil(3000 / 100) + 2);
    expect(sent.flatMap((b) => b.items)).toEqual(Array.from({ length: 1000 }, (_, k) => k));
  });

  it('flush sends what is pending once and nothing when empty', () => {
    const sent: string[][] = [];
    const t = createRowThrottle<string>(100, (batch) => sent.push(batch));
    t.flush();
    expect(sent).toEqual([]);
    t.push('a', 0);
    t.push('b', 10);
    t.flush();
    t.flush();
    expect(sent).toEqual([['a'], ['b']]);
  });

  it('rejects a negative interval with a RangeError naming it', () => {
    expect(() => createRowThrottle(-1, () => {})).toThrow(/intervalMs .* got -1/);
  });
});
