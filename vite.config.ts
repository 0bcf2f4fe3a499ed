import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

const ISOLATION_HEADERS = {
  'Cross-Origin-Opener-Policy': 'same-origin',
  'Cross-Origin-Embedder-Policy': 'require-corp',
};

// One config for the workbench (vite) and the unit/validation tests (vitest).
export default defineConfig({
  plugins: [react()],
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
  },
});
