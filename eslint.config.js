import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

const layer = (names) => names.flatMap((n) => [`**/${n}/**`, `**/${n}`]);

export default tseslint.config(
  { ignores: ['dist/**', 'dist-cli/**', '.tsbuild/**', 'node_modules/**', 'test-results/**', 'playwright-report/**', 'coverage/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx}'],
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'no-eval': 'error',
      'no-new-func': 'error',
      'no-implied-eval': 'error',
    },
  },
  {
    // The numeric core runs in Node, workers and tests: it may not reach into any host layer.
    files: ['src/core/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: layer(['ui', 'store', 'workers', 'export', 'cli']), message: 'src/core imports nothing from host layers.' },
            { group: ['node:*', 'fs', 'path', 'os', 'worker_threads', 'react', 'react-dom', 'd3-selection'], message: 'src/core is host-free: no Node built-ins, React or DOM.' },
            { group: ['**/core/index', '../index', './index'], message: 'Inside core, import concrete files, not the barrel.' },
          ],
        },
      ],
    },
  },
  {
    // Figure models are pure (no DOM): the workbench draws them and the command line writes them as SVG.
    files: ['src/figures/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: layer(['ui', 'store', 'workers', 'export', 'cli']), message: 'src/figures imports only the core and pure d3 modules.' },
            { group: ['node:*', 'fs', 'path', 'os', 'worker_threads', 'react', 'react-dom', 'd3', 'd3-selection', 'd3-axis', 'd3-transition', 'd3-zoom', 'd3-brush', 'd3-drag'], message: 'src/figures is host-free: no Node built-ins, React, DOM or DOM-touching d3 modules.' },
          ],
        },
      ],
    },
  },
  {
    files: ['src/ui/**/*.{ts,tsx}', 'src/export/**/*.ts', 'src/main.tsx'],
    plugins: { 'react-hooks': reactHooks },
    languageOptions: { globals: globals.browser },
    rules: {
      ...reactHooks.configs.recommended.rules,
      'no-restricted-imports': ['error', { patterns: [{ group: layer(['cli']), message: 'The browser does not import the command line.' }] }],
    },
  },
  {
    files: ['workers/**/*.ts'],
    languageOptions: { globals: globals.worker },
  },
  {
    files: ['src/cli/**/*.ts', 'scripts/**/*.{ts,mjs,js}', 'bench/**/*.ts', 'test/**/*.ts', 'e2e/**/*.ts', 'bin/**/*.mjs', '*.js', '*.ts'],
    languageOptions: { globals: globals.node },
  },
);
