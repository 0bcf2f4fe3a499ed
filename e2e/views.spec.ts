import { expect, test } from '@playwright/test';
import type { Locator } from '@playwright/test';
import { collectErrors, shoot } from './pageWatch';


/** A figure has plotted marks, both axis titles with their unit, tick labels and a legend. */
async function expectFigure(figure: Locator, yTitle: RegExp): Promise<void> {
  await expect(figure).toBeVisible();
  await expect(figure.getByTestId('x-axis-title')).toHaveText('Block length n');
  await expect(figure.getByTestId('y-axis-title')).toHaveText(yTitle);
  expect(await figure.locator('.axis text').count()).toBeGreaterThan(6);
  expect(await figure.locator('[data-mark]').count()).toBeGreaterThan(0);
  const legend = figure.getByRole('list', { name: /^Legend/ });
  expect(await legend.getByRole('listitem').count()).toBeGreaterThanOrEqual(2);
}

/** The read-out answers the keyboard: focus the plot, press End, and the last n is shown. */
async function expectKeyboardReadout(figure: Locator): Promise<void> {
  const plot = figure.getByRole('group');
  await plot.focus();
  await plot.press('Home');
  await expect(figure.getByTestId('readout-n')).toHaveText('1');
  await plot.press('ArrowRight');
  await expect(figure.getByTestId('readout-n')).toHaveText('2');
}

test('the three figures show marks, labelled axes with units, a legend and a keyboard read-out', async ({ page }) => {
  const errors = collectErrors(page);
  await page.setViewportSize({ width: 1280, height: 720 });
  await page.goto('/');
  await expect(page.getByTestId('entropy-interval')).toContainText(/95% interval/, { timeout: 30_000 });

  const convergence = page.getByTestId('convergence-figure');
  await expectFigure(convergence, /^log R_n \/ n \((nat|bit)\/symbol\)$/);
  // The sampled paths are drawn, to SVG or (past a few thousand segments) to a canvas; the figures
  // take the result a task after the summary, so poll.
  const drawnPaths = async () => (await convergence.getByTestId('paths-canvas').count()) + (await convergence.locator('[data-mark="paths"] path').count());
  await expect.poll(drawnPaths).toBeGreaterThan(0);
  await expect(convergence.locator('[data-mark="line"]')).not.toHaveCount(0);
  await expect(convergence.getByRole('list', { name: /^Legend/ })).toContainText('Exact h');
  await expectKeyboardReadout(convergence);
  await shoot(page.locator('section[aria-labelledby="convergence-heading"]'), 'views-convergence');

  const envelope = page.getByTestId('envelope-figure');
  await expectFigure(envelope, /^log R_n − n ĥ \((nat|bit)\)$/);
  await expect(envelope.getByRole('list', { name: /^Legend/ })).toContainText('log log n');
  await expect(page.getByTestId('envelope-table').locator('tbody tr')).not.toHaveCount(0);
  await expectKeyboardReadout(envelope);
  await shoot(page.locator('section[aria-labelledby="envelope-heading"]'), 'views-envelopes');

  // A bad δ gets a message next to its field; a good one clears it.
  const delta = page.getByRole('textbox', { name: /^δ/ });
  await delta.fill('0.9');
  await expect(page.getByRole('alert').filter({ hasText: 'δ must be a number from 0 to 0.5' })).toBeVisible();
  await expect(delta).toHaveAttribute('aria-invalid', 'true');
  await shoot(page.locator('.envelope-controls'), 'views-envelope-bad-delta');
  await delta.fill('0.25');
  await expect(delta).toHaveAttribute('aria-invalid', 'false');
  await expect(envelope.getByRole('list', { name: /^Legend/ })).toContainText('n^(1/2 − 0.25)');

  const variance = page.getByTestId('variance-figure');
  await expectFigure(variance, /^Var\(log R_n\) \((nat|bit)²\)$/);
  await expect(variance.locator('[data-mark="points"] path')).not.toHaveCount(0);
  await expectKeyboardReadout(variance);
  await shoot(page.locator('section[aria-labelledby="variance-heading"]'), 'views-variance');

  // The view options survive a reload.
  await page.reload();
  await expect(page.getByRole('textbox', { name: /^δ/ })).toHaveValue('0.25');

  // And on a large screen the figures grow with the page.
  await page.setViewportSize({ width: 1920, height: 1080 });
  await expect(page.getByTestId('convergence-figure')).toBeVisible();
  await shoot(page.locator('section[aria-labelledby="convergence-heading"]'), 'views-convergence-1920');
  expect(errors).toEqual([]);
});
