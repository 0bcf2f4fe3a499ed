import type { AnalysisResult, DecayFit } from '../core';
import { xmlText } from './xmlText';

const g = (x: number | null | undefined, digits = 4): string => (x === null || x === undefined || !Number.isFinite(x) ? '-' : x.toPrecision(digits));

function fitRow(name: string, fit: DecayFit | null): string {
  if (fit === null) return `<tr><th scope="row">${name}</th><td colspan="4">no fit (fewer than 3 gaps above the noise)</td></tr>`;
  return (
    `<tr><th scope="row">${name}</th><td class="num" data-value="${xmlText(String(fit.scale))}">${g(fit.scale)}</td><td class="num">${g(fit.C)}</td>` +
    `<td class="num">${g(fit.rSquared)}</td><td class="num">${g(fit.residualSd, 3)}</td><td>k = ${fit.gapRange[0]}–${fit.gapRange[1]}</td></tr>`
  );
}

/**
 * The report's diagnostics section: the reading in words with its caveat, the decay fits, the ACF
 * count, and the moments table with the heavy-tail note (text and tables only; the figures are
 * written by --figures and drawn in the workbench). Empty for a result without diagnostics.
 */
export function diagnosticsSection(result: AnalysisResult): string {
  const d = result.diagnostics;
  if (d === undefined) return '';
  const parts: string[] = [];
  parts.push(`<p id="mixing-reading" data-verdict="${xmlText(d.reading.verdict)}"><strong>Reading:</strong> ${xmlText(d.reading.text)}</p>`);
  parts.push(`<p class="report-caution">${xmlText(d.reading.caveat)}</p>`);
  const b = d.beta;
  if (b !== null) {
    parts.push(`<p>${xmlText(b.note)}</p>`);
    parts.push(
      '<table id="decay-fits"><thead><tr><th scope="col">Decay</th><th scope="col">τ (symbols) or rate p</th><th scope="col">C</th><th scope="col">R² (log scale)</th><th scope="col">Residual SD (log)</th><th scope="col">Gaps fitted</th></tr></thead><tbody>' +
        fitRow('Exponential C e^(−k/τ)', b.exponential) +
        fitRow('Power law C k^(−p)', b.power) +
        '</tbody></table>',
    );
  }
  const a = d.autocorrelation;
  if (a !== null) parts.push(`<p>${xmlText(`Autocorrelation of the information increments: ${a.outside} of ${a.lags.length} lags outside ±1.96/√n (${a.expectedOutside.toFixed(1)} expected by chance). ${a.note}`)}</p>`);
  const m = d.moments;
  if (m !== null) {
    const rows = m.raw.map(
      (v, i) =>
        `<tr><td class="num">${i + 1}</td><td class="num" data-value="${xmlText(String(v))}">${g(v, 5)}</td><td class="num">${g(m.rawStandardError[i], 3)}</td><td>${m.resolved[i] ? 'yes' : 'no'}</td></tr>`,
    );
    parts.push(
      `<table id="information-moments"><caption>Raw moments E[I^r] of I = −log p̂(x), nats^r</caption><thead><tr><th scope="col">r</th><th scope="col">E[I^r]</th><th scope="col">Standard error</th><th scope="col">Tail resolved</th></tr></thead><tbody>${rows.join('')}</tbody></table>`,
    );
    parts.push(`<p>${xmlText(m.note)}</p>`);
    if (m.heavyTail) {
      parts.push(
        `<p class="report-note" id="heavy-tail">${xmlText(`Heavy tail: symbols seen once carry ${(100 * m.tailShare).toFixed(0)}% of the variance of −log p̂(x), and about ${(100 * m.unseenMass).toPrecision(2)}% of the probability is unseen. The variance estimate is unreliable.`)}</p>`,
      );
    }
  }
  return `<section id="diagnostics"><h2>Mixing diagnostics</h2>${parts.join('\n')}</section>`;
}
