/**
 * `firnline run` with its failure handling: the entry of dist/firnline-run.cjs
 * (scripts/build-cli.mjs), loaded by main.ts with a V8 code cache (loadCachedCommand.ts). The
 * bundle carries its own copy of the error classes, so it judges its errors itself.
 */
import { failureExit } from './failureExit';
import type { CliStreams } from './main';
import { runCommand } from './runCommand';

export interface RunOptions {
  scenarioPath: string;
  outDir: string;
  quiet: boolean;
  figures: boolean;
  firnlineVersion: string;
}

export async function runRun(options: RunOptions, io: CliStreams): Promise<number> {
  try {
    return await runCommand(options.scenarioPath, options.outDir, options.quiet, options.figures, io, options.firnlineVersion);
  } catch (error) {
    return failureExit(error, io);
  }
}
