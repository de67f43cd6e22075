/**
 * The three output files of a run, built from its RunReport: shared by the command line and (for
 * downloads) the browser. profiles.csv is also offered in pieces, one per output time, so that a
 * caller writing to disk never holds a long run's whole table as one string.
 */
import type { GlacierNumbers } from '../model/diagnostics';
import type { RunReport, RunSummary } from '../model/runScenario';
import type { Scenario } from '../model/scenario';
import { fixedProfileText, profileRows, profilesHeaderLine, seriesCsv } from './csvWriters';
import { summaryJson, type SummaryJson } from './summaryJson';
import type { ValidationMessage } from '../scenario/validationMessage';

export interface RunOutputContext {
  scenario: Scenario;
  firnlineVersion: string;
  /** Warnings the validator gave for the scenario; repeated in summary.json. */
  validatorWarnings: readonly ValidationMessage[];
}

export interface RunOutputs {
  profilesCsv: string;
  seriesCsv: string;
  summary: SummaryJson;
}

/** profiles.csv as its header followed by one piece per output time. */
export function* profilesCsvPieces(report: RunReport): Generator<string> {
  const { grid } = report.model;
  yield profilesHeaderLine();
  // The grid's columns are the same at every output time: written once.
  const fixed = fixedProfileText({ x: grid.x, bed: grid.bed, width: grid.widthAtCells });
  for (const frame of report.frames) {
    yield profileRows(frame.time, { ...frame.fields, x: grid.x, bed: grid.bed, width: grid.widthAtCells }, fixed);
  }
}

/**
 * series.csv and summary.json, which are small whatever the run, and the glacier-wide numbers at
 * each output time they were made from (an experiment's table reuses them).
 */
export function seriesAndSummary(report: RunReport, context: RunOutputContext): Omit<RunOutputs, 'profilesCsv'> & { numbers: GlacierNumbers[] } {
  const numbers = report.frames.map((frame) => frame.numbers);
  const summary = runSummaryJson(context, report.summary, report.frames.map((frame) => frame.time));
  return { seriesCsv: seriesCsv(numbers), summary, numbers };
}

/** summary.json of a run, from its summary and output times (the browser has no RunReport). */
export function runSummaryJson(context: RunOutputContext, run: RunSummary, outputTimes: readonly number[]): SummaryJson {
  return summaryJson({
    firnlineVersion: context.firnlineVersion,
    scenarioName: context.scenario.name,
    spinupRequested: context.scenario.spinup === true,
    run,
    validatorWarnings: context.validatorWarnings,
    outputTimes,
  });
}

export function runOutputs(report: RunReport, context: RunOutputContext): RunOutputs {
  let profilesCsv = '';
  for (const piece of profilesCsvPieces(report)) profilesCsv += piece;
  const { seriesCsv, summary } = seriesAndSummary(report, context);
  return { profilesCsv, seriesCsv, summary };
}
