/**
 * The inversion's input (`firnline invert`): a scenario that may leave out the bed, since the bed
 * is what the inversion works out. Built from the very keys of the scenario schema
 * (scenarioShape), with only `bed` made optional, and the same cross-field rules, so every rule
 * and message of the format holds unchanged. Added, because the inversion cannot start without
 * them (docs/scenario-format.md, "The inversion's input"):
 *   - `surface` (the observed ice surface) and `observations.terminus` are required;
 *   - the surface points cover the whole domain [0, grid.length] (beyond the terminus the
 *     observed surface is the ground, and becomes the bed);
 *   - the terminus of the observation year lies down-valley of the head (x > 0);
 *   - the surface falls from the head to that terminus (ice flows down its surface slope);
 *   - no valley `section` (the inversion knows vertical walls only).
 * The presence rules are checked with the others; the geometry rules once the rest is valid.
 */
import * as z from 'zod';
import type { InversionScenario } from '../model/inversion/invertBed';
import { observedTerminus } from '../model/observedTerminus';
import { piecewiseLinear } from '../model/piecewiseLinear';
import type { Scenario } from '../model/scenario';
import { formatNumber } from './formatNumber';
import { issuesToMessages } from './issuesToMessages';
import { previewValue } from './previewValue';
import { migrateScenarioKeys } from './renamedKeys';
import { bedSchema, scenarioCrossFieldRules, scenarioShape } from './scenarioSchema';
import { scenarioWarnings } from './scenarioWarnings';
import { strictObjectField } from './strictObjectField';
import { MAX_LISTED_ERRORS, parseDocumentText, type DocumentFailure } from './validateScenario';
import type { ValidationMessage } from './validationMessage';
import { ZOD_PARSE_OPTIONS } from './zodParseOptions';

declare const validatedInput: unique symbol;

/** An inversion input that this validator accepted (a type-only brand, as ValidScenario's). */
export type ValidInversionInput = InversionScenario & { readonly [validatedInput]: true };

function checked(input: InversionScenario): ValidInversionInput {
  return input as ValidInversionInput;
}

export type InversionInputResult =
  | { ok: true; scenario: ValidInversionInput; warnings: ValidationMessage[] }
  | DocumentFailure;

const SURFACE_NEEDED =
  'the inversion needs the observed ice surface [[x m, elevation m a.s.l.], ...] over the whole domain, from x = 0 to grid.length';
const TERMINUS_NEEDED =
  'the inversion needs the observed terminus: "terminus" in "observations", a position in m or a record [[year a, x m], ...]';

const SECTION_NOT_INVERTED =
  'the inversion works with vertical walls at "width" only; leave out "section" (a valley section is not inverted yet)';

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Cross-field rules of every scenario, and the keys the inversion cannot start without. */
function inputRules(input: { grid?: unknown; observations?: unknown; surface?: unknown; section?: unknown }, ctx: z.RefinementCtx): void {
  scenarioCrossFieldRules(input, ctx);
  if (input.section !== undefined) ctx.addIssue({ code: 'custom', path: ['section'], input: input.section, message: SECTION_NOT_INVERTED });
  if (input.surface === undefined) ctx.addIssue({ code: 'custom', path: ['surface'], input: undefined, message: SURFACE_NEEDED });
  if (input.observations === undefined) {
    ctx.addIssue({ code: 'custom', path: ['observations'], input: undefined, message: TERMINUS_NEEDED });
  } else if (isObject(input.observations) && input.observations.terminus === undefined) {
    ctx.addIssue({ code: 'custom', path: ['observations', 'terminus'], input: undefined, message: TERMINUS_NEEDED });
  }
}

export const inversionInputSchema = strictObjectField('a scenario', { ...scenarioShape, bed: bedSchema.optional() })
  .superRefine(inputRules)
  .describe('The input of the bed inversion: a Firnline scenario that may leave out the bed.');

const fmt = (x: number) => formatNumber(Number(x.toPrecision(6)));

/** The geometry rules, on input whose every key is already valid. */
function geometryErrors(input: InversionScenario): ValidationMessage[] {
  const errors: ValidationMessage[] = [];
  const { length } = input.grid;
  const surfacePoints = input.surface ?? [];
  const terminus = observedTerminus(input.observations);
  if (surfacePoints.length === 0 || terminus === undefined) return errors; // refused by the schema already
  const first = surfacePoints[0][0];
  const lastIndex = surfacePoints.length - 1;
  const last = surfacePoints[lastIndex][0];
  if (first > 0) {
    errors.push({
      path: '/surface/0/0',
      message:
        `${previewValue(first)} is not allowed; the surface points must begin at the head of the domain (x = 0) or before it: ` +
        'the inversion needs the observed surface over the whole domain, and held constant before its first point it would be flat there',
    });
  }
  if (last < length) {
    errors.push({
      path: `/surface/${lastIndex}/0`,
      message:
        `${previewValue(last)} is not allowed; the surface points must reach the end of the domain (x = ${formatNumber(length)} m, grid.length) or beyond: ` +
        'beyond the terminus the observed surface is the ground, which becomes the bed',
    });
  }
  const year = input.observations?.year ?? 0;
  const terminusWords = typeof input.observations?.terminus === 'number' ? 'the terminus' : `the terminus of year ${fmt(year)} from the terminus record`;
  if (!(terminus > 0)) {
    errors.push({
      path: '/observations/terminus',
      message: `${terminusWords} is at x = ${fmt(terminus)} m, the head of the domain: there is no glacier to invert; it must lie down-valley of the head (x greater than 0)`,
    });
    return errors;
  }
  const surface = piecewiseLinear(surfacePoints);
  const head = surface(0);
  const snout = surface(terminus);
  if (!(head > snout)) {
    errors.push({
      path: '/surface',
      message:
        `the surface does not fall from the head to ${terminusWords}: it is at ${fmt(head)} m a.s.l. at x = 0 and ${fmt(snout)} m a.s.l. at x = ${fmt(terminus)} m; ` +
        'it must be lower at the terminus than at the head, as ice flows down its surface slope: a surface that is flat or rises down-valley over the glacier cannot carry it',
    });
  }
  return errors;
}

function errorText(error: unknown): string {
  try {
    return error instanceof Error ? error.message : String(error);
  } catch {
    return 'unknown error';
  }
}

/**
 * Untrusted JSON in, a ValidInversionInput or every error out; never throws. Warnings are the
 * scenario's when a bed is given, else none: the command line reports the warnings of the
 * complete scenario the inversion writes.
 */
export function validateInversionInput(input: unknown): InversionInputResult {
  try {
    const migrated = migrateScenarioKeys(input);
    if (migrated.errors.length > 0) return { ok: false, errors: migrated.errors, warnings: [] };
    const parsed = inversionInputSchema.safeParse(migrated.value, ZOD_PARSE_OPTIONS);
    if (!parsed.success) {
      return { ok: false, errors: issuesToMessages(parsed.error.issues, migrated.value, MAX_LISTED_ERRORS), warnings: [] };
    }
    const data: InversionScenario = parsed.data;
    const errors = geometryErrors(data);
    if (errors.length > 0) return { ok: false, errors, warnings: [] };
    let warnings: ValidationMessage[] = migrated.notes;
    if (data.bed !== undefined) {
      try {
        warnings = [...migrated.notes, ...scenarioWarnings({ ...data, bed: data.bed } satisfies Scenario)];
      } catch (error) {
        warnings = [{ path: '', message: `the warnings could not be computed (${errorText(error)})` }];
      }
    }
    return { ok: true, scenario: checked(data), warnings };
  } catch (error) {
    return { ok: false, errors: [{ path: '', message: `the input could not be read as JSON data (${errorText(error)})` }], warnings: [] };
  }
}

/** The same for text: JSON syntax errors with line and column, as parseScenarioText gives them. */
export function parseInversionInputText(text: string): InversionInputResult {
  return parseDocumentText(text, validateInversionInput);
}
