import type { AnalysisResult } from '../core';
import { symbolizationText } from './symbolizationText';

/** Where a figure's numbers came from, printed under an exported figure and atop its CSV. */
export interface FigureCaption {
  /** Input file name (or the generator's description). */
  readonly inputName: string;
  /** Hex SHA-256 of the input bytes; null for a sequence generated in memory. */
  readonly sha256: string | null;
  /** The analysis settings in one line, e.g. 'max n 40, unit nat, confidence 0.95, max censored 0.01'. */
  readonly settings: string;
  /** Program name and version, e.g. 'returnrate 0.1.0'. */
  readonly program: string;
  /** View options that shape this figure (e.g. 'n = 12'); '' when none. */
  readonly view: string;
  /** A figure of several inputs (a comparison) names each with its SHA-256; inputName and sha256 then are not printed. */
  readonly inputs?: readonly CaptionInput[];
}

/** One of several inputs a figure was made from. */
export interface CaptionInput {
  /** Its role, e.g. 'A'. */
  readonly label: string;
  readonly name: string;
  readonly sha256: string | null;
}

/** The caption of a result's figures; `view` names the view options of one figure. */
export function figureCaption(
  result: { readonly input: Pick<AnalysisResult['input'], 'name' | 'sha256'> & Partial<AnalysisResult['input']> } & Pick<AnalysisResult, 'settings' | 'program'>,
  view = '',
): FigureCaption {
  const s = result.settings;
  const parts = [`max n ${s.maxN}`, `unit ${s.unit}`, `confidence ${s.confidence}`, `max censored fraction ${s.maxCensoredFraction}`];
  if (s.intervalSeconds !== null) parts.push(`interval ${s.intervalSeconds} s/symbol`);
  if (result.input.symbolization !== undefined) parts.push(`symbolized ${symbolizationText(result.input.symbolization)}`);
  return {
    inputName: result.input.name,
    sha256: result.input.sha256,
    settings: parts.join(', '),
    program: `${result.program.name} ${result.program.version}`,
    view,
  };
}

/** The caption as plain lines (SVG text lines, CSV comment lines). */
export function captionLines(caption: FigureCaption): string[] {
  const inputs = caption.inputs ?? [{ label: '', name: caption.inputName, sha256: caption.sha256 }];
  const lines: string[] = [];
  for (const i of inputs) {
    const which = i.label === '' ? '' : ` ${i.label}`;
    lines.push(`Input${which}: ${i.name}`, `SHA-256${i.label === '' ? '' : ` of ${i.label}`}: ${i.sha256 ?? 'none (generated in memory)'}`);
  }
  lines.push(`Settings: ${caption.settings}`);
  if (caption.view !== '') lines.push(`View: ${caption.view}`);
  lines.push(`Made with ${caption.program}`);
  return lines;
}
