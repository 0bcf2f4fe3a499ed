#!/usr/bin/env node
// Installed command: runs the TypeScript command line through tsx's loader.
import { register } from 'tsx/esm/api';

register();
const entry = new URL('../src/cli/main.ts', import.meta.url);
await import(entry.href);
