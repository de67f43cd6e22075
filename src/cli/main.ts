/**
 * The firnline command. Bundled to dist/firnline.mjs; bin/firnline.mjs calls main() and sets the
 * exit code, so nothing here runs at import time or calls process.exit (pending writes to a pipe
 * would be cut off).
 *
 * Start-up: this module imports only the argument parser and the error types. Each command's
 * module (and with it the validator's zod schemas, the model, the figures' d3) is loaded by a
 * dynamic import() when that command runs; esbuild splits the bundle at those imports (see
 * scripts/build-cli.mjs), so `--help` and `--version` parse almost nothing.
 *
 * `check` and `run`, whose start-up is held against a bare Node's, come from CommonJS bundles with
 * a V8 code cache instead (loadCachedCommand.ts).
 *
 * Every failure ends in one line on stderr, without a stack trace (FIRNLINE_DEBUG=1 adds it for
 * unexpected errors): 2 for input the user can fix, 3 when the model itself fails, 1 otherwise
 * (failureExit.ts, loaded only then).
 */
import pkg from '../../package.json';
import { availableParallelism } from 'node:os';
import { parseArgs, USAGE } from './args';
import { loadCachedCommand } from './loadCachedCommand';

export const EXIT_OK = 0;
export const EXIT_INVALID_INPUT = 2;

/** Where the command writes; the process streams by default, swapped out only by tests. */
export interface CliStreams {
  out: (text: string) => void;
  err: (text: string) => void;
  errIsTerminal: boolean;
  env: Record<string, string | undefined>;
}

function processStreams(): CliStreams {
  // A reader that goes away early (`firnline check x | head -1`) is not an error of ours.
  for (const stream of [process.stdout, process.stderr]) {
    stream.on('error', (error: { code?: string }) => {
      if (error.code !== 'EPIPE') throw error;
    });
  }
  return {
    out: (text) => void process.stdout.write(text),
    err: (text) => void process.stderr.write(text),
    errIsTerminal: process.stderr.isTTY === true,
    env: process.env,
  };
}

export async function main(argv: string[], io: CliStreams = processStreams()): Promise<number> {
  const parsed = parseArgs(argv);
  if (!parsed.ok) {
    io.err(`firnline: ${parsed.message}\n`);
    if (parsed.showUsage) io.err('\n' + USAGE);
    return EXIT_INVALID_INPUT;
  }
  const command = parsed.command;
  try {
    switch (command.kind) {
      case 'help':
        io.out(USAGE);
        return EXIT_OK;
      case 'version':
        io.out(`firnline ${pkg.version}\n`);
        return EXIT_OK;
      case 'check': {
        const check = await loadCachedCommand('check');
        const exitCode = check.entry.runCheck(command.scenarioPath, io);
        // The build runs each cached command once with this set, to fill its bundle's code cache.
        if (io.env.FIRNLINE_WRITE_CODE_CACHE === '1') check.writeCache();
        return exitCode;
      }
      case 'run': {
        const run = await loadCachedCommand('run');
        const { scenarioPath, outDir, quiet, figures } = command;
        const exitCode = await run.entry.runRun({ scenarioPath, outDir, quiet, figures, firnlineVersion: pkg.version }, io);
        if (io.env.FIRNLINE_WRITE_CODE_CACHE === '1') run.writeCache();
        return exitCode;
      }
      case 'invert':
        return (await import('./invertCommand')).invertCommand(command, io, pkg.version);
      case 'experiment':
        return await (await import('./experimentCommand')).experimentCommand({ ...command, jobs: command.jobs ?? availableParallelism() }, io, pkg.version);
      case 'merge':
        return (await import('./mergeCommand')).mergeCommand(command.dirs, command.outDir, io);
      case 'calibrate':
        return (await import('./calibrateCommand')).calibrateCommand(command, io, pkg.version);
      case 'commit':
        return (await import('./analysisCommands')).commitCommand(command, io, pkg.version);
      case 'sensitivity':
        return (await import('./analysisCommands')).sensitivityCommand(command, io, pkg.version);
    }
  } catch (error) {
    // Loaded only on failure: the error classes and their wording stay off the start-up path.
    return (await import('./failureExit')).failureExit(error, io);
  }
}
