import type { AlternativeEstimate, AnalysisResult } from '../../core';
import { decimalsForInterval, DEFAULT_DECIMALS, formatCount, formatFixed, prettyUnit } from './format';

export interface IntervalText {
  readonly value: string;
  readonly low: string;
  readonly high: string;
  readonly unit: string;
}

export interface AlternativeRow {
  readonly key: string;
  readonly label: string;
  readonly estimate: string;
  readonly interval: string;
  readonly lengths: string;
  readonly note: string;
}

/** Everything the summary panel prints, as text; no numbers are computed in the component. */
export interface SummaryView {
  readonly inputName: string;
  readonly inputLine: string;
  readonly confidenceLabel: string;
  readonly entropy: IntervalText & { readonly method: string; readonly perSecond: IntervalText | null };
  readonly sigma2: IntervalText & { readonly method: string; readonly negligible: boolean; readonly reason: string };
  readonly lengths: string;
  readonly reason: string;
  readonly alternatives: readonly AlternativeRow[];
  /** The generator's exact values when the input was generated (demo or reference source). */
  readonly reference: { readonly source: string; readonly entropy: string; readonly sigma2: string } | null;
  readonly warnings: readonly { readonly code: string; readonly message: string }[];
}

function intervalText(estimate: number, ci: readonly [number, number], unit: string): IntervalText {
  const d = decimalsForInterval(ci[0], ci[1]);
  return { value: formatFixed(estimate, d), low: formatFixed(ci[0], d), high: formatFixed(ci[1], d), unit: prettyUnit(unit) };
}

function alternativeRow(key: string, a: AlternativeEstimate): AlternativeRow {
  const d = a.ci95 === null ? DEFAULT_DECIMALS : decimalsForInterval(a.ci95[0], a.ci95[1]);
  return {
    key,
    label: a.label,
    estimate: formatFixed(a.estimate, d),
    interval: a.ci95 === null ? '—' : `${formatFixed(a.ci95[0], d)} to ${formatFixed(a.ci95[1], d)}`,
    lengths: a.lengthsUsed === null ? '—' : rangeText(a.lengthsUsed),
    note: a.note,
  };
}

function rangeText([from, to]: readonly [number, number]): string {
  return from === to ? `n = ${from}` : `n = ${from} to ${to}`;
}

/** The summary panel's text for one result. */
export function summaryView(result: AnalysisResult): SummaryView {
  const { entropy, sigma2, input } = result;
  const percent = Math.round(entropy.confidence * 1000) / 10;
  const perSecond =
    entropy.perSecond === null || entropy.perSecondUnit === null
      ? null
      : intervalText(entropy.perSecond.estimate, entropy.perSecond.ci95, entropy.perSecondUnit);
  const entropyText = intervalText(entropy.estimate, entropy.ci95, entropy.unit);
  const sigmaText = intervalText(sigma2.estimate, sigma2.ci95, sigma2.unit);
  const ref = result.reference;
  const refDigits = DEFAULT_DECIMALS + 2;
  return {
    inputName: input.name,
    inputLine: `${formatCount(input.symbols)} symbols · alphabet of ${formatCount(input.alphabetSize)} · read as ${input.format}`,
    confidenceLabel: `${percent}% interval`,
    entropy: { ...entropyText, method: entropy.method, perSecond },
    sigma2: { ...sigmaText, method: sigma2.method, negligible: sigma2.negligible, reason: sigma2.reason },
    lengths: rangeText(entropy.lengthsUsed),
    reason: entropy.reason,
    alternatives: Object.entries(entropy.alternatives).map(([key, a]) => alternativeRow(key, a)),
    reference:
      ref === null
        ? null
        : {
            source: ref.source,
            entropy: `${formatFixed(ref.entropyRate, refDigits)} ${entropyText.unit}`,
            sigma2: `${formatFixed(ref.sigma2, refDigits)} ${sigmaText.unit}`,
          },
    warnings: result.warnings,
  };
}
