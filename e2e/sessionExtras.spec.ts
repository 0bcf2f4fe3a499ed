import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import type { Locator, Page } from '@playwright/test';
import { collectErrors, screenshot } from './pageWatch';
import { twoStateChainText } from './sequenceFiles';

const DEMO = 'Hill-top station wind sectors (invented)';
const LENGTH = 5_000;

/** Everything the calibration panel prints: progress, fitted model, the table and the corrected h. */
async function panelNumbers(panel: Locator): Promise<string[]> {
  return [
    await panel.getByTestId('calibration-progress').innerText(),
    await panel.getByTestId('calibration-model').innerText(),
    await panel.getByTestId('calibration-table').innerText(),
    await panel.getByTestId('calibration-corrected').innerText(),
  ];
}

async function idle(page: Page): Promise<void> {
  await expect(page.locator('.input-name')).toHaveText(DEMO, { timeout: 60_000 });
  await expect(page.getByTestId('run-status')).toHaveText('Idle', { timeout: 60_000 });
  await expect(page.getByTestId('entropy-interval')).toContainText(/interval/);
}

/** The comparison's three rate rows as the panel prints them. */
async function comparisonNumbers(page: Page): Promise<string[]> {
  return Promise.all(['cross', 'entropy-a', 'relative'].map((id) => page.getByTestId(`compare-${id}`).innerText()));
}

test('a session saved after a calibration and a comparison opens in a fresh browser with the same numbers, without computing', async ({ page, browser }) => {
  const errors = collectErrors(page);
  const dir = mkdtempSync(join(tmpdir(), 'returnrate-session-extras-'));
  await page.goto('/');
  await idle(page);
  // The default demo again at a small length, so the calibration is quick.
  await page.getByRole('spinbutton', { name: 'Symbols' }).fill(String(LENGTH));
  await page.getByRole('button', { name: 'Run', exact: true }).click();
  await expect(page.getByText(`${LENGTH.toLocaleString('en-US')} symbols`).first()).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId('run-status')).toHaveText('Idle');

  const panel = page.getByRole('region', { name: 'Calibration at this N' });
  await panel.getByLabel('Number of replicates').fill('10');
  await panel.getByRole('button', { name: 'Calibrate at this N' }).click();
  await expect(panel.getByTestId('calibration-progress')).toHaveText('Done: 10 replicates', { timeout: 90_000 });
  const before = await panelNumbers(panel);

  // The calibration figure has its export toolbar; its CSV names the input, its SHA-256 line and the replicates and seed.
  const toolbar = panel.getByRole('toolbar');
  await expect(toolbar.getByRole('button', { name: 'Download SVG' })).toBeVisible();
  const [csv] = await Promise.all([page.waitForEvent('download'), toolbar.getByRole('button', { name: 'Download CSV' }).click()]);
  expect(csv.suggestedFilename()).toMatch(/_calibration\.csv$/);
  const csvPath = join(dir, csv.suggestedFilename());
  await csv.saveAs(csvPath);
  const csvText = readFileSync(csvPath, 'utf8');
  expect(csvText).toContain(`# Input: ${DEMO}`);
  expect(csvText).toMatch(/# View: calibration by Markov surrogates: 10 of 10 replicates, base seed \d+/);

  // A small comparison of two files (invented two-state chains; only the page's behaviour is checked).
  const fileA = join(dir, 'gauge-a.txt');
  const fileB = join(dir, 'gauge-b.txt');
  writeFileSync(fileA, twoStateChainText(6_000, [0.9, 0.6], 11));
  writeFileSync(fileB, twoStateChainText(6_000, [0.7, 0.5], 12));
  await page.getByTestId('compare-panel').scrollIntoViewIfNeeded();
  await page.getByTestId('compare-file-a').setInputFiles(fileA);
  await page.getByTestId('compare-file-b').setInputFiles(fileB);
  await page.getByTestId('compare-run').click();
  await expect(page.getByTestId('compare-cross').locator('td').nth(1)).toHaveText(/^-?\d+\.\d{4} to -?\d+\.\d{4}$/, { timeout: 60_000 });
  const compared = await comparisonNumbers(page);
  // The comparison's convergence figure exports too; its CSV names both inputs with their SHA-256.
  const compareToolbar = page.getByTestId('compare-panel').getByRole('toolbar').first();
  const [compareCsv] = await Promise.all([page.waitForEvent('download'), compareToolbar.getByRole('button', { name: 'Download CSV' }).click()]);
  expect(compareCsv.suggestedFilename()).toBe('gauge-a-vs-gauge-b_compare-convergence.csv');
  const compareCsvPath = join(dir, compareCsv.suggestedFilename());
  await compareCsv.saveAs(compareCsvPath);
  const compareText = readFileSync(compareCsvPath, 'utf8');
  expect(compareText).toContain('# Input A: gauge-a.txt');
  expect(compareText).toMatch(/# SHA-256 of A: [0-9a-f]{64}\r\n# Input B: gauge-b.txt\r\n# SHA-256 of B: [0-9a-f]{64}/);

  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Save session' }).click()]);
  const path = join(dir, download.suggestedFilename());
  await download.saveAs(path);
  const saved = JSON.parse(readFileSync(path, 'utf8')) as { calibration?: { summary: { replicates: number; entropy: { bias: number | null } } }; comparison?: { inputB: { name: string } } };
  expect(saved.calibration?.summary.replicates).toBe(10);
  expect(saved.comparison?.inputB.name).toBe('gauge-b.txt');

  const fresh = await browser.newContext();
  const other = await fresh.newPage();
  const otherErrors = collectErrors(other);
  await other.goto('/');
  await idle(other);
  const otherPanel = other.getByRole('region', { name: 'Calibration at this N' });
  await expect(otherPanel.getByTestId('calibration-table')).toHaveCount(0);
  await other.getByLabel('Open a session file').setInputFiles(path);
  await expect(other.getByRole('status').first()).toContainText(/Opened session saved/);
  expect(await panelNumbers(otherPanel)).toEqual(before);
  await expect(otherPanel.getByTestId('calibration-stale')).toHaveCount(0);
  await expect(otherPanel.getByTestId('calibration-figure')).toBeVisible();
  await expect(otherPanel.getByRole('toolbar').getByRole('button', { name: 'Download CSV' })).toBeVisible();
  expect(await comparisonNumbers(other)).toEqual(compared);
  await expect(other.getByTestId('compare-convergence-figure')).toBeVisible();
  // The report of the opened session's result carries its calibration, numbers and figure included.
  const [report] = await Promise.all([other.waitForEvent('download'), other.getByRole('button', { name: 'Download report' }).click()]);
  const reportPath = join(dir, report.suggestedFilename());
  await report.saveAs(reportPath);
  const html = readFileSync(reportPath, 'utf8');
  expect(html).toContain('<section id="calibration">');
  expect(html).toContain('id="figure-calibration"');
  expect(html).toContain(`data-value="${String(saved.calibration?.summary.entropy.bias)}"`);
  expect(html).not.toMatch(/<script/i);
  await screenshot(other, 'session-extras-opened');
  await fresh.close();
  expect(errors).toEqual([]);
  expect(otherErrors).toEqual([]);
});
