/**
 * `firnline check` with its failure handling: the entry of dist/firnline-check.cjs
 * (scripts/build-cli.mjs), loaded by main.ts with a V8 code cache (loadCachedCommand.ts). The
 * bundle carries its own copy of the error classes, so it judges its errors itself.
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
