/**
 * The firnline command. Bundled to dist/firnline.mjs; bin/firnline.mjs calls main() and sets the
 * exit code, so nothing here runs at import time or calls process.exit (pending writes to a pipe
 * would be cut off).
 *
 * Every failure ends in one line on stderr, without a stack trace (FIRNLINE_DEBUG=1 adds it for
 * unexpected errors): 2 for input the user can fix, 3 when the model itself fails, 1 otherwise.
 */
import pkg from '../../package.json';
import { figureRunFromReport } from '../figures/figureRun';
import { runFigures } from '../figures/runFigures';
import { lakesJson } from '../outputs/lakesJson';
import { profilesCsvPieces, seriesAndSummary } from '../outputs/runOutputs';
import { formatMessage, MAX_SCENARIO_TEXT_BYTES, parseScenarioText, type ValidationResult, type ValidScenario } from '../scenario/validateScenario';
import { NumericalFailure } from '../model/numericalFailure';
import { runScenario, type RunReport } from '../model/runScenario';
import { availableParallelism } from 'node:os';
import { parseArgs, USAGE } from './args';
import { experimentCommand } from './experimentCommand';
import { invertCommand } from './invertCommand';
import { CommandFailure, invalidDocumentText, prepareOutDir, readInputText, writeOutput } from './commandFiles';
import { describeFailure, oneLine } from '../outputs/failureText';
import { mergeCommand } from './mergeCommand';
import { calibrateCommand } from './calibrateCommand';
import { commitCommand, sensitivityCommand } from './analysisCommands';
import { progressLine, type ProgressUpdate } from './progress';

export const EXIT_OK = 0;
export const EXIT_UNEXPECTED = 1;
export const EXIT_INVALID_INPUT = 2;
export const EXIT_NUMERICAL_FAILURE = 3;

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

/** The model could not go on (a NumericalFailure, located and worded for the user). */
class FailedRun extends Error {}

function errorText(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

function loadScenario(path: string): { scenario: ValidScenario; warnings: Extract<ValidationResult, { ok: true }>['warnings'] } {
  const result = parseScenarioText(readInputText(path, 'scenario', MAX_SCENARIO_TEXT_BYTES, '20 MB'));
  if (!result.ok) throw new CommandFailure(invalidDocumentText('scenario', result.errors), EXIT_INVALID_INPUT);
  return { scenario: result.scenario, warnings: result.warnings };
}

function shortNumber(value: number, unit: string): string {
  if (!Number.isFinite(value)) return 'undefined';
  const text = Math.abs(value) >= 1e6 ? value.toExponential(3) : String(Number(value.toPrecision(4)));
  return `${text} ${unit}`;
}

function closingLine(report: RunReport, dir: string, warningCount: number, figures: boolean): string {
  const last = report.frames[report.frames.length - 1];
  const final = last.numbers;
  return (
    `firnline: wrote profiles.csv, series.csv, summary.json${figures ? ', lakes.json and SVG figures' : ' and lakes.json'} to ${dir}; ` +
    `year ${last.time}: length ${shortNumber(final.length, 'm')}, volume ${shortNumber(final.volume, 'm^3')}; ` +
    `mass-budget relative residual ${report.summary.massBudget.relativeResidual.toExponential(1)}; ` +
    `${warningCount} warning${warningCount === 1 ? '' : 's'}\n`
  );
}

function runCommand(scenarioPath: string, outDir: string, quiet: boolean, figures: boolean, io: CliStreams): number {
  const { scenario, warnings } = loadScenario(scenarioPath);
  prepareOutDir(outDir);
  if (!quiet) for (const w of warnings) io.err(`warning: ${oneLine(formatMessage(w))}\n`);

  const progress = progressLine(io.err, !quiet && io.errIsTerminal);
  let phase: ProgressUpdate['phase'] = scenario.spinup ? 'spinup' : 'run';
  let report: RunReport;
  try {
    report = runScenario(scenario, {
      onProgress: (p) => {
        phase = p.phase;
        progress.update(p);
      },
    });
  } catch (error) {
    if (error instanceof NumericalFailure) throw new FailedRun(describeFailure(error, phase));
    throw error;
  } finally {
    progress.finish();
  }
  if (!quiet) for (const w of report.summary.warnings) io.err(`warning: ${oneLine(w)}\n`);

  const context = { scenario, firnlineVersion: pkg.version, validatorWarnings: warnings };
  const { seriesCsv, summary } = seriesAndSummary(report, context);
  writeOutput(outDir, 'profiles.csv', profilesCsvPieces(report));
  writeOutput(outDir, 'series.csv', [seriesCsv]);
  writeOutput(outDir, 'summary.json', [JSON.stringify(summary, null, 2) + '\n']);
  writeOutput(outDir, 'lakes.json', [JSON.stringify(lakesJson(report, pkg.version, scenario.name), null, 2) + '\n']);
  if (figures) {
    for (const figure of runFigures(figureRunFromReport(report, scenario, pkg.version))) writeOutput(outDir, figure.fileName, [figure.svg]);
  }
  io.out(closingLine(report, outDir, summary.warnings.length, figures));
  return EXIT_OK;
}

function checkCommand(scenarioPath: string, io: CliStreams): number {
  const { warnings } = loadScenario(scenarioPath);
  io.out('ok\n');
  for (const w of warnings) io.out(`warning: ${oneLine(formatMessage(w))}\n`);
  return EXIT_OK;
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
      case 'check':
        return checkCommand(command.scenarioPath, io);
      case 'run':
        return runCommand(command.scenarioPath, command.outDir, command.quiet, command.figures, io);
      case 'invert':
        return invertCommand(command, io, pkg.version);
      case 'experiment':
        return await experimentCommand({ ...command, jobs: command.jobs ?? availableParallelism() }, io, pkg.version);
      case 'merge':
        return mergeCommand(command.dirs, command.outDir, io);
      case 'calibrate':
        return calibrateCommand(command, io, pkg.version);
      case 'commit':
        return commitCommand(command, io, pkg.version);
      case 'sensitivity':
        return sensitivityCommand(command, io, pkg.version);
    }
  } catch (error) {
    if (error instanceof CommandFailure) {
      io.err(`firnline: ${error.message}\n`);
      return error.exitCode;
    }
    if (error instanceof FailedRun) {
      io.err(`firnline: ${error.message}\n`);
      return EXIT_NUMERICAL_FAILURE;
    }
    io.err(`firnline: unexpected error: ${oneLine(errorText(error))}\n`);
    if (io.env.FIRNLINE_DEBUG === '1' && error instanceof Error && error.stack) io.err(error.stack + '\n');
    return EXIT_UNEXPECTED;
  }
}
