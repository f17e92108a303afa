// Lint config (run as `eslint -c tests/eslint.config.js .`; the repository's top level is fixed).
// Beyond typescript-eslint's recommended rules it enforces the dependency direction:
// shared/ imports nothing of the app; server/ and src/ never import each other.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import importX from 'eslint-plugin-import-x';
import globals from 'globals';

export default tseslint.config(
  { ignores: ['node_modules/**', 'dist/**', 'data/**', 'test-output/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx,js}'],
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    plugins: { 'import-x': importX },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            { target: './shared', from: ['./src', './server', './db', './tests'], message: 'shared/ is the isomorphic engine: it imports nothing of the app.' },
            { target: './server', from: './src', message: 'server/ never imports the client.' },
            { target: './src', from: ['./server', './db'], message: 'src/ never imports the server.' },
          ],
        },
      ],
    },
  },
  {
    // The engine runs in the browser and in Node: no Node built-ins, DOM globals or PDFKit.
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['node:*', 'fs', 'path', 'os', 'child_process', 'crypto'], message: 'shared/ must not import Node built-ins.' },
            { group: ['react', 'react-dom', 'pdfkit', 'svgdom', 'express', 'knex'], message: 'shared/ stays free of UI, PDF, DOM and server packages.' },
          ],
        },
      ],
    },
  },
);
