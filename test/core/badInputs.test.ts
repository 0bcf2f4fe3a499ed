import { describe, expect, it } from 'vitest';
import { analyzeSequence } from '../../src/core/analyze';
import { DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import { ReadError } from '../../src/core/sequence/readError';
import { pageMemoryCheck } from '../../src/core/returns/pageMemoryCheck';
import { readAll } from '../../src/core/sequence/sequenceReader';
import type { ReadResult } from '../../src/core/sequence/sequenceReader';
import { readSession } from '../../src/core/session/readSession';
import { SessionError } from '../../src/core/session/sessionError';
import { parseSymbolizeSpec } from '../../src/core/symbolize/symbolizeSpec';
import { BAD_INPUTS } from '../corpus/badInputs';
import type { BadInput } from '../corpus/badInputs';

// Every kind of the bad-input corpus through the core: readers, the analysis's settings check and
// the session reader. A refusal must be the typed error with the corpus's code, message and
// position; nothing else may be thrown.

const HEAVY = process.env['RETURNRATE_HEAVY'] === '1';

/** Runs a kind's stage and returns what came out, or the error. */
function run(kind: BadInput): { read?: ReadResult; h?: number; error?: unknown } {
  const bytes = kind.bytes();
  try {
    if (kind.stage === 'session') {
      readSession(new TextDecoder().decode(bytes));
      return {};
    }
    // The spec is parsed as the command line and the page parse it, so a bad spec is refused here.
    const reader = kind.symbolize === undefined ? kind.reader : { ...kind.reader, symbolize: parseSymbolizeSpec(kind.symbolize) };
    const read = readAll(bytes, reader);
    if (kind.stage === 'read') return { read };
    if (kind.stage === 'memory') {
      pageMemoryCheck({ symbols: read.sequence.symbols.length, alphabetSize: read.sequence.alphabet.length, maxN: kind.settings?.maxN ?? DEFAULT_SETTINGS.maxN }, kind.memoryBudgetBytes);
      return { read };
    }
    const result = analyzeSequence(read.sequence, { name: kind.fileName, sha256: null, format: kind.reader.format }, { ...DEFAULT_SETTINGS, maxN: 5, ...kind.settings });
    return { read, h: result.entropy.estimate };
  } catch (error) {
    return { error };
  }
}

function positionText(p: { line?: number; column?: number; byte?: number }): string {
  return [p.line === undefined ? '' : `line ${p.line}`, p.column === undefined ? '' : `column ${p.column}`, p.byte === undefined ? '' : `byte ${p.byte}`].filter((s) => s !== '').join(', ');
}

describe('bad-input corpus through the core', () => {
  it('holds at least 40 kinds with unique ids, and the workbench subset at least 8', () => {
    expect(BAD_INPUTS.length).toBeGreaterThanOrEqual(40);
    expect(new Set(BAD_INPUTS.map((k) => k.id)).size).toBe(BAD_INPUTS.length);
    expect(BAD_INPUTS.filter((k) => k.browser === true).length).toBeGreaterThanOrEqual(8);
  });

  for (const kind of BAD_INPUTS) {
    // The heavy kinds (100 MB, 10^7 tokens) get a budget of 10 minutes: 10^7 distinct tokens took
    // 138 s to read on this 2-core machine at a load average of 11. Nothing here checks time.
    it.skipIf(kind.heavy === true && !HEAVY)(`${kind.id}: ${kind.title}`, { timeout: kind.heavy === true ? 600_000 : 60_000 }, () => {
      const { read, h, error } = run(kind);
      const want = kind.expect;
      if (want.outcome === 'refused') {
        expect(error, 'expected a refusal').toBeDefined();
        if (kind.stage === 'session') {
          expect(error).toBeInstanceOf(SessionError);
        } else if (want.code === undefined) {
          expect(error).toBeInstanceOf(RangeError);
        } else {
          expect(error).toBeInstanceOf(ReadError);
        }
        const e = error as Error & { code?: string; position?: object };
        if (want.code !== undefined) expect(e.code).toBe(want.code);
        expect(e.message).toMatch(want.message);
        expect(e.message.split('\n')).toHaveLength(1);
        if (want.position !== 'whole-input') {
          expect(e.position).toEqual(want.position);
          expect(e.message.startsWith(`${positionText(want.position)}: `)).toBe(true);
        }
        return;
      }
      if (error !== undefined) throw error;
      const r = read as ReadResult;
      if (want.symbols !== undefined) expect(r.sequence.symbols.length).toBe(want.symbols);
      if (want.alphabetSize !== undefined) expect(r.sequence.alphabet.length).toBe(want.alphabetSize);
      if (want.startsWith !== undefined) {
        const first = Array.from(r.sequence.symbols.subarray(0, want.startsWith.length), (id) => r.sequence.alphabet[id]);
        expect(first).toEqual(want.startsWith);
      }
      if (want.segments !== undefined) expect(r.records?.length).toBe(want.segments);
      if (want.warning !== undefined) expect(r.warnings.map((w) => w.message).join('\n')).toMatch(want.warning);
      if (want.entropyAtMost !== undefined) {
        expect(h).toBeGreaterThanOrEqual(-1e-12);
        expect(h).toBeLessThanOrEqual(want.entropyAtMost);
      }
    });
  }
});
