import { readFileSync } from 'node:fs';
import { expect, test } from '@playwright/test';
import type { Page } from '@playwright/test';
import { BROWSER_BAD_INPUTS } from '../test/corpus/badInputs';
import type { BadInput } from '../test/corpus/badInputs';
import { collectErrors, screenshot } from './pageWatch';

// The workbench subset of the bad-input corpus (test/corpus/badInputs.ts): each file is dropped on
// the page like a user's file and run; the page must name the problem in the corpus's words, stay
// usable, and log no console error. A demo must still run afterwards.

const runButton = (page: Page) => page.getByRole('button', { name: 'Run', exact: true });

async function idleWithEstimate(page: Page, inputName: string): Promise<void> {
  await expect(page.locator('.input-name')).toHaveText(inputName, { timeout: 60_000 });
  await expect(page.getByTestId('run-status')).toHaveText('Idle');
  await expect(page.getByTestId('entropy-interval')).toContainText(/interval: -?\d+\.\d+ to -?\d+\.\d+/);
}

async function drop(page: Page, kind: BadInput): Promise<void> {
  const dataTransfer = await page.evaluateHandle(
    ([bytes, name]) => {
      const dt = new DataTransfer();
      dt.items.add(new File([Uint8Array.from(bytes)], name));
      return dt;
    },
    [Array.from(kind.bytes()), kind.fileName] as const,
  );
  await page.dispatchEvent('.layout', 'drop', { dataTransfer });
}

/** The page's field label for each symbolization's parameter (src/ui/view/inputOptions.ts). */
const PARAMETER_LABEL: Readonly<Record<string, string>> = { quantile: 'Cells K', threshold: 'Cut points T1,T2,…', ordinal: 'Order D or D:TAU' };

/** Sets "Symbolize numbers", its parameter and "Missing values" as the kind's spec says (or none). */
async function chooseSymbolization(page: Page, kind: BadInput): Promise<void> {
  const select = page.getByRole('combobox', { name: 'Symbolize numbers' });
  if (kind.symbolize === undefined) {
    if ((await select.count()) > 0) await select.selectOption('none');
    return;
  }
  const colon = kind.symbolize.indexOf(':');
  const name = kind.symbolize.slice(0, colon);
  await select.selectOption(name);
  await page.getByRole('textbox', { name: PARAMETER_LABEL[name] ?? name }).fill(kind.symbolize.slice(colon + 1));
  await page.getByRole('combobox', { name: 'Missing values' }).selectOption(kind.reader.missing ?? 'skip');
}

/** A corpus pattern without its line anchors, for text the page shows among other text. */
const unanchored = (pattern: RegExp): RegExp => new RegExp(pattern.source.replace(/^\^/, '').replace(/\$$/, ''));

test('dropped bad files get a plain message with their place; the page stays usable and a demo still runs', async ({ page }) => {
  test.setTimeout(240_000);
  expect(BROWSER_BAD_INPUTS.length).toBeGreaterThanOrEqual(8);
  const errors = collectErrors(page);
  await page.goto('/');
  await idleWithEstimate(page, 'Hill-top station wind sectors (invented)');

  for (const kind of BROWSER_BAD_INPUTS) {
    await test.step(kind.id, async () => {
      const want = kind.expect;
      if (kind.stage === 'session') {
        await drop(page, kind);
        const alert = page.getByRole('alert');
        await expect(alert).toContainText(`Could not open the session “${kind.fileName}”`);
        if (want.outcome === 'refused') await expect(alert).toContainText(want.message);
      } else {
        await page.getByRole('combobox', { name: 'Format' }).selectOption(kind.reader.format);
        if (kind.reader.format === 'csv') await page.getByRole('textbox', { name: 'CSV column' }).fill(String(kind.reader.column ?? ''));
        await chooseSymbolization(page, kind);
        await drop(page, kind);
        await expect(page.getByTestId('preview').getByRole('heading', { level: 2 })).toContainText(kind.fileName);
        await runButton(page).click();
        if (want.outcome === 'refused') {
          const alert = page.getByRole('alert');
          await expect(alert).toContainText(kind.fileName);
          await expect(alert.locator('.alert-message')).toContainText(want.message);
          if (want.position !== 'whole-input') {
            const { line, column, byte } = want.position;
            const place = [line === undefined ? '' : `line ${line}`, column === undefined ? '' : `column ${column}`, byte === undefined ? '' : `byte ${byte}`].filter((s) => s !== '').join(', ');
            await expect(alert).toContainText(place);
          }
          await expect(page.getByTestId('run-status')).toHaveText('Idle');
        } else {
          await idleWithEstimate(page, kind.fileName);
          if (want.warning !== undefined && kind.symbolize !== undefined) await expect(page.getByText(unanchored(want.warning)).first()).toBeVisible();
        }
      }
      await screenshot(page, `bad-input-${kind.id}`, false);
      // The page is whole after each: heading, Run button, and a dismissible message.
      await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
      await expect(runButton(page)).toBeEnabled();
      const dismiss = page.getByRole('button', { name: 'Dismiss the error message' });
      if ((await dismiss.count()) > 0) await dismiss.first().click();
    });
  }

  // Still usable: a reference source from the gallery runs to an estimate.
  await page.getByRole('button', { name: 'Choose Fair coin' }).click();
  await page.getByRole('spinbutton', { name: 'Symbols' }).fill('20000');
  await runButton(page).click();
  await expect(page.getByTestId('run-status')).toHaveText('Idle', { timeout: 60_000 });
  await expect(page.getByTestId('entropy-interval')).toContainText(/interval: -?\d+\.\d+ to -?\d+\.\d+/);
  await expect(page.locator('.input-name')).toContainText(/coin/i);
  expect(errors).toEqual([]);
});

test('data that looks physiological carries the research-estimate caution in the preview and the estimate; other data does not', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/');
  await idleWithEstimate(page, 'Hill-top station wind sectors (invented)');
  await expect(page.getByTestId('physiological-caution')).toHaveCount(0);
  // A CSV whose file name says nothing, but whose column is named like a recording: an invented
  // binary pattern, never a check value.
  const rows = ['time,ECG_lead_II'];
  for (let k = 0; k < 600; k++) rows.push(`${k},${(k * 7919) % 5 < 2 ? 'u' : 'd'}`);
  await page.getByRole('combobox', { name: 'Format' }).selectOption('csv');
  await page.getByRole('textbox', { name: 'CSV column' }).fill('ECG_lead_II');
  const dataTransfer = await page.evaluateHandle((text) => {
    const dt = new DataTransfer();
    dt.items.add(new File([text], 'session-4.csv'));
    return dt;
  }, `${rows.join('\n')}\n`);
  await page.dispatchEvent('.layout', 'drop', { dataTransfer });
  await expect(page.getByTestId('preview-physiological-caution')).toContainText('research estimate, not a clinical measurement');
  await runButton(page).click();
  await idleWithEstimate(page, 'session-4.csv');
  await expect(page.getByTestId('physiological-caution')).toContainText('research estimate, not a clinical measurement');
  await screenshot(page, 'caution-physiological', false);
  expect(errors).toEqual([]);
});

test('hostile file and symbol names are shown as text in the page and written as text into exported SVG, CSV and the report', async ({ page }) => {
  const errors = collectErrors(page);
  const dialogs: string[] = [];
  page.on('dialog', (d) => {
    dialogs.push(d.message());
    void d.dismiss();
  });
  const name = '<img src=x onerror=alert(1)>.txt';
  const tokens = ['"><script>alert(2)</script>', '<img_src=x_onerror=alert(3)>'];
  // An invented alternation with a period of three, never a check value.
  const text = Array.from({ length: 3000 }, (_, k) => tokens[k % 3 === 0 ? 0 : 1]).join(' ');
  await page.goto('/');
  await idleWithEstimate(page, 'Hill-top station wind sectors (invented)');
  await page.getByRole('combobox', { name: 'Format' }).selectOption('tokens');
  const dataTransfer = await page.evaluateHandle(
    ([content, fileName]) => {
      const dt = new DataTransfer();
      dt.items.add(new File([content], fileName));
      return dt;
    },
    [text, name] as const,
  );
  await page.dispatchEvent('.layout', 'drop', { dataTransfer });
  await expect(page.getByTestId('preview').getByRole('heading', { level: 2 })).toHaveText(`Preview of ${name}`);
  await expect(page.getByTestId('preview').getByRole('region', { name: /Alphabet of the preview/ })).toContainText(tokens[0]!);
  await runButton(page).click();
  await idleWithEstimate(page, name);
  // Nothing was parsed as markup: no image with src x, no script holding the payload, no alert.
  expect(await page.locator('img[src="x"]').count()).toBe(0);
  expect(await page.evaluate(() => Array.from(document.scripts).some((s) => (s.textContent ?? '').includes('alert(')))).toBe(false);

  const toolbar = page.getByRole('toolbar', { name: /^Export: Convergence/ });
  const saved = async (button: string): Promise<string> => {
    const [download] = await Promise.all([page.waitForEvent('download'), toolbar.getByRole('button', { name: button, exact: true }).click()]);
    return readFileSync((await download.path()) ?? '', 'utf8');
  };
  const svg = await saved('Download SVG');
  expect(svg).not.toMatch(/<img|<script/i);
  expect(svg).toContain('&lt;img src=x onerror=alert(1)&gt;.txt');
  const csv = await saved('Download CSV');
  expect(csv).toContain(`# Input: ${name}`);
  const [report] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download report' }).click()]);
  const html = readFileSync((await report.path()) ?? '', 'utf8');
  expect(html).not.toMatch(/<img|<script/i);
  expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;.txt');
  expect(dialogs).toEqual([]);
  expect(errors).toEqual([]);
});
