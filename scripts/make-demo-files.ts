/**
 * Writes the invented demo files in public/demos/ from the demo scenarios the worker uses
 * (workers/demoScenarios.ts), so the file and the in-page demo tell the same invented story.
 * Run: npx tsx scripts/make-demo-files.ts
 */
import { writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { uniformStream } from '../src/core/sources/seededRandom';
import { demoScenario } from '../workers/demoScenarios';

const OUT = resolve(dirname(fileURLToPath(import.meta.url)), '..', 'public', 'demos');
/** Tokens per line: short lines keep the file readable in an editor. */
const TOKENS_PER_LINE = 24;

interface DemoFile {
  readonly file: string;
  readonly scenario: string;
  readonly length: number;
  readonly seed: number;
}

const FILES: readonly DemoFile[] = [
  { file: 'hilltop-wind-sectors.txt', scenario: 'hilltop-wind', length: 50_000, seed: 1_903 },
  // A pair for "Compare two sequences": the same invented syllables, two invented dialects.
  { file: 'bird-song-upper-valley.txt', scenario: 'song-upper-valley', length: 50_000, seed: 8_101 },
  { file: 'bird-song-lower-valley.txt', scenario: 'song-lower-valley', length: 50_000, seed: 8_102 },
];

/** A generated sequence as whitespace-separated tokens (the 'tokens' reader format). */
function tokensText(symbols: ArrayLike<number>, labels: readonly string[]): string {
  const lines: string[] = [];
  for (let start = 0; start < symbols.length; start += TOKENS_PER_LINE) {
    const line: string[] = [];
    const end = Math.min(symbols.length, start + TOKENS_PER_LINE);
    for (let t = start; t < end; t++) line.push(labels[symbols[t] ?? 0] ?? '?');
    lines.push(line.join(' '));
  }
  return `${lines.join('\n')}\n`;
}

for (const spec of FILES) {
  const scenario = demoScenario(spec.scenario);
  const sequence = scenario.source.generate(spec.length, spec.seed);
  const path = join(OUT, spec.file);
  writeFileSync(path, tokensText(sequence.symbols, sequence.alphabet));
  console.log(`wrote ${path}: ${spec.length} symbols of "${scenario.title}", seed ${spec.seed}`);
}

/** Readings of the invented garden-pond file: one every 10 minutes for 70 days. */
const POND_ROWS = 10_080;
const POND_SEED = 2_612;

/**
 * An invented real-valued series for trying --symbolize: the water level (cm) of a fictional garden
 * pond's float sensor, one reading every 10 minutes. Our own toy story, not a physical model: a
 * daily swing (warm afternoons), slow evaporation, rain showers that lift the level and drain
 * back over a few hours, sensor noise that follows an AR(1) law, and dropouts written as empty
 * cells or NA (about 0.3% of readings).
 */
function pondLevelCsv(rows: number, seed: number): string {
  const rand = uniformStream(seed);
  const gauss = (): number => Math.sqrt(-2 * Math.log(rand.nextPositive())) * Math.cos(2 * Math.PI * rand.next());
  const lines = ['minute,level_cm'];
  let rain = 0;
  let noise = 0;
  for (let t = 0; t < rows; t++) {
    const day = t / 144;
    // A shower starts about once in four days and adds 0.5 to 2.5 cm; the overflow drains with a half-life of about 3 hours.
    if (rand.next() < 1 / (4 * 144)) rain += 0.5 + 2 * rand.next();
    rain *= 0.962;
    noise = 0.8 * noise + 0.06 * gauss();
    const level = 42 - 0.05 * day - 0.35 * Math.sin(2 * Math.PI * (day - 0.1)) + rain + noise;
    const u = rand.next();
    const cell = u < 0.0015 ? '' : u < 0.003 ? 'NA' : level.toFixed(3);
    lines.push(`${t * 10},${cell}`);
  }
  return `${lines.join('\n')}\n`;
}

{
  const path = join(OUT, 'garden-pond-level.csv');
  writeFileSync(path, pondLevelCsv(POND_ROWS, POND_SEED));
  console.log(`wrote ${path}: ${POND_ROWS} invented water-level readings, seed ${POND_SEED}`);
}
