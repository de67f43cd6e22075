/**
 * The command line's arguments, parsed by hand: three commands and two options do not justify a
 * dependency, and hand parsing lets every mistake get a one-line message naming the argument.
 */

export type CliCommand =
  | { kind: 'help' }
  | { kind: 'version' }
  | { kind: 'run'; scenarioPath: string; outDir: string; quiet: boolean }
  | { kind: 'check'; scenarioPath: string };

export type ParsedArgs =
  | { ok: true; command: CliCommand }
  /** `showUsage`: print the usage text with the message (no command given at all). */
  | { ok: false; message: string; showUsage?: boolean };

export const USAGE = `Usage:
  firnline run <scenario.json> --out <dir> [--quiet]
      Run the scenario and write profiles.csv, series.csv and summary.json into <dir>
      (created when missing). --quiet (-q): no progress and no warnings on stderr.
  firnline check <scenario.json>
      Validate the scenario only; prints "ok" and any warnings.
  firnline --help | -h     Show this text.
  firnline --version       Show the version.

A scenario file "-" is read from standard input.

Exit codes: 0 success, 1 unexpected error, 2 invalid input or arguments,
3 numerical failure of the run.
`;

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
  if (command !== 'run' && command !== 'check') {
    return command.startsWith('-')
      ? fail(`unknown option "${command}"; see firnline --help`)
      : fail(`unknown command "${command}"; the commands are run and check (see firnline --help)`);
  }

  const positionals: string[] = [];
  let outDir: string | undefined;
  let quiet = false;
  for (let i = 0; i < rest.length; i++) {
    const arg = rest[i];
    if (arg === '--') {
      positionals.push(...rest.slice(i + 1));
      break;
    }
    if (command === 'run' && (arg === '--out' || arg === '-o' || arg.startsWith('--out='))) {
      if (outDir !== undefined) return fail('--out is given more than once');
      const value = arg.startsWith('--out=') ? arg.slice('--out='.length) : rest[++i];
      if (value === undefined || value === '') return fail(`${arg.startsWith('--out=') ? '--out' : arg} needs a directory`);
      outDir = value;
    } else if (command === 'run' && (arg === '--quiet' || arg === '-q')) {
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
  if (outDir === undefined) return fail('run needs --out <dir>, the directory for the output files');
  return { ok: true, command: { kind: 'run', scenarioPath, outDir, quiet } };
}
