// The one test command (`npm test`): type check, lint with zero warnings, unit and validation tests,
// then the browser tests. Every suite runs even when an earlier one fails; the last line printed is
// "N passed, N failed" over all of them (type check and lint count as one check each).
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';

const reports = '.ci-reports';
mkdirSync(reports, { recursive: true });
const vitestJson = `${reports}/vitest.json`;
const playwrightJson = `${reports}/playwright.json`;
rmSync(vitestJson, { force: true });
rmSync(playwrightJson, { force: true });

function run(label, command, args, env = {}) {
  console.log(`\n=== ${label}: ${command} ${args.join(' ')}`);
  const result = spawnSync(command, args, { stdio: 'inherit', env: { ...process.env, ...env } });
  return result.status === 0;
}

function readJson(path) {
  try {
    return existsSync(path) ? JSON.parse(readFileSync(path, 'utf8')) : null;
  } catch {
    return null;
  }
}

const rows = [];
const check = (label, ok) => rows.push({ label, passed: ok ? 1 : 0, failed: ok ? 0 : 1, skipped: 0 });

check('type check', run('type check', 'npx', ['tsc', '-b']));
check('lint', run('lint', 'npx', ['eslint', '.', '--max-warnings', '0']));

const vitestOk = run('unit and validation tests', 'npx', ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile=${vitestJson}`]);
const v = readJson(vitestJson);
if (v) {
  rows.push({ label: 'vitest', passed: v.numPassedTests, failed: v.numFailedTests + (vitestOk || v.numFailedTests > 0 ? 0 : 1), skipped: v.numPendingTests + v.numTodoTests });
} else {
  check('vitest (no report)', false);
}

const e2eOk = run('browser tests', 'npx', ['playwright', 'test', '-c', 'e2e/playwright.config.ts']);
const p = readJson(playwrightJson);
if (p && p.stats) {
  const failed = p.stats.unexpected + (e2eOk || p.stats.unexpected > 0 ? 0 : 1);
  rows.push({ label: 'playwright', passed: p.stats.expected + p.stats.flaky, failed, skipped: p.stats.skipped });
} else {
  check('playwright (no report)', false);
}

console.log('\n=== summary');
for (const r of rows) console.log(`${r.label.padEnd(28)} ${r.passed} passed, ${r.failed} failed${r.skipped ? `, ${r.skipped} skipped` : ''}`);
const passed = rows.reduce((s, r) => s + r.passed, 0);
const failed = rows.reduce((s, r) => s + r.failed, 0);
const skipped = rows.reduce((s, r) => s + r.skipped, 0);
const line = `${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`;
writeFileSync(`${reports}/summary.txt`, `${line}\n`);
console.log(line);
process.exit(failed === 0 ? 0 : 1);
