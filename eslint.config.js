import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import globals from 'globals';

export default tseslint.config(
  { ignores: ['dist', 'node_modules', 'test-results', 'coverage'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    // The numerical core must run unchanged in the browser, the worker, Node and the tests.
    files: ['src/model/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: ['react', 'react-dom', 'node:*', 'fs', 'path', 'zustand', 'd3*', '../io/*', '../ui/*', '../cli/*', '../worker/*'] }],
      'no-restricted-globals': ['error', 'window', 'document', 'self', 'postMessage', 'process', 'navigator', 'localStorage'],
    },
  },
);
