import { converter, differenceCiede2000, filterDeficiencyDeuter, filterDeficiencyProt, filterDeficiencyTrit } from 'culori';
import type { Rgb } from 'culori';
import { describe, expect, it } from 'vitest';
import { PALETTE, SERIES_COLOURS } from '../../src/figures/palette';

/**
 * Simulation matrices for complete (severity 1.0) protanopia, deuteranopia and tritanopia, acting on
 * linear RGB: Machado, Oliveira & Fernandes (2009), "A Physiologically-based Model for Simulation of
 * Color Vision Deficiency", IEEE TVCG 15(6):1291-1298, the precomputed matrices published with the
 * paper. Typed from memory and checked below against culori's copy of the same table.
 */
const MACHADO_2009: Record<'protanopia' | 'deuteranopia' | 'tritanopia', readonly (readonly number[])[]> = {
  protanopia: [
    [0.152286, 1.052583, -0.204868],
    [0.114503, 0.786281, 0.099216],
    [-0.003882, -0.048116, 1.051998],
  ],
  deuteranopia: [
    [0.367322, 0.860646, -0.227968],
    [0.280085, 0.672501, 0.047413],
    [-0.01182, 0.04294, 0.968881],
  ],
  tritanopia: [
    [1.255528, -0.076749, -0.178779],
    [-0.078411, 0.930809, 0.147602],
    [0.004733, 0.691367, 0.3039],
  ],
};

const toLinear = converter('lrgb');
const toRgb = converter('rgb');
const deltaE2000 = differenceCiede2000();
const clamp01 = (v: number): number => Math.min(1, Math.max(0, v));

/** The colour as seen with the deficiency: sRGB -> linear RGB (IEC 61966-2-1) -> matrix -> clamp -> sRGB. */
function simulate(hex: string, matrix: readonly (readonly number[])[] | null): Rgb {
  const rgb = toRgb(hex);
  if (rgb === undefined) throw new Error(`not a colour: ${hex}`);
  if (matrix === null) return rgb;
  const lin = toLinear(rgb);
  const v = [lin.r, lin.g, lin.b];
  const row = (k: number): number => clamp01((matrix[k] ?? []).reduce((sum, m, j) => sum + m * (v[j] ?? 0), 0));
  return toRgb({ mode: 'lrgb', r: row(0), g: row(1), b: row(2) });
}

/**
 * Smallest CIEDE2000 difference allowed between two series colours under any vision: around 10 two
 * colours read as different at a glance; we ask for 15 (common practice, no source). The palette
 * was searched to reach about 20.
 */
const MIN_DELTA_E = 15;

describe('series palette under colour-vision deficiency', () => {
  it('the Machado 2009 matrices typed here equal the ones culori ships (columns = images of the unit colours)', () => {
    // culori applies the matrix to gamma-encoded RGB without clamping, so a unit colour gives a column exactly.
    const filters = { protanopia: filterDeficiencyProt(1), deuteranopia: filterDeficiencyDeuter(1), tritanopia: filterDeficiencyTrit(1) };
    for (const [name, matrix] of Object.entries(MACHADO_2009) as [keyof typeof MACHADO_2009, readonly (readonly number[])[]][]) {
      const units: Rgb[] = [
        { mode: 'rgb', r: 1, g: 0, b: 0 },
        { mode: 'rgb', r: 0, g: 1, b: 0 },
        { mode: 'rgb', r: 0, g: 0, b: 1 },
      ];
      units.forEach((unit, j) => {
        const out = filters[name](unit);
        expect([out.r, out.g, out.b].map((x) => Number(x.toFixed(6)))).toEqual(matrix.map((row) => row[j]));
      });
    }
  });

  it('every pair of series colours differs by at least ΔE2000 15 for normal vision and the three simulated deficiencies', () => {
    const visions: [string, readonly (readonly number[])[] | null][] = [['normal', null], ...Object.entries(MACHADO_2009)];
    const worst: Record<string, number> = {};
    for (const [vision, matrix] of visions) {
      const seen = SERIES_COLOURS.map((name) => simulate(PALETTE[name], matrix));
      let smallest = Infinity;
      for (let i = 0; i < seen.length; i++) {
        for (let j = i + 1; j < seen.length; j++) {
          const d = deltaE2000(seen[i] as Rgb, seen[j] as Rgb);
          expect(d, `${vision}: ${SERIES_COLOURS[i]} vs ${SERIES_COLOURS[j]}`).toBeGreaterThanOrEqual(MIN_DELTA_E);
          smallest = Math.min(smallest, d);
        }
      }
      worst[vision] = Number(smallest.toFixed(1));
    }
    // Recorded so a palette change shows its effect in review.
    expect(worst).toMatchInlineSnapshot(`
      {
        "deuteranopia": 20,
        "normal": 21.3,
        "protanopia": 19.8,
        "tritanopia": 21.4,
      }
    `);
  });

  it('the palette is checked whole: six distinct hex colours, all of them series colours', () => {
    expect(new Set(Object.values(PALETTE)).size).toBe(6);
    expect([...SERIES_COLOURS].sort()).toEqual(Object.keys(PALETTE).sort());
  });

  it('simulate leaves white white and black black under every deficiency (the matrices keep rows summing to 1)', () => {
    // Machado et al. normalise each matrix so that white maps to white.
    for (const matrix of Object.values(MACHADO_2009)) {
      for (const row of matrix) expect(row.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 5);
      const white = simulate('#ffffff', matrix);
      expect([white.r, white.g, white.b].map((x) => Number(x.toFixed(6)))).toEqual([1, 1, 1]);
    }
  });
});
