import { describe, expect, it } from 'vitest';
import { markovEntropyRate } from '../../../src/core/sources/markovEntropy';
import { galleryView } from '../../../src/ui/view/galleryView';
import {
  DEMO_SCENARIOS,
  demoScenario,
  hilltopWindMatrix,
  LOWER_VALLEY_SONG,
  SONG_SYLLABLES,
  UPPER_VALLEY_SONG,
} from '../../../workers/demoScenarios';

/** Binary entropy in nats. */
const H2 = (p: number): number => -p * Math.log(p) - (1 - p) * Math.log(1 - p);

function facts(id: string) {
  return demoScenario(id).source.facts;
}

describe('demo gallery catalogue', () => {
  it('holds the five reference sources of the brief and five invented stories (two of them a pair for comparing)', () => {
    expect(DEMO_SCENARIOS.map((d) => `${d.kind}:${d.id}`)).toEqual([
      'reference:source:coin',
      'reference:source:markov:0.9,0.1;0.4,0.6',
      'reference:source:golden',
      'reference:source:cf',
      'reference:source:renewal:1.5',
      'invented:hilltop-wind',
      'invented:stirred-tank',
      'invented:dry-wet-days',
      'invented:song-upper-valley',
      'invented:song-lower-valley',
    ]);
    for (const d of DEMO_SCENARIOS) expect(d.title.includes('(invented)')).toBe(d.kind === 'invented');
  });

  it('states the exact h and sigma^2 of each reference source', () => {
    // Fair coin: h = log 2, sigma^2 = 0 (closed form).
    expect(facts('source:coin')).toMatchObject({ entropyRate: Math.LN2, sigma2: 0 });
    // Two-state chain: stationary law (0.8, 0.2) from 0.1 pi_0 = 0.4 pi_1; h = sum_i pi_i H(row i)
    // (Cover and Thomas 2006, Theorem 4.2.4).
    expect(facts('source:markov:0.9,0.1;0.4,0.6').entropyRate).toBeCloseTo(0.8 * H2(0.1) + 0.2 * H2(0.4), 12);
    // Golden-mean shift under its Parry measure: h = log((1 + sqrt 5)/2), sigma^2 = 0 (Parry 1964).
    expect(facts('source:golden').entropyRate).toBeCloseTo(Math.log((1 + Math.sqrt(5)) / 2), 12);
    expect(facts('source:golden').sigma2).toBe(0);
    // Gauss map: h = pi^2 / (6 log 2) (from memory; the classical entropy of the Gauss measure).
    expect(facts('source:cf').entropyRate).toBeCloseTo((Math.PI * Math.PI) / (6 * Math.LN2), 12);
    // The renewal chain claims no sigma^2.
    expect(facts('source:renewal:1.5').sigma2).toBeNull();
  });

  it('states exact values for the invented stories from their generators', () => {
    // Logistic map at r = 4 cut at 1/2: i.i.d. fair bits, h = log 2, sigma^2 = 0 (Ulam and von Neumann 1947; from memory).
    expect(facts('stirred-tank')).toMatchObject({ entropyRate: Math.LN2, sigma2: 0 });
    // Dry/wet chain [[0.85, 0.15], [0.3, 0.7]]: pi = (2/3, 1/3) from 0.15 pi_D = 0.3 pi_W (Cover and Thomas 2006, Theorem 4.2.4).
    expect(facts('dry-wet-days').entropyRate).toBeCloseTo((2 / 3) * H2(0.15) + (1 / 3) * H2(0.3), 12);
    expect(facts('hilltop-wind').entropyRate).toBe(markovEntropyRate(hilltopWindMatrix()));
    expect(facts('song-upper-valley').entropyRate).toBeCloseTo(markovEntropyRate(UPPER_VALLEY_SONG), 12);
    expect(facts('song-lower-valley').entropyRate).toBeCloseTo(markovEntropyRate(LOWER_VALLEY_SONG), 12);
    // The valley pair shares one alphabet and every transition is possible, so each song's blocks
    // can occur in the other's and the cross entropy is finite (common practice, no source).
    for (const m of [UPPER_VALLEY_SONG, LOWER_VALLEY_SONG]) {
      expect(m).toHaveLength(SONG_SYLLABLES.length);
      for (const row of m) {
        expect(row.every((p) => p > 0)).toBe(true);
        expect(row.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
      }
    }
  });

  it('the cards show the exact values in the chosen unit and mark invented stories', () => {
    const nats = galleryView(DEMO_SCENARIOS, 'nat');
    const bits = galleryView(DEMO_SCENARIOS, 'bit');
    const coin = nats.find((i) => i.id === 'source:coin');
    expect(coin).toMatchObject({ entropy: '0.693147 nat/symbol', sigma2: '0.000000 nat²/symbol', badge: 'Reference source', invented: false });
    expect(bits.find((i) => i.id === 'source:coin')?.entropy).toBe('1.000000 bit/symbol');
    expect(nats.find((i) => i.id === 'source:renewal:1.5')?.sigma2).toBe('none claimed');
    expect(nats.filter((i) => i.invented).map((i) => i.badge)).toEqual(Array.from({ length: 5 }, () => 'Invented story'));
  });
});
