import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, test } from '@playwright/test';
import type { Download } from '@playwright/test';
import { build, preview } from 'vite';
import type { PreviewServer } from 'vite';
import { ROOT, collectErrors } from './pageWatch';

// The page users get: `vite build` served by `vite preview` (the dev server injects inline scripts
// for hot reloading, so the content security policy is only in the build). It must carry a policy
// that allows its own origin only, still run the analysis worker and the PNG export under it, make
// no request elsewhere, and hold no eval or Function constructor in its code.

let outDir = '';
let server: PreviewServer | null = null;
let origin = '';

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const address = s.address();
      const port = typeof address === 'object' && address !== null ? address.port : 0;
      s.close(() => resolve(port));
    });
  });
}

test.beforeAll(async () => {
  test.setTimeout(240_000);
  outDir = mkdtempSync(join(tmpdir(), 'returnrate-built-'));
  await build({ root: ROOT, logLevel: 'error', build: { outDir, emptyOutDir: true } });
  const port = await freePort();
  server = await preview({ root: ROOT, logLevel: 'error', build: { outDir }, preview: { host: '127.0.0.1', port, strictPort: true, open: false } });
  origin = `http://127.0.0.1:${port}`;
});

test.afterAll(async () => {
  await server?.close();
  if (outDir !== '') rmSync(outDir, { recursive: true, force: true });
});

test('the built page carries a same-origin content security policy, runs its worker and PNG export under it, and blocks a request elsewhere', async ({ page, context }) => {
  const errors = collectErrors(page);
  const foreign: string[] = [];
  context.on('request', (request) => {
    const url = new URL(request.url());
    if (url.protocol !== 'data:' && url.protocol !== 'blob:' && url.origin !== origin) foreign.push(request.url());
  });
  await page.goto(`${origin}/`);
  const policy = await page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content');
  expect(policy).not.toBeNull();
  const directives = new Map((policy ?? '').split(';').map((d) => d.trim().split(/\s+/)).map(([name, ...sources]) => [name!, sources]));
  expect(directives.get('default-src')).toEqual(["'self'"]);
  expect(directives.get('script-src')).toEqual(["'self'"]);
  expect(directives.get('connect-src')).toEqual(["'self'"]);
  expect(directives.get('object-src')).toEqual(["'none'"]);
  // No host other than the page's own in any directive.
  expect([...directives.values()].flat().filter((s) => /^(https?:|\*|wss?:)/.test(s))).toEqual([]);

  // The analysis worker runs under the policy: the first-visit demo reaches its estimate.
  await expect(page.getByTestId('entropy-interval')).toContainText(/interval: \d+\.\d+ to \d+\.\d+/, { timeout: 60_000 });
  await expect(page.getByTestId('run-status')).toHaveText('Idle');

  // PNG export draws an SVG blob: into an image: still allowed.
  const toolbar = page.getByRole('toolbar', { name: /^Export: Convergence/ });
  const [png] = (await Promise.all([page.waitForEvent('download'), toolbar.getByRole('button', { name: 'PNG 1x', exact: true }).click()])) as [Download, void];
  const bytes = readFileSync((await png.path()) ?? '');
  // PNG signature (PNG spec, ISO/IEC 15948, 5.2)
  expect(Array.from(bytes.subarray(0, 8))).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

  // A request to another origin is refused by the policy (connect-src), not merely by the offline browser.
  const outcome = await page.evaluate(async () => {
    const violations: string[] = [];
    document.addEventListener('securitypolicyviolation', (e) => violations.push(`${e.effectiveDirective} ${e.blockedURI}`));
    let fetched = 'resolved';
    try {
      await fetch('https://example.org/collect');
    } catch (e) {
      fetched = `rejected: ${String(e)}`;
    }
    await new Promise((r) => setTimeout(r, 100));
    return { fetched, violations };
  });
  expect(outcome.fetched).toMatch(/^rejected/);
  expect(outcome.violations).toEqual(['connect-src https://example.org/collect']);
  expect(foreign).toEqual([]);
  // The one console error allowed is the policy's report of the blocked fetch made above.
  expect(errors.filter((e) => !e.includes('example.org'))).toEqual([]);
});

test('the built code holds no eval and no Function constructor', () => {
  const assets = join(outDir, 'assets');
  const scripts = readdirSync(assets).filter((f) => f.endsWith('.js'));
  expect(scripts.length).toBeGreaterThanOrEqual(2); // the page and the analysis worker
  for (const file of scripts) {
    const code = readFileSync(join(assets, file), 'utf8');
    expect(code, file).not.toMatch(/\beval\s*\(/);
    expect(code, file).not.toMatch(/new\s+Function\s*\(/);
    expect(code, file).not.toMatch(/\bFunction\s*\(\s*["'`]/);
  }
});
