import { describe, expect, it } from 'vitest';
import { capturedReturnsCsv, returnsCsv } from '../../../src/core/result/returnsCsv';

describe('returnsCsv', () => {
  it('writes position,return_time,censored rows', () => {
    // source: API contract
    expect(returnsCsv([0, 1, 2], [3, 7, 5], [false, false, true])).toBe('position,return_time,censored\n0,3,0\n1,7,0\n2,5,1\n');
    expect(() => returnsCsv([0], [1, 2], [0])).toThrow(RangeError);
  });

  it('reads the engine captured-level encoding: -(c + 1) is censored with lower bound c', () => {
    // source: ReturnScan.captured encoding (levelStats.ts): "abracadabra" n = 4 from THEORY.md section 9: [7, >6, ...]
    expect(capturedReturnsCsv(Int32Array.from([7, -7, -1]))).toBe('position,return_time,censored\n0,7,0\n1,6,1\n2,0,1\n');
  });
});
