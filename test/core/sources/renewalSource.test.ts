import { describe, expect, it } from 'vitest';
import { renewalEntropyRate, renewalInformationVariance } from '../../../src/core/sources/renewalLaw';
import { renewalSource } from '../../../src/core/sources/renewalSource';

describe('renewalSource', () => {
  it('states h = H(T)/E[T], claims no sigma^2 and no Gaussian limit', () => {
    const source = renewalSource(1.5);
    expect(source.id).toBe('renewal:1.5');
    expect(source.facts.entropyRate).toBe(renewalEntropyRate(1.5));
    expect(source.facts.sigma2).toBeNull();
    expect(source.facts.gaussianLimit).toBe(false);
    expect(source.facts.description).toMatch(/infinite/);
    expect(renewalSource(3.5).facts.description).not.toMatch(/infinite/);
  });

  it('states sigma^2 from the renewal-reward formula once the gap variance is finite', () => {
    // source: renewalInformationVariance (checked against the age chain in renewalLaw.test.ts)
    const finite = renewalSource(2.5);
    expect(finite.facts.sigma2).toBe(renewalInformationVariance(2.5));
    expect(finite.facts.gaussianLimit).toBe(false);
    expect(finite.facts.description).toMatch(/third moment of the gap is infinite/);
    expect(renewalSource(3.5).facts.gaussianLimit).toBe(true);
  });

  it('defaults to alpha = 1.5', () => {
    expect(renewalSource().id).toBe('renewal:1.5');
  });

  it('writes runs of 0s each closed by a single 1, reproducibly', () => {
    const a = renewalSource(1.5).generate(10_000, 6);
    const b = renewalSource(1.5).generate(10_000, 6);
    expect(Array.from(a.symbols)).toEqual(Array.from(b.symbols));
    expect(a.alphabet).toEqual(['0', '1']);
    expect(a.counts[0]! + a.counts[1]!).toBe(10_000);
  });

  it('handles alpha close to 1, where the first run can exceed any sample', () => {
    const seq = renewalSource(1.01).generate(1000, 1);
    expect(seq.symbols).toHaveLength(1000);
  });

  it('rejects alpha <= 1', () => {
    expect(() => renewalSource(1)).toThrow(RangeError);
    expect(() => renewalSource(0.5)).toThrow(/0.5/);
  });
});
