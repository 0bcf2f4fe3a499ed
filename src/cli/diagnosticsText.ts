import type { DecayFit, DiagnosticsSummary } from '../core';

const g = (x: number | null | undefined, digits = 3): string => (x === null || x === undefined || !Number.isFinite(x) ? '-' : x.toPrecision(digits));

function fitText(fit: DecayFit | null): string {
  if (fit === null) return 'no fit';
  const what = fit.kind === 'exponential' ? `tau = ${g(fit.scale)}` : `p = ${g(fit.scale)}`;
  return `${what}, R^2 ${g(fit.rSquared)}, log-residual SD ${g(fit.residualSd, 2)} over k = ${fit.gapRange[0]}..${fit.gapRange[1]}`;
}

/** The short diagnostics block of `returnrate analyze`'s summary (the full numbers are in --json). */
export function diagnosticsText(d: DiagnosticsSummary): string[] {
  const lines: string[] = ['mixing diagnostics (a finite sample cannot prove mixing)'];
  lines.push(`  reading (${d.reading.verdict}): ${d.reading.text}`);
  const b = d.beta;
  if (b !== null) {
    lines.push(
      `  beta(k), block length m = ${b.blockLength} (${b.cells} cells, ${b.pairs} pairs): beta(1) = ${g(b.beta[0])}, noise floor ${g(b.noiseFloor[0])}; ` +
        `${b.gapsAboveFloor} leading gaps above ${b.signalFactor} x floor`,
    );
    lines.push(`  exponential fit: ${fitText(b.exponential)}`);
    lines.push(`  power-law fit:   ${fitText(b.power)}`);
  }
  const a = d.autocorrelation;
  if (a !== null) {
    lines.push(
      `  ACF of information increments (k = ${a.order}): r(1) = ${g(a.acf[0])}, ${a.outside} of ${a.lags.length} lags outside +-${g(a.band, 2)} (${g(a.expectedOutside, 2)} expected by chance)`,
    );
  }
  const m = d.moments;
  if (m !== null) {
    const shown = m.raw.map((v, i) => `E[I^${i + 1}] ${g(v, 4)}${m.resolved[i] ? '' : '*'}`).join(', ');
    lines.push(`  one-symbol information (raw moments, nats^r; * = tail not resolved): ${shown}`);
    if (m.heavyTail) {
      lines.push(
        `  heavy tail: symbols seen once carry ${(100 * m.tailShare).toFixed(0)}% of the variance of -log p(x) and about ${(100 * m.unseenMass).toPrecision(2)}% of the mass is unseen: the variance estimate is unreliable`,
      );
    }
  }
  return lines;
}
