import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import globals from 'globals';
import reactHooks from 'eslint-plugin-react-hooks';

// ---------------------------------------------------------------------------------------------
// The layering: each folder of src/ -> the other src/ folders it may import from. Anything not
// listed is refused by lint (no-restricted-imports, built from this table below). When a folder
// is added or split (src/io into several), add a row for it and name it in its importers' rows.
// Top-level files (src/version.ts, src/main.tsx) and npm packages are not covered by the table;
// packages a folder must not use are in LAYER_PACKAGES.
// ---------------------------------------------------------------------------------------------
const LAYERS = {
  model: [], //                                         pure numerics: runs everywhere
  io: ['model'], //                                     formats, validation, file contents
  chart: ['model'], //                                  chart geometry and labels as plain data
  figures: ['model', 'io', 'chart'], //                 report figures as SVG text
  worker: ['model', 'io'], //                           web workers and their main-thread clients
  cli: ['model', 'io', 'chart', 'figures'], //          the Node command line (no browser code)
  state: ['model', 'io', 'worker'], //                  zustand stores; wire the worker clients
  pwa: [], //                                           service worker registration
  ui: ['model', 'io', 'chart', 'figures', 'worker', 'state', 'pwa'], // React components
};
// npm packages (and Node built-ins) a folder must not import.
const NO_UI_OR_NODE = ['react', 'react-dom', 'react/*', 'react-dom/*', 'zustand', 'zustand/*', 'node:*', 'fs', 'path'];
const LAYER_PACKAGES = {
  model: [...NO_UI_OR_NODE, 'd3', 'd3-*'],
  chart: NO_UI_OR_NODE,
  figures: NO_UI_OR_NODE,
  worker: ['react', 'react-dom', 'react/*', 'react-dom/*', 'zustand', 'zustand/*'],
};

/** A relative import that climbs out of the folder into one of `folders` (src/<folder>/...). */
const intoFolders = (folders) => `^(\\.\\./)+(${folders.join('|')})(/|$)`;

const layerRules = Object.entries(LAYERS).map(([folder, allowed]) => {
  const refused = Object.keys(LAYERS).filter((other) => other !== folder && !allowed.includes(other));
  const packages = LAYER_PACKAGES[folder] ?? [];
  return {
    files: [`src/${folder}/**/*.{ts,tsx}`],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            ...(refused.length
              ? [{ regex: intoFolders(refused), message: `src/${folder} may import only from ${allowed.length ? allowed.map((f) => `src/${f}`).join(', ') : 'itself'} (see LAYERS in eslint.config.js).` }]
              : []),
            ...(packages.length ? [{ group: packages, message: `src/${folder} does not use this package (see LAYER_PACKAGES in eslint.config.js).` }] : []),
          ],
        },
      ],
    },
  };
});

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
  ...layerRules,
  {
    // The numerical core must run unchanged in the browser, the worker, Node and the tests.
    files: ['src/model/**/*.ts'],
    rules: {
      'no-restricted-globals': ['error', 'window', 'document', 'self', 'postMessage', 'process', 'navigator', 'localStorage'],
    },
  },
  {
    files: ['src/ui/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
);
