import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { expect, test } from '@playwright/test';
import { twoStateChainText } from './sequenceFiles';
import { collectErrors, screenshot } from './pageWatch';

function tempFile(name: string, text: string): string {
  const path = join(mkdtempSync(join(tmpdir(), 'returnrate-e2e-compare-')), name);
  writeFileSync(path, text);
  return path;
}

// Two invented two-state chains (stay probabilities chosen for the test, not from any data set); the
// test checks only that the page shows the three rates with intervals, never a value.
const FILE_A = () => tempFile('river-gauge-a.txt', twoStateChainText(60_000, [0.9, 0.6], 11));
const FILE_B = () => tempFile('river-gauge-b.txt', twoStateChainText(60_000, [0.7, 0.5], 12));
/** The invented demo file of the upper valley's bird song (public/demos/README.md). */
const UPPER_VALLEY_FILE = resolve(dirname(fileURLToPath(import.meta.url)), '..', 'public', 'demos', 'bird-song-upper-valley.txt');
const INTERVAL = /^-?\d+\.\d{4} to -?\d+\.\d{4}$/;

test('compares two files: cross entropy, h(A) and relative entropy, each with an interval, and the two figures', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/');
  const panel = page.getByTestId('compare-panel');
  await panel.scrollIntoViewIfNeeded();
  // The pick buttons are labelled for keyboard and screen-reader users.
  await expect(panel.getByLabel('Choose a file for sequence A')).toBeAttached();
  await page.getByTestId('compare-file-a').setInputFiles(FILE_A());
  await page.getByTestId('compare-file-b').setInputFiles(FILE_B());
  await expect(page.getByTestId('compare-chosen-a')).toContainText('river-gauge-a.txt');
  await expect(page.getByTestId('compare-chosen-b')).toContainText('river-gauge-b.txt');
  await page.getByTestId('compare-run').click();
  await expect(page.getByTestId('compare-cross').locator('td').nth(1)).toHaveText(INTERVAL, { timeout: 60_000 });
  for (const id of ['cross', 'entropy-a', 'relative']) {
    const row = page.getByTestId(`compare-${id}`);
    await expect(row.locator('td').nth(0)).toHaveText(/^-?\d+\.\d{4}$/);
    await expect(row.locator('td').nth(1)).toHaveText(INTERVAL);
  }
  await expect(page.getByTestId('compare-headline')).toContainText('Cross entropy rate');
  await expect(page.getByTestId('compare-progress')).toContainText('Idle');
  await expect(page.getByTestId('compare-convergence-figure')).toBeVisible();
  await expect(page.getByTestId('compare-qq-figure')).toBeVisible();
  await screenshot(page, 'compare-files');
  expect(errors).toEqual([]);
});

test('a reference-source pair shows the exact values, and Stop comparing stops a running comparison', async ({ page }) => {
  await page.goto('/');
  await page.getByTestId('compare-panel').scrollIntoViewIfNeeded();
  await page.getByTestId('compare-source-a').selectOption('source:markov:0.9,0.1;0.4,0.6');
  await page.getByTestId('compare-source-b').selectOption('source:coin');
  await expect(page.getByTestId('compare-length-a')).toHaveValue('200000');
  await page.getByTestId('compare-run').click();
  await expect(page.getByTestId('compare-progress')).toContainText('Running');
  await page.getByRole('button', { name: 'Stop comparing' }).click();
  await expect(page.getByTestId('compare-message')).toContainText('cancelled');
  await expect(page.getByTestId('compare-run')).toBeEnabled();
  // Run again to the end: both sides are first-order chains, so the exact column appears.
  await page.getByTestId('compare-run').click();
  await expect(page.getByTestId('compare-cross').locator('td').nth(1)).toHaveText(INTERVAL, { timeout: 60_000 });
  await expect(page.getByTestId('compare-cross').locator('td').nth(2)).toHaveText(/^\d+\.\d{4}$/);
  await screenshot(page, 'compare-sources');
});

test('"the input loaded above" is sequence A: the file open in the Input panel, against an invented gallery story as B', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/');
  await page.getByLabel('Choose a sequence file').setInputFiles(UPPER_VALLEY_FILE);
  await expect(page.getByTestId('next-input')).toContainText('bird-song-upper-valley.txt');
  await page.getByTestId('compare-panel').scrollIntoViewIfNeeded();
  await page.getByTestId('compare-source-a').selectOption({ label: 'The input loaded above' });
  await expect(page.getByTestId('compare-chosen-a')).toContainText('the input loaded above');
  await page.getByTestId('compare-source-b').selectOption('song-lower-valley');
  await page.getByTestId('compare-length-b').fill('50000');
  await expect(page.getByTestId('compare-chosen-b')).toContainText('50,000 symbols');
  await page.getByTestId('compare-run').click();
  await expect(page.getByTestId('compare-cross').locator('td').nth(1)).toHaveText(INTERVAL, { timeout: 60_000 });
  await expect(page.getByTestId('compare-names')).toContainText('A: bird-song-upper-valley.txt');
  await expect(page.getByTestId('compare-names')).toContainText('lower valley');
  // A file and an invented story: no exact column.
  await expect(page.getByTestId('compare-cross').locator('td')).toHaveCount(2);
  await screenshot(page, 'compare-loaded-input');
  expect(errors).toEqual([]);
});
