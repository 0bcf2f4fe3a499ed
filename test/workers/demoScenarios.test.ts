import { describe, expect, it } from 'vitest';
import { demoScenario } from '../../workers/demoScenarios';

describe('invented demo scenarios', () => {
  it('the stirred-tank probe is thresholded into two labelled symbols with consistent counts', () => {
    const seq = demoScenario('stirred-tank').source.generate(20_000, 3);
    expect(seq.alphabet).toEqual(['L', 'H']);
    let high = 0;
    for (const s of seq.symbols) high += s;
    expect(Array.from(seq.counts)).toEqual([20_000 - high, high]);
    // i.i.d. fair bits (see the source's comment): the share of H lies within 4 standard errors of 1/2,
    // SE = sqrt(0.25 / 20000) (binomial; common practice, no source)
    expect(Math.abs(high / 20_000 - 0.5)).toBeLessThan(4 * Math.sqrt(0.25 / 20_000));
  });

  it('the same seed gives the same sequence, another seed another', () => {
    const a = demoScenario('stirred-tank').source.generate(1_000, 9).symbols;
    const b = demoScenario('stirred-tank').source.generate(1_000, 9).symbols;
    const c = demoScenario('stirred-tank').source.generate(1_000, 10).symbols;
    expect(Array.from(a)).toEqual(Array.from(b));
    expect(Array.from(a)).not.toEqual(Array.from(c));
  });

  it('the dry/wet chain speaks in D and W', () => {
    expect(demoScenario('dry-wet-days').source.generate(100, 1).alphabet).toEqual(['D', 'W']);
  });
});
