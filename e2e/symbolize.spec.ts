import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import type { Page } from '@playwright/test';
import { collectErrors, ROOT, screenshot, shoot } from './pageWatch';

// The invented real-valued demo file (public/demos/README.md); nothing in it is a check value.
const POND = join(ROOT, 'public', 'demos', 'garden-pond-level.csv');

async function idleWithEstimate(page: Page, inputName: string): Promise<void> {
  await expect(page.locator('.input-name')).toHaveText(inputName, { timeout: 60_000 });
  await expect(page.getByTestId('run-status')).toHaveText('Idle');
  await expect(page.getByTestId('entropy-interval')).toContainText(/interval: -?\d+\.\d+ to -?\d+\.\d+/);
}

test('a real-valued file: choose quantile 4, see series, histogram and cut points before running; run; reload keeps the choice', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/');
  await idleWithEstimate(page, 'Hill-top station wind sectors (invented)');
  await page.getByLabel('Choose a sequence file').setInputFiles(POND);
  const preview = page.getByTestId('preview');
  await expect(preview.getByRole('heading', { level: 2 })).toHaveText('Preview of garden-pond-level.csv');

  await page.getByRole('textbox', { name: 'CSV column' }).fill('level_cm');
  await page.getByRole('combobox', { name: 'Symbolize numbers' }).selectOption('quantile');
  await expect(page.getByRole('textbox', { name: 'Cells K' })).toHaveValue('4');

  const symbolization = page.getByTestId('symbolization-preview');
  await expect(page.getByTestId('symbolization-spec')).toContainText('Symbolization quantile:4');
  await expect(page.getByTestId('symbolization-cuts')).toContainText(/Cut points in the first .*: \d+(\.\d+)?, \d+(\.\d+)?, \d+(\.\d+)?/);
  await expect(symbolization.getByTestId('symbolization-series').locator('[data-mark="line"]')).toHaveCount(2);
  await expect(symbolization.getByTestId('symbolization-histogram').locator('[data-mark="band"]')).toHaveCount(1);
  await expect(symbolization.getByTestId('symbolization-histogram').locator('[data-mark="line"]')).toHaveCount(2);
  const cells = page.getByTestId('symbolization-cells');
  await expect(cells.locator('tbody tr')).toHaveCount(4);
  await expect(cells).toContainText('q1');
  await expect(cells).toContainText('q4');
  await screenshot(page, 'symbolize-1-preview-quantile');
  await shoot(symbolization, 'symbolize-1-preview-figures');

  // A bad parameter says what is wrong, in the preview, before any run.
  await page.getByRole('textbox', { name: 'Cells K' }).fill('1');
  await expect(preview.getByRole('alert')).toContainText('K must be between 2');
  await page.getByRole('textbox', { name: 'Cells K' }).fill('4');
  await expect(page.getByTestId('symbolization-spec')).toContainText('quantile:4');

  await page.getByRole('button', { name: 'Run', exact: true }).click();
  await idleWithEstimate(page, 'garden-pond-level.csv');
  await screenshot(page, 'symbolize-2-estimate');

  await page.reload();
  await expect(page.getByRole('combobox', { name: 'Symbolize numbers' })).toHaveValue('quantile');
  await expect(page.getByRole('textbox', { name: 'Cells K' })).toHaveValue('4');
  await expect(page.getByRole('textbox', { name: 'CSV column' })).toHaveValue('level_cm');
  await expect(page.locator('.input-name')).toHaveText('garden-pond-level.csv');
  expect(errors).toEqual([]);
});
