/**
 * Arguments of the calibration and analysis commands (calibrate, commit, sensitivity), parsed by
 * hand as args.ts does, each mistake in one line naming the argument. Kept apart from args.ts so
 * that adding commands touches it in two lines.
 */
import type { ObservationKind } from '../model/analysis/calibrationTypes';
import { migrateScenarioPointer } from '../scenario/renamedKeys';

export const ANALYSIS_COMMANDS = ['calibrate', 'commit', 'sensitivity'] as const;

export type AnalysisCommand =
  | { kind: 'calibrate'; scenarioPath: string; outDir: string; pointer: string; pointers: string[]; observation: ObservationKind | undefined; quiet: boolean }
  | { kind: 'commit'; scenarioPath: string; outDir: string; year: number; quiet: boolean }
  | { kind: 'sensitivity'; scenarioPath: string; outDir: string; from: number; to: number; step: number; quiet: boolean };

export type AnalysisArgs = { ok: true; command: AnalysisCommand } | { ok: false; message: string };

const OBSERVATION_KINDS: readonly ObservationKind[] = ['surfaceSpeed', 'thickness', 'terminus', 'terminusRecord', 'geodeticBalance'];

/**
 * The warming range the browser's Analyses panel accepts (src/ui/analyses/analysisInputs.ts,
 * SENSITIVITY_LIMITS), so that the command line computes the curves the browser can.
 */
export const SENSITIVITY_RANGE = { lowest: -10, highest: 10, smallestStep: 0.1, largestStep: 2, mostWarmings: 41 } as const;

function fail(message: string): AnalysisArgs {
  return { ok: false, message };
}

const matches = (arg: string, long: string, short?: string) => arg === long || arg === short || arg.startsWith(long + '=');

/** A number option's text: finite decimal, else the message. */
function numberOption(name: string, value: string | undefined, what: string): number | string {
  if (value === undefined || value.trim() === '' || !Number.isFinite(Number(value))) {
    return `${name} needs ${what}, not ${value === undefined ? 'nothing' : `"${value}"`}`;
  }
  return Number(value);
}

export function parseAnalysisArgs(command: (typeof ANALYSIS_COMMANDS)[number], rest: readonly string[]): AnalysisArgs {
  const positionals: string[] = [];
  const options = new Map<string, string>();
  let quiet = false;
  const parameters: string[] = [];
  const known: Record<string, readonly string[]> = {
    calibrate: ['--out', '--parameter', '--observation'],
    commit: ['--out', '--from'],
    sensitivity: ['--out', '--from', '--to', '--step'],
  };
  for (let i = 0; i < rest.length; i++) {
    const arg = rest[i];
    if (arg === '--') {
      positionals.push(...rest.slice(i + 1));
      break;
    }
    const name = arg === '-o' ? '--out' : arg === '-p' ? '--parameter' : known[command].find((o) => matches(arg, o));
    if (name !== undefined) {
      const inline = arg.startsWith(name + '=');
      const value = inline ? arg.slice(name.length + 1) : rest[i + 1];
      if (!inline) i++;
      if (value === undefined || value === '') return fail(`${name} needs a value`);
      if (name === '--parameter') {
        // A renamed key's old pointer (/massBalance/gradient) still names the value.
        parameters.push(migrateScenarioPointer(value));
        if (parameters.length > 2) {
          return fail('--parameter is given more than twice: joint fits take at most two parameters (/ice/A with /sliding/C, or two mass-balance parameters); fit the others one at a time');
        }
      } else if (options.has(name)) return fail(`${name} is given more than once`);
      options.set(name, value);
    } else if (arg === '--quiet' || arg === '-q') {
      quiet = true;
    } else if (arg.startsWith('-') && arg !== '-') {
      return fail(`unknown option "${arg}" for ${command}; see firnline --help`);
    } else {
      positionals.push(arg);
    }
  }
  if (positionals.length === 0) return fail(`${command} needs a scenario file: firnline ${command} <scenario.json> ...`);
  if (positionals.length > 1) return fail(`unexpected argument "${positionals[1]}": ${command} takes one scenario file`);
  const scenarioPath = positionals[0];
  const outDir = options.get('--out');
  if (outDir === undefined) return fail(`${command} needs --out <dir>, the directory for the output files`);

  if (command === 'calibrate') {
    const pointer = parameters[0];
    if (pointer === undefined) return fail('calibrate needs --parameter <JSON Pointer>, e.g. --parameter /ice/A');
    const observation = options.get('--observation');
    if (observation !== undefined && parameters.length > 1) {
      return fail('--observation chooses the observation of a one-parameter fit; a joint fit uses the observations that constrain the pair together');
    }
    if (observation !== undefined && !OBSERVATION_KINDS.includes(observation as ObservationKind)) {
      return fail(`--observation needs one of ${OBSERVATION_KINDS.join(', ')}, not "${observation}"`);
    }
    return { ok: true, command: { kind: 'calibrate', scenarioPath, outDir, pointer, pointers: parameters, observation: observation as ObservationKind | undefined, quiet } };
  }
  if (command === 'commit') {
    const year = numberOption('--from', options.get('--from'), 'the model year to hold the warming from');
    if (typeof year === 'string') return fail(options.has('--from') ? year : 'commit needs --from <year>, the model year to hold the warming from');
    return { ok: true, command: { kind: 'commit', scenarioPath, outDir, year, quiet } };
  }
  const { lowest, highest, smallestStep, largestStep, mostWarmings } = SENSITIVITY_RANGE;
  const values: number[] = [];
  for (const name of ['--from', '--to', '--step']) {
    if (!options.has(name)) return fail(`sensitivity needs --from <K> --to <K> --step <K>: ${name} is missing`);
    const v = numberOption(name, options.get(name), 'a warming in kelvin');
    if (typeof v === 'string') return fail(v);
    values.push(v);
  }
  const [from, to, step] = values;
  if (!(from >= lowest && to <= highest)) return fail(`the warmings must lie from ${lowest} to ${highest} K, not ${from} to ${to} K`);
  if (!(to > from)) return fail(`--to (${to} K) must be above --from (${from} K)`);
  if (!(step >= smallestStep && step <= largestStep)) return fail(`--step must be from ${smallestStep} to ${largestStep} K, not ${step} K`);
  const count = (to - from) / step;
  if (Math.abs(count - Math.round(count)) > 1e-6) return fail(`--step ${step} K must divide the range ${from} to ${to} K into whole steps`);
  if (Math.round(count) + 1 > mostWarmings) return fail(`at most ${mostWarmings} warmings: ${from} to ${to} K in steps of ${step} K gives ${Math.round(count) + 1}`);
  return { ok: true, command: { kind: 'sensitivity', scenarioPath, outDir, from, to, step, quiet } };
}
