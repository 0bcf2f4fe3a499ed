import { describe, expect, it } from 'vitest';
import { bruteScan } from '../../helpers/bruteScan';
import { randomSymbols } from '../../helpers/estimateFixtures';
import { lengthTable } from '../../../src/core/estimate/lengthTable';
import { lengthsCsv } from '../../../src/core/result/lengthsCsv';

describe('lengthsCsv', () => {
  it('writes a header with units and one row per block length, empty cells for missing values', () => {
    // source: API contract (lengthsCsv.ts)
    const x = randomSymbols(300, 4, 9);
    const rows = lengthTable(bruteScan(x, 4, { maxN: 8, batchLength: 4, sampleStride: 30, matchWindow: 150 }).levels, 'bit');
    const lines = lengthsCsv(rows, 'bit').trimEnd().split('\n');
    const header = lines[0]!.split(',');
    expect(header).toContain('block_entropy_bit');
    expect(header).toContain('mean_log_R_nat');
    expect(header).toContain('q50_log_R_nat');
    expect(lines).toHaveLength(rows.length + 1);
    const cells = lines.map((l) => l.split(','));
    cells.forEach((c) => expect(c).toHaveLength(header.length));
    const col = header.indexOf('mean_log_R_nat');
    rows.forEach((r, j) => expect(cells[j + 1]![col]).toBe(r.meanLogReturn === null ? '' : String(r.meanLogReturn)));
    expect(Number(cells[1]![header.indexOf('block_entropy_bit')])).toBe(rows[0]!.blockEntropy);
  });
});
