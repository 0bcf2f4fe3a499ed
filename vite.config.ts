import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import type { Plugin } from 'vite';

/**
 * The built page may load and contact nothing but its own origin. Workers come from the page's
 * own files (blob: kept for worker bundles inlined by vite); PNG export draws an SVG blob: into an
 * <img>, so images allow blob: and data:. Styles allow inline because React and d3 set style
 * attributes and exported SVG carries a <style> element. Only in the production build: vite's dev
 * server injects inline scripts for hot reloading, which script-src 'self' would block.
 */
export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  "worker-src 'self' blob:",
  "connect-src 'self'",
  "img-src 'self' data: blob:",
  "style-src 'self' 'unsafe-inline'",
  "font-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
].join('; ');

function contentSecurityPolicy(): Plugin {
  return {
    name: 'returnrate-content-security-policy',
    apply: 'build',
    transformIndexHtml: () => [{ tag: 'meta', attrs: { 'http-equiv': 'Content-Security-Policy', content: CONTENT_SECURITY_POLICY }, injectTo: 'head-prepend' }],
  };
}

const ISOLATION_HEADERS = {
  'Cross-Origin-Opener-Policy': 'same-origin',
  'Cross-Origin-Embedder-Policy': 'require-corp',
};

// One config for the workbench (vite) and the unit/validation tests (vitest).
export default defineConfig({
  plugins: [react(), contentSecurityPolicy()],
  worker: { format: 'es' },
  // `npm start` prints the address and opens nothing: machines without a desktop browser must not fail.
  // COOP/COEP make the page cross-origin isolated, which SharedArrayBuffer needs: the analysis worker
  // then shares the scan among sub-workers (static hosting: send the same two headers, README).
  server: { open: false, headers: ISOLATION_HEADERS },
  preview: { headers: ISOLATION_HEADERS },
  build: { target: 'es2022', sourcemap: true },
  test: {
    include: ['test/**/*.test.ts', 'test/**/*.test.tsx'],
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 60_000,
    pool: 'threads',
    setupFiles: ['test/setup/fastCheckSeed.ts'],
  },
});
