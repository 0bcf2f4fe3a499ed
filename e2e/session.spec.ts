import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import type { Download, Page } from '@playwright/test';
import { twoStateChainText } from './sequenceFiles';
import { collectErrors, screenshot, shoot } from './pageWatch';

const DEMO = 'Hill-top station wind sectors (invented)';
// Invented chain parameters for generated files; no value of these files is ever a check value.
const STAY: [number, number] = [0.8, 0.7];

function tempDir(): string {
  return mkdtempSync(join(tmpdir(), 'returnrate-session-'));
}

async function idleWithEstimate(page: Page, inputName: string): Promise<void> {
  await expect(page.locator('.input-name')).toHaveText(inputName, { timeout: 30_000 });
  await expect(page.getByTestId('run-status')).toHaveText('Idle');
  await expect(page.getByTestId('entropy-interval')).toContainText(/interval: -?\d+\.\d+ to -?\d+\.\d+/);
}

/** What the views show of the numbers: the headline estimate (full precision), its interval, sigma^2 and the per-n table. */
async function shownNumbers(page: Page): Promise<string[]> {
  return [
    String(await page.getByTestId('entropy-estimate').getAttribute('data-value')),
    await page.getByTestId('entropy-interval').innerText(),
    await page.getByTestId('sigma2').innerText(),
    await page.getByTestId('length-table').innerText(),
  ];
}

async function saveSession(page: Page, dir: string): Promise<{ download: Download; path: string }> {
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Save session' }).click()]);
  const path = join(dir, download.suggestedFilename());
  await download.saveAs(path);
  return { download, path };
}

/** The saved state the page keeps in IndexedDB, parsed. */
async function savedInIndexedDb(page: Page): Promise<{ state: { result: { paths: { positions: number[] } } | null; pathsDropped: boolean } }> {
  const text = await page.evaluate(
    () =>
      new Promise<string>((resolve, reject) => {
        const open = indexedDB.open('returnrate');
        open.onerror = () => reject(new Error('no database'));
        open.onsuccess = () => {
          const get = open.result.transaction('workbench').objectStore('workbench').get('returnrate.workbench');
          get.onsuccess = () => resolve(String(get.result));
          get.onerror = () => reject(new Error('no saved state'));
        };
      }),
  );
  return JSON.parse(text) as { state: { result: { paths: { positions: number[] } } | null; pathsDropped: boolean } };
}

test('a saved session opens in a fresh browser with identical numbers; a newer schema is refused clearly; a reload restores the last result from IndexedDB', async ({ page, browser }) => {
  const errors = collectErrors(page);
  const dir = tempDir();
  await page.goto('/');
  await idleWithEstimate(page, DEMO);
  // A setting changed after the run: the session must bring it back too.
  await page.getByRole('combobox', { name: 'Unit' }).selectOption('bit');
  const before = await shownNumbers(page);
  const { download, path } = await saveSession(page, dir);
  expect(download.suggestedFilename()).toBe(`${DEMO}.returnrate-session.json`);
  expect(readFileSync(path, 'utf8').startsWith('{\n  "schema": "returnrate.session/1",')).toBe(true);

  // A fresh context has empty storage: it opens with the default demo, then the session replaces it.
  const fresh = await browser.newContext();
  const other = await fresh.newPage();
  const otherErrors = collectErrors(other);
  await other.goto('/');
  await idleWithEstimate(other, DEMO);
  await expect(other.getByRole('combobox', { name: 'Unit' })).toHaveValue('nat');
  await other.getByLabel('Open a session file').setInputFiles(path);
  await expect(other.getByRole('status').first()).toContainText(/Opened session saved \d{4}-\d\d-\d\d \d\d:\d\d UTC/);
  await expect(other.getByRole('combobox', { name: 'Unit' })).toHaveValue('bit');
  expect(await shownNumbers(other)).toEqual(before);
  await expect(other.getByTestId('session-status')).toContainText(`Session of “${DEMO}”, saved`);
  await screenshot(other, 'session-1-opened');

  // The same session written by a newer program: a clear message, the shown result stays.
  const tampered = join(dir, 'tampered.json');
  writeFileSync(tampered, readFileSync(path, 'utf8').replace('"returnrate.session/1"', '"returnrate.session/2"'));
  await other.getByLabel('Open a session file').setInputFiles(tampered);
  const alert = other.getByRole('alert');
  await expect(alert).toContainText('Could not open the session “tampered.json”');
  await expect(alert).toContainText('this session was saved by a newer returnrate (schema returnrate.session/2); this version reads returnrate.session/1');
  await screenshot(other, 'session-2-newer-schema', false);
  expect(await shownNumbers(other)).toEqual(before);

  // A reload shows the opened session's result at once, read back from IndexedDB with its sampled paths.
  const saved = await savedInIndexedDb(other);
  expect(saved.state.pathsDropped).toBe(false);
  expect(saved.state.result?.paths.positions.length).toBeGreaterThan(0);
  await other.reload();
  await idleWithEstimate(other, DEMO);
  await expect(other.getByRole('combobox', { name: 'Unit' })).toHaveValue('bit');
  expect(await shownNumbers(other)).toEqual(before);
  await fresh.close();
  expect(errors).toEqual([]);
  expect(otherErrors).toEqual([]);
});

test('with a session open, a dropped file is checked against its SHA-256; a session file dropped on the page opens as a session', async ({ page, browser }) => {
  const errors = collectErrors(page);
  const dir = tempDir();
  const data = join(dir, 'chain.txt');
  writeFileSync(data, twoStateChainText(3_000, STAY, 21));
  const changed = join(dir, 'chain-changed.txt');
  writeFileSync(changed, twoStateChainText(3_000, STAY, 22));
  await page.goto('/');
  await idleWithEstimate(page, DEMO);
  await page.getByLabel('Choose a sequence file').setInputFiles(data);
  await page.getByRole('button', { name: 'Run', exact: true }).click();
  await idleWithEstimate(page, 'chain.txt');
  const before = await shownNumbers(page);
  const { path } = await saveSession(page, dir);

  const fresh = await browser.newContext();
  const other = await fresh.newPage();
  const otherErrors = collectErrors(other);
  await other.goto('/');
  await idleWithEstimate(other, DEMO);
  // Dropped on the page like a data file, the session file is recognised by its head.
  const dataTransfer = await other.evaluateHandle((content) => {
    const dt = new DataTransfer();
    dt.items.add(new File([content], 'chain.txt.returnrate-session.json', { type: 'application/json' }));
    return dt;
  }, readFileSync(path, 'utf8'));
  await other.dispatchEvent('.layout', 'drop', { dataTransfer });
  await idleWithEstimate(other, 'chain.txt');
  expect(await shownNumbers(other)).toEqual(before);
  await expect(other.getByTestId('session-status')).toContainText('Drop the original file to check it is the same data.');

  await other.getByLabel('Choose a sequence file').setInputFiles(data);
  await expect(other.getByTestId('data-check')).toHaveText('“chain.txt”: same data as the session (SHA-256 matches).');
  await screenshot(other, 'session-3-same-data');
  await shoot(other.getByRole('region', { name: 'Session' }), 'session-4-same-data-panel');
  await other.getByLabel('Choose a sequence file').setInputFiles(changed);
  await expect(other.getByTestId('data-check')).toHaveText("“chain-changed.txt” is different data from the session's (SHA-256 differs).");
  await fresh.close();
  expect(errors).toEqual([]);
  expect(otherErrors).toEqual([]);
});
