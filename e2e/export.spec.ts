import { readFile } from 'node:fs/promises';
import { DOMParser } from '@xmldom/xmldom';
import { expect, test } from '@playwright/test';
import type { Download, Page } from '@playwright/test';
import { collectErrors, shoot } from './pageWatch';

async function download(page: Page, button: string): Promise<{ name: string; bytes: Buffer }> {
  const toolbar = page.getByRole('toolbar', { name: /^Export: Convergence/ });
  const [file] = (await Promise.all([page.waitForEvent('download'), toolbar.getByRole('button', { name: button, exact: true }).click()])) as [Download, void];
  const path = await file.path();
  return { name: file.suggestedFilename(), bytes: await readFile(path) };
}

/** Width and height from a PNG's IHDR chunk: big-endian 32-bit integers at bytes 16-19 and 20-23 (PNG spec, ISO/IEC 15948, 11.2.2). */
function pngSize(bytes: Buffer): { width: number; height: number } {
  expect(bytes.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

test('the convergence figure downloads as SVG, PNG 1x, 2x and 4x and CSV that match what is drawn', async ({ page }) => {
  const errors = collectErrors(page);
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.goto('/');
  await expect(page.getByTestId('entropy-interval')).toContainText(/95% interval/, { timeout: 30_000 });
  const figure = page.getByTestId('convergence-figure');
  await expect(figure.locator('[data-mark="line"]')).not.toHaveCount(0);
  const toolbar = page.getByRole('toolbar', { name: /^Export: Convergence/ });
  await expect(toolbar).toBeVisible();
  await shoot(toolbar, 'export-toolbar');

  // Marks the page draws: markers on the lines (one per plotted point of mean, plug-in, conditional).
  const pageMarkers = await figure.locator('[data-mark="markers"] path').count();
  const pageLines = await figure.locator('[data-mark="line"]').count();

  const svg = await download(page, 'Download SVG');
  expect(svg.name).toMatch(/_convergence\.svg$/);
  const errorsXml: string[] = [];
  const doc = new DOMParser({ onError: (level, message) => errorsXml.push(`${level}: ${message}`) }).parseFromString(svg.bytes.toString('utf8'), 'image/svg+xml');
  expect(errorsXml).toEqual([]);
  const all = Array.from(doc.getElementsByTagName('*'));
  const byMark = (kind: string) => all.filter((e) => e.getAttribute('data-mark') === kind);
  expect(byMark('line').length).toBe(pageLines);
  expect(byMark('markers').reduce((s, g) => s + g.getElementsByTagName('path').length, 0)).toBe(pageMarkers);
  expect(svg.bytes.toString('utf8')).toContain('SHA-256: ');
  const width = Number(doc.documentElement?.getAttribute('width'));
  const height = Number(doc.documentElement?.getAttribute('height'));

  for (const scale of [1, 2, 4]) {
    const png = await download(page, `PNG ${scale}x`);
    // 1x keeps the plain name; larger scales say theirs.
    expect(png.name).toMatch(new RegExp(`_convergence${scale === 1 ? '' : `\\.${scale}x`}\\.png$`));
    expect(pngSize(png.bytes)).toEqual({ width: scale * width, height: scale * height });
  }

  const csv = await download(page, 'Download CSV');
  expect(csv.name).toMatch(/_convergence\.csv$/);
  const records = csv.bytes
    .toString('utf8')
    .split('\r\n')
    .filter((l) => l !== '' && !l.startsWith('#'));
  expect(records[0]).toMatch(/^mark,series,label,x,x_end,y \[(nat|bit)\/symbol\]/);
  // The line series with markers (mean, plug-in, conditional) have one CSV row per drawn marker.
  const markerRows = records.filter((r) => /^line,(mean|plugin|conditional),/.test(r)).length;
  expect(markerRows).toBe(pageMarkers);
  expect(errors).toEqual([]);
});
