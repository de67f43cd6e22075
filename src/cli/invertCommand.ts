/**
 * `firnline invert <scenario.json> --out <dir> [--quiet]`: reads a scenario that may leave out the
 * bed (validateInversionInput: surface over the domain and the observed terminus required), works
 * out the bed from the surface (src/model/inversion/invertBed.ts), checks the complete scenario
 * with the one validator and only then writes <dir>/scenario.json, <dir>/inversion.csv and
 * <dir>/inversion.json. Exit codes as `run`: 2 invalid input; 3 when the inversion fails
 * numerically or gives a scenario the format refuses (nothing is written then); 1 when files
 * could not be written.
 */
import { invertBed, invertedScenario, type InversionResult, type InversionScenario } from '../model/inversion/invertBed';
import type { Scenario } from '../model/scenario';
import { NumericalFailure } from '../model/numericalFailure';
import { oneLine } from '../outputs/failureText';
import { inversionCsv, inversionJson } from '../outputs/inversionOutputs';
import { parseInversionInputText } from '../scenario/validateInversionInput';
import { formatMessage, MAX_SCENARIO_TEXT_BYTES, validateScenario } from '../scenario/validateScenario';
import { CommandFailure, invalidDocumentText, prepareOutDir, readInputText, writeOutput } from './commandFiles';

export const INVERSION_FILES = ['scenario.json', 'inversion.csv', 'inversion.json'] as const;

/** The numerical inversion; the real one by default, a stand-in in tests of the command itself. */
export interface Inversion {
  invertBed: (scenario: InversionScenario) => InversionResult;
  invertedScenario: (scenario: InversionScenario, result: InversionResult) => Scenario;
}

export interface InvertOptions {
  scenarioPath: string;
  outDir: string;
  quiet: boolean;
}

export interface InvertIo {
  out: (text: string) => void;
  err: (text: string) => void;
}

const EXIT_OK = 0;
const EXIT_INVALID_INPUT = 2;
const EXIT_NUMERICAL_FAILURE = 3;

function short(value: number, unit: string): string {
  return Number.isFinite(value) ? `${Number(value.toPrecision(4))}${unit === '' ? '' : ` ${unit}`}` : 'undefined';
}

function multiplierWords(r: InversionResult): string {
  const range = r.rateFactorMultiplierRange;
  if (range === undefined) return `rate-factor multiplier ${short(r.rateFactorMultiplier, '')} (not fitted)`;
  return `rate-factor multiplier ${short(r.rateFactorMultiplier, '')} (${short(range[0], '')} to ${short(range[1], '')})`;
}

function misfitWords(r: InversionResult): string {
  const m = r.misfit;
  return m === undefined ? '' : `, misfit to ${m.count} radar point${m.count === 1 ? '' : 's'}: rms ${short(m.rmsMetres, 'm')}`;
}

export function invertCommand(
  options: InvertOptions,
  io: InvertIo,
  firnlineVersion: string,
  inversion: Inversion = { invertBed, invertedScenario },
): number {
  const parsed = parseInversionInputText(readInputText(options.scenarioPath, 'scenario', MAX_SCENARIO_TEXT_BYTES, '20 MB'));
  if (!parsed.ok) throw new CommandFailure(invalidDocumentText('scenario', parsed.errors), EXIT_INVALID_INPUT);
  const input = parsed.scenario;
  prepareOutDir(options.outDir);
  if (!options.quiet) for (const w of parsed.warnings) io.err(`warning: ${oneLine(formatMessage(w))}\n`);

  let result: InversionResult;
  let complete: Scenario;
  try {
    result = inversion.invertBed(input);
    complete = inversion.invertedScenario(input, result);
  } catch (error) {
    if (error instanceof NumericalFailure) {
      const where = error.position !== undefined && Number.isFinite(error.position) ? ` (x = ${error.position.toFixed(0)} m)` : '';
      throw new CommandFailure(`numerical failure in the inversion${where}: ${oneLine(error.message)}; no files were written`, EXIT_NUMERICAL_FAILURE);
    }
    throw error;
  }

  // What is written is what is checked: the text, read back, must be a valid scenario.
  const scenarioText = JSON.stringify(complete, null, 2) + '\n';
  const checked = validateScenario(JSON.parse(scenarioText));
  if (!checked.ok) {
    const [first, ...others] = checked.errors.map(formatMessage);
    throw new CommandFailure(
      [
        `the inverted scenario is not a valid scenario, so no files were written: ${oneLine(first)}`,
        ...others.map((m) => `  ${oneLine(m)}`),
      ].join('\n'),
      EXIT_NUMERICAL_FAILURE,
    );
  }
  const warnings = checked.warnings.map(formatMessage);
  if (!options.quiet) for (const w of warnings) io.err(`warning: ${oneLine(w)}\n`);

  const summary = inversionJson(result, { firnlineVersion, scenarioName: input.name, warnings });
  writeOutput(options.outDir, 'scenario.json', [scenarioText]);
  writeOutput(options.outDir, 'inversion.csv', [inversionCsv(result)]);
  writeOutput(options.outDir, 'inversion.json', [JSON.stringify(summary, null, 2) + '\n']);
  io.out(
    `firnline: wrote scenario.json, inversion.csv and inversion.json to ${options.outDir}; ` +
      `terminus ${short(result.terminus, 'm')}, largest thickness ${short(summary.maxThickness_m ?? NaN, 'm')}, ` +
      `${multiplierWords(result)}${misfitWords(result)}; ${warnings.length} warning${warnings.length === 1 ? '' : 's'}\n`,
  );
  return EXIT_OK;
}
