import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import globals from 'globals';
import reactHooks from 'eslint-plugin-react-hooks';

// ---------------------------------------------------------------------------------------------
// The layering: each folder of src/ -> the other src/ folders it may import from, in the order
// data flows through them. Anything not listed is refused by lint (no-restricted-imports, built
// from this table below). When a folder is added or split, add a row for it and name it in its
// importers' rows. Top-level files (src/version.ts, src/main.tsx) are not covered.
//   model       the numerical core: nothing outside src/model, no packages
//   json        JSON helpers with no domain (pointers, merge patch, syntax errors)
//   scenario    the scenario file: schema, the one validator, warnings
//   experiment  the experiment file: schema, validator, members
//   csvImport   the CSV profile import
//   outputs     run and experiment outputs: CSV, JSON, archives, caution, failure text
//   chart       chart geometry and labels as plain data (screen and figures)
//   figures     report figures as SVG text
//   worker      web workers and their main-thread clients (report to sinks the stores give)
//   cli         the Node command line (no browser code)
//   state       zustand stores; wire the worker clients
//   pwa         service worker registration
//   ui          React components
// ---------------------------------------------------------------------------------------------
const DATA = ['model', 'json', 'scenario', 'experiment', 'csvImport', 'outputs'];
const LAYERS = {
  model: [],
  json: [],
  scenario: ['model', 'json'],
  experiment: ['model', 'json', 'scenario'],
  csvImport: ['model', 'json', 'scenario'],
  outputs: ['model', 'json', 'scenario', 'experiment'],
  chart: ['model', 'json', 'scenario'],
  figures: ['model', 'json', 'scenario', 'outputs', 'chart'],
  worker: [...DATA],
  cli: [...DATA, 'chart', 'figures'],
  state: [...DATA, 'worker'],
  pwa: [],
  ui: [...DATA, 'chart', 'figures', 'worker', 'state', 'pwa'],
};
// npm packages: the only ones a folder may use (ONLY_PACKAGES), or those it must not (NO_PACKAGES).
const ONLY_PACKAGES = {
  model: [],
  json: [],
  scenario: ['zod'],
  experiment: ['zod'],
  csvImport: ['d3'],
  outputs: ['fflate'],
};
const NO_UI_OR_NODE = ['react', 'react-dom', 'react/*', 'react-dom/*', 'zustand', 'zustand/*', 'node:*', 'fs', 'path'];
const NO_PACKAGES = {
  chart: NO_UI_OR_NODE,
  figures: NO_UI_OR_NODE,
  worker: ['react', 'react-dom', 'react/*', 'react-dom/*', 'zustand', 'zustand/*'],
};

const allowedText = (folder) =>
  `src/${folder} may import only from ${LAYERS[folder].length ? LAYERS[folder].map((f) => `src/${f}`).join(', ') : 'itself'} (see LAYERS in eslint.config.js).`;

function packagePatterns(folder) {
  const only = ONLY_PACKAGES[folder];
  if (only) {
    return [
      {
        regex: only.length ? `^(?![./])(?!(${only.join('|')})(/|$))` : '^(?![./])',
        message: `src/${folder} uses ${only.length ? `only the packages ${only.join(', ')}` : 'no packages'} (see ONLY_PACKAGES in eslint.config.js).`,
      },
    ];
  }
  const refused = NO_PACKAGES[folder] ?? [];
  return refused.length ? [{ group: refused, message: `src/${folder} does not use this package (see NO_PACKAGES in eslint.config.js).` }] : [];
}

/** A relative import that climbs out of the folder into one of `folders` (src/<folder>/...). */
const intoFolders = (folders) => `^(\\.\\./)+(${folders.join('|')})(/|$)`;

const restrict = (files, patterns) => ({ files, rules: { 'no-restricted-imports': ['error', { patterns }] } });

const layerRules = Object.keys(LAYERS)
  .filter((folder) => folder !== 'model')
  .map((folder) => {
    const refused = Object.keys(LAYERS).filter((other) => other !== folder && !LAYERS[folder].includes(other));
    return restrict([`src/${folder}/**/*.{ts,tsx}`], [{ regex: intoFolders(refused), message: allowedText(folder) }, ...packagePatterns(folder)]);
  });

// src/model is nested and has files named like folders (model/scenario.ts): at depth d, a path
// with d + 1 leading "../" leaves it, and that is all it may not do.
const modelRules = ['src/model/*.ts', 'src/model/*/*.ts', 'src/model/*/*/*.ts'].map((files, depth) =>
  restrict([files], [{ regex: `^(\\.\\./){${depth + 1}}`, message: allowedText('model') }, ...packagePatterns('model')]),
);

// A ValidScenario (or ValidExperiment, ValidInversionInput) is made only by the validators: a type assertion to one is
// refused everywhere else, except the test helper that builds a deliberately corrupt message.
const brandAssertion = (name) =>
  ['TSAsExpression', 'TSTypeAssertion'].map((node) => ({
    selector: `${node} > TSTypeReference.typeAnnotation[typeName.name='${name}']`,
    message: `only the validator makes a ${name}: validate instead of asserting`,
  }));
const brandRule = {
  files: ['src/**/*.{ts,tsx}', 'test/**/*.{ts,tsx}', 'bench/**/*.ts', 'scripts/**/*.ts'],
  ignores: ['src/scenario/validateScenario.ts', 'src/scenario/validateInversionInput.ts', 'test/helpers/checkedScenario.ts'],
  rules: {
    'no-restricted-syntax': [
      'error',
      ...brandAssertion('ValidScenario'),
      ...brandAssertion('ValidExperiment'),
      ...brandAssertion('ValidInversionInput'),
    ],
  },
};

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
  ...modelRules,
  brandRule,
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
