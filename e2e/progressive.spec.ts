import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import type { Page } from '@playwright/test';
import { SCREENSHOTS, collectErrors, screenshot } from './pageWatch';


const runButton = (page: Page) => page.getByRole('button', { name: 'Run', exact: true });
const tableRows = (page: Page) => page.getByTestId('length-table').locator('tbody tr');

test('a long run fills the per-n table and the convergence figure level by level; cancel keeps the rows with a note', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/');
  await expect(page.getByTestId('run-status')).toHaveText('Idle', { timeout: 30_000 });
  await expect(page.getByTestId('entropy-interval')).toContainText(/interval: -?\d+\.\d+ to -?\d+\.\d+/);
  await page.getByRole('button', { name: 'Choose Fair coin' }).click();
  // Large enough that every level up to n of about 23 scans all twelve million positions: the run lasts many seconds.
  await page.getByRole('spinbutton', { name: 'Symbols' }).fill('12000000');
  await runButton(page).click();
  await expect(page.getByTestId('run-status')).toHaveText('Running');

  // The table gains rows while the run goes on, each batch labelled as partial.
  await expect(page.getByTestId('length-table-partial').first()).toContainText(/partial: n = 1\.\.\d+ so far/, { timeout: 60_000 });
  const first = await tableRows(page).count();
  expect(first).toBeGreaterThan(0);
  await expect.poll(() => tableRows(page).count(), { timeout: 60_000 }).toBeGreaterThan(first);
  await expect(page.getByTestId('run-status')).toHaveText('Running');
  const k = await tableRows(page).count();
  await expect(page.getByTestId('length-table-partial')).toContainText(new RegExp(`partial: n = 1\\.\\.(${k}|${k + 1}) so far`));
  // The convergence figure draws the same rows, with the same label under it.
  await expect(page.getByTestId('convergence-figure')).toBeVisible();
  await expect(page.getByTestId('convergence-partial')).toContainText(/partial: n = 1\.\.\d+ so far/);
  // The viewport from the table down into the figure: the part of the page that fills in.
  await page.getByRole('heading', { name: 'By block length' }).evaluate((h) => h.scrollIntoView({ block: 'start' }));
  await screenshot(page, 'progressive-partial', false);
  await page.locator('section[aria-labelledby="convergence-heading"]').screenshot({ path: join(SCREENSHOTS, 'progressive-partial-figure.png') });

  await page.getByRole('button', { name: 'Cancel' }).click();
  await expect(page.getByTestId('run-status')).toHaveText('Idle', { timeout: 5_000 });
  const kept = await tableRows(page).count();
  expect(kept).toBeGreaterThanOrEqual(k);
  await expect(page.getByRole('status')).toContainText(`Cancelled at n = ${kept} of`);
  await expect(page.getByTestId('length-table-partial')).toContainText(`Cancelled at n = ${kept}`);
  await expect(page.getByTestId('convergence-partial')).toContainText(`Cancelled at n = ${kept}`);
  await page.getByRole('heading', { name: 'By block length' }).evaluate((h) => h.scrollIntoView({ block: 'start' }));
  await screenshot(page, 'progressive-cancelled', false);

  // The next run's result replaces the partial rows.
  await page.getByRole('spinbutton', { name: 'Symbols' }).fill('100000');
  await runButton(page).click();
  await expect(page.getByTestId('run-status')).toHaveText('Idle', { timeout: 60_000 });
  await expect(page.locator('.summary')).toContainText('100,000 symbols');
  await expect(page.getByTestId('length-table-partial')).toHaveCount(0);
  await expect(page.getByTestId('convergence-partial')).toHaveCount(0);
  await expect(page.getByTestId('length-table')).toContainText('trusted range');
  expect(errors).toEqual([]);
});
