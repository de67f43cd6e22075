// Bundles the command line (and the benchmark) into plain ESM JavaScript with esbuild, so that
// `npx firnline` starts without compiling anything. Runs from `npm ci` (prepare) and before tests.
//
// The command line and its member worker are built together with code splitting: main.ts loads
// each command with a dynamic import(), and esbuild puts what only that command needs (zod, the
// model, d3) into chunks beside dist/firnline.mjs, so `firnline --help` reads a few kilobytes.
// Chunks sit in dist/ itself (not a subfolder) because modules find their worker file by
// new URL('./firnline-member-worker.mjs', import.meta.url). `check` and `run` are also built as one
// CommonJS script each with a V8 code cache (below), which main.ts loads instead of their chunks.
import { build } from 'esbuild';
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdirSync, mkdtempSync, readdirSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

mkdirSync('dist', { recursive: true });
const CHUNK_PREFIX = 'firnline-chunk-';
// Chunks of earlier builds are removed only when an hour old: a command started just before this
// build may still import them (chunk names carry a content hash, so they never collide).
for (const name of readdirSync('dist')) {
  if (name.startsWith(CHUNK_PREFIX) && Date.now() - statSync(`dist/${name}`).mtimeMs > 3_600_000) rmSync(`dist/${name}`);
}
const common = { bundle: true, platform: 'node', format: 'esm', target: 'node20', sourcemap: true, logLevel: 'warning' };
await build({
  ...common,
  entryPoints: { firnline: 'src/cli/main.ts', 'firnline-member-worker': 'src/cli/memberWorker.ts' },
  outdir: 'dist',
  outExtension: { '.js': '.mjs' },
  splitting: true,
  minify: true,
  // No keepNames: it wraps every function and class in a __name() call at load time (about 6 ms of
  // `firnline check`, zod being mostly classes), and nothing reads function names (errors set theirs).
  keepNames: false,
  chunkNames: `${CHUNK_PREFIX}[name]-[hash]`,
});
// `firnline check` and `run` as one CommonJS script each, loaded with a V8 code cache
// (src/cli/codeCachedBundle.ts): a bundle's first line names its build, and its cache is made by
// running the command once with this build (check and run of the demo, with spin-up).
const cacheRunDir = mkdtempSync(join(tmpdir(), 'firnline-build-'));
for (const [name, entry, args] of [
  ['check', 'src/cli/checkEntry.ts', ['check', 'examples/demo-valley.json']],
  ['run', 'src/cli/runEntry.ts', ['run', 'examples/demo-valley.json', '--out', join(cacheRunDir, 'run'), '--quiet']],
]) {
  const result = await build({ ...common, entryPoints: [entry], format: 'cjs', minify: true, sourcemap: false, write: false });
  const text = result.outputFiles[0].text;
  const bundle = `dist/firnline-${name}.cjs`;
  rmSync(`${bundle}.cache`, { force: true });
  writeFileSync(`${bundle}.partial`, `//firnline-build ${createHash('sha256').update(text).digest('hex').slice(0, 16)}\n${text}`);
  renameSync(`${bundle}.partial`, bundle);
  const cacheRun = spawnSync(process.execPath, ['bin/firnline.mjs', ...args], { env: { ...process.env, FIRNLINE_WRITE_CODE_CACHE: '1' }, encoding: 'utf8' });
  if (cacheRun.status !== 0) console.warn(`build-cli: no code cache for ${bundle} (exit ${cacheRun.status}): ${cacheRun.stderr}`);
}
rmSync(cacheRunDir, { recursive: true, force: true });

const entries = [
  ['bench/bench.ts', 'dist/bench.mjs'],
  ['bench/memberWorker.ts', 'dist/bench-member-worker.mjs'],
  ['scripts/write-schema.ts', 'dist/write-schema.mjs'],
];
for (const [entry, outfile] of entries) {
  await build({ ...common, entryPoints: [entry], outfile });
}
