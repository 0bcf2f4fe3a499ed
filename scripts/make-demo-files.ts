/**
 * Writes the invented demo files in public/demos/ from the demo scenarios the worker uses
 * (workers/demoScenarios.ts), so the file and the in-page demo tell the same invented story.
 * Run: npx tsx scripts/make-demo-files.ts
 */
import { writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
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

const FILES: readonly DemoFile[] = [{ file: 'hilltop-wind-sectors.txt', scenario: 'hilltop-wind', length: 50_000, seed: 1_903 }];

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
