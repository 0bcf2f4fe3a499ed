import { describe, expect, it } from 'vitest';
import { checkProbabilities, cumulativeLaw, iidSource } from '../../../src/core/sources/iidSource';

describe('iidSource', () => {
  it('states h = -sum p log p and sigma^2 = Var(-log p(X)) for Bernoulli(0.3)', () => {
    const source = iidSource([0.7, 0.3]);
    // closed forms, THEORY.md section 2 [calc]
    expect(source.facts.entropyRate).toBeCloseTo(0.610864302055, 11);
    expect(source.facts.sigma2).toBeCloseTo(0.150761869486, 11);
    expect(source.facts.gaussianLimit).toBe(true);
    expect(source.id).toBe('iid:0.7,0.3');
    expect(source.label).toBe('Bernoulli(0.3)');
  });

  it('has sigma^2 = 0 and no Gaussian limit for a uniform law on the used symbols', () => {
    const facts = iidSource([0.25, 0, 0.25, 0.25, 0.25]).facts;
    expect(facts.entropyRate).toBeCloseTo(Math.log(4), 14);
    expect(facts.sigma2).toBe(0);
    expect(facts.gaussianLimit).toBe(false);
  });

  it('never emits a zero-probability symbol, with small and large alphabets', () => {
    const small = iidSource([0.5, 0, 0.5]).generate(50_000, 1);
    expect(small.counts[1]).toBe(0);
    const law = Array.from({ length: 30 }, (_, k) => (k % 2 === 0 ? 0 : 1 / 15));
    const large = iidSource(law).generate(50_000, 2);
    for (let k = 0; k < 30; k += 2) expect(large.counts[k]).toBe(0);
    expect(large.alphabet).toHaveLength(30);
  });

  it('reports counts that match the symbols and labels 0..k-1', () => {
    const seq = iidSource([0.2, 0.3, 0.5]).generate(1000, 3);
    expect(seq.alphabet).toEqual(['0', '1', '2']);
    const counts = [0, 0, 0];
    for (const s of seq.symbols) counts[s]!++;
    expect(Array.from(seq.counts)).toEqual(counts);
    expect(seq.symbols).toBeInstanceOf(Uint8Array);
  });

  it('gives the information -log p(x_t) per symbol', () => {
    const detailed = iidSource([0.7, 0.3]).generateDetailed!(100, 4);
    for (let t = 0; t < 100; t++) {
      const p = detailed.sequence.symbols[t] === 1 ? 0.3 : 0.7;
      expect(detailed.information[t]).toBeCloseTo(-Math.log(p), 15);
    }
  });

  it('a single-symbol law gives a constant sequence with h = 0', () => {
    const source = iidSource([1]);
    expect(source.facts.entropyRate).toBe(0);
    expect(Array.from(source.generate(5, 1).symbols)).toEqual([0, 0, 0, 0, 0]);
  });

  it('rejects bad laws and bad lengths with RangeError naming the problem', () => {
    expect(() => iidSource([])).toThrow(/at least one/);
    expect(() => iidSource([0.5, -0.1, 0.6])).toThrow(/probability 2 is -0.1/);
    expect(() => iidSource([0.5, 0.4])).toThrow(/sum to 0.9/);
    expect(() => iidSource([0.5, 0.5]).generate(-1, 0)).toThrow(/length/);
    expect(() => iidSource([0.5, 0.5]).generate(2.5, 0)).toThrow(RangeError);
  });
});

describe('checkProbabilities and cumulativeLaw', () => {
  it('rescales a law that sums to 1 within 1e-9', () => {
    const law = checkProbabilities([0.5, 0.5 + 1e-10]);
    expect(law[0]! + law[1]!).toBeCloseTo(1, 15);
  });

  it('ends the cumulative law at exactly 1 from the last positive entry on', () => {
    const out = new Float64Array(4);
    cumulativeLaw([0.1, 0.2, 0.7 - 1e-17, 0], out, 0);
    expect(out[2]).toBe(1);
    expect(out[3]).toBe(1);
  });
});
