import { describe, expect, test } from 'vitest';
import { mixingDiagnostics } from '../../../src/core/diagnostics/mixingDiagnostics';
import { iidSource } from '../../../src/core/sources/iidSource';
import { markovSource } from '../../../src/core/sources/markovSource';
import { renewalSource } from '../../../src/core/sources/renewalSource';

// The readings are rules, not estimates; these tests check that each reference source lands on
// the verdict its known mixing implies (i.i.d.: independent; the chain: second eigenvalue 0.5,
// exponential; renewal with gap tail exponent 1.5: beta(k) ~ k^-0.5, not summable, from the
// renewal structure, from memory).
describe('mixingDiagnostics', () => {
  test('an i.i.d. source reads as fast, with nothing to fit', () => {
    const seq = iidSource([0.7, 0.3]).generate(200_000, 8);
    const d = mixingDiagnostics(seq.symbols, 2, { informationOrder: 2, });
    expect(d.beta?.gapsAboveFloor).toBe(0);
    expect(d.beta?.exponential).toBeNull();
    expect(d.reading.verdict).toBe('fast');
    expect(d.reading.text).toContain('the mixing the limit theorems assume looks plausible');
    expect(d.reading.caveat).toContain('cannot prove mixing');
  });

  test('a fast two-state chain reads as fast with an exponential fit near its eigenvalue', () => {
    const seq = markovSource([
      [0.9, 0.1],
      [0.4, 0.6],
    ]).generate(1_000_000, 8);
    const d = mixingDiagnostics(seq.symbols, 2, { informationOrder: 2, });
    expect(d.reading.verdict).toBe('fast');
    // beta(k) of the blocks falls like 0.5^k, tau = 1/ln 2 = 1.44 (second eigenvalue 0.5); the
    // first gaps carry a pre-asymptotic excess, so only the order of magnitude is checked.
    const tau = d.beta?.exponential?.scale ?? Number.NaN;
    expect(tau).toBeGreaterThan(1);
    expect(tau).toBeLessThan(2.5);
  });

  test('the renewal chain with tail exponent 1.5 reads as too slow, with a power rate below 1', () => {
    const seq = renewalSource(1.5).generate(1_000_000, 8);
    const d = mixingDiagnostics(seq.symbols, 2, { informationOrder: 5, });
    expect(d.reading.verdict).toBe('too-slow');
    expect(d.beta?.power?.scale).toBeLessThan(1);
    expect(d.autocorrelation?.outside).toBeGreaterThan(10);
  });

  test('a very short sequence gives an unknown reading, not an error', () => {
    const seq = iidSource([0.5, 0.5]).generate(500, 1);
    const d = mixingDiagnostics(seq.symbols, 2, { informationOrder: 1, });
    expect(d.beta).toBeNull();
    expect(d.reading.verdict).toBe('unknown');
  });
});
