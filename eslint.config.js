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
    // (What it may import is in the data-path block below.)
    files: ['src/model/**/*.ts'],
    rules: {
      'no-restricted-globals': ['error', 'window', 'document', 'self', 'postMessage', 'process', 'navigator', 'localStorage'],
    },
  },
  ...dataPathRules(),
);

// ---------------------------------------------------------------------------------------------
// The data path: model -> json -> scenario -> experiment -> outputs, and csvImport beside
// experiment. Each folder imports only the folders before it on the path (and itself), plus the
// few packages it is built on; none imports ui, state, worker, cli, figures or pwa, so the
// browser, the workers and the command line share them unchanged.
//   model       the numerical core: nothing outside src/model, no packages
//   json        JSON helpers with no domain (pointers, merge patch, syntax errors): nothing
//   scenario    the scenario file: schema, the one validator, warnings (zod)
//   experiment  the experiment file: schema, validator, members (zod)
//   csvImport   the CSV profile import (d3's CSV parser)
//   outputs     run and experiment outputs: CSV, JSON, archives, caution, failure text (fflate)
// A ValidScenario (or ValidExperiment) is made only by the validators: a type assertion to one is
// refused everywhere else, except the test helper that builds a deliberately corrupt message.
// Self-contained: later blocks for other folders must not set no-restricted-imports or
// no-restricted-syntax for these files, or they replace these rules there.
// ---------------------------------------------------------------------------------------------
function dataPathRules() {
  const layers = [
    { folder: 'json', may: [], packages: [] },
    { folder: 'scenario', may: ['model', 'json'], packages: ['zod'] },
    { folder: 'experiment', may: ['model', 'json', 'scenario'], packages: ['zod'] },
    { folder: 'csvImport', may: ['model', 'json', 'scenario'], packages: ['d3'] },
    { folder: 'outputs', may: ['model', 'json', 'scenario', 'experiment'], packages: ['fflate'] },
  ];
  const notAllowed = (message, regex) => ({ regex, message });
  const packageRule = (packages) =>
    notAllowed(
      packages.length ? `of packages, only ${packages.join(', ')} here (see the data path in eslint.config.js)` : 'no packages here (see the data path in eslint.config.js)',
      packages.length ? `^(?![./])(?!(${packages.join('|')})(/|$))` : '^(?![./])',
    );
  const layerBlocks = layers.map(({ folder, may, packages }) => ({
    files: [`src/${folder}/**/*.ts`],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            // The folders are flat: "../x/..." is folder x; anything else outside ./ is refused.
            notAllowed(
              `src/${folder} may import only ${may.length ? may.map((m) => `src/${m}`).join(', ') : 'its own files'} (the data path in eslint.config.js)`,
              may.length ? `^\\.\\./(?!(${may.join('|')})/)` : '^\\.\\./',
            ),
            packageRule(packages),
          ],
        },
      ],
    },
  }));
  // src/model is nested: at depth d a path with d + 1 leading "../" leaves it.
  const modelBlocks = ['src/model/*.ts', 'src/model/*/*.ts', 'src/model/*/*/*.ts'].map((files, depth) => ({
    files: [files],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            notAllowed('src/model imports only src/model: it is the pure core the rest is built on', `^(\\.\\./){${depth + 1}}`),
            packageRule([]),
          ],
        },
      ],
    },
  }));
  const brandAssertion = (name) => [
    { selector: `TSAsExpression > TSTypeReference.typeAnnotation[typeName.name='${name}']`, message: `only the validator makes a ${name}: validate instead of asserting` },
    { selector: `TSTypeAssertion > TSTypeReference.typeAnnotation[typeName.name='${name}']`, message: `only the validator makes a ${name}: validate instead of asserting` },
  ];
  const brandBlock = {
    files: ['src/**/*.{ts,tsx}', 'test/**/*.{ts,tsx}', 'bench/**/*.ts', 'scripts/**/*.ts'],
    ignores: ['src/scenario/validateScenario.ts', 'test/helpers/checkedScenario.ts'],
    rules: { 'no-restricted-syntax': ['error', ...brandAssertion('ValidScenario'), ...brandAssertion('ValidExperiment')] },
  };
  return [...modelBlocks, ...layerBlocks, brandBlock];
}
