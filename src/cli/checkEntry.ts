/**
 * `firnline check` with its failure handling, as one unit: the entry of dist/firnline-check.cjs
 * (scripts/build-cli.mjs), which main.ts loads with a V8 code cache (codeCachedBundle.ts).
 */
import { checkCommand } from './checkCommand';
import { failureExit } from './failureExit';
import type { CliStreams } from './main';

export function runCheck(scenarioPath: string, io: CliStreams): number {
  try {
    return checkCommand(scenarioPath, io);
  } catch (error) {
    return failureExit(error, io);
  }
}
