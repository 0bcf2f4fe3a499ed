import { expect, test } from '@playwright/test';
import { collectErrors, shoot } from './pageWatch';

test('the default demo shows the mixing diagnostics: beta(k) with both fits, the ACF, the moments and the reading in words', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/');
  await expect(page.getByTestId('entropy-interval')).toContainText(/95% interval/, { timeout: 60_000 });

  const panel = page.getByTestId('diagnostics-panel');
  await panel.scrollIntoViewIfNeeded();
  await expect(panel.getByRole('heading', { name: 'Mixing diagnostics' })).toBeVisible();
  // The reading in plain words, with its verdict and the caveat that a sample cannot prove mixing.
  const reading = panel.getByTestId('mixing-reading');
  // The default demo is an eight-state Markov chain: exponential decay, short against the batches.
  await expect(reading).toContainText(/decays exponentially \(tau = \d+\.\d symbols\), far shorter than the \d+ batches of \d+ symbols/);
  await expect(reading).toContainText('the mixing the limit theorems assume looks plausible');
  await expect(reading).toHaveAttribute('data-verdict', 'fast');
  await expect(panel).toContainText('A finite sample cannot prove mixing');

  // beta(k) on log axes with its points, the noise floor and the fits (or a plain "no fit" row).
  const beta = panel.getByTestId('mixing-figure');
  await expect(beta).toBeVisible();
  await expect(beta.getByTestId('x-axis-title')).toHaveText(/Gap k/);
  await expect(beta.getByTestId('y-axis-title')).toHaveText(/β\(k\)/);
  await expect(beta.locator('[data-mark="points"]')).not.toHaveCount(0);
  await expect(beta.getByRole('list', { name: /^Legend/ })).toContainText('Noise floor');
  const fits = panel.getByTestId('decay-fits');
  await expect(fits).toContainText('Exponential C e^(−k/τ)');
  await expect(fits).toContainText('Power law C k^(−p)');

  // The ACF with its white-noise band, and the moments table.
  const acf = panel.getByTestId('acf-figure');
  await expect(acf).toBeVisible();
  await expect(acf.locator('[data-mark="band"]')).not.toHaveCount(0);
  await expect(panel.getByTestId('information-moments').locator('tbody tr')).toHaveCount(6);
  await expect(panel.getByRole('toolbar', { name: /Decay of dependence/ })).toBeVisible();
  await shoot(panel, 'diagnostics');
  expect(errors).toEqual([]);
});
