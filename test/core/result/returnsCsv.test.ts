import { describe, expect, it } from 'vitest';
import { capturedReturnsCsv } from '../../../src/core/result/returnsCsv';

describe('capturedReturnsCsv', () => {
  it('reads the engine captured-level encoding: -(c + 1) is censored with lower bound c', () => {
    // source: ReturnScan.captured encoding (levelStats.ts); "abracadabra" n = 4 starts [7, >6, ...] (THEORY.md section 9)
    expect([...capturedReturnsCsv(Int32Array.from([7, -7, -1]))].join('')).toBe('position,return_time,censored\n0,7,0\n1,6,1\n2,0,1\n');
  });

  it('splits the rows into chunks without changing the text', () => {
    // source: API contract
    const captured = Int32Array.from({ length: 10 }, (_, i) => (i % 3 === 0 ? -(i + 1) : i + 2));
    const whole = [...capturedReturnsCsv(captured)];
    const pieces = [...capturedReturnsCsv(captured, 3)];
    expect(whole).toHaveLength(1);
    expect(pieces).toHaveLength(4);
    expect(pieces.join('')).toBe(whole[0]);
    expect(() => [...capturedReturnsCsv(captured, 0)]).toThrow(RangeError);
  });
});
