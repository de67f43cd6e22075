/**
 * The command line's arguments, parsed by hand: a handful of commands and options do not justify a
 * dependency, and hand parsing lets every mistake get a one-line message naming the argument.
 */

import { ANALYSIS_COMMANDS, parseAnalysisArgs, type AnalysisCommand } from './analysisArgs';

export type CliCommand =
  | AnalysisCommand
  | { kind: 'help' }
  | { kind: 'version' }
  | { kind: 'run'; scenarioPath: string; outDir: string; quiet: boolean; figures: boolean }
  | { kind: 'check'; scenarioPath: string }
  | { kind: 'invert'; scenarioPath: string; outDir: string; quiet: boolean }
  | {
      kind: 'experiment';
      experimentPath: string;
      outDir: string;
      /** Worker threads; undefined: one per core. */
      jobs: number | undefined;
      shard: { index: number; count: number };
      quiet: boolean;
      /** Run only the members without a completion marker in <dir> (see experimentCommand.ts). */
      resume: boolean;
    }
  | { kind: 'merge'; dirs: string[]; outDir: string };

export type ParsedArgs =
  | { ok: true; command: CliCommand }
  /** `showUsage`: print the usage text with the message (no command given at all). */
  | { ok: false; message: string; showUsage?: boolean };

export const USAGE = `Usage:
  firnline run <scenario.json> --out <dir> [--figures] [--quiet]
      Run the scenario and write profiles.csv, series.csv, summary.json and lakes.json into
      <dir> (created when missing). --figures: also write the SVG figures
      profile-snapshots-every-<N>a.svg, profile-year-<Y>.svg, along-flow-year-<Y>.svg (speed and
      driving stress) and time-series.svg (Y the last output year). --quiet (-q): no progress and
      no warnings on stderr.
  firnline check <scenario.json>
      Validate the scenario only; prints "ok" and any warnings.
  firnline invert <scenario.json> --out <dir> [--quiet]
      Work out the bed from the observed surface: the scenario may leave out "bed" but
      needs "surface" over the whole domain and "observations.terminus". Writes into <dir>
      scenario.json (the complete scenario with the inverted bed, for firnline run),
      inversion.csv (x_m, surface_m, thickness_m, bed_m, flux_m3_a, slope,
      thickness_low_m, thickness_high_m) and inversion.json (terminus, rate-factor
      multiplier, misfit to the radar points, assumptions, caution).
  firnline experiment <experiment.json> --out <dir> [--jobs N] [--shard K/N] [--resume] [--quiet]
      Run every member of an experiment (variants x sweep x ensemble) on N worker threads
      (default: one per core) and write experiment.csv, outcomes.csv, manifest.json (and
      percentiles.csv for an ensemble) and one folder per member into <dir>, holding
      profiles.csv, series.csv, summary.json and member-done.json (written last).
      --shard K/N runs only the K-th of N equal shares. --resume reruns only the members
      that an interrupted run into <dir> did not finish.
  firnline merge <dir>... --out <dir>
      Join the outputs of the shards of one experiment into one experiment.csv,
      outcomes.csv and manifest.json (and percentiles.csv for an ensemble), identical to a
      run on one machine.
  firnline calibrate <scenario.json> --parameter <JSON Pointer> [--parameter <JSON Pointer>]
            --out <dir> [--observation <kind>] [--quiet]
      Fit one parameter (e.g. /ice/A, /sliding/C, /massBalance/ela) to the scenario's
      observations; write scenario.json (the fitted value in place) and calibration.json
      (value, range, misfit before and after, runs) into <dir>. A second --parameter fits
      two together where the observations constrain them together: /ice/A (or
      /ice/enhancement) with /sliding/C from at least three surface speeds, or the balance
      model's ELA (degree-day: mean temperature) with another /massBalance number from a
      terminus and a geodetic balance; calibration.json then gives both values, their
      ranges and correlation. Three or more --parameter are refused.
  firnline commit <scenario.json> --from <year> --out <dir> [--quiet]
      Committed change: hold the warming of output year <year> and run to a steady state;
      write committed.csv, committed.json and committed.svg into <dir>.
  firnline sensitivity <scenario.json> --from <K> --to <K> --step <K> --out <dir> [--quiet]
      Steady terminus and volume for held warmings, up and back down; write
      sensitivity.csv and sensitivity.svg into <dir>.
  firnline --help | -h       Show this text.
  firnline --version | -V    Show the version.

A scenario file "-" is read from standard input.

Exit codes: 0 success, 1 unexpected error, 2 invalid input or arguments (for calibrate also
a pointer that names no number, or no observation that constrains it, alone or as a pair),
3 numerical failure of the run (of any member, for experiment and merge; for calibrate also
a fit without a bracket).
`;

/** Most worker threads accepted for --jobs. */
export const MAX_JOBS = 256;
/** Most shards accepted for --shard (an experiment has at most 10,000 members). */
export const MAX_SHARDS = 10_000;

function fail(message: string): ParsedArgs {
  return { ok: false, message };
}

export function parseArgs(argv: readonly string[]): ParsedArgs {
  if (argv.length === 0) return { ok: false, message: 'no command given', showUsage: true };
  // Help wins wherever it appears before "--", so `firnline run x --help` shows the usage.
  const endOfOptions = argv.indexOf('--');
  const optionPart = endOfOptions < 0 ? argv : argv.slice(0, endOfOptions);
  if (optionPart.includes('--help') || optionPart.includes('-h')) return { ok: true, command: { kind: 'help' } };
  const [command, ...rest] = argv;
  if (command === '--version' || command === '-V') {
    return rest.length === 0 ? { ok: true, command: { kind: 'version' } } : fail(`unexpected argument "${rest[0]}" after --version`);
  }
  if (command === 'experiment') return parseExperimentArgs(rest);
  if (command === 'merge') return parseMergeArgs(rest);
  if ((ANALYSIS_COMMANDS as readonly string[]).includes(command)) return parseAnalysisArgs(command as (typeof ANALYSIS_COMMANDS)[number], rest);
  if (command !== 'run' && command !== 'check' && command !== 'invert') {
    return command.startsWith('-')
      ? fail(`unknown option "${command}"; see firnline --help`)
      : fail(`unknown command "${command}"; the commands are run, check, invert, experiment, merge, calibrate, commit and sensitivity (see firnline --help)`);
  }

  const positionals: string[] = [];
  let outDir: string | undefined;
  let quiet = false;
  let figures = false;
  for (let i = 0; i < rest.length; i++) {
    const arg = rest[i];
    if (arg === '--') {
      positionals.push(...rest.slice(i + 1));
      break;
    }
    if (command === 'run' && arg === '--figures') {
      figures = true;
    } else if (command !== 'check' && matches(arg, '--out', '-o')) {
      const out = readOutDir(rest, i, outDir);
      if ('ok' in out) return out;
      ({ outDir, next: i } = out);
    } else if (command !== 'check' && (arg === '--quiet' || arg === '-q')) {
      quiet = true;
    } else if (arg.startsWith('-') && arg !== '-') {
      return fail(`unknown option "${arg}" for ${command}; see firnline --help`);
    } else {
      positionals.push(arg);
    }
  }
  if (positionals.length === 0) return fail(`${command} needs a scenario file: firnline ${command} <scenario.json>`);
  if (positionals.length > 1) return fail(`unexpected argument "${positionals[1]}": ${command} takes one scenario file`);
  const scenarioPath = positionals[0];
  if (command === 'check') return { ok: true, command: { kind: 'check', scenarioPath } };
  if (outDir === undefined) return fail(`${command} needs --out <dir>, the directory for the output files`);
  if (command === 'invert') return { ok: true, command: { kind: 'invert', scenarioPath, outDir, quiet } };
  return { ok: true, command: { kind: 'run', scenarioPath, outDir, quiet, figures } };
}

/** The value of an option given as "--name value", "-x value" or "--name=value"; i advances past it. */
function optionValue(args: readonly string[], i: number, long: string): { value: string | undefined; next: number } {
  const arg = args[i];
  if (arg.startsWith(long + '=')) return { value: arg.slice(long.length + 1), next: i };
  return { value: args[i + 1], next: i + 1 };
}

/** The --out (or -o) option at rest[i], once only and not empty; `next` is its last argument. */
function readOutDir(rest: readonly string[], i: number, already: string | undefined): { outDir: string; next: number } | ParsedArgs {
  if (already !== undefined) return fail('--out is given more than once');
  const { value, next } = optionValue(rest, i, '--out');
  if (value === undefined || value === '') return fail('--out needs a directory');
  return { outDir: value, next };
}

function matches(arg: string, long: string, short?: string): boolean {
  return arg === long || arg === short || arg.startsWith(long + '=');
}

function parseExperimentArgs(rest: readonly string[]): ParsedArgs {
  const positionals: string[] = [];
  let outDir: string | undefined;
  let jobs: number | undefined;
  let shard: { index: number; count: number } | undefined;
  let quiet = false;
  let resume = false;
  for (let i = 0; i < rest.length; i++) {
    const arg = rest[i];
    if (arg === '--') {
      positionals.push(...rest.slice(i + 1));
      break;
    }
    if (matches(arg, '--out', '-o')) {
      const out = readOutDir(rest, i, outDir);
      if ('ok' in out) return out;
      ({ outDir, next: i } = out);
    } else if (arg === '--resume') {
      resume = true;
    } else if (matches(arg, '--jobs', '-j')) {
      if (jobs !== undefined) return fail('--jobs is given more than once');
      const { value, next } = optionValue(rest, i, '--jobs');
      i = next;
      if (value === undefined || !/^[0-9]+$/.test(value) || Number(value) < 1 || Number(value) > MAX_JOBS) {
        return fail(`--jobs needs a whole number of worker threads from 1 to ${MAX_JOBS}, not ${value === undefined ? 'nothing' : `"${value}"`}`);
      }
      jobs = Number(value);
    } else if (matches(arg, '--shard')) {
      if (shard !== undefined) return fail('--shard is given more than once');
      const { value, next } = optionValue(rest, i, '--shard');
      i = next;
      const m = value === undefined ? null : /^([0-9]+)\/([0-9]+)$/.exec(value);
      const index = m ? Number(m[1]) : NaN;
      const count = m ? Number(m[2]) : NaN;
      if (!(index >= 1 && count >= index && count <= MAX_SHARDS)) {
        return fail(
          `--shard needs K/N with whole numbers 1 <= K <= N <= ${MAX_SHARDS} (the K-th of N shares), not ${value === undefined ? 'nothing' : `"${value}"`}`,
        );
      }
      shard = { index, count };
    } else if (arg === '--quiet' || arg === '-q') {
      quiet = true;
    } else if (arg.startsWith('-') && arg !== '-') {
      return fail(`unknown option "${arg}" for experiment; see firnline --help`);
    } else {
      positionals.push(arg);
    }
  }
  if (positionals.length === 0) return fail('experiment needs an experiment file: firnline experiment <experiment.json> --out <dir>');
  if (positionals.length > 1) return fail(`unexpected argument "${positionals[1]}": experiment takes one experiment file`);
  if (outDir === undefined) return fail('experiment needs --out <dir>, the directory for the output files');
  return {
    ok: true,
    command: { kind: 'experiment', experimentPath: positionals[0], outDir, jobs, shard: shard ?? { index: 1, count: 1 }, quiet, resume },
  };
}

function parseMergeArgs(rest: readonly string[]): ParsedArgs {
  const dirs: string[] = [];
  let outDir: string | undefined;
  for (let i = 0; i < rest.length; i++) {
    const arg = rest[i];
    if (arg === '--') {
      dirs.push(...rest.slice(i + 1));
      break;
    }
    if (matches(arg, '--out', '-o')) {
      const out = readOutDir(rest, i, outDir);
      if ('ok' in out) return out;
      ({ outDir, next: i } = out);
    } else if (arg.startsWith('-')) {
      return fail(`unknown option "${arg}" for merge; see firnline --help`);
    } else {
      dirs.push(arg);
    }
  }
  if (dirs.length === 0) return fail('merge needs the shard output directories: firnline merge <dir>... --out <dir>');
  if (outDir === undefined) return fail('merge needs --out <dir>, the directory for the merged files');
  return { ok: true, command: { kind: 'merge', dirs, outDir } };
}
