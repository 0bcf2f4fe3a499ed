import { describe, expect, it } from 'vitest';
import { envelopeExceedance } from '../../src/figures/envelopeExceedance';

// Three paths, h = 1 nat; deviations log R_n - n h worked by hand:
//   A: n=1 0.5, n=2 0.5, n=3 left out;  B: n=1 -0.8, n=2 1.5, n=3 -1.0;  C: n=1 left out, n=2 -1.0, n=3 1.5.
const PATHS = [
  [1.5, 2.5, null],
  [0.2, 3.5, 2.0],
  [null, 1.0, 4.5],
];
const WIDTHS = [
  { gaussian: 0.6, iteratedLog: null, errorTerm: 1.0 },
  { gaussian: 1.2, iteratedLog: null, errorTerm: 0.5 },
  { gaussian: 1.2, iteratedLog: 1.2, errorTerm: 2.0 },
];

describe('envelopeExceedance', () => {
  it('counts, per n, the used paths strictly outside each band, and the left-out ones', () => {
    expect(envelopeExceedance(PATHS, 1, WIDTHS)).toEqual([
      // |0.5| and |-0.8| against 0.6: one of two outside; against 1.0: none.
      { n: 1, used: 2, leftOut: 1, outside: { gaussian: 1 / 2, iteratedLog: null, errorTerm: 0 } },
      // 0.5, 1.5, 1.0 against 1.2: one of three; against 0.5: 0.5 is on the edge (inside), 1.5 and 1.0 outside.
      { n: 2, used: 3, leftOut: 0, outside: { gaussian: 1 / 3, iteratedLog: null, errorTerm: 2 / 3 } },
      // 1.0 and 1.5 against 1.2: one of two for both bands; against 2.0: none.
      { n: 3, used: 2, leftOut: 1, outside: { gaussian: 1 / 2, iteratedLog: 1 / 2, errorTerm: 0 } },
    ]);
  });

  it('gives null shares where no path has a value, and counts all of them as left out', () => {
    const rows = envelopeExceedance([[null], [null]], 1, [{ gaussian: 1, iteratedLog: null, errorTerm: 1 }]);
    expect(rows).toEqual([{ n: 1, used: 0, leftOut: 2, outside: { gaussian: null, iteratedLog: null, errorTerm: null } }]);
  });
});
