import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

// One config for the workbench (vite) and the unit/validation tests (vitest).
export default defineConfig({
  plugins: [react()],
  worker: { format: 'es' },
  build: { target: 'es2022', sourcemap: true },
  test: {
    include: ['test/**/*.test.ts', 'test/**/*.test.tsx'],
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 60_000,
    pool: 'threads',
  },
});
