import { afterAll, describe, expect, it } from 'vitest';
import { BAD_INPUTS } from '../corpus/badInputs';
import { cli, failureLine, tempFolder } from './cliHarness';

// The bad-input corpus through the command line, in process: a refusal is one line
// "returnrate: ..." on standard error with the exit status of the contract (1 input, 2 usage) and
// the place of the problem; an accepted input exits 0 with at most the expected note.

const folder = tempFolder('bad-inputs');
afterAll(() => folder.remove());

const CLI_KINDS = BAD_INPUTS.filter((k) => k.cli !== undefined && k.heavy !== true);

describe('bad-input corpus through the command line', () => {
  it('covers at least 40 kinds', () => {
    expect(CLI_KINDS.length).toBeGreaterThanOrEqual(40);
  });

  for (const kind of CLI_KINDS) {
    const c = kind.cli!;
    it(`${kind.id}: exit ${c.exit}${c.stderr === undefined ? '' : `, ${c.stderr.source}`}`, async () => {
      const path = folder.file(`${kind.id}-${kind.fileName}`, kind.bytes());
      const run = await cli(...c.args.map((a) => a.replace(/^FILE/, path)));
      expect(run.code, run.stderr).toBe(c.exit);
      expect(run.stderr).not.toContain('    at ');
      if (c.exit === 0) {
        if (c.stderr === undefined) expect(run.stderr).toBe('');
        else expect(run.stderr).toMatch(c.stderr);
        return;
      }
      const line = failureLine(run);
      expect(line).toMatch(c.stderr!);
      // Input problems name the file; usage problems point at the help.
      if (c.exit === 1) expect(line.startsWith(`returnrate: ${path}: `)).toBe(true);
      else expect(line.endsWith('(see returnrate --help)')).toBe(true);
    });
  }
});
