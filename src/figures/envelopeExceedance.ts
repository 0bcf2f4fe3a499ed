/** Band half-widths at one n (nats); null where a band is not defined or cannot be computed. */
export interface BandWidths {
  readonly gaussian: number | null;
  readonly iteratedLog: number | null;
  readonly errorTerm: number | null;
}

export type EnvelopeBand = keyof BandWidths;

export interface ExceedanceRow {
  readonly n: number;
  /** Paths with a value at this n. */
  readonly used: number;
  /** Paths left out at this n: censored or past the end (null entries). */
  readonly leftOut: number;
  /** Fraction of used paths strictly outside ±half-width; null when the band is undefined or no path is used. */
  readonly outside: Readonly<Record<EnvelopeBand, number | null>>;
}

const BANDS: readonly EnvelopeBand[] = ['gaussian', 'iteratedLog', 'errorTerm'];

/**
 * Per n, the share of sampled paths whose deviation log R_n(x) − n h lies outside each band.
 * @param logReturn per path, log R_n for n = 1.. (nats; null = censored or past the end)
 * @param hNats the entropy rate the deviations are taken from
 * @param widths half-widths per n (index n − 1)
 */
export function envelopeExceedance(
  logReturn: readonly (readonly (number | null)[])[],
  hNats: number,
  widths: readonly BandWidths[],
): ExceedanceRow[] {
  const rows: ExceedanceRow[] = [];
  for (let i = 0; i < widths.length; i++) {
    const n = i + 1;
    const w = widths[i] as BandWidths;
    let used = 0;
    const outsideCount: Record<EnvelopeBand, number> = { gaussian: 0, iteratedLog: 0, errorTerm: 0 };
    for (const row of logReturn) {
      const v = row[i];
      if (v === null || v === undefined) continue;
      used++;
      const d = Math.abs(v - n * hNats);
      for (const b of BANDS) {
        const half = w[b];
        if (half !== null && d > half) outsideCount[b]++;
      }
    }
    const share = (b: EnvelopeBand): number | null => (w[b] === null || used === 0 ? null : outsideCount[b] / used);
    rows.push({
      n,
      used,
      leftOut: logReturn.length - used,
      outside: { gaussian: share('gaussian'), iteratedLog: share('iteratedLog'), errorTerm: share('errorTerm') },
    });
  }
  return rows;
}
