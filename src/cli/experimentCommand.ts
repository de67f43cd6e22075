/**
 * `firnline experiment <file> --out <dir> [--jobs N] [--shard K/N] [--quiet]`: validates the
 * experiment (all members, before anything runs), runs this shard's members on worker threads,
 * and writes each member's files in <dir>/<member>/ plus experiment.csv, outcomes.csv and
 * manifest.json. Exit codes as `run`: 2 invalid input; 3 when any member failed numerically
 * (the others are still written); 1 when files could not be written.
 */
import { createHash } from 'node:crypto';
import { experimentHeaderLine, outcomesHeaderLine } from '../outputs/experimentCsv';
import { experimentManifest, manifestText, shardRange } from '../outputs/experimentManifest';
import { EXPERIMENT_LIMITS } from '../experiment/experimentSchema';
import { formatMessage } from '../scenario/validationMessage';
import { parseExperimentText } from '../experiment/validateExperiment';
import { finishedMember, type MemberJob, type MemberResult } from './experimentMember';
import type { MemberPlan } from '../experiment/experimentMembers';
import { percentilesCsv, type EnsembleGroups } from '../outputs/ensemblePercentiles';
import { experimentProgressText } from './progress';
import { oneLine } from '../outputs/failureText';
import { runInPool } from './experimentPool';
import { CommandFailure, invalidDocumentText, prepareOutDir, readInputText, writeOutput } from './commandFiles';

export interface ExperimentOptions {
  experimentPath: string;
  outDir: string;
  jobs: number;
  shard: { index: number; count: number };
  quiet: boolean;
  /** Rerun only members without a valid completion marker (experimentMember.ts). */
  resume?: boolean;
}

export interface CommandIo {
  out: (text: string) => void;
  err: (text: string) => void;
  errIsTerminal: boolean;
}

/** The ensemble's groups (members differing only in their sample), labelled by variant and swept values. */
export function ensembleGroups(members: readonly MemberPlan[], samples: number): EnsembleGroups {
  const labels: string[] = [];
  for (let k = 0; k < members.length; k += samples) {
    const m = members[k];
    labels.push([m.variantName ?? 'base', ...m.sweep.map((c) => `${c.pointer}=${JSON.stringify(c.value)}`)].join(' '));
  }
  return { members: samples, labels };
}

const now = () => performance.now();

export async function experimentCommand(options: ExperimentOptions, io: CommandIo, firnlineVersion: string): Promise<number> {
  const parsed = parseExperimentText(readInputText(options.experimentPath, 'experiment', EXPERIMENT_LIMITS.maxTextBytes, '50 MB'));
  if (!parsed.ok) throw new CommandFailure(invalidDocumentText('experiment', parsed.errors), 2);
  const { experiment, members } = parsed;
  const { from, to } = shardRange(members.length, options.shard.index, options.shard.count);
  prepareOutDir(options.outDir);
  if (!options.quiet) {
    const withWarnings = members.slice(from, to).filter((m) => m.warnings.length > 0);
    for (const m of withWarnings.slice(0, 3)) {
      io.err(`warning: member ${m.name}: ${oneLine(formatMessage(m.warnings[0]))}${m.warnings.length > 1 ? ` (and ${m.warnings.length - 1} more)` : ''}\n`);
    }
    if (withWarnings.length > 3) io.err(`warning: ${withWarnings.length - 3} more members have warnings; see their summary.json\n`);
  }

  const experimentDigest = createHash('sha256').update(JSON.stringify(experiment)).digest('hex');
  const jobs: MemberJob[] = members.slice(from, to).map((m) => ({
    index: m.index,
    name: m.name,
    scenario: m.scenario,
    warnings: m.warnings,
    outDir: options.outDir,
    firnlineVersion,
    experimentDigest,
  }));
  // --resume: members an earlier run finished (their marker is written after their files).
  const earlier = new Map<number, MemberResult>();
  if (options.resume) {
    for (const job of jobs) {
      const done = finishedMember(job);
      if (done) earlier.set(job.index, done);
    }
  }
  const toRun = jobs.filter((job) => !earlier.has(job.index));
  const showProgress = !options.quiet && io.errIsTerminal;
  const started = now();
  let finished = earlier.size;
  let failed = 0;
  let ranHere = 0;
  let shownLength = 0;
  const draw = () => {
    const text = experimentProgressText({ done: finished, failed, total: jobs.length, ranHere, elapsedMs: now() - started });
    io.err('\r' + text + ' '.repeat(Math.max(0, shownLength - text.length)));
    shownLength = text.length;
  };
  const progress = (result: MemberResult) => {
    finished++;
    ranHere++;
    if (result.status !== 'ok') failed++;
    if (showProgress) draw();
  };
  if (showProgress && jobs.length > 0) draw();
  const workerUrl = new URL('./firnline-member-worker.mjs', import.meta.url);
  const ran = await runInPool(toRun, options.jobs, workerUrl, progress);
  if (showProgress && jobs.length > 0) io.err('\n');
  const byIndex = new Map(ran.map((r) => [r.index, r]));
  const results = jobs.map((job) => earlier.get(job.index) ?? byIndex.get(job.index)!);

  const experimentCsv = experimentHeaderLine() + results.map((r) => r.experimentRows).join('');
  writeOutput(options.outDir, 'experiment.csv', [experimentCsv]);
  writeOutput(options.outDir, 'outcomes.csv', [outcomesHeaderLine() + results.map((r) => r.outcomeRow).join('')]);
  const ensemble = experiment.ensemble ? ensembleGroups(members, experiment.ensemble.members) : undefined;
  const manifest = experimentManifest({
    firnlineVersion,
    experimentName: experiment.name ?? null,
    experimentDigest,
    members: members.map((m) => m.name),
    shard: { index: options.shard.index, count: options.shard.count, from, to },
    ensemble,
  });
  // A shard holds only part of each ensemble: its percentiles come from `firnline merge`.
  if (ensemble && options.shard.count === 1) {
    writeOutput(options.outDir, 'percentiles.csv', [percentilesCsv(experimentCsv, manifest.members, ensemble)]);
  }
  writeOutput(options.outDir, 'manifest.json', [manifestText(manifest)]);

  const numericalFailures = results.filter((r) => r.status === 'failed').length;
  const errors = results.filter((r) => r.status === 'error');
  // Failures are shown even with --quiet (the command failed); a flood is cut short.
  const failures = results.flatMap((r, k) => (r.status === 'ok' ? [] : [`firnline: member ${jobs[k].name}: ${r.message}\n`]));
  for (const line of failures.slice(0, 5)) io.err(line);
  if (failures.length > 5) io.err(`firnline: ${failures.length - 5} more members failed; see outcomes.csv\n`);
  const shardText = options.shard.count > 1 ? ` (shard ${options.shard.index} of ${options.shard.count})` : '';
  io.out(
    `firnline: experiment ${experiment.name ? JSON.stringify(experiment.name) + ' ' : ''}ran ${jobs.length} of ${members.length} members${shardText}: ` +
      `${jobs.length - numericalFailures - errors.length} ok, ${numericalFailures + errors.length} failed; ` +
      `${earlier.size > 0 ? `${earlier.size} found done, ` : ''}` +
      `wrote experiment.csv, outcomes.csv, ${ensemble && options.shard.count === 1 ? 'percentiles.csv, ' : ''}manifest.json and one folder per member to ${options.outDir}\n`,
  );
  if (errors.length > 0) return 1;
  return numericalFailures > 0 ? 3 : 0;
}
