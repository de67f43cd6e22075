/**
 * `check` and `run` as main.ts runs them: from their CommonJS bundle in dist/ with its code cache
 * when the command line is built (codeCachedBundle.ts), else (from source) by an ordinary import
 * of the same entry module.
 */
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { loadCodeCachedBundle } from './codeCachedBundle';

const ENTRIES = {
  check: { bundle: 'firnline-check.cjs', load: () => import('./checkEntry') },
  run: { bundle: 'firnline-run.cjs', load: () => import('./runEntry') },
};

type Entry<N extends keyof typeof ENTRIES> = Awaited<ReturnType<(typeof ENTRIES)[N]['load']>>;

export async function loadCachedCommand<N extends keyof typeof ENTRIES>(name: N): Promise<{ entry: Entry<N>; writeCache: () => void }> {
  const bundle = fileURLToPath(new URL(`./${ENTRIES[name].bundle}`, import.meta.url));
  if (!existsSync(bundle)) return { entry: (await ENTRIES[name].load()) as Entry<N>, writeCache: () => {} };
  const loaded = loadCodeCachedBundle(bundle);
  return { entry: loaded.exports as unknown as Entry<N>, writeCache: loaded.writeCache };
}
