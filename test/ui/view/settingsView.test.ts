import { describe, expect, it } from 'vitest';
import { MAX_N_RANGE, parseMaxN } from '../../../src/ui/view/settingsView';

describe('settingsView', () => {
  it('parseMaxN accepts integers inside MAX_N_RANGE only', () => {
    expect(parseMaxN(String(MAX_N_RANGE[1]))).toBe(MAX_N_RANGE[1]);
    expect(parseMaxN(' 12 ')).toBe(12);
    expect(parseMaxN('0')).toBeNull();
    expect(parseMaxN(String(MAX_N_RANGE[1] + 1))).toBeNull();
    expect(parseMaxN('4.5')).toBeNull();
  });
});
