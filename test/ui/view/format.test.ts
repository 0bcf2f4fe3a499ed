import { describe, expect, it } from 'vitest';
import { decimalsForInterval, DEFAULT_DECIMALS, formatBytes, formatCount, formatFixed, formatPercent, prettyUnit } from '../../../src/ui/view/format';

describe('format', () => {
  it('decimalsForInterval shows the half-width to two significant digits', () => {
    // Half-widths 0.0123 -> 3 decimals (0.012), 0.5 -> 2 (0.50), 4 -> 1 (4.0), 25 -> 0; by hand.
    expect(decimalsForInterval(1, 1.0246)).toBe(3);
    expect(decimalsForInterval(0, 1)).toBe(2);
    expect(decimalsForInterval(0, 8)).toBe(1);
    expect(decimalsForInterval(0, 50)).toBe(0);
  });

  it('decimalsForInterval falls back to the default for empty, reversed or infinite intervals', () => {
    expect(decimalsForInterval(1, 1)).toBe(DEFAULT_DECIMALS);
    expect(decimalsForInterval(2, 1)).toBe(DEFAULT_DECIMALS);
    expect(decimalsForInterval(0, Number.POSITIVE_INFINITY)).toBe(DEFAULT_DECIMALS);
    expect(decimalsForInterval(0, Number.NaN)).toBe(DEFAULT_DECIMALS);
  });

  it('formatFixed prints a dash for missing values and never "-0"', () => {
    expect(formatFixed(null, 2)).toBe('—');
    expect(formatFixed(Number.NaN, 2)).toBe('—');
    expect(formatFixed(-0.0001, 2)).toBe('0.00');
    expect(formatFixed(-1.234, 2)).toBe('-1.23');
  });

  it('formats counts, percentages, bytes and units for people', () => {
    expect(formatCount(3_000_000)).toBe('3,000,000');
    expect(formatPercent(0.0123)).toBe('1.2%');
    expect(formatBytes(512)).toBe('512 B');
    expect(formatBytes(4 * 1024 * 1024)).toBe('4.0 MiB');
    expect(prettyUnit('bit^2/symbol')).toBe('bit²/symbol');
  });
});
