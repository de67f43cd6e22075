/**
 * One experiment member, run where it is called (a worker thread): run the scenario, write its
 * three files into its own folder exactly as `firnline run` does, and return its rows of
 * experiment.csv and outcomes.csv. A numerical failure is a result, not an exception: the other
 * members go on.
 */
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { runOutcome } from '../model/analysis/runOutcome';
import { experimentRows, outcomeRow } from '../outputs/experimentCsv';
import { profilesCsvPieces, seriesAndSummary } from '../outputs/runOutputs';
import type { ValidationMessage } from '../scenario/validationMessage';
import { writeWhole } from './writeWhole';
import { describeFailure, oneLine } from '../outputs/failureText';
import type { GlacierNumbers } from '../model/diagnostics';
import { NumericalFailure } from '../model/numericalFailure';
import { runScenario, type RunReport } from '../model/runScenario';
import type { ValidScenario } from '../scenario/validateScenario';

export interface MemberJob {
  index: number;
  name: string;
  scenario: ValidScenario;
  warnings: ValidationMessage[];
  /** The experiment's output directory; the member writes into <outDir>/<name>/. */
  outDir: string;
  firnlineVersion: string;
  /** SHA-256 of the experiment, recorded in the member's completion marker. */
  experimentDigest: string;
}

/** The completion marker, written last into a member's folder: the member is done when it is there. */
export const MEMBER_DONE_FILE = 'member-done.json';
export const MEMBER_DONE_FORMAT = 'firnline-member-done';

export interface MemberResult {
  index: number;
  /** ok; failed: numerical failure (exit 3); error: anything else, e.g. files not written (exit 1). */
  status: 'ok' | 'failed' | 'error';
  experimentRows: string;
  outcomeRow: string;
  message: string;
}

export function runMemberJob(job: MemberJob): MemberResult {
  let phase: 'spinup' | 'run' = job.scenario.spinup ? 'spinup' : 'run';
  let report: RunReport;
  try {
    report = runScenario(job.scenario, { onProgress: (p) => void (phase = p.phase) });
  } catch (error) {
    const failed = error instanceof NumericalFailure;
    const message = describeFailure(error, phase);
    return failure(job, failed ? 'failed' : 'error', message);
  }
  let numbers: GlacierNumbers[];
  try {
    const dir = join(job.outDir, job.name);
    mkdirSync(dir, { recursive: true });
    const context = { scenario: job.scenario, firnlineVersion: job.firnlineVersion, validatorWarnings: job.warnings };
    const outputs = seriesAndSummary(report, context);
    const { seriesCsv, summary } = outputs;
    numbers = outputs.numbers;
    writeWhole(dir, 'profiles.csv', profilesCsvPieces(report));
    writeWhole(dir, 'series.csv', [seriesCsv]);
    writeWhole(dir, 'summary.json', [JSON.stringify(summary, null, 2) + '\n']);
    const result: MemberResult = {
      index: job.index,
      status: 'ok',
      experimentRows: experimentRows(job.name, numbers),
      outcomeRow: outcomeRow(job.name, 'ok', runOutcome(report), ''),
      message: '',
    };
    // Last, and whole or not at all (writeWhole renames): the files above are complete.
    writeWhole(dir, MEMBER_DONE_FILE, [memberDoneText(job, result)]);
    return result;
  } catch (error) {
    return failure(job, 'error', `cannot write the member's files: ${oneLine(error instanceof Error ? error.message : String(error))}`);
  }
}

function memberDoneText(job: MemberJob, result: MemberResult): string {
  const marker = {
    format: MEMBER_DONE_FORMAT,
    version: 1,
    firnlineVersion: job.firnlineVersion,
    experimentDigest: job.experimentDigest,
    member: job.name,
    experimentRows: result.experimentRows,
    outcomeRow: result.outcomeRow,
  };
  return JSON.stringify(marker) + '\n';
}

/**
 * The result of a member that an earlier run into the same directory finished, read from its
 * completion marker; undefined when the member must run (no marker, a marker of another
 * experiment or version, or any of its files missing).
 */
export function finishedMember(job: MemberJob): MemberResult | undefined {
  const dir = join(job.outDir, job.name);
  let marker: Record<string, unknown>;
  try {
    marker = JSON.parse(readFileSync(join(dir, MEMBER_DONE_FILE), 'utf8')) as Record<string, unknown>;
  } catch {
    return undefined;
  }
  const matches =
    marker.format === MEMBER_DONE_FORMAT &&
    marker.version === 1 &&
    marker.firnlineVersion === job.firnlineVersion &&
    marker.experimentDigest === job.experimentDigest &&
    marker.member === job.name &&
    typeof marker.experimentRows === 'string' &&
    typeof marker.outcomeRow === 'string';
  if (!matches) return undefined;
  if (!['profiles.csv', 'series.csv', 'summary.json'].every((name) => existsSync(join(dir, name)))) return undefined;
  return { index: job.index, status: 'ok', experimentRows: marker.experimentRows as string, outcomeRow: marker.outcomeRow as string, message: '' };
}

export function failure(job: Pick<MemberJob, 'index' | 'name'>, status: 'failed' | 'error', message: string): MemberResult {
  return { index: job.index, status, experimentRows: '', outcomeRow: outcomeRow(job.name, 'failed', undefined, message), message };
}
