import { expect, test } from '@playwright/test';
import type { Page } from '@playwright/test';
import { collectErrors, screenshot } from './pageWatch';

// Faults in the user's path: the analysis worker dying mid-run, Cancel pressed at arbitrary moments,
// and a reload in the middle of a run. After each the page must say what happened, keep the
// settings and the rows computed so far, and run again.

const runButton = (page: Page) => page.getByRole('button', { name: 'Run', exact: true });
const tableRows = (page: Page) => page.getByTestId('length-table').locator('tbody tr');

async function idleWithEstimate(page: Page): Promise<void> {
  await expect(page.getByTestId('run-status')).toHaveText('Idle', { timeout: 60_000 });
  await expect(page.getByTestId('entropy-interval')).toContainText(/interval: -?\d+\.\d+ to -?\d+\.\d+/);
}

/** Opens the page, waits for the first-visit demo, and picks the fair coin with `symbols` symbols. */
async function fairCoin(page: Page, symbols: number): Promise<void> {
  await page.goto('/');
  await idleWithEstimate(page);
  await page.getByRole('button', { name: 'Choose Fair coin' }).click();
  await page.getByRole('spinbutton', { name: 'Symbols' }).fill(String(symbols));
}

/** A short run that must end in an estimate: the page is usable again. */
async function shortRunCompletes(page: Page): Promise<void> {
  await page.getByRole('spinbutton', { name: 'Symbols' }).fill('20000');
  await runButton(page).click();
  await idleWithEstimate(page);
  await expect(page.locator('.input-name')).toContainText(/coin/i);
}

test('a worker that dies mid-run is reported, the rows so far and the settings stay, and Run starts again', async ({ page }) => {
  const errors = collectErrors(page);
  await fairCoin(page, 12_000_000);
  await page.getByRole('combobox', { name: 'Unit' }).selectOption('bit');
  await runButton(page).click();
  await expect(page.getByTestId('length-table-partial').first()).toContainText(/partial: n = 1\.\.\d+ so far/, { timeout: 60_000 });
  const shown = await tableRows(page).count();
  await page.evaluate(() => (globalThis as { __returnrateStopWorker?: () => void }).__returnrateStopWorker?.());
  const alert = page.getByRole('alert');
  await expect(alert).toContainText('stopped unexpectedly');
  await expect(alert).toContainText('the analysis stopped unexpectedly (the worker was terminated)');
  await expect(page.getByTestId('run-status')).toHaveText('Idle');
  await expect(page.getByTestId('length-table-partial').first()).toContainText(/Stopped unexpectedly at n = \d+ of/);
  expect(await tableRows(page).count()).toBeGreaterThanOrEqual(shown);
  await expect(page.getByRole('spinbutton', { name: 'Symbols' })).toHaveValue('12000000');
  await expect(page.getByRole('combobox', { name: 'Unit' })).toHaveValue('bit');
  await screenshot(page, 'faults-worker-stopped', false);
  await page.getByRole('button', { name: 'Dismiss the error message' }).click();
  await shortRunCompletes(page);
  expect(errors).toEqual([]);
});

test('Cancel at arbitrary moments of a run always leaves a usable page', async ({ page }) => {
  const errors = collectErrors(page);
  await fairCoin(page, 3_000_000);
  // Delays in ms after Run, fixed so that a failure can be repeated: before the worker starts,
  // while reading, during the first levels and later.
  for (const delay of [0, 35, 120, 400, 900, 1600]) {
    await runButton(page).click();
    await page.waitForTimeout(delay);
    const cancel = page.getByRole('button', { name: 'Cancel' });
    if (await cancel.isEnabled()) await cancel.click();
    await expect(page.getByTestId('run-status')).toHaveText('Idle', { timeout: 60_000 });
    await expect(runButton(page)).toBeEnabled();
    await expect(page.getByRole('alert')).toHaveCount(0);
  }
  await shortRunCompletes(page);
  expect(errors).toEqual([]);
});

test('a reload in the middle of a run restores the settings and every row shown, marked as interrupted by a reload', async ({ page }) => {
  const errors = collectErrors(page);
  await fairCoin(page, 12_000_000);
  await page.getByRole('combobox', { name: 'Unit' }).selectOption('bit');
  await runButton(page).click();
  await expect.poll(() => tableRows(page).count(), { timeout: 60_000 }).toBeGreaterThanOrEqual(2);
  const shown = await tableRows(page).count();
  const firstRow = await tableRows(page).first().innerText();
  await page.reload();
  await expect(page.getByTestId('length-table-partial').first()).toContainText(/Interrupted by a reload at n = \d+ of \d+/, { timeout: 30_000 });
  expect(await tableRows(page).count()).toBeGreaterThanOrEqual(shown);
  expect(await tableRows(page).first().innerText()).toBe(firstRow);
  await expect(page.getByRole('combobox', { name: 'Unit' })).toHaveValue('bit');
  await expect(page.getByRole('spinbutton', { name: 'Symbols' })).toHaveValue('12000000');
  await expect(page.getByTestId('run-status')).toHaveText('Idle');
  await screenshot(page, 'faults-reload-interrupted', false);
  await page.getByRole('button', { name: 'Choose Fair coin' }).click();
  await shortRunCompletes(page);
  await expect(page.getByTestId('length-table-partial')).toHaveCount(0);
  expect(errors).toEqual([]);
});
