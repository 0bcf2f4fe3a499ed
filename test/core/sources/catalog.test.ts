import { describe, expect, it } from 'vitest';
import { parseSourceSpec, sourceCatalog } from '../../../src/core/sources/catalog';

describe('sourceCatalog', () => {
  it('lists the eight reference sources with distinct ids', () => {
    const ids = sourceCatalog().map((s) => s.id);
    expect(ids).toEqual([
      'coin',
      'iid:0.7,0.3',
      'markov:0.9,0.1;0.4,0.6',
      'markov:0.5,0.3,0.2;0.2,0.6,0.2;0.1,0.2,0.7',
      'golden',
      'cf',
      'renewal:2.5',
      'renewal:1.5',
    ]);
  });

  it('has ids that parse back into sources with the same facts', () => {
    for (const source of sourceCatalog()) {
      const parsed = parseSourceSpec(source.id);
      expect(parsed.id).toBe(source.id);
      expect(parsed.facts).toEqual(source.facts);
    }
  });

  it('states h for every source and sigma^2 except for the renewal process with infinite gap variance', () => {
    for (const source of sourceCatalog()) {
      expect(source.facts.entropyRate).not.toBeNull();
      expect(source.facts.description.length).toBeGreaterThan(40);
      if (source.id === 'renewal:1.5') expect(source.facts.sigma2).toBeNull();
      else expect(source.facts.sigma2).not.toBeNull();
    }
  });
});

describe('parseSourceSpec', () => {
  it('parses every documented form', () => {
    expect(parseSourceSpec('coin').id).toBe('coin');
    expect(parseSourceSpec(' Bernoulli:0.3 ').id).toBe('iid:0.7,0.3');
    expect(parseSourceSpec('iid:0.3,0.7').id).toBe('iid:0.3,0.7');
    expect(parseSourceSpec('markov:0.9,0.1;0.4,0.6').facts.entropyRate).toBeCloseTo(0.394668712115, 11);
    expect(parseSourceSpec('markov2:0.8,0.2;0.3,0.7;0.6,0.4;0.1,0.9').id).toBe('markov2:0.8,0.2;0.3,0.7;0.6,0.4;0.1,0.9');
    expect(parseSourceSpec('golden').id).toBe('golden');
    expect(parseSourceSpec('parry:1,1;1,0').facts.entropyRate).toBeCloseTo(Math.log((1 + Math.sqrt(5)) / 2), 14);
    expect(parseSourceSpec('cf').id).toBe('cf');
    expect(parseSourceSpec('renewal').id).toBe('renewal:1.5');
    expect(parseSourceSpec('renewal:2.5').id).toBe('renewal:2.5');
  });

  it('names the bad part in a RangeError', () => {
    expect(() => parseSourceSpec('dice')).toThrow(/unknown source "dice"/);
    expect(() => parseSourceSpec('iid:0.3,x')).toThrow(/iid, entry 2: "x" is not a number/);
    expect(() => parseSourceSpec('markov:0.9,0.1;0.4')).toThrow(/row 2 has 1 entries/);
    expect(() => parseSourceSpec('markov:0.9,0.1;0.4,abc')).toThrow(/markov, row 2, entry 2: "abc"/);
    expect(() => parseSourceSpec('markov:')).toThrow(/needs matrix rows/);
    expect(() => parseSourceSpec('coin:3')).toThrow(/takes no parameters/);
    expect(() => parseSourceSpec('bernoulli:1.5')).toThrow(/not in \[0, 1\]/);
    expect(() => parseSourceSpec('renewal:0.9')).toThrow(/tail exponent/);
    expect(() => parseSourceSpec('markov2:0.5,0.5')).toThrow(/needs 4 rows/);
    expect(() => parseSourceSpec('parry:1,2;1,0')).toThrow(/not 0 or 1/);
    for (const bad of ['dice', 'iid:0.3,x', 'renewal:0.9']) {
      expect(() => parseSourceSpec(bad)).toThrow(RangeError);
    }
  });
});
