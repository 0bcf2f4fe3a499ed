// Speed of the workbench in the browser, the user's path: the built page (`vite build`, served by
// `vite preview`, so the numbers are those of the page users get, not of the dev server's
// unbundled modules) in Debian's chromium through playwright. For each size a fair-coin file
// (cached like bench.ts's, same folder) is picked through the file input and Run is pressed; the
// page's own clock measures from the click to the moment the summary shows this file's name and
// estimate, and a PerformanceObserver for long tasks counts main-thread tasks over 50 ms in that
// window. Sizes default to 1e6, 1e7; BENCH_BROWSER_SIZES=1e6 limits them; BENCH_BROWSER=0 skips
// the whole part (`npm run bench` runs it after the command-line bench); BENCH_BROWSER_SIZES=1e8
// runs the largest size the page takes (not by default: about a minute and a 100 MB file). Requests
// to any other origin are blocked and listed. Peak memory: the highest resident size (VmHWM) of the
// page's renderer process, which holds the analysis worker and its sub-workers, read from /proc
// (the renderer's process id from the browser's SystemInfo.getProcessInfo).
import { readFileSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { basename, dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser } from '@playwright/test';
import { build, preview } from 'vite';
import { benchFile } from './benchFiles';

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const sizes = (process.env.BENCH_BROWSER_SIZES ?? '1e6,1e7').split(',').map(Number);
const SPEC = 'coin';

// Targets of the workbench issue: seconds from pressing Run to the estimate; main-thread tasks.
const TIME_TARGET: Record<number, number> = { 1e6: 2, 1e7: 10 };
const LONG_TASK_MS = 50;
// Long tasks are counted until this long after the estimate shows: the figures of the new result are
// drawn just after it, and long-task entries reach the observer a little after their task ends.
const SETTLE_MS = 1000;
// BENCH_BROWSER_PROFILE=1: a CPU profile of the main thread from the click to the estimate, its
// heaviest functions (self time) printed, to find what blocks the page.
const PROFILE = process.env.BENCH_BROWSER_PROFILE === '1';

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
}
interface Profile {
  nodes: ProfileNode[];
  samples: number[];
  timeDeltas: number[];
}

function heaviest(profile: Profile, count: number): string[] {
  const byId = new Map(profile.nodes.map((n) => [n.id, n]));
  const self = new Map<string, number>();
  profile.samples.forEach((id, i) => {
    const f = byId.get(id)?.callFrame;
    if (f === undefined || f.functionName === '(idle)' || f.functionName === '(program)') return;
    const key = `${f.functionName || '(anonymous)'} ${f.url.split('/').pop() ?? ''}:${f.lineNumber + 1}`;
    self.set(key, (self.get(key) ?? 0) + (profile.timeDeltas[i] ?? 0) / 1000);
  });
  return [...self.entries()]
    .sort((a, b) => b[1] - a[1])
    .slice(0, count)
    .map(([k, ms]) => `${ms.toFixed(0).padStart(6)} ms  ${k}`);
}

function freePort(): Promise<number> {
  return new Promise((done, fail) => {
    const s = createServer();
    s.once('error', fail);
    s.listen(0, '127.0.0.1', () => {
      const address = s.address();
      const port = typeof address === 'object' && address !== null ? address.port : 0;
      s.close(() => done(port));
    });
  });
}

/**
 * Runs in the page before its own scripts: records every long task from the start (buffered),
 * the time of the click on Run (capture phase, before React's handler), and the first moment the
 * summary shows the awaited file's name with an estimate and the run badge says Idle. Plain
 * JavaScript text, because tsx's compiled functions call a helper that does not exist in the page.
 */
const PROBES = `
(() => {
  const probe = { longTasks: [], clickAt: null, doneAt: null, awaited: null };
  globalThis.__bench = probe;
  new PerformanceObserver((list) => {
    for (const e of list.getEntries()) probe.longTasks.push({ start: e.startTime, duration: e.duration, name: e.name });
  }).observe({ type: 'longtask', buffered: true });
  const check = () => {
    if (probe.clickAt === null || probe.doneAt !== null || probe.awaited === null) return;
    const name = document.querySelector('.input-name')?.textContent;
    const estimate = document.querySelector('[data-testid="entropy-estimate"]')?.textContent ?? '';
    const status = document.querySelector('[data-testid="run-status"]')?.textContent;
    if (name === probe.awaited && /\\d/.test(estimate) && status === 'Idle') probe.doneAt = performance.now();
  };
  document.addEventListener('click', (event) => {
    const button = event.target instanceof Element ? event.target.closest('button') : null;
    if (button?.textContent?.trim() === 'Run' && probe.awaited !== null && probe.clickAt === null) probe.clickAt = performance.now();
  }, true);
  document.addEventListener('DOMContentLoaded', () => {
    new MutationObserver(check).observe(document.body, { subtree: true, childList: true, characterData: true, attributes: true });
  });
})();
`;

/** The highest resident size of the browser's renderer processes so far (bytes; 0 if unreadable). */
async function rendererPeakBytes(browser: Browser): Promise<number> {
  const session = await browser.newBrowserCDPSession();
  try {
    const { processInfo } = (await session.send('SystemInfo.getProcessInfo')) as { processInfo: { type: string; id: number }[] };
    let peak = 0;
    for (const p of processInfo.filter((q) => q.type === 'renderer')) {
      try {
        const hwm = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${p.id}/status`, 'utf8'));
        if (hwm !== null) peak = Math.max(peak, Number(hwm[1]) * 1024);
      } catch {
        // the process ended meanwhile
      }
    }
    return peak;
  } finally {
    await session.detach();
  }
}

/** The page's document as the predicates below read it (the scripts compile without the DOM types). */
interface PageDocument {
  querySelector(selector: string): { textContent: string | null } | null;
}

interface LongTask {
  start: number;
  duration: number;
  name: string;
}

async function main(): Promise<void> {
  const files = await Promise.all(sizes.map((N) => benchFile(SPEC, N)));

  process.stdout.write('  building the page (vite build) ...\n');
  // Profiling wants readable function names: the profiled build is not minified.
  await build({ root: ROOT, logLevel: 'warn', ...(PROFILE ? { build: { minify: false } } : {}) });
  const port = await freePort();
  const server = await preview({ root: ROOT, logLevel: 'warn', preview: { host: '127.0.0.1', port, strictPort: true, open: false } });
  const origin = `http://127.0.0.1:${port}`;

  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
  });
  const blocked: string[] = [];
  const rows: string[][] = [];
  try {
    for (const [i, N] of sizes.entries()) {
      const file = files[i]!;
      const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
      await context.route('**/*', (route) => {
        const url = route.request().url();
        if (url.startsWith(`${origin}/`) || url.startsWith('data:') || url.startsWith('blob:')) return route.continue();
        blocked.push(url);
        return route.abort('blockedbyclient');
      });
      const page = await context.newPage();
      const errors: string[] = [];
      page.on('pageerror', (e) => errors.push(e.message));
      await page.addInitScript({ content: PROBES });
      await page.goto(`${origin}/`);
      // The first visit runs the default demo; wait for it so its result is not mistaken for ours.
      // Predicates are functions, not strings: the page's content security policy forbids eval.
      await page.waitForFunction(() => {
        const d = (globalThis as unknown as { document: PageDocument }).document;
        return d.querySelector('[data-testid="run-status"]')?.textContent === 'Idle' && d.querySelector('.input-name') !== null;
      }, null, {
        timeout: 60_000,
      });
      const name = basename(file);
      await page.getByLabel('Choose a sequence file').setInputFiles(file);
      await page.getByTestId('preview').getByText(`Preview of ${name}`).waitFor();
      await page.evaluate((n) => {
        (globalThis as unknown as { __bench: { awaited: string } }).__bench.awaited = n;
      }, name);
      const cdp = PROFILE ? await context.newCDPSession(page) : null;
      if (cdp !== null) {
        await cdp.send('Profiler.enable');
        await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
        await cdp.send('Profiler.start');
      }
      await page.getByRole('button', { name: 'Run', exact: true }).click();
      try {
        await page.waitForFunction(() => (globalThis as unknown as { __bench: { doneAt: number | null } }).__bench.doneAt !== null, null, {
          timeout: Number(process.env.BENCH_BROWSER_TIMEOUT_MS ?? 180_000),
          polling: 200,
        });
      } catch (error) {
        const state: unknown = await page.evaluate(() => {
          const d = (globalThis as unknown as { document: PageDocument }).document;
          return {
            probe: (globalThis as unknown as { __bench: unknown }).__bench,
            name: d.querySelector('.input-name')?.textContent,
            status: d.querySelector('[role="status"]')?.textContent,
          };
        });
        throw new Error(`no estimate for ${name} (${JSON.stringify(state).slice(0, 2000)})`, { cause: error });
      }
      await page.waitForFunction((settle) => performance.now() > (globalThis as unknown as { __bench: { doneAt: number } }).__bench.doneAt + settle, SETTLE_MS, { polling: 100 });
      if (cdp !== null) {
        const { profile } = (await cdp.send('Profiler.stop')) as unknown as { profile: Profile };
        if (process.env.BENCH_BROWSER_PROFILE_FILE !== undefined) writeFileSync(`${process.env.BENCH_BROWSER_PROFILE_FILE}-${N}.cpuprofile`, JSON.stringify(profile));
        process.stdout.write(`    main thread, heaviest functions (self time), ${N}:\n${heaviest(profile, 25).map((l) => `      ${l}`).join('\n')}\n`);
      }
      const probe = await page.evaluate(() => (globalThis as unknown as { __bench: { clickAt: number; doneAt: number; longTasks: LongTask[] } }).__bench);
      const peakMb = (await rendererPeakBytes(browser)) / 1e6;
      const seconds = (probe.doneAt - probe.clickAt) / 1000;
      const during = probe.longTasks.filter((t) => t.start + t.duration >= probe.clickAt && t.start <= probe.doneAt + SETTLE_MS);
      const over = during.filter((t) => t.duration > LONG_TASK_MS);
      const longest = Math.max(0, ...during.map((t) => t.duration));
      const target = TIME_TARGET[N];
      const verdict = [
        target === undefined ? '' : seconds <= target ? `time <= ${target} s ok` : `time > ${target} s MISSED`,
        over.length === 0 ? 'no long task ok' : 'long tasks MISSED',
        errors.length > 0 ? `page errors: ${errors.join('; ')}` : '',
      ]
        .filter(Boolean)
        .join(', ');
      rows.push([N.toExponential(0), seconds.toFixed(2), target === undefined ? '' : `${target}`, String(over.length), longest.toFixed(0), peakMb.toFixed(0), verdict]);
      process.stdout.write(`  ${rows[rows.length - 1]!.join(' | ')}\n`);
      if (process.env.BENCH_BROWSER_VERBOSE === '1') for (const t of over) process.stdout.write(`    long task at +${(t.start - probe.clickAt).toFixed(0)} ms: ${t.duration.toFixed(0)} ms\n`);
      await context.close();
    }
  } finally {
    await browser.close();
    await new Promise<void>((done) => server.httpServer.close(() => done()));
  }

  const header = ['N', 'seconds to estimate', 'target s', `long tasks > ${LONG_TASK_MS} ms`, 'longest task ms', 'renderer peak MB', 'verdict'];
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? '').length)));
  console.log(`\nworkbench in chromium (built page, vite preview), fair-coin file picked and run, from the click on Run to the estimate shown; long tasks until ${SETTLE_MS / 1000} s after it`);
  for (const r of [header, ...rows]) console.log(r.map((cell, i) => (cell ?? '').padEnd(widths[i]!)).join('  '));
  console.log(`requests to other origins: ${blocked.length === 0 ? 'none' : `${blocked.length} blocked (${[...new Set(blocked)].join(', ')})`}`);
  const missed = rows.filter((r) => r[6]!.includes('MISSED')).length;
  console.log(missed === 0 ? 'browser bench: every target met' : `browser bench: ${missed} of ${rows.length} sizes missed a target`);
}

if (process.env.BENCH_BROWSER === '0') console.log('\nbrowser bench skipped (BENCH_BROWSER=0)');
else await main();
