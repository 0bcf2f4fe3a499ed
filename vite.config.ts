import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

// One config for the workbench (vite) and the unit/validation tests (vitest).
export default defineConfig({
  plugins: [react()],
  worker: { format: 'es' },
  // `npm start` prints the address and opens nothing: machines without a desktop browser must not fail.
  server: { open: false },
  build: { target: 'es2022', sourcemap: true },
  test: {
    include: ['test/**/*.test.ts', 'test/**/*.test.tsx'],
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 60_000,
    pool: 'threads',
  },
});
