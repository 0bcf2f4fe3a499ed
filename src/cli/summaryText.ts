import type { AnalysisResult, LengthRow, SymbolCount } from '../core';
import { symbolizationText } from '../figures/symbolizationText';
import { diagnosticsText } from './diagnosticsText';

const fmt = (x: number | null | undefined, digits = 4): string => (x === null || x === undefined || !Number.isFinite(x) ? '-' : x.toFixed(digits));
const interval = (ci: readonly [number, number] | null | undefined, digits = 4): string => (ci ? `[${fmt(ci[0], digits)}, ${fmt(ci[1], digits)}]` : '');

/** The human summary of an analysis, as printed by `returnrate analyze` without --json. */
export function summaryText(result: AnalysisResult, options: { table: boolean }): string {
  const { input, entropy, sigma2, settings } = result;
  const unit = entropy.unit;
  const lines: string[] = [];
  const level = Math.round(settings.confidence * 100);
  lines.push(`returnrate ${result.program.version}: ${input.name}`);
  lines.push(`  ${input.symbols.toLocaleString('en-US')} symbols, alphabet of ${input.alphabetSize}, read as ${input.format}${input.sha256 ? `, sha256 ${input.sha256.slice(0, 16)}...` : ''}`);
  if (input.symbolization !== undefined) lines.push(`  symbolized ${symbolizationText(input.symbolization)}`);
  if (input.alphabet !== undefined) lines.push(`  alphabet (symbol count): ${alphabetText(input.alphabet, input.alphabetSize)}`);
  lines.push('');
  lines.push(`entropy rate   h = ${fmt(entropy.estimate)} ${unit}   ${level}% interval ${interval(entropy.ci95)}`);
  lines.push(`  method ${entropy.method}, block lengths n = ${entropy.lengthsUsed[0]}..${entropy.lengthsUsed[1]}`);
  lines.push(`  ${entropy.reason}`);
  if (entropy.perSecond) lines.push(`  per second: ${fmt(entropy.perSecond.estimate)} ${interval(entropy.perSecond.ci95)}`);
  lines.push(`sigma^2          = ${fmt(sigma2.estimate)}   ${level}% interval ${interval(sigma2.ci95)}   (${sigma2.method})`);
  if (sigma2.negligible && result.exponentialLaw) {
    const e = result.exponentialLaw;
    lines.push(`  sigma^2 is negligible here: fluctuations are not Gaussian at scale sqrt(n). Exponential law at n = ${e.n}:`);
    lines.push(`  mean log(R f) = ${fmt(e.meanLogRFreq)} (Exp(1): ${fmt(e.expectedMean)}), variance ${fmt(e.varLogRFreq)} (Exp(1): ${fmt(e.expectedVar)})`);
  }
  if (result.reference) {
    const r = result.reference;
    lines.push(`reference source ${r.source}: exact h = ${fmt(r.entropyRate, 6)} ${unit}, sigma^2 = ${fmt(r.sigma2, 6)} ${sigma2.unit}`);
  }
  lines.push('');
  lines.push('other estimators');
  const rows = [
    ...Object.entries(entropy.alternatives).map(([key, alt]) => ({ label: `h: ${alt.label}`, alt, headline: key === entropy.method })),
    ...Object.values(sigma2.alternatives).map((alt) => ({ label: `sigma^2: ${alt.label}`, alt, headline: false })),
  ];
  const width = Math.max(...rows.map((r) => r.label.length));
  for (const { label, alt, headline } of rows) {
    lines.push(`  ${label.padEnd(width)}  ${fmt(alt.estimate).padStart(9)} ${interval(alt.ci95).padEnd(20)} ${headline ? '(headline)' : ''}`.trimEnd());
  }
  if (result.diagnostics !== undefined) lines.push('', ...diagnosticsText(result.diagnostics));
  if (options.table) {
    lines.push('');
    lines.push(tableText(result.lengths, unit));
  }
  if (result.warnings.length > 0) {
    lines.push('');
    lines.push('warnings');
    for (const w of result.warnings) lines.push(`  - ${w.message}`);
  }
  return lines.join('\n') + '\n';
}

/** Up to 12 symbols with their counts, most frequent first, then how many more there are. */
function alphabetText(alphabet: readonly SymbolCount[], size: number): string {
  const shown = alphabet.slice(0, 12).map((s) => `${JSON.stringify(s.symbol)} ${s.count}`);
  return shown.join(', ') + (size > shown.length ? `, ... (${size - shown.length} more)` : '');
}

function tableText(rows: readonly LengthRow[], unit: string): string {
  const header = ['n', 'positions', 'observed', 'censored', 'mean logR', 'var logR', 'logR/n', `H_n (${unit})`, 'H_n-H_n-1', 'distinct'];
  const body = rows.map((r) => [
    String(r.n),
    String(r.positions),
    String(r.observed),
    String(r.censored),
    fmt(r.meanLogReturn),
    fmt(r.varLogReturn),
    fmt(r.ratePerSymbol),
    fmt(r.blockEntropyMillerMadow),
    fmt(r.conditionalEntropy),
    String(r.distinctBlocks),
  ]);
  const widths = header.map((h, i) => Math.max(h.length, ...body.map((row) => row[i]!.length)));
  const line = (cells: string[]): string => cells.map((c, i) => c.padStart(widths[i]!)).join('  ');
  return ['per block length (log R in nats)', line(header), ...body.map(line)].join('\n');
}
