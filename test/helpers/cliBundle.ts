/**
 * Running the built command line in tests: rebuild the bundles when any source is newer, then
 * spawn `bin/firnline.mjs` exactly as a user would.
 */
import { spawnSync } from 'node:child_process';
import { expect } from 'vitest';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const BUNDLES = ['dist/firnline.mjs', 'dist/firnline-member-worker.mjs', 'dist/firnline-check.cjs', 'dist/firnline-run.cjs'].map((b) => join(ROOT, b));

/** A node stack frame ("    at f (file:1:2)"): never to be shown to a user. */
export const STACK_FRAME = /^\s+at .+/m;

function newestSourceTime(): number {
  let newest = statSync(join(ROOT, 'package.json')).mtimeMs;
  for (const entry of readdirSync(join(ROOT, 'src'), { recursive: true, withFileTypes: true })) {
    if (entry.isFile()) newest = Math.max(newest, statSync(join(entry.parentPath, entry.name)).mtimeMs);
  }
  return newest;
}

const bundleTime = () => Math.min(...BUNDLES.map((b) => (existsSync(b) ? statSync(b).mtimeMs : 0)));

/**
 * Rebuilds when stale. Judged by the bundles under test, not the script's exit status: the script
 * also builds other entries (benchmark, schema writer), which `npm run build:cli` checks on its own.
 */
export function ensureFreshBundles(): void {
  const sources = newestSourceTime();
  if (bundleTime() >= sources) return;
  const build = spawnSync(process.execPath, ['scripts/build-cli.mjs'], { cwd: ROOT, encoding: 'utf8' });
  if (bundleTime() < sources) throw new Error(`node scripts/build-cli.mjs did not rebuild the bundles:\n${build.stderr}`);
}

/** Runs `firnline ...args` in `cwd`; stack traces stay off (FIRNLINE_DEBUG empty). */
export function runFirnline(cwd: string, args: string[]) {
  const result = spawnSync(process.execPath, [join(ROOT, 'bin/firnline.mjs'), ...args], {
    cwd,
    encoding: 'utf8',
    env: { ...process.env, FIRNLINE_DEBUG: '' },
    timeout: 120_000,
  });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

/** A failure as the command line must word it: the exit code, no stack, one first line that says it all. */
export function expectOneLineFailure(result: ReturnType<typeof runFirnline>, status: number, ...fragments: string[]): void {
  expect(result.status, result.stderr).toBe(status);
  expect(result.stderr).not.toMatch(STACK_FRAME);
  const firstLine = result.stderr.split('\n')[0];
  expect(firstLine).toMatch(/^firnline: /);
  for (const f of fragments) expect(firstLine).toContain(f);
}
