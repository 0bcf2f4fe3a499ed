import { execFile } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { expect, test } from '@playwright/test';
import type { Page } from '@playwright/test';
import { twoStateChainText } from './sequenceFiles';
import { ROOT, SCREENSHOTS, collectErrors, screenshot } from './pageWatch';

const CLI = join(ROOT, 'src', 'cli', 'main.ts');
const run = promisify(execFile);

function tempFile(name: string, text: string): string {
  const path = join(mkdtempSync(join(tmpdir(), 'returnrate-e2e-')), name);
  writeFileSync(path, text);
  return path;
}

/** The headline estimate as stored in the page (full precision, not the rounded text). */
async function headlineEstimate(page: Page): Promise<number> {
  const value = await page.getByTestId('entropy-estimate').getAttribute('data-value');
  return Number(value);
}

async function waitForEstimateOf(page: Page, inputName: string): Promise<void> {
  await expect(page.locator('.input-name')).toHaveText(inputName);
  await expect(page.getByTestId('run-status')).toHaveText('Idle');
  await expect(page.getByTestId('entropy-interval')).toContainText(/95% interval: -?\d+\.\d+ to -?\d+\.\d+/);
}

// Two-state chain with stay probabilities 0.9 and 0.6; invented parameters, the test checks only that
// page and command line agree, never a value.
const CHAIN_STAY: [number, number] = [0.9, 0.6];
const CHAIN_LENGTH = 100_000;
const CHAIN_SEED = 7;

test('(a) opens with the invented demo and an estimate with its interval, offline and without console errors', async ({ page, context, baseURL }) => {
  const errors = collectErrors(page);
  const pageHost = new URL(baseURL ?? '').host;
  const foreign: string[] = [];
  // Every request of the page and its worker, whatever the protocol; data: and blob: URLs stay inside the page.
  context.on('request', (request) => {
    const url = new URL(request.url());
    if (url.protocol !== 'data:' && url.protocol !== 'blob:' && url.host !== pageHost) foreign.push(request.url());
  });
  const started = Date.now();
  await page.goto('/');
  await expect(page).toHaveTitle(/returnrate/);
  await expect(page.getByRole('heading', { level: 1 })).toHaveText('returnrate');
  await expect(page.getByTestId('entropy-interval')).toContainText(/95% interval: \d+\.\d+ to \d+\.\d+/, { timeout: 20_000 });
  const seconds = (Date.now() - started) / 1000;
  test.info().annotations.push({ type: 'demo-seconds', description: seconds.toFixed(2) });
  await expect(page.locator('.input-name')).toContainText('(invented)');
  const h = await headlineEstimate(page);
  expect(Number.isFinite(h) && h > 0).toBe(true);
  await expect(page.getByTestId('sigma2')).toContainText('nat²/symbol');
  await screenshot(page, 'a-demo');
  expect(errors).toEqual([]);
  expect(foreign).toEqual([]);
});

test('(b) a chosen file is read and analysed', async ({ page }) => {
  const errors = collectErrors(page);
  const file = tempFile('two-state-chain.txt', twoStateChainText(CHAIN_LENGTH, CHAIN_STAY, CHAIN_SEED));
  await page.goto('/');
  await waitForEstimateOf(page, 'Hill-top station wind sectors (invented)');
  await page.getByLabel('Choose a sequence file').setInputFiles(file);
  await expect(page.getByTestId('preview-format')).toContainText('Reading as characters');
  await page.getByRole('button', { name: 'Run', exact: true }).click();
  await waitForEstimateOf(page, 'two-state-chain.txt');
  await expect(page.locator('.summary')).toContainText('100,000 symbols · alphabet of 2 · read as chars');
  await screenshot(page, 'b-file');
  expect(errors).toEqual([]);
});

test('(b) the page and the command line give the same headline estimate', async ({ page }) => {
  const file = tempFile('two-state-chain.txt', twoStateChainText(CHAIN_LENGTH, CHAIN_STAY, CHAIN_SEED));
  const cli = run('npx', ['tsx', CLI, 'analyze', file, '--json', '-'], { cwd: ROOT, maxBuffer: 1 << 28 });
  await page.goto('/');
  await waitForEstimateOf(page, 'Hill-top station wind sectors (invented)');
  await page.getByLabel('Choose a sequence file').setInputFiles(file);
  await expect(page.getByTestId('preview')).toBeVisible();
  await page.getByRole('button', { name: 'Run', exact: true }).click();
  await waitForEstimateOf(page, 'two-state-chain.txt');
  const fromPage = await headlineEstimate(page);
  const { stdout } = await cli;
  const fromCli = (JSON.parse(stdout) as { entropy: { estimate: number } }).entropy.estimate;
  // Same core code on the same bytes: only summation order could differ (common practice, no source).
  expect(Math.abs(fromPage - fromCli)).toBeLessThanOrEqual(1e-9);
});

test('(c) a CSV file without the chosen column gives a message that names the problem', async ({ page }) => {
  const errors = collectErrors(page);
  const rows = ['time,sector'];
  for (let k = 0; k < 200; k++) rows.push(`${k},${['N', 'NE', 'E'][k % 3] ?? 'N'}`);
  const file = tempFile('station-log.csv', `${rows.join('\n')}\n`);
  await page.goto('/');
  await expect(page.getByTestId('entropy-interval')).toBeVisible();
  await page.getByRole('combobox', { name: 'Format' }).selectOption('csv');
  await page.getByRole('textbox', { name: 'CSV column' }).fill('direction');
  await page.getByLabel('Choose a sequence file').setInputFiles(file);
  // The preview already names the problem; the run then refuses the file with the same words.
  await expect(page.getByRole('list', { name: 'Problems found in the preview' })).toContainText("no column 'direction'");
  await page.getByRole('button', { name: 'Run', exact: true }).click();
  const alert = page.getByRole('alert');
  await expect(alert).toContainText('Could not read “station-log.csv”');
  await expect(alert).toContainText("no column 'direction'");
  await expect(alert).toContainText('time');
  // The page stays usable: header, panels and the previous result are still there.
  await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
  await expect(page.getByTestId('run-status')).toHaveText('Idle');
  await screenshot(page, 'c-bad-csv-column');
  await page.getByRole('button', { name: 'Dismiss the error message' }).click();
  await expect(page.getByRole('alert')).toHaveCount(0);
  expect(errors).toEqual([]);
});

test('(d) cancel stops a long run, and the next run completes', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/');
  await waitForEstimateOf(page, 'Hill-top station wind sectors (invented)');
  const symbols = page.getByRole('spinbutton', { name: 'Symbols' });
  await symbols.fill('3000000');
  await page.getByRole('button', { name: 'Run', exact: true }).click();
  await expect(page.getByTestId('run-status')).toHaveText('Running');
  // Cancel at once: the whole 3e6-symbol run takes only a few seconds, so waiting would race it.
  await page.screenshot({ path: join(SCREENSHOTS, 'd-running.png') });
  await page.getByRole('button', { name: 'Cancel' }).click();
  await expect(page.getByTestId('run-status')).toHaveText('Idle', { timeout: 2_000 });
  await expect(page.getByRole('status')).toContainText('Cancelled');
  // The previous result stays; the cancelled run left nothing behind.
  await expect(page.locator('.summary')).toContainText('200,000 symbols');
  await expect(page.getByText('A new run is in progress')).toHaveCount(0);

  await symbols.fill('150000');
  await page.getByRole('button', { name: 'Run', exact: true }).click();
  await expect(page.locator('.summary')).toContainText('150,000 symbols', { timeout: 20_000 });
  await waitForEstimateOf(page, 'Hill-top station wind sectors (invented)');
  await screenshot(page, 'd-after-cancel');
  expect(errors).toEqual([]);
});
