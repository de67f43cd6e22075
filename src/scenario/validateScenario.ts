/**
 * The one validator: untrusted JSON (parsed or as text) in, a ValidScenario or a list of errors
 * out. It never throws, returns exactly what was given (defaults are the model's business, so a
 * scenario round-trips unchanged) but for keys the format has renamed (renamedKeys.ts: read under
 * the new name, with a warning), and adds warnings for valid but physically odd choices.
 */
import type { Scenario } from '../model/scenario';
import { formatNumber } from './formatNumber';
import { issuesToMessages } from './issuesToMessages';
import { migrateScenarioKeys } from './renamedKeys';
import { utf8Length } from '../json/utf8Length';
import { describeCharacter, findJsonSyntaxError } from '../json/findJsonSyntaxError';
import { scenarioSchema } from './scenarioSchema';
import { scenarioWarnings } from './scenarioWarnings';
import { textPosition } from '../json/textPosition';
import { formatMessage, type ValidationMessage } from './validationMessage';
import { ZOD_PARSE_OPTIONS } from './zodParseOptions';

export type { ValidationMessage } from './validationMessage';
export { formatMessage } from './validationMessage';

declare const validated: unique symbol;

/**
 * A scenario that this validator accepted. The brand is a type only (nothing is added at run
 * time, so a checked scenario posted to a worker is the same plain data), keyed by a symbol this
 * module does not export: only `checked` below applies it, and lint refuses
 * `as ValidScenario` anywhere else. Code that must only ever see a checked scenario (the stores,
 * the worker protocols, the command line's runs) takes this type; the pure model takes the plain
 * Scenario, since it derives scenarios of its own (calibration, committed change).
 */
export type ValidScenario = Scenario & { readonly [validated]: true };

/** The one place the brand is applied: to what the schema has just accepted. */
function checked(scenario: Scenario): ValidScenario {
  return scenario as ValidScenario;
}

export type ValidationResult =
  | { ok: true; scenario: ValidScenario; warnings: ValidationMessage[] }
  | { ok: false; errors: ValidationMessage[]; warnings: ValidationMessage[] };

/** Errors listed at most; one more line says how many were left out. */
export const MAX_LISTED_ERRORS = 100;

/** Largest scenario text accepted [bytes of UTF-8]: 20 MB, far above any real scenario. */
export const MAX_SCENARIO_TEXT_BYTES = 20_000_000;

function failure(message: string, extra: Partial<ValidationMessage> = {}): ValidationResult {
  return { ok: false, errors: [{ path: '', message, ...extra }], warnings: [] };
}

function errorText(error: unknown): string {
  try {
    return error instanceof Error ? error.message : String(error);
  } catch {
    return 'unknown error';
  }
}

export function validateScenario(input: unknown): ValidationResult {
  try {
    const migrated = migrateScenarioKeys(input);
    if (migrated.errors.length > 0) return { ok: false, errors: migrated.errors, warnings: [] };
    const parsed = scenarioSchema.safeParse(migrated.value, ZOD_PARSE_OPTIONS);
    if (!parsed.success) {
      return { ok: false, errors: issuesToMessages(parsed.error.issues, migrated.value, MAX_LISTED_ERRORS), warnings: [] };
    }
    let warnings: ValidationMessage[];
    try {
      warnings = scenarioWarnings(parsed.data);
    } catch (error) {
      // A bug in a warning must not hide a valid scenario.
      warnings = [{ path: '', message: `the warnings could not be computed (${errorText(error)})` }];
    }
    return { ok: true, scenario: checked(parsed.data), warnings: [...migrated.notes, ...warnings] };
  } catch (error) {
    // Only exotic JavaScript input gets here: getters or proxies that throw while being read.
    return failure(`the input could not be read as JSON data (${errorText(error)})`);
  }
}

/**
 * For scenarios the program itself holds (the demo file, the blank valley, test fixtures): the
 * validated scenario, or an Error listing why it is not one. Not for user input, whose errors are
 * shown, not thrown.
 */
export function validScenarioOf(input: unknown, what: string): ValidScenario {
  const result = validateScenario(input);
  if (!result.ok) throw new Error(`${what} is not a valid scenario:\n${result.errors.map(formatMessage).join('\n')}`);
  return result.scenario;
}

/** Offset of a JSON syntax error: as the engine states it, else found by our own scan. */
function syntaxErrorAt(text: string, error: unknown): { position: number; reason: string } {
  const scanned = findJsonSyntaxError(text);
  const stated = /at position (\d+)/.exec(errorText(error));
  if (stated !== null) {
    const position = Math.min(Number(stated[1]), text.length);
    if (scanned !== null && scanned.position === position) return scanned;
    return { position, reason: `unexpected ${describeCharacter(text, position)}` };
  }
  return scanned ?? { position: text.length, reason: 'the text is not valid JSON' };
}

export function parseScenarioText(text: string): ValidationResult {
  return parseDocumentText(text, validateScenario);
}

/** A refusal of the whole document, as every validator built on the scenario schema gives one. */
export type DocumentFailure = Extract<ValidationResult, { ok: false }>;

/**
 * Text to a validated document: size limit, byte-order mark, JSON syntax errors with line and
 * column, then `validate` on the parsed value. Shared by parseScenarioText and the inversion's
 * input (validateInversionInput.ts), so both read text the same way.
 */
export function parseDocumentText<Result>(text: string, validate: (value: unknown) => Result): Result | DocumentFailure {
  const failure = (message: string, extra: Partial<ValidationMessage> = {}): DocumentFailure => ({
    ok: false,
    errors: [{ path: '', message, ...extra }],
    warnings: [],
  });
  try {
    // UTF-8 never takes fewer bytes than UTF-16 code units, so a long string is rejected uncounted.
    const bytes = text.length > MAX_SCENARIO_TEXT_BYTES ? text.length : utf8Length(text, MAX_SCENARIO_TEXT_BYTES);
    if (bytes > MAX_SCENARIO_TEXT_BYTES) {
      return failure(
        `the text is longer than ${formatNumber(MAX_SCENARIO_TEXT_BYTES)} bytes (20 MB of UTF-8), the largest scenario accepted`,
      );
    }
    // A byte-order mark from some editors is not JSON but is harmless; positions count after it.
    const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
    if (/^[ \t\n\r]*$/.test(body)) return failure('the text is empty; a scenario is a JSON object', { line: 1, column: 1 });
    let value: unknown;
    try {
      value = JSON.parse(body);
    } catch (error) {
      if (!(error instanceof SyntaxError)) {
        return failure(`the text could not be read as JSON (${errorText(error)})`);
      }
      const { position, reason } = syntaxErrorAt(body, error);
      const { line, column } = textPosition(body, position);
      return failure(`the text is not valid JSON (RFC 8259) at line ${line}, column ${column}: ${reason}`, { line, column });
    }
    return validate(value);
  } catch (error) {
    return failure(`the text could not be read (${errorText(error)})`);
  }
}
