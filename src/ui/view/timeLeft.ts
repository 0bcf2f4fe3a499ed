/** What the scan has reported so far, enough to guess how long the rest takes. */
export interface ScanSoFar {
  /** Seconds from the start of the scan to its last level report. */
  readonly elapsedSeconds: number;
  /** Last finished block length n (1-based). */
  readonly n: number;
  /** The run's largest block length. */
  readonly maxN: number;
  /** Positions still in play after level n. */
  readonly active: number;
  /** Positions still in play after level n - 1; null before the second report. */
  readonly previousActive: number | null;
  /** Sum of the positions in play over the levels finished so far (the work done, in position-levels). */
  readonly positionLevelsDone: number;
}

/**
 * Seconds the scan still needs, or null while there is nothing to go on.
 *
 * Rule (ours; it follows the engine's cost model in ARCHITECTURE.md): the work of a level is
 * proportional to the positions still in play, and these shrink geometrically once e^{nh} passes
 * the sequence length. So the remaining levels n+1..maxN are predicted to hold
 * a_n r + a_n r^2 + ... + a_n r^m positions (m = maxN - n), with r = a_n / a_{n-1} the last
 * observed ratio, capped at 1 (the count never grows), and the time per position-level is the one
 * measured so far: elapsed / positionLevelsDone. With r = 1 this is m a_n, the plain linear
 * extrapolation; with a_n = 0 nothing is left.
 */
export function timeLeftSeconds(s: ScanSoFar): number | null {
  const m = s.maxN - s.n;
  if (m <= 0 || s.active <= 0) return 0;
  if (s.previousActive === null || s.previousActive <= 0 || !(s.positionLevelsDone > 0) || !(s.elapsedSeconds >= 0)) return null;
  const r = Math.min(1, s.active / s.previousActive);
  const remaining = r === 1 ? m * s.active : (s.active * r * (1 - r ** m)) / (1 - r);
  return (s.elapsedSeconds / s.positionLevelsDone) * remaining;
}

/** A duration for people: '< 1 s', '42 s', '3 min 05 s', '1 h 02 min'. */
export function formatDuration(seconds: number): string {
  if (!Number.isFinite(seconds) || seconds < 0) return '—';
  if (seconds < 1) return '< 1 s';
  const s = Math.round(seconds);
  if (s < 60) return `${s} s`;
  if (s < 3600) return `${Math.floor(s / 60)} min ${String(s % 60).padStart(2, '0')} s`;
  return `${Math.floor(s / 3600)} h ${String(Math.floor((s % 3600) / 60)).padStart(2, '0')} min`;
}
