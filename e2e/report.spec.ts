import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import type { Download } from '@playwright/test';
import { collectErrors, screenshot } from './pageWatch';

test('Download report saves one HTML file that opens offline with all six figures and the estimate', async ({ page, context }) => {
  const errors = collectErrors(page);
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.goto('/');
  const estimate = page.getByTestId('entropy-estimate');
  await expect(page.getByTestId('entropy-interval')).toContainText(/95% interval/, { timeout: 30_000 });
  const value = await estimate.getAttribute('data-value');
  expect(value).not.toBeNull();

  const [file] = (await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download report', exact: true }).click()])) as [Download, void];
  expect(file.suggestedFilename()).toMatch(/_report\.html$/);
  const dir = mkdtempSync(join(tmpdir(), 'returnrate-report-'));
  try {
    const path = join(dir, 'report.html');
    await file.saveAs(path);

    const report = await context.newPage();
    const reportErrors = collectErrors(report);
    // Nothing may be fetched: the report is one file.
    const requests: string[] = [];
    report.on('request', (r) => {
      if (!r.url().startsWith('file://')) requests.push(r.url());
    });
    await report.goto(`file://${path}`);
    await expect(report.locator('svg')).toHaveCount(6);
    await expect(report.locator('figure figcaption')).toHaveCount(6);
    await expect(report.locator('#estimate-h td').first()).toHaveAttribute('data-value', value!);
    await expect(report.locator('#estimate-h td').first()).toHaveText(Number(value).toFixed(4));
    await expect(report.locator('#cautions')).toContainText('not a diagnostic device');
    await expect(report.locator('script')).toHaveCount(0);
    await screenshot(report, 'report');
    // Printing: chromium's own print to PDF (A4, print CSS) gives a document of several pages, each
    // figure starting a new one, so at least 1 (tables) + 6 (figures) pages.
    const pdf = (await report.pdf({ format: 'A4', printBackground: false })).toString('latin1');
    expect(pdf.startsWith('%PDF-')).toBe(true);
    expect((pdf.match(/\/Type\s*\/Page\b/g) ?? []).length).toBeGreaterThanOrEqual(7);
    expect(requests).toEqual([]);
    expect(reportErrors).toEqual([]);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  expect(errors).toEqual([]);
});
