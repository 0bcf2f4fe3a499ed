import type { BadInput } from './badInputs';

/**
 * The bad-input kinds of real-valued input (`--format numbers`, `--format csv --column C` with
 * `--symbolize`, `--missing`) and of runs larger than the memory estimate allows; part of BAD_INPUTS
 * (test/corpus/badInputs.ts), driven by the same tests. Positions and messages are written by hand
 * from the bytes: lines and columns 1-based, bytes 0-based; a CSV cell's column is where its text
 * starts.
 */

const text = (s: string): Uint8Array => new TextEncoder().encode(s);

/** One line of `length` bytes of 'a' with a 'b' every 7th byte (two symbols, no line break). */
function twoSymbolLine(length: number): Uint8Array {
  const line = new Uint8Array(length).fill(0x61);
  for (let i = 1; i < length; i += 7) line[i] = 0x62;
  return line;
}

/** Valid numbers for the kinds whose problem is the symbolization spec, not the file. */
const FEW_NUMBERS = '0.5\n1.5\n0.25\n2\n';

/**
 * A kind whose symbolization spec is refused by its parser (RangeError, the whole setting to
 * blame); the command line says it as a usage error after `--symbolize: `.
 */
function badSpec(id: string, title: string, spec: string, message: RegExp): BadInput {
  return {
    id, title, fileName: 'levels.txt', bytes: () => text(FEW_NUMBERS), stage: 'read', reader: { format: 'numbers' }, symbolize: spec,
    expect: { outcome: 'refused', message, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers', '--symbolize', spec], exit: 2, stderr: new RegExp(`--symbolize: symbolization '${spec}': ${message.source}`) },
  };
}

export const NUMERIC_BAD_INPUTS: readonly BadInput[] = [
  // --- missing values: never a symbol ---
  {
    id: 'numbers-missing-skip', title: 'NaN, NA and an empty line among numbers (skip: dropped, counted, warned)', fileName: 'levels.txt',
    bytes: () => text('1.5\n2.5\nNaN\n0.5\nNA\n\n3.5\n'), stage: 'read', reader: { format: 'numbers' }, symbolize: 'quantile:2',
    // 4 values; quantile:2 cuts at sorted[2] = 2.5, a value equal to the cut goes up: 1.5 q1, 2.5 q2, 0.5 q1, 3.5 q2.
    expect: { outcome: 'accepted', symbols: 4, alphabetSize: 2, startsWith: ['q1', 'q2', 'q1', 'q2'], warning: /^3 missing values \(first at line 3\): dropped them and joined the values around them$/m },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers', '--symbolize', 'quantile:2', '--max-n', '1', '--quiet'], exit: 0, stderr: /note: 3 missing values \(first at line 3\): dropped them/ },
  },
  {
    id: 'csv-missing-split', title: 'an empty cell, NaN and NA in a CSV column (split: three segments)', fileName: 'tank.csv',
    bytes: () => text('t,x\n1,0.2\n2,0.8\n3,0.3\n4,0.9\n5,\n6,0.4\n7,NaN\n8,NA\n9,0.6\n10,0.1\n11,0.7\n12,0.2\n'), stage: 'read', reader: { format: 'csv', column: 'x', missing: 'split' }, symbolize: 'threshold:0.5',
    // Segments: lines 2-5 (4 values), line 7 (1 value), lines 10-13 (4 values); the first missing cell is on line 6.
    expect: { outcome: 'accepted', symbols: 9, alphabetSize: 2, segments: 3, startsWith: ['<0.5', '>=0.5', '<0.5', '>=0.5', '<0.5'], warning: /^3 missing values \(first at line 6\): cut the series into 3 segments there$/m },
    // The one-value segment is too short to analyse and is named.
    cli: { args: ['analyze', 'FILE', '--column', 'x', '--symbolize', 'threshold:0.5', '--missing', 'split', '--max-n', '1', '--quiet'], exit: 0, stderr: /note: 3 missing values \(first at line 6\): cut the series into 3 segments there\n.*"segment 2 \(from line 7\)" has 1 symbol\(s\) and is left out/ },
  },
  {
    id: 'numbers-all-missing', title: 'only missing values', fileName: 'holes.txt', bytes: () => text('NaN\nNA\n\nnan\n'), stage: 'read', reader: { format: 'numbers' }, symbolize: 'quantile:4',
    expect: { outcome: 'refused', code: 'empty', message: /^the series holds no numbers \(4 missing values\)$/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers', '--symbolize', 'quantile:4'], exit: 1, stderr: /holds no numbers \(4 missing values\)/ },
  },
  // --- infinite and non-numeric cells: refused with their place ---
  {
    id: 'numbers-minus-infinity', title: '-Infinity on a line of its own', fileName: 'levels.txt', bytes: () => text('0.5\n1\n-Infinity\n2\n'), stage: 'read', reader: { format: 'numbers' }, symbolize: 'quantile:4',
    expect: { outcome: 'refused', code: 'bad-number', message: /'-Infinity' is infinite; only finite numbers can be symbolized \(write a missing value as an empty cell, NaN or NA\)/, position: { line: 3, column: 1, byte: 6 } },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers', '--symbolize', 'quantile:4'], exit: 1, stderr: /line 3, column 1, byte 6: '-Infinity' is infinite/ },
  },
  {
    id: 'csv-infinity', title: 'Infinity in a numeric CSV column', fileName: 'probe.csv', bytes: () => text('t,x\n1,0.5\n2,Infinity\n3,0.7\n'), stage: 'read', reader: { format: 'csv', column: 'x' }, symbolize: 'quantile:4',
    expect: { outcome: 'refused', code: 'bad-number', message: /'Infinity' is infinite/, position: { line: 3, column: 3, byte: 12 } },
    cli: { args: ['analyze', 'FILE', '--column', 'x', '--symbolize', 'quantile:4'], exit: 1, stderr: /line 3, column 3, byte 12: 'Infinity' is infinite/ }, browser: true,
  },
  {
    id: 'csv-overflow', title: 'a decimal too large for a double (1e400)', fileName: 'probe.csv', bytes: () => text('t,x\n1,0.5\n2,1e400\n'), stage: 'read', reader: { format: 'csv', column: 'x' }, symbolize: 'threshold:0',
    expect: { outcome: 'refused', code: 'bad-number', message: /'1e400' is infinite/, position: { line: 3, column: 3, byte: 12 } },
    cli: { args: ['analyze', 'FILE', '--column', 'x', '--symbolize', 'threshold:0'], exit: 1, stderr: /line 3, column 3, byte 12: '1e400' is infinite/ },
  },
  {
    id: 'csv-nan-then-infinity', title: 'NaN (missing) before Infinity (refused) in one column', fileName: 'nan.csv', bytes: () => text('t,x\n1,0.5\n2,NaN\n3,Infinity\n4,0.5\n'), stage: 'read', reader: { format: 'csv', column: 'x' }, symbolize: 'quantile:2',
    expect: { outcome: 'refused', code: 'bad-number', message: /'Infinity' is infinite/, position: { line: 4, column: 3, byte: 18 } },
    cli: { args: ['analyze', 'FILE', '--column', 'x', '--symbolize', 'quantile:2'], exit: 1, stderr: /line 4, column 3, byte 18: 'Infinity' is infinite/ },
  },
  {
    id: 'numbers-text-cell', title: 'a word among numbers, indented', fileName: 'levels.txt', bytes: () => text('0.25\n0.75\n  high\n'), stage: 'read', reader: { format: 'numbers' }, symbolize: 'quantile:2',
    expect: { outcome: 'refused', code: 'bad-number', message: /'high' is not a number; write decimals like -1\.25 or 3e-4, and missing values as an empty cell, NaN or NA$/, position: { line: 3, column: 3, byte: 12 } },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers', '--symbolize', 'quantile:2'], exit: 1, stderr: /line 3, column 3, byte 12: 'high' is not a number/ }, browser: true,
  },
  {
    id: 'numbers-thousands-separator', title: 'a thousands separator (1,000)', fileName: 'levels.txt', bytes: () => text('950\n1,000\n'), stage: 'read', reader: { format: 'numbers' }, symbolize: 'quantile:2',
    expect: { outcome: 'refused', code: 'bad-number', message: /'1,000' is not a number/, position: { line: 2, column: 1, byte: 4 } },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers', '--symbolize', 'quantile:2'], exit: 1, stderr: /line 2, column 1, byte 4: '1,000' is not a number/ },
  },
  {
    id: 'csv-text-column', title: 'a column of symbols read as numbers', fileName: 'wind.csv', bytes: () => text('time,sector\n0,N\n1,E\n'), stage: 'read', reader: { format: 'csv', column: 'sector' }, symbolize: 'quantile:4',
    expect: { outcome: 'refused', code: 'bad-number', message: /'N' is not a number; .*; if the file holds symbols rather than numbers, read it without a symbolization$/, position: { line: 2, column: 3, byte: 14 } },
    cli: { args: ['analyze', 'FILE', '--column', 'sector', '--symbolize', 'quantile:4'], exit: 1, stderr: /line 2, column 3, byte 14: 'N' is not a number.*without a symbolization/ },
  },
  // --- --symbolize on a file of symbols ---
  {
    id: 'symbolize-symbol-file', title: '--symbolize on a text file of symbols (read as one number per line)', fileName: 'bases.txt', bytes: () => text('ACGTTGCA\nACGT\n'), stage: 'read', reader: { format: 'numbers' }, symbolize: 'quantile:4',
    expect: { outcome: 'refused', code: 'bad-number', message: /'ACGTTGCA' is not a number; .*; if the file holds symbols rather than numbers, read it without a symbolization$/, position: { line: 1, column: 1, byte: 0 } },
    // Without --format, --symbolize reads a .txt file as one number per line.
    cli: { args: ['analyze', 'FILE', '--symbolize', 'quantile:4'], exit: 1, stderr: /line 1, column 1, byte 0: 'ACGTTGCA' is not a number.*without a symbolization/ },
  },
  {
    id: 'symbolize-chars-format', title: '--symbolize with --format chars', fileName: 'bases.txt', bytes: () => text('ACGTTGCA\n'), stage: 'read', reader: { format: 'chars' }, symbolize: 'quantile:4',
    expect: { outcome: 'refused', code: 'bad-option', message: /symbolization reads numbers: use format 'numbers' \(one per line\) or 'csv' \(one column\), not 'chars'/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'chars', '--symbolize', 'quantile:4'], exit: 2, stderr: /--symbolize reads numbers: use --format numbers \(one per line\) or --format csv --column C, not chars/ },
  },
  {
    id: 'numbers-without-symbolize', title: '--format numbers without --symbolize', fileName: 'levels.txt', bytes: () => text(FEW_NUMBERS), stage: 'read', reader: { format: 'numbers' },
    expect: { outcome: 'refused', code: 'bad-option', message: /format 'numbers' needs a symbolization/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers'], exit: 2, stderr: /--format numbers needs --symbolize quantile:K \| threshold:T1,T2,\.\.\. \| ordinal:D\[:TAU\]/ },
  },
  // --- what the symbols cannot say ---
  {
    id: 'numbers-constant', title: 'a constant series (zero range) under quantile cells', fileName: 'flat.txt', bytes: () => text('7\n'.repeat(2000)), stage: 'analyze', reader: { format: 'numbers' }, symbolize: 'quantile:4', settings: { maxN: 10 },
    // Every cut point is 7 and a value equal to a cut goes to the cell above: all of them in q4.
    expect: { outcome: 'accepted', symbols: 2000, alphabetSize: 1, startsWith: ['q4'], entropyAtMost: 1e-12, warning: /^all 2000 values equal 7 \(zero range\): the 3 quantile cut points all equal 7, and a value equal to a cut goes to the cell above, so the sequence has the one symbol 'q4' and an entropy rate of 0$/m },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers', '--symbolize', 'quantile:4', '--max-n', '10', '--no-table'], exit: 0, stderr: /note: all 2000 values equal 7 \(zero range\)/ }, browser: true,
  },
  {
    id: 'numbers-constant-ordinal', title: 'a constant series under ordinal patterns', fileName: 'flat.txt', bytes: () => text('-2.5\n'.repeat(10)), stage: 'read', reader: { format: 'numbers' }, symbolize: 'ordinal:3',
    expect: { outcome: 'accepted', symbols: 8, alphabetSize: 1, startsWith: ['012'], warning: /all 10 values equal -2\.5 \(zero range\): every window is all ties, and ties rank in time order, so the sequence has the one symbol '012'/ },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers', '--symbolize', 'ordinal:3', '--max-n', '2', '--quiet'], exit: 0, stderr: /note: all 10 values equal -2\.5 \(zero range\)/ },
  },
  {
    id: 'numbers-ties-empty-cells', title: 'ties that leave quantile cells empty', fileName: 'ties.txt', bytes: () => text('1\n1\n1\n1\n1\n1\n2\n3\n'), stage: 'read', reader: { format: 'numbers' }, symbolize: 'quantile:4',
    // N = 8: cuts sorted[2] = 1, sorted[4] = 1, sorted[6] = 2; the 1s go above both equal cuts (q3), 2 and 3 to q4.
    expect: { outcome: 'accepted', symbols: 8, alphabetSize: 2, startsWith: ['q3', 'q3', 'q3', 'q3', 'q3', 'q3', 'q4', 'q4'], warning: /tied values make some quantile cut points equal: 2 of the 4 cells are empty and the sequence has 2 symbols/ },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers', '--symbolize', 'quantile:4', '--max-n', '2', '--quiet'], exit: 0, stderr: /note: tied values make some quantile cut points equal/ },
  },
  {
    id: 'ordinal-too-few', title: 'fewer values than one ordinal pattern needs', fileName: 'short.txt', bytes: () => text('3\n1\n2\n'), stage: 'read', reader: { format: 'numbers' }, symbolize: 'ordinal:4',
    expect: { outcome: 'refused', code: 'too-short', message: /^the series holds 3 values, but one ordinal pattern of order 4 with delay 1 needs 4 values$/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers', '--symbolize', 'ordinal:4'], exit: 1, stderr: /the series holds 3 values, but one ordinal pattern of order 4 with delay 1 needs 4 values/ },
  },
  {
    id: 'ordinal-delay-too-few', title: 'too few values for the ordinal order at a delay', fileName: 'short.txt', bytes: () => text('1\n2\n3\n4\n5\n'), stage: 'read', reader: { format: 'numbers' }, symbolize: 'ordinal:3:3',
    // (D - 1) TAU + 1 = 7 values.
    expect: { outcome: 'refused', code: 'too-short', message: /the series holds 5 values, but one ordinal pattern of order 3 with delay 3 needs 7 values/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers', '--symbolize', 'ordinal:3:3'], exit: 1, stderr: /holds 5 values, but .* needs 7 values/ },
  },
  {
    id: 'ordinal-split-short-segments', title: 'split segments too short for one ordinal pattern (left out, counted)', fileName: 'gappy.txt', bytes: () => text('1\n2\n\n3\n4\n5\n6\n\n7\n'), stage: 'read', reader: { format: 'numbers', missing: 'split' }, symbolize: 'ordinal:3',
    // Segments [1, 2], [3, 4, 5, 6], [7]: only the middle one gives patterns (two, both increasing).
    expect: { outcome: 'accepted', symbols: 2, alphabetSize: 1, segments: 1, startsWith: ['012', '012'], warning: /cut the series into 3 segments there\nleft out 2 of the 3 segments as too short: one ordinal pattern of order 3 with delay 1 needs 3 values/ },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers', '--symbolize', 'ordinal:3', '--missing', 'split', '--max-n', '1', '--quiet'], exit: 0, stderr: /note: left out 2 of the 3 segments as too short/ },
  },
  {
    id: 'ordinal-split-all-short', title: 'every split segment too short for one ordinal pattern', fileName: 'gappy.txt', bytes: () => text('1\n2\n\n3\n\n4\n5\n'), stage: 'read', reader: { format: 'numbers', missing: 'split' }, symbolize: 'ordinal:3',
    expect: { outcome: 'refused', code: 'too-short', message: /^the longest of the 3 segments between missing values holds 2 values, but one ordinal pattern of order 3 with delay 1 needs 3 values$/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers', '--symbolize', 'ordinal:3', '--missing', 'split'], exit: 1, stderr: /the longest of the 3 segments between missing values holds 2 values/ },
  },
  // --- bad symbolization specs and policies ---
  badSpec('spec-quantile-one', 'quantile with K = 1', 'quantile:1', /K must be between 2 and 1024, got 1/),
  badSpec('spec-quantile-zero', 'quantile with K = 0', 'quantile:0', /K must be between 2 and 1024, got 0/),
  badSpec('spec-quantile-fractional', 'quantile with a fractional K', 'quantile:2.5', /the number of cells K must be a whole number from 2 to 1024, got '2\.5'/),
  badSpec('spec-ordinal-negative-tau', 'ordinal patterns with a negative delay', 'ordinal:3:-1', /the delay TAU must be a whole number of at least 1, got '-1'/),
  badSpec('spec-ordinal-one', 'ordinal patterns of order 1', 'ordinal:1', /the order D must be between 2 and 8, got 1/),
  badSpec('spec-ordinal-nine', 'ordinal patterns of order 9', 'ordinal:9', /the order D must be between 2 and 8, got 9/),
  badSpec('spec-threshold-decreasing', 'thresholds that do not increase', 'threshold:0.5,0.2', /cut points must increase strictly, but 0\.2 follows 0\.5/),
  badSpec('spec-threshold-text', 'thresholds that are not numbers', 'threshold:low,high', /cut point 'low' is not a finite decimal number/),
  {
    id: 'missing-bad-policy', title: 'a missing-value policy that does not exist', fileName: 'levels.txt', bytes: () => text(FEW_NUMBERS), stage: 'read',
    reader: { format: 'numbers', missing: 'drop' as 'skip' }, symbolize: 'quantile:2',
    expect: { outcome: 'refused', code: 'bad-option', message: /^the missing-value policy must be 'skip' or 'split'; got 'drop'$/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'numbers', '--symbolize', 'quantile:2', '--missing', 'drop'], exit: 2, stderr: /--missing must be one of skip, split; got "drop"/ },
  },
  // --- larger than the memory estimate allows (the budget set small instead of a huge file) ---
  {
    id: 'memory-over-budget', title: 'a file larger than the memory budget allows in one scan', fileName: 'long.txt', bytes: () => twoSymbolLine(300_000), stage: 'memory', reader: { format: 'chars' }, settings: { maxN: 8 },
    // By hand from returns/memoryEstimate.ts: 3e5 symbols of 1 byte + 12 bytes of engine arrays each
    // (3,600,000) + 8 levels of (809 histogram bins + 8 x 147 batches) x 8 bytes + 256 x 8 x 16 of paths
    // + 2 x 96 + 64 MiB = 71,168,864 bytes. Budget 66 MiB = 69,206,016. A chunked run holds the level
    // sums twice (the running merge and a part): 67,695,904 bytes besides its arrays, which hold the
    // longest chunk (the last takes the remainder). Chunks of 131072 (batch grid 2048): 2 of them,
    // the last 168,928 positions, 69,723,040 bytes in all, too many; chunks of 65536: 4, the last
    // 103,392 positions, 68,936,608 bytes (about 69 MB), which fits.
    memoryBudgetBytes: 66 * 2 ** 20,
    expect: { outcome: 'refused', message: /^this run needs about 71 MB of memory, more than the page's 69 MB \(a fixed budget\); the command line can run it in chunks \(returnrate analyze FILE --chunk 65536\)$/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'chars', '--max-n', '8', '--max-memory', '66M'], exit: 1, stderr: /this run needs about 71 MB but 69 MB are available \(--max-memory\); a chunked run fits: --chunk 65536 \(about 69 MB; returns are then censored at chunk ends\)$/ },
  },
  {
    id: 'memory-no-room', title: 'a budget below what the program and the symbols need', fileName: 'long.txt', bytes: () => twoSymbolLine(300_000), stage: 'memory', reader: { format: 'chars' }, settings: { maxN: 8 },
    // Budget 64 MiB = 67,108,864, below the 67,695,904 bytes a chunked run needs besides its arrays;
    // the smallest chunk, 2^16 positions (the last of 4 holds 103,392), needs 67,695,904 + 1,240,704
    // = 68,936,608 bytes.
    memoryBudgetBytes: 64 * 2 ** 20,
    expect: { outcome: 'refused', message: /^this run needs about 71 MB of memory, more than the page's 67 MB \(a fixed budget\); the command line can run it where it has about 69 MB, the smallest chunked run \(--chunk 65536\)$/, position: 'whole-input' },
    cli: { args: ['analyze', 'FILE', '--format', 'chars', '--max-n', '8', '--max-memory', '64M'], exit: 1, stderr: /71 MB but 67 MB are available \(--max-memory\); the program and the symbols alone leave no room for a scan: it needs at least about 69 MB, the smallest chunked run \(--chunk 65536\)$/ },
  },
];
