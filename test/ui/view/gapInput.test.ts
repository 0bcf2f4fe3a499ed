import { describe, expect, it } from 'vitest';
import { parseGap } from '../../../src/ui/view/gapInput';

describe('parseGap', () => {
  it('accepts whole numbers from 1 up, with surrounding spaces', () => {
    expect(parseGap(' 25 ')).toEqual({ value: 25 });
    expect(parseGap('1')).toEqual({ value: 1 });
  });

  it('names the problem for empty, fractional, negative, zero and huge gaps', () => {
    expect(parseGap('')).toEqual({ message: 'Enter a gap: a whole number of symbols, 1 or more.' });
    expect(parseGap('2.5')).toEqual({ message: 'The gap must be a whole number of symbols, 1 or more; got “2.5”.' });
    expect(parseGap('-3')).toEqual({ message: 'The gap must be a whole number of symbols, 1 or more; got “-3”.' });
    expect(parseGap('0')).toEqual({ message: 'The gap must be from 1 to 1,000,000,000; got 0.' });
    expect(parseGap('2000000000')).toEqual({ message: 'The gap must be from 1 to 1,000,000,000; got 2000000000.' });
  });
});
