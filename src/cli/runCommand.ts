/**
 * `firnline run`, loaded by main.ts only when it runs (it brings the validator, the model and the
 * writers; the figures and d3 only with --figures).
 */
import { lakesJson } from '../outputs/lakesJson';
import { profilesCsvPieces, seriesAndSummary } from '../outputs/runOutputs';
import { formatMessage } from '../scenario/validateScenario';
import { NumericalFailure } from '../model/numericalFailure';
import { runScenario, type RunReport } from '../model/runScenario';
import { FailedRun, prepareOutDir, writeOutput } from './commandFiles';
import { loadScenario } from './checkCommand';
import { describeFailure, oneLine } from '../outputs/failureText';
import { progressLine, type ProgressUpdate } from './progress';
import type { CliStreams } from './main';



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

export async function runCommand(scenarioPath: string, outDir: string, quiet: boolean, figures: boolean, io: CliStreams, firnlineVersion: string): Promise<number> {
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

  const context = { scenario, firnlineVersion: firnlineVersion, validatorWarnings: warnings };
  const { seriesCsv, summary } = seriesAndSummary(report, context);
  writeOutput(outDir, 'profiles.csv', profilesCsvPieces(report));
  writeOutput(outDir, 'series.csv', [seriesCsv]);
  writeOutput(outDir, 'summary.json', [JSON.stringify(summary, null, 2) + '\n']);
  writeOutput(outDir, 'lakes.json', [JSON.stringify(lakesJson(report, firnlineVersion, scenario.name), null, 2) + '\n']);
  if (figures) {
    // The figures (and d3) load only when asked for.
    const { figureRunFromReport } = await import('../figures/figureRun');
    const { runFigures } = await import('../figures/runFigures');
    for (const figure of runFigures(figureRunFromReport(report, scenario, firnlineVersion))) writeOutput(outDir, figure.fileName, [figure.svg]);
  }
  io.out(closingLine(report, outDir, summary.warnings.length, figures));
  return 0;
}


