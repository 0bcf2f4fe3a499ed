import type { HeadPreview, InputFormat } from '../../core';
import type { FilePreview } from '../store/inputSlice';
import { formatBytes, formatCount, formatPercent } from './format';

/** One symbol of the head's alphabet, as shown. */
export interface PreviewSymbolRow {
  /** The symbol made visible (control characters and spaces as pictures or code points). */
  readonly symbol: string;
  /** Accessible name: the symbol spelled out where a picture stands for it. */
  readonly spoken: string;
  readonly count: string;
  readonly share: string;
}

/** Everything the preview panel prints; no numbers are computed in the component. */
export type PreviewView =
  | { readonly kind: 'failed'; readonly title: string; readonly message: string }
  | {
      readonly kind: 'ready';
      readonly title: string;
      /** e.g. 'Reading as tokens (guessed from the file)' or 'Reading as chars (chosen; the guess was tokens)'. */
      readonly formatLine: string;
      /** 'in the first 64.0 KiB' or 'in the whole file'. */
      readonly scope: string;
      readonly linesCaption: string;
      readonly lines: readonly string[];
      readonly symbolsLine: string;
      readonly alphabetCaption: string;
      readonly alphabet: readonly PreviewSymbolRow[];
      readonly warnings: readonly string[];
    };

const FORMAT_NAMES: Readonly<Record<InputFormat, string>> = {
  chars: 'characters',
  tokens: 'tokens',
  fasta: 'FASTA',
  csv: 'CSV column',
  bytes: 'raw bytes',
  numbers: 'numbers, one per line',
};

/** Names of the whitespace characters a symbol can be, for people. */
const SPOKEN: Readonly<Record<string, string>> = { ' ': 'space', '\t': 'tab', '\u00a0': 'no-break space', '\u3000': 'ideographic space' };

/**
 * Text with C0 control characters and DEL replaced by their Unicode control pictures (U+2400 +
 * code, U+2421), so a preview never hides or interprets them. React prints the result as text.
 */
export function visibleText(text: string): string {
  let out = '';
  for (const ch of text) {
    const cp = ch.codePointAt(0) ?? 0;
    if (cp < 0x20) out += String.fromCodePoint(0x2400 + cp);
    else if (cp === 0x7f) out += '\u2421';
    else out += ch;
  }
  return out;
}

function symbolRow(symbol: string, count: number, total: number): PreviewSymbolRow {
  const spoken = SPOKEN[symbol];
  const cp = symbol.codePointAt(0) ?? 0;
  const isSpace = spoken !== undefined || /^\s$/u.test(symbol);
  const shown = symbol === ' ' ? '\u2420' : isSpace ? `U+${cp.toString(16).toUpperCase().padStart(4, '0')}` : visibleText(symbol);
  return {
    symbol: shown,
    spoken: spoken ?? (isSpace ? shown : symbol),
    count: formatCount(count),
    share: formatPercent(total > 0 ? count / total : Number.NaN),
  };
}

function symbolsLine(m: HeadPreview, scope: string): string {
  if (m.symbolsInHead === null) return `No symbols could be read ${scope}.`;
  const head = `${formatCount(m.symbolsInHead)} symbols ${scope}`;
  if (m.estimatedSymbols === null) return `${head}.`;
  return `${head}; about ${formatCount(m.estimatedSymbols)} in the whole file (${formatBytes(m.fileBytes)}), estimated from its size.`;
}

/** The preview panel's text for one file preview. */
export function previewView(preview: FilePreview): PreviewView {
  const title = `Preview of ${preview.name}`;
  if (preview.kind === 'failed') return { kind: 'failed', title, message: preview.message };
  const m = preview.model;
  const scope = m.wholeFile ? 'in the whole file' : `in the first ${formatBytes(m.bytesRead)}`;
  const guessed = FORMAT_NAMES[m.guessedFormat];
  const formatLine =
    m.format === m.guessedFormat
      ? `Reading as ${FORMAT_NAMES[m.format]}; the guess for this file is ${guessed}.`
      : `Reading as ${FORMAT_NAMES[m.format]} (chosen); the guess for this file is ${guessed}.`;
  const total = m.alphabet.reduce((sum, s) => sum + s.count, 0);
  const unlisted = m.alphabetSize - m.alphabet.length;
  return {
    kind: 'ready',
    title,
    formatLine,
    scope,
    linesCaption: m.linesKind === 'hex' ? 'First bytes, in hexadecimal' : `First ${m.lines.length} line${m.lines.length === 1 ? '' : 's'} as text`,
    lines: m.lines.map(visibleText),
    symbolsLine: symbolsLine(m, scope),
    alphabetCaption:
      `Alphabet ${scope}: ${formatCount(m.alphabetSize)} symbol${m.alphabetSize === 1 ? '' : 's'}` +
      (unlisted > 0 ? ` (the ${formatCount(m.alphabet.length)} most frequent listed)` : '') +
      (m.wholeFile ? '' : '. Counts for the whole file come with the result.'),
    alphabet: m.alphabet.map((s) => symbolRow(s.symbol, s.count, m.symbolsInHead ?? total)),
    warnings: m.issues.map((i) => i.message),
  };
}
