import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import type { Locator } from '@playwright/test';
import { twoStateChainText } from './sequenceFiles';
import { collectErrors, shoot } from './pageWatch';


/** A figure has marks of the given kinds, both axis titles, tick labels and a legend with at least two entries. */
async function expectFigure(figure: Locator, xTitle: string | RegExp, yTitle: string | RegExp, marks: readonly string[]): Promise<void> {
  await expect(figure).toBeVisible();
  await expect(figure.getByTestId('x-axis-title')).toHaveText(xTitle);
  await expect(figure.getByTestId('y-axis-title')).toHaveText(yTitle);
  expect(await figure.locator('.axis text').count()).toBeGreaterThan(5);
  for (const mark of marks) await expect(figure.locator(`[data-mark="${mark}"]`)).not.toHaveCount(0);
  const legend = figure.getByRole('list', { name: /^Legend/ });
  expect(await legend.getByRole('listitem').count()).toBeGreaterThanOrEqual(2);
}

test('the fluctuation and return-law views draw their figures and follow the block-length sliders', async ({ page }) => {
  const errors = collectErrors(page);
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.goto('/');
  await expect(page.getByTestId('entropy-interval')).toContainText(/95% interval/, { timeout: 60_000 });

  const section = page.locator('section[aria-labelledby="fluctuation-heading"]');
  const quantile = section.getByTestId('fluctuation-qq-figure');
  const histogram = section.getByTestId('fluctuation-histogram-figure');
  await expectFigure(quantile, 'N(0,1) quantile', '(log R_n − n ĥ) / (σ̂ √n)', ['points', 'band', 'line']);
  await expectFigure(histogram, '(log R_n − n ĥ) / (σ̂ √n)', 'Count', ['band', 'line']);
  await expect(quantile.getByRole('list', { name: /^Legend/ })).toContainText('Pointwise 95% band');
  await expect(histogram.getByRole('list', { name: /^Legend/ })).toContainText('N(0,1) on the count scale');
  await expect(section.getByTestId('fluctuation-ks')).toHaveText(/^\d\.\d+(e[−-]\d+)? \(p (= [\d.e-]+|< 1e-4)\)$/);
  await expect(section.getByTestId('fluctuation-ad')).toHaveText(/\(p (= [\d.e-]+|< 1e-4)\)$/);
  await expect(section).toContainText('only indicative');
  await shoot(section, 'fluctuations-gaussian');

  // The slider is a named, keyboard-operable control: one step down changes n, the title and the statistics.
  const slider = section.getByRole('slider', { name: 'Block length n for the fluctuations' });
  const before = Number(await slider.inputValue());
  const ksBefore = await section.getByTestId('fluctuation-ks').textContent();
  await slider.focus();
  await slider.press(before > 1 ? 'ArrowLeft' : 'ArrowRight');
  const after = before > 1 ? before - 1 : before + 1;
  await expect(slider).toHaveValue(String(after));
  await expect(quantile.locator('svg title')).toHaveText(`Q-Q plot against N(0,1) at n = ${after}`);
  await expect(section.getByTestId('fluctuation-ks')).not.toHaveText(ksBefore ?? '');

  // A gap thins the positions; a bad gap gets a message beside its field.
  const gap = section.getByRole('textbox', { name: /^Gap between kept positions/ });
  await gap.fill('5000');
  await expect(section.getByTestId('fluctuation-counts')).toHaveText(/^\d+ \/ \d+ \/ [1-9]\d*$/);
  await gap.fill('0');
  await expect(section.getByRole('alert')).toContainText('The gap must be from 1');
  await expect(gap).toHaveAttribute('aria-invalid', 'true');
  await shoot(section.locator('.statistics-controls'), 'fluctuations-bad-gap');
  await gap.fill('1');
  await expect(section.getByTestId('fluctuation-counts')).toHaveText(/ \/ 0$/);

  const lawSection = page.locator('section[aria-labelledby="return-law-heading"]');
  const law = lawSection.getByTestId('return-law-figure');
  await expectFigure(law, 's', 'P(t > s) (log scale)', ['band', 'line']);
  await expect(law.getByRole('list', { name: /^Legend/ })).toContainText('Exp(1): e^(−s)');
  await expect(lawSection.getByTestId('return-law-figure-statistics')).toContainText('−γ = −0.5772');
  await expect(lawSection).toContainText('only indicative');
  const lawSlider = lawSection.getByRole('slider', { name: 'Block length n for the return law' });
  const lawN = Number(await lawSlider.inputValue());
  await lawSlider.focus();
  await lawSlider.press('ArrowRight');
  await expect(law.locator('svg title')).toHaveText(`Return law at n = ${lawN + 1}`);
  await shoot(lawSection, 'fluctuations-return-law');

  // The chosen n survive a reload.
  await page.reload();
  await expect(page.getByRole('slider', { name: 'Block length n for the fluctuations' })).toHaveValue(String(after));
  await expect(page.getByRole('slider', { name: 'Block length n for the return law' })).toHaveValue(String(lawN + 1));
  expect(errors).toEqual([]);
});

test('for a fair coin (σ² = 0) the fluctuation view says so and shows the return law instead', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/');
  await expect(page.getByTestId('entropy-interval')).toContainText(/95% interval/, { timeout: 60_000 });
  // Stay probability 1/2 in both states: independent fair coin flips, whose information per symbol never varies.
  const file = join(mkdtempSync(join(tmpdir(), 'returnrate-e2e-')), 'fair-coin.txt');
  writeFileSync(file, twoStateChainText(50_000, [0.5, 0.5], 3));
  await page.getByLabel('Choose a sequence file').setInputFiles(file);
  await expect(page.getByTestId('preview').getByRole('heading', { level: 2 })).toHaveText('Preview of fair-coin.txt');
  await page.getByRole('button', { name: 'Run', exact: true }).click();
  await expect(page.locator('.input-name')).toHaveText('fair-coin.txt', { timeout: 30_000 });
  await expect(page.getByTestId('run-status')).toHaveText('Idle', { timeout: 60_000 });
  const section = page.locator('section[aria-labelledby="fluctuation-heading"]');
  await expect(section.getByTestId('fluctuation-negligible')).toContainText('σ̂² is negligible');
  await expect(section.getByTestId('fluctuation-qq-figure')).toHaveCount(0);
  const law = section.getByTestId('fluctuation-return-law-figure');
  await expectFigure(law, 's', 'P(t > s) (log scale)', ['band', 'line']);
  await shoot(section, 'fluctuations-fair-coin');
  expect(errors).toEqual([]);
});
