import type { AlternativeEstimate, AnalysisResult, CalibrationResult } from '../core';
import { calibrationSection } from './calibrationReport';
import { DEFAULT_EXPORT_VIEW, exportFigures, type ExportViewOptions } from './exportFigures';
import { diagnosticsSection } from './diagnosticsReport';
import { figureSvg } from './figureSvg';
import { symbolizationMethod, symbolizationText } from './symbolizationText';
import { xmlText } from './xmlText';

export interface ReportOptions {
  /** When the report was made, printed as given (e.g. an ISO time); null or absent: no date line. */
  readonly date?: string | null;
  /** View options that shape the figures; the workbench's defaults when absent. */
  readonly view?: ExportViewOptions;
  /** Names of the columns read (CSV), checked by looksPhysiological besides the input's name. */
  readonly columns?: readonly string[];
  /** A calibration of the result: adds the calibration section with its figure (marked stale when it belongs to another analysis). */
  readonly calibration?: CalibrationResult | null;
}

/**
 * Input names and formats that suggest a physiological recording. Matching is loose on purpose:
 * a caution shown on a file that is not physiological costs nothing.
 */
const PHYSIOLOGICAL = /ecg|ekg|eeg|emg|heart|cardi|spike|neuron|neural|pulse|hrv|physio|patient|clinic|blood|respirat|sleep|muscle|brain|cortex|axon|bpm/i;

/** The caution shown in the workbench and the report when looksPhysiological is true. */
export const PHYSIOLOGICAL_CAUTION = 'This looks like a physiological recording. The entropy rate here is a research estimate, not a clinical measurement.';

/**
 * True when the input's name or format, or the name of a column read from it (CSV header), suggests
 * physiological data; the workbench and the report then show PHYSIOLOGICAL_CAUTION.
 */
export function looksPhysiological(input: Pick<AnalysisResult['input'], 'name' | 'format'>, columns: readonly string[] = []): boolean {
  return PHYSIOLOGICAL.test(input.name) || PHYSIOLOGICAL.test(input.format) || columns.some((c) => PHYSIOLOGICAL.test(c));
}

/** Page styles: embedded, system fonts only, so the file works offline; print rules for PDF. */
const CSS = `
:root{color-scheme:light}
body{font-family:system-ui,-apple-system,'Segoe UI',Roboto,'Helvetica Neue',Arial,sans-serif;color:#1b2330;background:#fff;margin:0 auto;padding:24px;max-width:1000px;line-height:1.45;font-size:14px}
h1{font-size:22px;margin:0 0 4px}
h2{font-size:17px;margin:28px 0 8px;border-bottom:1px solid #d5dbe3;padding-bottom:3px}
table{border-collapse:collapse;margin:8px 0;font-variant-numeric:tabular-nums}
th,td{border:1px solid #d5dbe3;padding:3px 7px;text-align:left;vertical-align:top}
td.num{text-align:right;white-space:nowrap}
table.lengths{font-size:12px}
dl.facts{display:grid;grid-template-columns:max-content 1fr;gap:2px 14px;margin:8px 0}
dl.facts dt{font-weight:600}
dl.facts dd{margin:0;overflow-wrap:anywhere}
.hash{font-family:ui-monospace,'SFMono-Regular',Menlo,Consolas,monospace;font-size:12px}
.report-note{border:2px solid #9a3412;background:#fff7ed;padding:8px 12px;margin:12px 0;font-weight:600}
.report-caution{border-left:4px solid #4d5869;padding:4px 12px}
figure{margin:18px 0}
figure svg{width:100%;height:auto;display:block}
figcaption{font-size:12px;color:#4d5869;margin-top:4px}
.unavailable{border:1px dashed #8b96a6;padding:12px;color:#4d5869}
@page{margin:14mm}
@media print{
  body{max-width:none;padding:0;font-size:11pt}
  figure{break-before:page;break-inside:avoid}
  table,dl.facts,.report-note{break-inside:avoid}
  thead{display:table-header-group}
  tr{break-inside:avoid}
  .report-note{background:none}
}
`;

/** Fixed decimals for a table cell; '-' for a missing or non-finite number. */
function fixed(x: number | null | undefined, digits = 4): string {
  return x === null || x === undefined || !Number.isFinite(x) ? '-' : x.toFixed(digits);
}

/** A number cell carrying the exact value in data-value, so readers and tests need not parse text. */
function numCell(x: number | null | undefined, digits = 4): string {
  const exact = x === null || x === undefined ? '' : ` data-value="${xmlText(String(x))}"`;
  return `<td class="num"${exact}>${fixed(x, digits)}</td>`;
}

function intervalText(ci: readonly [number, number] | null): string {
  return ci === null ? '-' : `${fixed(ci[0])} to ${fixed(ci[1])}`;
}

function lengthsText(range: readonly [number, number] | null): string {
  return range === null ? '-' : range[0] === range[1] ? `n = ${range[0]}` : `n = ${range[0]}..${range[1]}`;
}

function alternativeRow(key: string, alt: AlternativeEstimate, what: string, headline: boolean): string {
  return (
    `<tr data-key="${xmlText(key)}"><th scope="row">${xmlText(`${what}: ${alt.label}`)}${headline ? ' (headline)' : ''}</th>` +
    `${numCell(alt.estimate)}<td class="num">${intervalText(alt.ci95)}</td><td>${xmlText(lengthsText(alt.lengthsUsed))}</td><td>${xmlText(alt.note)}</td></tr>`
  );
}

function headerSection(result: AnalysisResult, date: string | null): string {
  const { input } = result;
  const facts: [string, string][] = [
    ['Input', xmlText(input.name)],
    ['SHA-256', `<span class="hash">${xmlText(input.sha256 ?? 'none (generated in memory)')}</span>`],
    ['Symbols', xmlText(input.symbols.toLocaleString('en-US'))],
    ['Alphabet size', xmlText(String(input.alphabetSize))],
    ['Read as', xmlText(input.format)],
    ['Program', xmlText(`${result.program.name} ${result.program.version}`)],
  ];
  if (date !== null) facts.push(['Made', xmlText(date)]);
  return `<header><h1>Entropy-rate report: ${xmlText(input.name)}</h1><dl class="facts" id="input-facts">${facts.map(([k, v]) => `<dt>${k}</dt><dd>${v}</dd>`).join('')}</dl></header>`;
}

function estimateSection(result: AnalysisResult): string {
  const { entropy, sigma2 } = result;
  const level = `${xmlText(String(Math.round(entropy.confidence * 1000) / 10))}% interval`;
  const rows: string[] = [];
  rows.push(
    `<tr id="estimate-h"><th scope="row">Entropy rate h (${xmlText(entropy.unit)})</th>${numCell(entropy.estimate)}` +
      `<td class="num" data-low="${xmlText(String(entropy.ci95[0]))}" data-high="${xmlText(String(entropy.ci95[1]))}">${intervalText(entropy.ci95)}</td>` +
      `<td>${xmlText(lengthsText(entropy.lengthsUsed))}</td><td>${xmlText(`method ${entropy.method}. ${entropy.reason}`)}</td></tr>`,
  );
  if (entropy.perSecond !== null) {
    rows.push(
      `<tr><th scope="row">h per second (${xmlText(entropy.perSecondUnit ?? '')})</th>${numCell(entropy.perSecond.estimate)}` +
        `<td class="num">${intervalText(entropy.perSecond.ci95)}</td><td></td><td></td></tr>`,
    );
  }
  rows.push(
    `<tr id="estimate-sigma2"><th scope="row">σ² (${xmlText(sigma2.unit)})</th>${numCell(sigma2.estimate)}` +
      `<td class="num">${intervalText(sigma2.ci95)}</td><td></td><td>${xmlText(`method ${sigma2.method}${sigma2.negligible ? ', negligible against the exponential-law spread' : ''}. ${sigma2.reason}`)}</td></tr>`,
  );
  if (result.reference !== null) {
    const r = result.reference;
    rows.push(
      `<tr id="reference"><th scope="row">${xmlText(`Exact values of the reference source ${r.source}`)}</th>` +
        `<td class="num" colspan="2">h = ${fixed(r.entropyRate, 6)} ${xmlText(entropy.unit)}; σ² = ${fixed(r.sigma2, 6)} ${xmlText(sigma2.unit)}</td><td></td><td>Known in closed form for this generator.</td></tr>`,
    );
  }
  const trusted = result.trustedRange === null ? '' : `<p>Trusted block lengths n = ${result.trustedRange.lo}..${result.trustedRange.hi}: ${xmlText(result.trustedRange.reason)}</p>`;
  const law = result.exponentialLaw;
  const lawLine =
    law === null
      ? ''
      : `<p>Exponential law at n = ${law.n}: mean log(R f) = ${fixed(law.meanLogRFreq)} (Exp(1): ${fixed(law.expectedMean)}), variance ${fixed(law.varLogRFreq)} (Exp(1): ${fixed(law.expectedVar)}).</p>`;
  const alternatives = [
    ...Object.entries(entropy.alternatives).map(([k, a]) => alternativeRow(k, a, 'h', k === entropy.method)),
    ...Object.entries(sigma2.alternatives).map(([k, a]) => alternativeRow(k, a, 'σ²', k === sigma2.method)),
  ];
  return (
    `<section id="estimate"><h2>Estimate</h2><table id="estimate-table"><thead><tr><th scope="col">Quantity</th><th scope="col">Estimate</th><th scope="col">${level}</th><th scope="col">Block lengths used</th><th scope="col">Method and reason</th></tr></thead>` +
    `<tbody>${rows.join('')}</tbody></table>${trusted}${lawLine}` +
    `<h3>All estimators</h3><table id="alternatives"><thead><tr><th scope="col">Estimator</th><th scope="col">Estimate</th><th scope="col">${level}</th><th scope="col">Block lengths</th><th scope="col">Note</th></tr></thead><tbody>${alternatives.join('')}</tbody></table></section>`
  );
}

function warningsSection(result: AnalysisResult): string {
  const body =
    result.warnings.length === 0
      ? '<p>None.</p>'
      : `<ul>${result.warnings.map((w) => `<li><strong>${xmlText(w.code)}</strong>: ${xmlText(w.message)}</li>`).join('')}</ul>`;
  return `<section id="warnings"><h2>Warnings</h2>${body}</section>`;
}

function settingsSection(result: AnalysisResult): string {
  const s = result.settings;
  const facts: [string, string][] = [
    ['Largest block length', String(s.maxN)],
    ['Unit', s.unit],
    ['Confidence level', String(s.confidence)],
    ['Largest censored fraction in the trusted range', String(s.maxCensoredFraction)],
    ['Sampling interval', s.intervalSeconds === null ? 'none' : `${s.intervalSeconds} s per symbol`],
    ['Block lengths scanned', `${result.scan.maxN}${result.scan.exhausted ? ' (every block unique before the limit)' : ''}`],
    ['Batches for the intervals', `${result.scan.intervalBatches} (batch length ${result.scan.batchLength}, ${result.scan.batchCount} fine batches)`],
    ['Match-length window', String(result.scan.matchWindow)],
  ];
  if (result.input.symbolization !== undefined) facts.push(['Symbolization', symbolizationText(result.input.symbolization)]);
  return `<section id="settings"><h2>Settings</h2><dl class="facts">${facts.map(([k, v]) => `<dt>${xmlText(k)}</dt><dd>${xmlText(v)}</dd>`).join('')}</dl></section>`;
}

function figuresSection(result: AnalysisResult, view: ExportViewOptions): string {
  const parts = exportFigures(result, view).map(({ id, figure, caption }, i) => {
    if (figure.kind !== 'figure') {
      return `<figure id="figure-${id}" data-figure="${id}"><p class="unavailable">${xmlText(`Figure ${i + 1} (${id}) cannot be drawn: ${figure.message}`)}</p></figure>`;
    }
    // The standalone SVG without its XML declaration, which has no place inside HTML.
    const svg = figureSvg(figure.model, caption, `${id}-`).replace(/^<\?xml[^>]*\?>\n/, '');
    const text = `Figure ${i + 1}. ${figure.model.title}. ${figure.model.description}${caption.view === '' ? '' : ` View: ${caption.view}.`}`;
    return `<figure id="figure-${id}" data-figure="${id}">${svg}<figcaption>${xmlText(text)}</figcaption></figure>`;
  });
  return `<section id="figures"><h2>Figures</h2>${parts.join('\n')}</section>`;
}

function lengthsSection(result: AnalysisResult): string {
  const unit = xmlText(result.entropy.unit);
  const head = ['n', 'positions', 'observed', 'censored', 'censored fraction', 'mean log R (nats)', 'var log R', 'log R / n', `H_n (${unit}, Miller–Madow)`, `H_n − H_(n−1) (${unit})`, 'distinct blocks'];
  const rows = result.lengths.map(
    (r) =>
      `<tr><td class="num">${r.n}</td><td class="num">${r.positions}</td><td class="num">${r.observed}</td><td class="num">${r.censored}</td>` +
      `${numCell(r.censoredFraction)}${numCell(r.meanLogReturn)}${numCell(r.varLogReturn)}${numCell(r.ratePerSymbol)}${numCell(r.blockEntropyMillerMadow)}${numCell(r.conditionalEntropy)}` +
      `<td class="num">${r.distinctBlocks}</td></tr>`,
  );
  return (
    `<section id="lengths"><h2>Per block length</h2><table class="lengths" id="lengths-table"><thead><tr>${head.map((h) => `<th scope="col">${h}</th>`).join('')}</tr></thead>` +
    `<tbody>${rows.join('')}</tbody></table></section>`
  );
}

/**
 * The published methods behind the numbers, with the citations the code and THEORY.md give (a
 * citation written there as "from memory" is given here without the details not checked).
 */
const METHODS = [
  'For each block length n, the return time R_n of the block starting at each position is the distance to its next occurrence; (1/n) log R_n converges to the entropy rate h almost surely (Ornstein & Weiss, IEEE Trans. Inf. Theory 39 (1993) 78–83), and E[R_A | A] = 1/μ(A) (Kac 1947).',
  'The headline h is the slope of the mean of log R_n against n over the trusted block lengths, or the plug-in conditional block entropy when the returns cannot be trusted; (1/n) mean log R_n is shown for comparison, as it keeps a bias of order 1/n because E log R_n − n h tends to a constant (Kim, Osaka J. Math. 49 (2012) 1–20).',
  'Fluctuations: (log R_n − n h)/(σ √n) tends to a standard normal law, with σ² the limiting variance of −log μ(A_n)/√n (Kontoyiannis, J. Theoret. Probab. 11 (1998) 795–811); σ² is estimated as the long-run variance of the information function (Kontoyiannis & Verdú, IEEE Trans. Inf. Theory 60 (2014) 777–795) and from the growth of Var(log R_n) with n.',
  'For well-mixing sources R_n μ(A_n) tends to an exponential law with mean 1 (Hirata; Galves & Schmitt; Abadi), so log(R_n μ(A_n)) has mean −γ and variance π²/6.',
  'Plug-in block entropies use the Miller–Madow correction (Miller 1955); match lengths follow Kontoyiannis, Algoet, Suhov & Wyner (IEEE Trans. Inf. Theory 44 (1998) 1319–1327).',
  'Intervals come from batch means with Student t quantiles (Schmeiser, Oper. Res. 30 (1982) 556–568). Returns that run past the end of the data are censored, never dropped; their weight is restored by inverse-probability weights (Horvitz & Thompson, JASA 47 (1952)), and the return-time law is estimated by Kaplan–Meier (Kaplan & Meier, JASA 53 (1958)).',
  'Goodness of fit: Kolmogorov–Smirnov with the distribution of Marsaglia, Tsang & Wang (J. Stat. Softw. 8(18) (2003)) and Anderson–Darling (Anderson & Darling, JASA 49 (1954) 765–769) with the distribution of Marsaglia & Marsaglia (J. Stat. Softw. 9(2) (2004)).',
];

function methodsSection(result: AnalysisResult): string {
  const headline = `This report's headline uses the method "${result.entropy.method}" over ${lengthsText(result.entropy.lengthsUsed)}.`;
  const symbolized = result.input.symbolization === undefined ? '' : ` ${xmlText(symbolizationMethod(result.input.symbolization))}`;
  return `<section id="methods"><h2>Methods</h2><p>${METHODS.map(xmlText).join(' ')} ${xmlText(headline)}${symbolized}</p></section>`;
}

function cautionsSection(physiological: boolean): string {
  const items = [
    'returnrate is a research tool, not a diagnostic device. Its numbers describe a symbol sequence; they carry no clinical meaning.',
    'The estimators assume a stationary, well-mixing source. Intervals are only as good as the batches are long compared with the dependence in the data; check the figures for plateaus and for departures from the limit laws.',
    'A finite sequence cannot show block lengths whose blocks are all unique; the trusted range and the warnings say where the data stop speaking.',
  ];
  const note = physiological ? `<p class="report-note" id="physiological-note">${PHYSIOLOGICAL_CAUTION}</p>` : '';
  return `<section id="cautions"><h2>Cautions</h2>${note}<ul class="report-caution">${items.map((i) => `<li>${xmlText(i)}</li>`).join('')}</ul></section>`;
}

/**
 * A one-file HTML report of a result: the input, the estimate table with every estimator and the
 * reference values, warnings, settings, every exported figure as inline SVG with its caption, the
 * per-n table, a methods paragraph with citations and the cautions. Embedded CSS only (no scripts,
 * links, fonts or images), so it works offline and prints to PDF with one figure per page. Every
 * text from the result is escaped; the same result, view and date give the same bytes.
 */
export function reportHtml(result: AnalysisResult, options: ReportOptions = {}): string {
  const date = options.date ?? null;
  const physiological = looksPhysiological(result.input, options.columns);
  const body = [
    headerSection(result, date),
    physiological ? '<p class="report-note">Research estimate, not a clinical measurement: see the cautions at the end.</p>' : '',
    estimateSection(result),
    warningsSection(result),
    settingsSection(result),
    figuresSection(result, options.view ?? DEFAULT_EXPORT_VIEW),
    diagnosticsSection(result),
    calibrationSection(result, options.calibration, Math.round(result.entropy.confidence * 1000) / 10),
    lengthsSection(result),
    methodsSection(result),
    cautionsSection(physiological),
  ];
  return [
    '<!DOCTYPE html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>${xmlText(`returnrate report: ${result.input.name}`)}</title>`,
    `<style>${CSS}</style>`,
    '</head>',
    '<body>',
    '<main>',
    ...body.filter((b) => b !== ''),
    '</main>',
    '</body>',
    '</html>',
    '',
  ].join('\n');
}
