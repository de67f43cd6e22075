// Bundles the command line (and the benchmark) into plain ESM JavaScript with esbuild, so that
// `npx firnline` starts without compiling anything. Runs from `npm ci` (prepare) and before tests.
import { build } from 'esbuild';
import { mkdirSync } from 'node:fs';

mkdirSync('dist', { recursive: true });
const common = { bundle: true, platform: 'node', format: 'esm', target: 'node20', sourcemap: true, logLevel: 'warning' };
const entries = [
  ['src/cli/main.ts', 'dist/firnline.mjs'],
  ['src/cli/memberWorker.ts', 'dist/firnline-member-worker.mjs'],
  ['bench/bench.ts', 'dist/bench.mjs'],
  ['bench/memberWorker.ts', 'dist/bench-member-worker.mjs'],
  ['scripts/write-schema.ts', 'dist/write-schema.mjs'],
];
for (const [entry, outfile] of entries) {
  await build({ ...common, entryPoints: [entry], outfile });
}
