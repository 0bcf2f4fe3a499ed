import { expect, test } from '@playwright/test';
import type { Page } from '@playwright/test';
import { collectErrors, screenshot, shoot } from './pageWatch';

/** Runs the default demo (invented) at a small length and waits for its estimate. */
async function runSmallDemo(page: Page, length: number, open = true): Promise<void> {
  if (open) {
    await page.goto('/');
    // The first visit runs the default demo at its full length; wait for it, then run it short.
    await expect(page.getByTestId('entropy-interval')).toContainText(/95% interval/, { timeout: 60_000 });
  }
  await page.getByRole('spinbutton', { name: 'Symbols' }).fill(String(length));
  await page.getByRole('button', { name: 'Run', exact: true }).click();
  await expect(page.getByTestId('run-status')).toHaveText('Idle');
  await expect(page.getByText(`${length.toLocaleString('en-US')} symbols`).first()).toBeVisible();
}

test('calibrates the demo at N = 1e4 with 12 replicates: progress, then distribution, bias, coverage and corrected h', async ({ page }) => {
  const errors = collectErrors(page);
  await runSmallDemo(page, 10_000);
  const panel = page.getByRole('region', { name: 'Calibration at this N' });
  await panel.getByLabel('Number of replicates').fill('12');
  await panel.getByRole('button', { name: 'Calibrate at this N' }).click();
  await expect(panel.getByTestId('calibration-progress')).toContainText(/Replicate \d+ of 12|Fitting|Reading/);
  await expect(panel.getByTestId('calibration-progress')).toHaveText('Done: 12 replicates', { timeout: 90_000 });
  await expect(panel.getByTestId('calibration-model')).toContainText(/Markov chain of order \d+ \(BIC over k = 0\.\.\d+/);
  const table = panel.getByTestId('calibration-table');
  await expect(table).toContainText('Bias ± SE');
  await expect(table.locator('tbody tr')).toHaveCount(2);
  await expect(table.locator('tbody tr').first()).toContainText(/\d+ of 12; nominal 95%/);
  await expect(panel.getByTestId('calibration-corrected')).toContainText(/Corrected h = \d+\.\d+/);
  await expect(panel.getByTestId('calibration-corrected')).toContainText('corrected by Markov surrogates of order');
  const figure = panel.getByTestId('calibration-figure');
  await expect(figure).toBeVisible();
  // One marker per surrogate estimate, and the exact value's line.
  await expect(figure.locator('svg').first()).toBeVisible();
  await expect(panel.getByTestId('calibration-stale')).toHaveCount(0);
  await screenshot(page, 'calibration-done');
  await shoot(panel, 'calibration-panel');
  expect(errors).toEqual([]);
});

test('cancel midway keeps the finished replicates as partial and leaves a usable page', async ({ page }) => {
  const errors = collectErrors(page);
  await runSmallDemo(page, 10_000);
  const panel = page.getByRole('region', { name: 'Calibration at this N' });
  await panel.getByLabel('Number of replicates').fill('1000');
  await panel.getByRole('button', { name: 'Calibrate at this N' }).click();
  await expect(panel.getByTestId('calibration-progress')).toContainText(/Replicate ([3-9]|\d\d+) of 1000/, { timeout: 60_000 });
  await panel.getByRole('button', { name: 'Stop calibrating' }).click();
  await expect(panel.getByTestId('calibration-progress')).toContainText(/Stopped at \d+ of 1000 replicates \(partial\)/);
  await expect(panel.getByTestId('calibration-message')).toContainText('partial');
  await expect(panel.getByTestId('calibration-table')).toContainText('(partial)');
  await expect(panel.getByRole('button', { name: 'Calibrate at this N' })).toBeEnabled();
  // The page still runs (no reload): a new analysis at another length marks the calibration stale.
  await runSmallDemo(page, 12_000, false);
  await expect(panel.getByTestId('calibration-stale')).toBeVisible();
  await panel.getByLabel('Number of replicates').fill('10');
  await panel.getByRole('button', { name: 'Calibrate at this N' }).click();
  await expect(panel.getByTestId('calibration-progress')).toHaveText('Done: 10 replicates', { timeout: 90_000 });
  await expect(panel.getByTestId('calibration-stale')).toHaveCount(0);
  await screenshot(page, 'calibration-after-cancel');
  expect(errors).toEqual([]);
});
