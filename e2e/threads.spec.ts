import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import { twoStateChainText } from './sequenceFiles';
import { collectErrors, screenshot } from './pageWatch';

// Invented chain parameters for the generated file; no value of this file is a check value.
const STAY: [number, number] = [0.8, 0.7];

test('the page is cross-origin isolated and a file of five million symbols is analysed on sub-workers', async ({ page }) => {
  const errors = collectErrors(page);
  const subWorkers: string[] = [];
  page.on('worker', (worker) => {
    if (worker.url().includes('scanJob')) subWorkers.push(worker.url());
  });
  const path = join(mkdtempSync(join(tmpdir(), 'returnrate-threads-')), 'five-million.txt');
  writeFileSync(path, twoStateChainText(5_050_000, STAY, 5));
  await page.goto('/');
  await expect(page.getByTestId('run-status')).toHaveText('Idle', { timeout: 60_000 });
  expect(await page.evaluate(() => self.crossOriginIsolated)).toBe(true);
  expect(await page.evaluate(() => navigator.hardwareConcurrency)).toBeGreaterThan(1);
  await page.getByLabel('Choose a sequence file').setInputFiles(path);
  // Every text the status line shows during the run, to find the class groups' progress in it.
  await page.evaluate(() => {
    const seen: string[] = [];
    (window as unknown as { statusTexts: string[] }).statusTexts = seen;
    const status = document.querySelector('[role="status"]')!;
    new MutationObserver(() => seen.push(status.textContent ?? '')).observe(status, { subtree: true, childList: true, characterData: true });
  });
  await page.getByRole('button', { name: 'Run', exact: true }).click();
  await expect(page.locator('.input-name')).toHaveText('five-million.txt', { timeout: 110_000 });
  await expect(page.getByTestId('run-status')).toHaveText('Idle', { timeout: 110_000 });
  await expect(page.getByTestId('entropy-interval')).toContainText(/interval: -?\d+\.\d+ to -?\d+\.\d+/);
  // The one-worker note appears only when the page is not isolated.
  await expect(page.getByText('not cross-origin isolated')).toHaveCount(0);
  // While the sub-workers' class groups run, the status counts them.
  const texts = await page.evaluate(() => (window as unknown as { statusTexts: string[] }).statusTexts);
  expect(texts.some((t) => /shared among workers: \d+ of \d+ groups of blocks done/.test(t))).toBe(true);
  // Nested workers are reported by chromium with their script's URL.
  expect(subWorkers.length).toBeGreaterThan(1);
  await screenshot(page, 'threads-5-million');
  expect(errors).toEqual([]);
});
