/**
 * `firnline check` as main.ts runs it: from dist/firnline-check.cjs with its code cache when the
 * command line is built (codeCachedBundle.ts), else (from source) by an ordinary import.
 */
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { loadCodeCachedBundle } from './codeCachedBundle';
import type { CliStreams } from './main';

export const CHECK_BUNDLE = 'firnline-check.cjs';

export interface LoadedCheck {
  runCheck: (scenarioPath: string, io: CliStreams) => number;
  writeCache: () => void;
}

export async function loadCheck(): Promise<LoadedCheck> {
  const bundle = fileURLToPath(new URL(`./${CHECK_BUNDLE}`, import.meta.url));
  if (!existsSync(bundle)) return { runCheck: (await import('./checkEntry')).runCheck, writeCache: () => {} };
  const loaded = loadCodeCachedBundle(bundle);
  return { runCheck: loaded.exports.runCheck as LoadedCheck['runCheck'], writeCache: loaded.writeCache };
}
