import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import type { Page } from '@playwright/test';
import { twoStateChainText } from './sequenceFiles';
import { collectErrors, screenshot } from './pageWatch';


function tempFile(name: string, text: string): string {
  const path = join(mkdtempSync(join(tmpdir(), 'returnrate-intake-')), name);
  writeFileSync(path, text);
  return path;
}

async function idleWithEstimate(page: Page, inputName: string): Promise<void> {
  await expect(page.locator('.input-name')).toHaveText(inputName, { timeout: 30_000 });
  await expect(page.getByTestId('run-status')).toHaveText('Idle');
  await expect(page.getByTestId('entropy-interval')).toContainText(/interval: -?\d+\.\d+ to -?\d+\.\d+/);
}

const runButton = (page: Page) => page.getByRole('button', { name: 'Run', exact: true });

// Invented chain parameters for generated files; no value of these files is ever a check value.
const STAY: [number, number] = [0.8, 0.7];

test('a picked file is previewed before the run; changing the format updates the preview; Run analyses it', async ({ page }) => {
  const errors = collectErrors(page);
  // Tokens 'a'/'b' with <b> markup-like text in a first line that must stay text.
  const text = `<b>not markup</b>\n${twoStateChainText(2_000, STAY, 11)}`;
  const file = tempFile('chain-with-note.txt', text);
  await page.goto('/');
  await idleWithEstimate(page, 'Hill-top station wind sectors (invented)');
  await page.getByLabel('Choose a sequence file').setInputFiles(file);

  const preview = page.getByTestId('preview');
  await expect(preview.getByRole('heading', { level: 2 })).toHaveText('Preview of chain-with-note.txt');
  await expect(page.getByTestId('preview-lines')).toContainText('<b>not markup</b>');
  await expect(preview.locator('pre b')).toHaveCount(0);
  await expect(page.getByTestId('preview-format')).toHaveText('Reading as tokens; the guess for this file is tokens.');
  await expect(page.getByTestId('preview-symbols')).toContainText('symbols in the whole file');
  await expect(preview.getByRole('region', { name: /Alphabet of the preview/ })).toContainText('not');
  // Nothing ran: the previous result is still the demo's.
  await expect(page.locator('.input-name')).toHaveText('Hill-top station wind sectors (invented)');
  await screenshot(page, 'intake-1-preview-tokens');

  await page.getByRole('combobox', { name: 'Format' }).selectOption('chars');
  await expect(page.getByTestId('preview-format')).toHaveText('Reading as characters (chosen); the guess for this file is tokens.');
  await expect(page.getByRole('checkbox', { name: 'Keep spaces and tabs as symbols' })).not.toBeChecked();
  await page.getByRole('checkbox', { name: 'Keep spaces and tabs as symbols' }).check();
  await expect(preview.getByRole('region', { name: /Alphabet of the preview/ })).toContainText('␠');
  await page.getByRole('checkbox', { name: 'Keep spaces and tabs as symbols' }).uncheck();
  await screenshot(page, 'intake-2-preview-chars');

  await runButton(page).click();
  await idleWithEstimate(page, 'chain-with-note.txt');
  await expect(page.locator('.summary')).toContainText('read as chars');
  expect(errors).toEqual([]);
});

test('a file dropped on the page is previewed; a big file gets an estimated symbol count', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/');
  await idleWithEstimate(page, 'Hill-top station wind sectors (invented)');
  const text = twoStateChainText(600_000, STAY, 12); // about 1.2 MB, far more than the 64 KiB head
  const dataTransfer = await page.evaluateHandle((content) => {
    const dt = new DataTransfer();
    dt.items.add(new File([content], 'dropped-chain.txt', { type: 'text/plain' }));
    return dt;
  }, text);
  await page.dispatchEvent('.layout', 'dragover', { dataTransfer });
  await expect(page.getByTestId('drop-zone')).toHaveClass(/is-dragging/);
  await page.dispatchEvent('.layout', 'drop', { dataTransfer });
  await expect(page.getByTestId('preview')).toContainText('Preview of dropped-chain.txt');
  await expect(page.getByTestId('preview-symbols')).toContainText(/in the first 64\.0 KiB; about [\d,]+ in the whole file .*estimated from its size/);
  await expect(page.getByTestId('preview')).toContainText('Alphabet in the first 64.0 KiB: 2 symbols');
  await screenshot(page, 'intake-3-dropped-big-file');
  expect(errors).toEqual([]);
});

test('a long run shows n of maxN, positions in play, elapsed and time left; cancel leaves the page usable and the next run completes', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/');
  await idleWithEstimate(page, 'Hill-top station wind sectors (invented)');
  await page.getByRole('button', { name: 'Choose Fair coin' }).click();
  await page.getByRole('spinbutton', { name: 'Symbols' }).fill('12000000');
  await runButton(page).click();
  await expect(page.getByTestId('run-status')).toHaveText('Running');
  await expect(page.getByRole('status')).toContainText(/Block length n = \d+ of at most \d+ · [\d,]+ positions still in play/, { timeout: 30_000 });
  await expect(page.getByTestId('run-timing')).toContainText(/elapsed/);
  await expect(page.getByTestId('run-timing')).toContainText(/(about .+|less than 1 s) left/, { timeout: 30_000 });
  // The page answers while the worker computes: the settings still react.
  await page.getByRole('combobox', { name: 'Unit' }).selectOption('bit');
  await expect(page.getByRole('combobox', { name: 'Unit' })).toHaveValue('bit');
  await screenshot(page, 'intake-4-running', false);
  await page.getByRole('button', { name: 'Cancel', exact: true }).click();
  await expect(page.getByTestId('run-status')).toHaveText('Idle', { timeout: 5_000 });
  await expect(page.getByRole('status')).toContainText('Cancelled');
  await expect(page.locator('.input-name')).toHaveText('Hill-top station wind sectors (invented)');

  await page.getByRole('spinbutton', { name: 'Symbols' }).fill('100000');
  await runButton(page).click();
  await idleWithEstimate(page, 'Fair coin');
  await expect(page.locator('.summary')).toContainText('100,000 symbols');
  expect(errors).toEqual([]);
});

test('a demo opens from the gallery by keyboard and shows its exact values; settings and reading choices survive a reload', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/');
  await idleWithEstimate(page, 'Hill-top station wind sectors (invented)');
  const gallery = page.getByRole('list', { name: 'Demos' });
  await expect(gallery.getByRole('listitem')).toHaveCount(10);
  await expect(page.getByTestId('gallery-h-stirred-tank')).toHaveText('0.693147 nat/symbol');
  const choose = page.getByRole('button', { name: 'Choose Chaotic stirring tank probe (invented)' });
  await choose.focus();
  await page.keyboard.press('Enter');
  await expect(choose).toHaveAttribute('aria-pressed', 'true');
  await expect(page.getByTestId('next-input')).toContainText('Chaotic stirring tank probe (invented), 200,000 symbols');
  await runButton(page).focus();
  await page.keyboard.press('Enter');
  await idleWithEstimate(page, 'Chaotic stirring tank probe (invented)');
  await screenshot(page, 'intake-5-gallery-demo');

  await page.getByRole('combobox', { name: 'Unit' }).selectOption('bit');
  await page.getByRole('combobox', { name: 'Format' }).selectOption('csv');
  await page.getByRole('textbox', { name: 'CSV column' }).fill('sector');
  await page.reload();
  await expect(page.getByRole('combobox', { name: 'Unit' })).toHaveValue('bit');
  await expect(page.getByRole('combobox', { name: 'Format' })).toHaveValue('csv');
  await expect(page.getByRole('textbox', { name: 'CSV column' })).toHaveValue('sector');
  await expect(page.locator('.input-name')).toHaveText('Chaotic stirring tank probe (invented)');
  await expect(page.getByTestId('gallery-h-stirred-tank')).toHaveText('1.000000 bit/symbol');
  await screenshot(page, 'intake-6-after-reload');
  expect(errors).toEqual([]);
});
