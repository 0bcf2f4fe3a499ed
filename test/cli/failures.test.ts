import { afterAll, describe, expect, it } from 'vitest';
import { cli, failureLine, tempFolder } from './cliHarness';

// Every failure here must reach the user as one line "returnrate: ..." on standard error, with the
// exit status of main.ts's contract: 1 for input or analysis failures, 2 for usage errors.
const folder = tempFolder('failures');
afterAll(() => folder.remove());

/** 'ab', two NULs, 'cd', two control bytes, a NUL: binary by the NUL at byte 2. */
const BINARY = Uint8Array.from([0x61, 0x62, 0x00, 0x00, 0x63, 0x64, 0x01, 0x02, 0x00]);

describe('returnrate refuses bad input with one line naming the problem and its place', () => {
  it('an empty file: exit 1, the file and "no symbols"', async () => {
    const path = folder.file('empty.txt', '');
    const run = await cli('analyze', path);
    expect(run.code).toBe(1);
    expect(failureLine(run)).toBe(`returnrate: ${path}: the file holds no symbols (0 bytes)`);
  });

  it('a file of spaces, tabs and line breaks only: exit 1, "only whitespace"', async () => {
    const path = folder.file('blank.txt', '  \n\t \n\n');
    const run = await cli('analyze', path);
    expect(run.code).toBe(1);
    expect(failureLine(run)).toBe(`returnrate: ${path}: the file holds no symbols (only whitespace)`);
  });

  it('a sequence of one symbol: exit 1, "at least 2 symbols"', async () => {
    const path = folder.file('one.txt', 'a');
    const run = await cli('analyze', path);
    expect(run.code).toBe(1);
    expect(failureLine(run)).toBe(`returnrate: ${path}: the sequence needs at least 2 symbols; got 1`);
  });

  it('--max-n 0: usage error, exit 2, naming the option and the value', async () => {
    const path = folder.file('abra.txt', 'abracadabra');
    const run = await cli('analyze', path, '--max-n', '0');
    expect(run.code).toBe(2);
    expect(failureLine(run)).toBe('returnrate: --max-n must be a whole number of at least 1; got "0" (see returnrate --help)');
  });

  it('--max-n beyond the sequence: exit 1, in the option\'s name with the largest allowed value', async () => {
    const path = folder.file('abra.txt', 'abracadabra');
    const run = await cli('analyze', path, '--max-n', '20', '--format', 'chars');
    expect(run.code).toBe(1);
    // 11 symbols allow n = 1..10 (a block of length n needs a later copy inside the data)
    expect(failureLine(run)).toBe(`returnrate: ${path}: --max-n 20 is too large for a sequence of 11 symbols: block lengths go up to N - 1 = 10`);
  });

  it('a CSV column that does not exist: exit 1, line 1 and the header names', async () => {
    const path = folder.file('log.csv', 'time,sector\n0,N\n1,NE\n2,E\n');
    const run = await cli('analyze', path, '--column', 'direction');
    expect(run.code).toBe(1);
    expect(failureLine(run)).toBe(`returnrate: ${path}: line 1: no column 'direction'; the header has 'time', 'sector'`);
  });

  it('binary data read as characters (guessed), as tokens and as FASTA: exit 1, the byte, and --format bytes', async () => {
    const asText = folder.file('dump.txt', BINARY);
    const asFasta = folder.file('dump.fa', new Uint8Array([...new TextEncoder().encode('>r\nAC'), 0, 0, ...new TextEncoder().encode('GT\n')]));
    const chars = await cli('analyze', asText);
    const tokens = await cli('analyze', asText, '--format', 'tokens');
    const fasta = await cli('analyze', asFasta);
    for (const run of [chars, tokens]) {
      expect(run.code).toBe(1);
      expect(failureLine(run)).toBe(
        `returnrate: ${asText}: line 1, column 3, byte 2: a NUL byte: this looks like binary data (or UTF-16 text), not UTF-8 text; read it as bytes (--format bytes)`,
      );
    }
    expect(fasta.code).toBe(1);
    // '>r\n' is bytes 0..2 and 'AC' bytes 3..4: the first NUL is byte 5, line 2, column 3
    expect(failureLine(fasta)).toBe(
      `returnrate: ${asFasta}: line 2, column 3, byte 5: a NUL byte: this looks like binary data (or UTF-16 text), not UTF-8 text; read it as bytes (--format bytes)`,
    );
    // The advice works: as bytes the same file is analysed.
    const bytes = await cli('analyze', asText, '--format', 'bytes', '--json', '-');
    expect(bytes.code).toBe(0);
    expect((JSON.parse(bytes.stdout) as { input: { symbols: number } }).input.symbols).toBe(BINARY.length);
  });

  it('a missing file: exit 1, the path and "no such file"', async () => {
    const path = `${folder.dir}/no-such-file.txt`;
    const run = await cli('analyze', path);
    expect(run.code).toBe(1);
    expect(failureLine(run)).toBe(`returnrate: ${path}: no such file`);
  });

  it('an unknown option and an unknown command: usage errors, exit 2', async () => {
    const path = folder.file('abra.txt', 'abracadabra');
    const option = await cli('analyze', path, '--bogus');
    const command = await cli('frobnicate', path);
    expect(option.code).toBe(2);
    expect(failureLine(option)).toBe("returnrate: unknown option '--bogus' (see returnrate --help)");
    expect(command.code).toBe(2);
    expect(failureLine(command)).toBe('returnrate: unknown command "frobnicate"; the commands are analyze, returns, generate, compare, merge (see returnrate --help)');
  });

  it('--unit furlong and --interval -1: usage errors naming the option, what it takes and the value', async () => {
    const path = folder.file('abra.txt', 'abracadabra');
    const unit = await cli('analyze', path, '--unit', 'furlong');
    const interval = await cli('analyze', path, '--interval', '-1');
    expect(unit.code).toBe(2);
    expect(failureLine(unit)).toBe('returnrate: --unit must be one of nat, bit; got "furlong" (see returnrate --help)');
    expect(interval.code).toBe(2);
    expect(failureLine(interval)).toBe('returnrate: --interval must be a positive number of seconds per symbol; got "-1" (see returnrate --help)');
  });

  it('returns without --n: usage error, exit 2', async () => {
    const path = folder.file('abra.txt', 'abracadabra');
    const run = await cli('returns', path);
    expect(run.code).toBe(2);
    expect(failureLine(run)).toBe('returnrate: returns needs --n N, the block length (see returnrate --help)');
  });

  it('generate with a bad spec names the spec and the bad part, exit 1', async () => {
    const name = await cli('generate', 'dice', '--length', '10');
    const entry = await cli('generate', 'markov:0.9,x;0.4,0.6', '--length', '10');
    const probability = await cli('generate', 'bernoulli:1.5', '--length', '10');
    for (const run of [name, entry, probability]) expect(run.code).toBe(1);
    expect(failureLine(name)).toMatch(/^returnrate: source "dice": unknown source "dice"; expected one of: coin, bernoulli:P, /);
    expect(failureLine(entry)).toBe('returnrate: source "markov:0.9,x;0.4,0.6": markov, row 1, entry 2: "x" is not a number');
    expect(failureLine(probability)).toBe('returnrate: source "bernoulli:1.5": bernoulli: probability 1.5 is not in [0, 1]');
  });

  it('an output path in a folder that does not exist: exit 1 naming the path, nothing reported as written', async () => {
    const input = folder.file('abra.txt', 'abracadabra');
    const nowhere = `${folder.dir}/no-such-folder`;
    const generated = await cli('generate', 'coin', '--length', '10', '--out', `${nowhere}/coin.txt`);
    const returns = await cli('returns', input, '--n', '2', '--format', 'chars', '--out', `${nowhere}/r.csv`);
    const json = await cli('analyze', input, '--format', 'chars', '--json', `${nowhere}/a.json`);
    for (const [run, file] of [
      [generated, 'coin.txt'],
      [returns, 'r.csv'],
      [json, 'a.json'],
    ] as const) {
      expect(run.code).toBe(1);
      expect(failureLine(run)).toBe(`returnrate: ${nowhere}/${file}: cannot write (its folder does not exist, ENOENT)`);
    }
  });
});

describe('returnrate accepts a constant sequence and says why nothing fluctuates', () => {
  it('5000 copies of one symbol: exit 0, h = 0 and the single-symbol warning in JSON and in the summary', async () => {
    const path = folder.file('constant.txt', 'a'.repeat(5000));
    const json = await cli('analyze', path, '--json', '-');
    const text = await cli('analyze', path, '--no-table');
    expect(json.code).toBe(0);
    expect(text.code).toBe(0);
    const result = JSON.parse(json.stdout) as { entropy: { estimate: number }; warnings: { code: string; message: string }[] };
    // by hand: in a constant sequence every block recurs one step later, so log R_n = 0 for all n
    expect(result.entropy.estimate).toBe(0);
    const warning = result.warnings.find((w) => w.code === 'single-symbol');
    expect(warning?.message).toBe('The sequence uses a single symbol: its entropy rate is 0 and nothing fluctuates.');
    expect(text.stdout).toContain(`  - ${warning?.message}`);
    expect(text.stderr).toBe('');
  });
});
