import type { ChunkPlan, ScanPart } from '../returns/chunkedScan';
import type { LevelStats } from '../returns/levelStats';
import type { AnalysisSettings, InputSummary } from './analysisResult';
import { PROGRAM_VERSION } from './version';

/** Schema of a part file: one chunk's mergeable statistics. */
export const PART_SCHEMA = 'returnrate.part/1';

/** What a part file holds besides the statistics. */
export interface PartFacts {
  /** The whole input (name, SHA-256 of the file, format, alphabet with whole-file counts). */
  readonly input: InputSummary;
  readonly settings: AnalysisSettings;
  /** SHA-256 (hex) of the chunk's symbol ids as little-endian 32-bit integers, or null. */
  readonly chunkSha256: string | null;
}

/** A part file read back. */
export interface PartFileContents extends PartFacts {
  readonly part: ScanPart;
}

/** A part file that cannot be used; the message names the file and the field. */
export class PartFileError extends RangeError {
  override readonly name = 'PartFileError';
}

const LEVEL_ARRAYS = ['histogram', 'batchObserved', 'batchSumLog', 'batchSumLog2', 'batchSumLogCount'] as const;
const LEVEL_NUMBERS = [
  'n',
  'positions',
  'distinctBlocks',
  'singletons',
  'sumCountLogCount',
  'forwardObserved',
  'forwardSumLog',
  'forwardSumLog2',
  'observed',
  'sumLog',
  'sumLog2',
  'sumLogRc',
  'sumLogRc2',
  'matchCount',
] as const;
const PLAN_NUMBERS = ['length', 'maxN', 'chunkSize', 'chunkCount', 'batchLength', 'batchCount', 'stride', 'matchWindow'] as const;

/**
 * The part file's JSON text. Numbers are written by JSON.stringify, whose shortest round-trip form
 * reads back to the same double, so a merge of part files equals the in-process merge bit for bit.
 * Batch arrays are written for the chunk's own batches only (`firstBatch` on).
 */
export function partFileJson(part: ScanPart, facts: PartFacts): string {
  const { plan } = part;
  const firstBatch = Math.floor((part.index * plan.chunkSize) / plan.batchLength);
  const lastBatch = part.index === plan.chunkCount - 1 ? plan.batchCount : ((part.index + 1) * plan.chunkSize) / plan.batchLength;
  const levels = part.levels.map((level) => {
    const out: Record<string, unknown> = {};
    for (const key of LEVEL_NUMBERS) out[key] = level[key];
    out.histogram = Array.from(trimZeros(level.histogram));
    for (const key of LEVEL_ARRAYS.slice(1)) out[key] = Array.from(level[key].subarray(firstBatch, lastBatch));
    return out;
  });
  const file = {
    schema: PART_SCHEMA,
    program: { name: 'returnrate', version: PROGRAM_VERSION },
    input: facts.input,
    settings: facts.settings,
    chunk: { index: part.index, sha256: facts.chunkSha256, firstBatch },
    plan,
    alphabetSize: part.alphabetSize,
    matchPositions: part.matchPositions,
    exhausted: part.exhausted,
    levels,
    paths: {
      positions: Array.from(part.paths.positions),
      forward: Array.from(part.paths.forward),
      counts: Array.from(part.paths.counts),
    },
  };
  return JSON.stringify(file) + '\n';
}

function trimZeros(a: Float64Array): Float64Array {
  let end = a.length;
  while (end > 0 && a[end - 1] === 0) end--;
  return a.subarray(0, end);
}

type Json = Record<string, unknown>;

/**
 * Reads a part file's text.
 * @param name the file's name, put in front of every message
 * @throws PartFileError naming the file and what is wrong
 */
export function readPartFile(text: string, name: string): PartFileContents {
  const fail = (what: string): never => {
    throw new PartFileError(`${name}: ${what}`);
  };
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return fail('not JSON, so not a returnrate part file');
  }
  const o = isObject(raw) ? raw : fail('not a returnrate part file (no JSON object)');
  if (o.schema !== PART_SCHEMA) {
    const schema = typeof o.schema === 'string' ? `schema "${o.schema}"` : 'no schema field';
    return fail(`not a ${PART_SCHEMA} file (${schema})`);
  }
  const object = (value: unknown, path: string): Json => (isObject(value) ? value : fail(`${path} is missing or not an object`));
  const num = (from: Json, key: string, path: string): number => {
    const v = from[key];
    return typeof v === 'number' && Number.isFinite(v) ? v : fail(`${path}.${key} is missing or not a number`);
  };
  const nums = (value: unknown, path: string, length?: number): Float64Array => {
    if (!Array.isArray(value) || !value.every((v) => typeof v === 'number' && Number.isFinite(v))) return fail(`${path} is not an array of numbers`);
    if (length !== undefined && value.length > length) return fail(`${path} has ${value.length} entries, more than ${length}`);
    return Float64Array.from(value as number[]);
  };
  const planJson = object(o.plan, 'plan');
  const plan = Object.fromEntries(PLAN_NUMBERS.map((k) => [k, num(planJson, k, 'plan')])) as unknown as ChunkPlan;
  const chunk = object(o.chunk, 'chunk');
  const index = num(chunk, 'index', 'chunk');
  if (!Number.isInteger(index) || index < 0 || index >= plan.chunkCount) fail(`chunk.index ${index} is outside 0 to ${plan.chunkCount - 1}`);
  const firstBatch = num(chunk, 'firstBatch', 'chunk');
  const chunkSha256 = typeof chunk.sha256 === 'string' ? chunk.sha256 : null;
  if (!Array.isArray(o.levels) || o.levels.length !== plan.maxN) fail(`levels must be an array of ${plan.maxN} levels`);
  const levels = (o.levels as unknown[]).map((value, j): LevelStats => {
    const path = `levels[${j}]`;
    const l = object(value, path);
    const out: Record<string, unknown> = {};
    for (const key of LEVEL_NUMBERS) out[key] = num(l, key, path);
    if (out.n !== j + 1) fail(`${path}.n is ${String(out.n)}, expected ${j + 1}`);
    out.histogram = nums(l.histogram, `${path}.histogram`);
    for (const key of LEVEL_ARRAYS.slice(1)) {
      const local = nums(l[key], `${path}.${key}`, plan.batchCount - firstBatch);
      const global = new Float64Array(plan.batchCount);
      global.set(local, firstBatch);
      out[key] = global;
    }
    return out as unknown as LevelStats;
  });
  const pathsJson = object(o.paths, 'paths');
  const positionsF = nums(pathsJson.positions, 'paths.positions');
  const forward = nums(pathsJson.forward, 'paths.forward');
  const counts = nums(pathsJson.counts, 'paths.counts');
  if (forward.length !== positionsF.length * plan.maxN || counts.length !== forward.length) {
    fail(`paths.forward and paths.counts must hold ${positionsF.length * plan.maxN} entries`);
  }
  const input = object(o.input, 'input') as unknown as InputSummary;
  if (typeof input.name !== 'string' || typeof input.format !== 'string') fail('input.name and input.format must be strings');
  const settings = object(o.settings, 'settings') as unknown as AnalysisSettings;
  if (settings.maxN !== plan.maxN) fail(`settings.maxN ${String(settings.maxN)} differs from plan.maxN ${plan.maxN}`);
  const part: ScanPart = {
    plan,
    index,
    alphabetSize: num(o, 'alphabetSize', 'file'),
    levels,
    paths: { positions: Int32Array.from(positionsF), forward, counts, maxN: plan.maxN },
    matchPositions: num(o, 'matchPositions', 'file'),
    exhausted: o.exhausted === true,
  };
  return { part, input, settings, chunkSha256 };
}

function isObject(value: unknown): value is Json {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * Checks that part files belong together (same input file and reading, same settings, same plan and
 * alphabet) before their statistics are merged.
 * @param names the files' names, in the same order, for the messages
 * @throws PartFileError naming the first file that disagrees with the first one and the field
 */
export function checkPartsAgree(contents: readonly PartFileContents[], names: readonly string[]): void {
  const first = contents[0];
  if (first === undefined) throw new PartFileError('no part files to merge');
  const facts = (c: PartFileContents): Record<string, string> => ({
    'input file (SHA-256)': String(c.input.sha256),
    'input format': c.input.format,
    'input length': String(c.input.symbols),
    alphabet: JSON.stringify([c.part.alphabetSize, c.input.alphabet ?? null]),
    settings: JSON.stringify(c.settings),
    'chunk plan': JSON.stringify(c.part.plan),
  });
  const want = facts(first);
  contents.forEach((c, i) => {
    const got = facts(c);
    for (const key of Object.keys(want)) {
      if (got[key] !== want[key]) throw new PartFileError(`${names[i]}: ${key} not the same as in ${names[0]}`);
    }
  });
}
