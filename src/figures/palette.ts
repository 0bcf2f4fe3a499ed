/**
 * returnrate's series colours, chosen for this program: a cobalt, an amber, a lilac, a teal and the
 * page's ink, plus a light grey for the many thin sample paths. They were picked by a small search
 * that maximised the smallest CIEDE2000 difference between any two of them, on white, under normal
 * vision and under simulated protanopia, deuteranopia and tritanopia (Machado, Oliveira & Fernandes
 * 2009, severity 1); test/figures/palette.test.ts keeps that property. Colour is never the only
 * cue: every series also has its own dash pattern or marker shape (seriesStyle.ts).
 */
export const PALETTE = {
  cobalt: '#174bad',
  amber: '#d68714',
  lilac: '#a97dd7',
  teal: '#20957f',
  ink: '#1b2330',
  pathGrey: '#b9c0ca',
} as const;

export type PaletteName = keyof typeof PALETTE;

/** Every series colour, for the colour-vision test and for legends that list them. */
export const SERIES_COLOURS: readonly PaletteName[] = ['cobalt', 'amber', 'lilac', 'teal', 'ink', 'pathGrey'];

/** Band fills: the series colour at low opacity, so bands stay readable where they overlap. */
export const BAND_OPACITY = 0.16;
