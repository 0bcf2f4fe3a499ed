import { mkdirSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Locator, Page } from '@playwright/test';

/** The repository root, and where the browser tests leave screenshots for people to look at. */
export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..');
export const SCREENSHOTS = join(ROOT, 'test-results', 'screenshots');

/** Console errors and uncaught exceptions of the page, collected for the whole test. */
export function collectErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(`console: ${message.text()}`);
  });
  page.on('pageerror', (error) => errors.push(`page error: ${error.message}`));
  return errors;
}

/** A screenshot of the page (whole length by default) into SCREENSHOTS/NAME.png. */
export async function screenshot(page: Page, name: string, fullPage = true): Promise<void> {
  mkdirSync(SCREENSHOTS, { recursive: true });
  await page.screenshot({ path: join(SCREENSHOTS, `${name}.png`), fullPage });
}

/** A screenshot of one element, scrolled into view, into SCREENSHOTS/NAME.png. */
export async function shoot(target: Locator, name: string): Promise<void> {
  mkdirSync(SCREENSHOTS, { recursive: true });
  await target.scrollIntoViewIfNeeded();
  await target.screenshot({ path: join(SCREENSHOTS, `${name}.png`) });
}
