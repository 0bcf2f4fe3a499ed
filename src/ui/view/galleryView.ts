import { entropyFromNats, rateUnitLabel, varianceFromNats, varianceUnitLabel } from '../../core';
import type { EntropyUnit } from '../../core';
import type { DemoScenario } from '../../../workers/demoScenarios';
import { formatFixed, prettyUnit } from './format';

/** One card of the demo gallery, as text. */
export interface GalleryItem {
  readonly id: string;
  readonly title: string;
  /** 'Reference source' or 'Invented story'. */
  readonly badge: string;
  readonly invented: boolean;
  readonly story: string;
  /** Exact entropy rate in the chosen unit, e.g. '0.693147 nat/symbol', or 'not known'. */
  readonly entropy: string;
  /** Exact sigma^2 in the chosen unit, or 'none claimed'. */
  readonly sigma2: string;
  /** The source's own account of how exact the numbers are. */
  readonly description: string;
}

/** Decimals of the exact values in the gallery (they are exact; six is what a card has room for). */
const EXACT_DECIMALS = 6;

/** The gallery's cards: each entry's exact h and sigma^2 straight from its source object, in the chosen unit. */
export function galleryView(scenarios: readonly DemoScenario[], unit: EntropyUnit): readonly GalleryItem[] {
  return scenarios.map((s) => {
    const { entropyRate, sigma2, description } = s.source.facts;
    return {
      id: s.id,
      title: s.title,
      badge: s.kind === 'invented' ? 'Invented story' : 'Reference source',
      invented: s.kind === 'invented',
      story: s.story,
      entropy: entropyRate === null ? 'not known' : `${formatFixed(entropyFromNats(entropyRate, unit), EXACT_DECIMALS)} ${rateUnitLabel(unit)}`,
      sigma2: sigma2 === null ? 'none claimed' : `${formatFixed(varianceFromNats(sigma2, unit), EXACT_DECIMALS)} ${prettyUnit(varianceUnitLabel(unit))}`,
      description,
    };
  });
}
