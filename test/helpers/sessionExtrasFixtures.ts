import { analyzeSequence } from '../../src/core/analyze';
import { calibrateSequence } from '../../src/core/calibration/calibrationResult';
import type { CalibrationResult } from '../../src/core/calibration/calibrationResult';
import { compareSequences } from '../../src/core/cross/compareSequences';
import type { ComparisonResult } from '../../src/core/cross/comparisonResult';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import type { AnalysisResult } from '../../src/core/result/analysisResult';
import { createDigestingReader } from '../../src/core/sequence/digestingReader';
import type { Sequence } from '../../src/core/sequence/sequence';
import { parseSourceSpec } from '../../src/core/sources/catalog';

/** A file name meant to break naive writers: quotes, markup, a line break, non-ASCII. */
export const HOSTILE_NAME = 'wind "gusts", <script>alert(1)</script>\n€.txt';
export const HOSTILE_NAME_B = 'other <b>&</b> "side".txt';

/** A token file made from a two-state chain, read with its SHA-256 (the reader's digest). */
function tokenFile(length: number, seed: number): { sequence: Sequence; sha256: string } {
  const ids = parseSourceSpec('markov:0.9,0.1;0.4,0.6').generate(length, seed).symbols;
  const text = Array.from(ids, (id) => (id === 0 ? 'calm' : 'gust')).join(' ');
  const reader = createDigestingReader({ format: 'tokens' });
  reader.push(new TextEncoder().encode(text));
  const read = reader.finish();
  return { sequence: read.sequence, sha256: read.sha256 };
}

export interface ExtrasFixture {
  readonly result: AnalysisResult;
  readonly calibration: CalibrationResult;
  readonly comparison: ComparisonResult;
}

let cached: ExtrasFixture | null = null;

/** A real analysis of 3000 symbols, its calibration with 10 replicates (seed 5), and a comparison of two files. */
export function extrasFixture(): ExtrasFixture {
  if (cached !== null) return cached;
  const a = tokenFile(3_000, 1);
  const b = tokenFile(3_000, 2);
  const settings = { ...DEFAULT_SETTINGS, maxN: 12 };
  const result = analyzeSequence(a.sequence, { name: HOSTILE_NAME, sha256: a.sha256, format: 'tokens' }, settings);
  const calibration = calibrateSequence(a.sequence, result, 10, 5);
  const comparison = compareSequences(
    a.sequence,
    b.sequence,
    { name: HOSTILE_NAME, sha256: a.sha256, format: 'tokens' },
    { name: HOSTILE_NAME_B, sha256: b.sha256, format: 'tokens' },
    settings,
  );
  cached = { result, calibration, comparison };
  return cached;
}
