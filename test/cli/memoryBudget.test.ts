import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { maxMemoryOption } from '../../src/cli/memoryBudget';
import { cli, failureLine, tempFolder } from './cliHarness';

const folder = tempFolder('memory');
afterAll(() => folder.remove());

describe('--max-memory', () => {
  it('reads sizes with binary suffixes and refuses others', () => {
    expect(maxMemoryOption({ 'max-memory': '2G' })).toBe(2 * 2 ** 30);
    expect(maxMemoryOption({ 'max-memory': '512MiB' })).toBe(512 * 2 ** 20);
    expect(maxMemoryOption({ 'max-memory': '1e9' })).toBe(1e9);
    expect(() => maxMemoryOption({ 'max-memory': 'lots' })).toThrow('--max-memory must be a size such as 2G, 512M or 1e9; got "lots"');
  });

  it('refuses a run that does not fit with one line naming a chunk size that does, and runs that chunk size', async () => {
    const data = join(folder.dir, 'coin.txt');
    expect((await cli('generate', 'coin', '--length', '2000000', '--out', data)).code).toBe(0);
    // 2e6 binary symbols: 2 MB of symbols + 24 MB of engine arrays + 64 MiB base + small arrays = about 93 MB
    const refused = await cli('analyze', data, '--format', 'chars', '--max-memory', '80M', '--max-n', '12', '--quiet');
    expect(refused.code).toBe(1);
    const line = failureLine(refused);
    expect(line).toMatch(/^returnrate: .*coin\.txt: this run needs about 93 MB but 84 MB are available \(--max-memory\); a chunked run fits: --chunk \d+ /);
    const size = /--chunk (\d+)/.exec(line)![1]!;
    const chunked = await cli('analyze', data, '--format', 'chars', '--max-memory', '80M', '--max-n', '12', '--chunk', size, '--quiet');
    expect(chunked.code).toBe(0);
  });
});
