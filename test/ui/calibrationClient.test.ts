import { describe, expect, it } from 'vitest';
import { calibrationPoolSize, MAX_CALIBRATION_WORKERS } from '../../src/ui/calibrationClient';

describe('calibrationPoolSize', () => {
  it('is the number of cores, at most 4, and 1 when unknown', () => {
    expect(MAX_CALIBRATION_WORKERS).toBe(4);
    expect(calibrationPoolSize(8)).toBe(4);
    expect(calibrationPoolSize(2)).toBe(2);
    expect(calibrationPoolSize(1)).toBe(1);
    expect(calibrationPoolSize(undefined)).toBe(1);
    expect(calibrationPoolSize(0)).toBe(1);
  });
});
