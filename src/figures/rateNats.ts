import { entropyFromNats, type AnalysisResult } from '../core';

/** The result's headline h and sigma converted back to nats (the unit of its sampled paths); null when not finite. */
export function rateNats(result: AnalysisResult): { readonly hNats: number | null; readonly sigmaNats: number | null } {
  const f = entropyFromNats(1, result.settings.unit);
  const h = result.entropy.estimate;
  const s2 = result.sigma2.estimate;
  return {
    hNats: Number.isFinite(h) ? h / f : null,
    sigmaNats: Number.isFinite(s2) && s2 > 0 ? Math.sqrt(s2) / f : null,
  };
}
