#!/usr/bin/env node
// Installed command. Runs the prebuilt bundle (dist-cli/, made by scripts/build-cli.mjs on `npm ci`)
// when it is newer than every source file, and otherwise the TypeScript sources through tsx, so an
// edited checkout never runs stale code.
import { existsSync, readdirSync, statSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';

const root = fileURLToPath(new URL('..', import.meta.url));
const bundle = join(root, 'dist-cli', 'returnrate.mjs');

function newestSource(dir) {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    newest = Math.max(newest, entry.isDirectory() ? newestSource(path) : statSync(path).mtimeMs);
  }
  return newest;
}

if (existsSync(bundle) && statSync(bundle).mtimeMs >= newestSource(join(root, 'src'))) {
  await import(new URL('../dist-cli/returnrate.mjs', import.meta.url).href);
} else {
  const { register } = await import('tsx/esm/api');
  register();
  await import(new URL('../src/cli/main.ts', import.meta.url).href);
}
