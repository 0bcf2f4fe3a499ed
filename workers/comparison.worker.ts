import { expose, releaseProxy } from 'comlink';
import { compareSequences, createDigestingReader, crossReferenceOfSpecs, parseSourceSpec } from '../src/core';
import { demoScenario } from './demoScenarios';
import type { AnalysisSettings, ComparisonInputFacts, ComparisonResult, ReaderOptions, Sequence } from '../src/core';

/** One side of a comparison: a file (streamed here) or a reference source generated here. */
export type ComparisonSide =
  | { readonly kind: 'file'; readonly blob: Blob; readonly options: ReaderOptions & { readonly name: string } }
  | { readonly kind: 'source'; readonly spec: string; readonly length: number; readonly seed: number }
  | { readonly kind: 'demo'; readonly id: string; readonly length: number; readonly seed: number };

/** Gallery ids of reference sources are 'source:' + the core's spec. */
const REFERENCE_PREFIX = 'source:';

/** Which stage runs and how far it is: reading, A alone by block length, then the segment pairs. */
export interface ComparisonProgress {
  readonly stage: 'read' | 'entropy-a' | 'waiting';
  readonly done: number;
  readonly total: number;
}
export type ComparisonProgressCallback = (progress: ComparisonProgress) => void;

async function load(side: ComparisonSide): Promise<{ sequence: Sequence; facts: ComparisonInputFacts; spec: string | null }> {
  if (side.kind === 'source') {
    const source = parseSourceSpec(side.spec);
    return {
      sequence: source.generate(side.length, side.seed),
      facts: { name: `${source.label} (${side.length} symbols, seed ${side.seed})`, sha256: null, format: 'generated' },
      spec: source.id,
    };
  }
  if (side.kind === 'demo') {
    const scenario = demoScenario(side.id);
    const sequence = scenario.source.generate(side.length, side.seed);
    return {
      sequence: scenario.labels === null ? sequence : { ...sequence, alphabet: scenario.labels },
      facts: { name: `${scenario.title} (${side.length} symbols, seed ${side.seed})`, sha256: null, format: 'generated' },
      // Exact values only for the core's reference sources; invented stories are stories.
      spec: scenario.kind === 'reference' && side.id.startsWith(REFERENCE_PREFIX) ? parseSourceSpec(side.id.slice(REFERENCE_PREFIX.length)).id : null,
    };
  }
  const { name, ...options } = side.options;
  const reader = createDigestingReader({ ...options, sizeHint: side.blob.size });
  const stream = side.blob.stream().getReader();
  for (;;) {
    const { done, value } = await stream.read();
    if (done) break;
    reader.push(value);
  }
  const read = reader.finish();
  return { sequence: read.sequence, facts: { name, sha256: read.sha256, format: options.format }, spec: null };
}

const api = {
  /** Reads or generates both sides and compares them (compareSequences); exact values for two reference chains. */
  async compare(a: ComparisonSide, b: ComparisonSide, settings: AnalysisSettings, onProgress: ComparisonProgressCallback): Promise<ComparisonResult> {
    try {
      onProgress({ stage: 'read', done: 0, total: 2 });
      const left = await load(a);
      onProgress({ stage: 'read', done: 1, total: 2 });
      const right = await load(b);
      const exact = left.spec !== null && right.spec !== null ? crossReferenceOfSpecs(left.spec, right.spec) : null;
      const maxN = Math.min(settings.maxN, left.sequence.symbols.length - 1);
      return compareSequences(left.sequence, right.sequence, left.facts, right.facts, { ...settings, maxN }, {
        onLevel: (stage, done, total) => onProgress({ stage, done, total }),
        ...(exact === null ? {} : { exact }),
      });
    } finally {
      (onProgress as Partial<Record<typeof releaseProxy, () => void>>)[releaseProxy]?.();
    }
  },
};

expose(api);

export type ComparisonApi = typeof api;
