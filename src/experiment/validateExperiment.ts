/**
 * Validates an experiment file strictly and expands it into its members. Never throws. Errors
 * name a JSON Pointer into the experiment file; an error in a member's scenario (found by the one
 * scenario validator, validateScenario) also names the variant and the member, and is placed on
 * the sweep value, the variant's "set" or the base, whichever supplied the offending value.
 */
import { utf8Length } from '../json/utf8Length';
import { describeCharacter, findJsonSyntaxError } from '../json/findJsonSyntaxError';
import { formatNumber } from '../scenario/formatNumber';
import { issuesToMessages } from '../scenario/issuesToMessages';
import { checkEnsemble, drawEnsemble, type EnsembleSamples } from './ensemble';
import { migrateExperimentKeys } from './experimentRenamedKeys';
import { memberCount, memberDocument, planMembers, type MemberPlan } from './experimentMembers';
import { EXPERIMENT_LIMITS as L, experimentSchema, type Experiment } from './experimentSchema';
import { parseJsonPointer, resolveJsonPointer, toJsonPointer } from '../json/jsonPointer';
import { textPosition } from '../json/textPosition';
import { MAX_LISTED_ERRORS, validateScenario, type ValidScenario } from '../scenario/validateScenario';
import type { ValidationMessage } from '../scenario/validationMessage';
import { ZOD_PARSE_OPTIONS } from '../scenario/zodParseOptions';

export interface ExperimentMember extends MemberPlan {
  scenario: ValidScenario;
  /** The validator's warnings for this member's scenario. */
  warnings: ValidationMessage[];
}

/**
 * An experiment the validator accepted: its base is the checked scenario the validator returned
 * for it (the same content as the file's base), so views read it as a scenario without a cast.
 */
export type ValidExperiment = Experiment & { base: ValidScenario };

export type ExperimentValidation =
  | { ok: true; experiment: ValidExperiment; members: ExperimentMember[] }
  | { ok: false; errors: ValidationMessage[] };

/** Keys a sweep may not change: they identify the file, they are not parameters. */
const FIXED_POINTERS = new Set(['/format', '/version']);

class ErrorList {
  readonly errors: ValidationMessage[] = [];
  private dropped = 0;
  private readonly seen = new Set<string>();
  /** `sameAs`: errors with the same path and `sameAs` are one error (shown for its first member). */
  add(path: string, message: string, sameAs = message): void {
    const key = `${path}\n${sameAs}`;
    if (this.seen.has(key)) return;
    this.seen.add(key);
    if (this.errors.length >= MAX_LISTED_ERRORS) this.dropped++;
    else this.errors.push({ path, message });
  }
  get full(): boolean {
    return this.errors.length >= MAX_LISTED_ERRORS;
  }
  result(): ValidationMessage[] {
    if (this.dropped > 0) {
      this.errors.push({ path: '', message: `${this.dropped} further error${this.dropped === 1 ? '' : 's'} not listed; fix the ones above first` });
    }
    return this.errors;
  }
}

function describeMember(plan: MemberPlan): string {
  const variant = plan.variantName === undefined ? 'the base' : `variant ${JSON.stringify(plan.variantName)}`;
  return `${variant} (member ${plan.name})`;
}

/** Where in the experiment file the value at scenario pointer `path` of a member came from. */
function sourceOf(experiment: Experiment, plan: MemberPlan, path: string): string {
  for (const { pointer } of plan.sample?.values ?? []) {
    if (path === pointer) return toJsonPointer(['ensemble', 'parameters', pointer]);
  }
  for (const choice of plan.sweep) {
    if (path === choice.pointer || path.startsWith(choice.pointer + '/')) {
      return toJsonPointer(['sweep', choice.pointer, choice.valueIndex]) + path.slice(choice.pointer.length);
    }
  }
  if (plan.variantIndex !== undefined) {
    const setPath = toJsonPointer(['variants', plan.variantIndex, 'set']);
    const patch = experiment.variants![plan.variantIndex].set;
    const parsed = parseJsonPointer(path);
    const tokens = parsed.ok ? parsed.tokens : [];
    // The deepest part of the path that the patch itself holds.
    for (let depth = tokens.length; depth >= 1; depth--) {
      const prefix = toJsonPointer(tokens.slice(0, depth));
      if (resolveJsonPointer(patch, prefix).found) return setPath + prefix;
    }
    // Not in the patch and not in the base: a required key the patch removed (or never was).
    if (!resolveJsonPointer(experiment.base, path).found) return setPath;
  }
  return '/base' + path;
}

export function validateExperiment(input: unknown): ExperimentValidation {
  try {
    return validateParsed(input);
  } catch (error) {
    // Only exotic JavaScript input gets here (getters or proxies that throw).
    return { ok: false, errors: [{ path: '', message: `the input could not be read as JSON data (${String(error)})` }] };
  }
}

function validateParsed(input: unknown): ExperimentValidation {
  const parsed = experimentSchema.safeParse(input, ZOD_PARSE_OPTIONS);
  if (!parsed.success) return { ok: false, errors: issuesToMessages(parsed.error.issues, input, MAX_LISTED_ERRORS) };
  // Renamed scenario keys first, so the members are built from one set of names.
  const migrated = migrateExperimentKeys(parsed.data as Experiment);
  if (migrated.errors.length > 0) return { ok: false, errors: migrated.errors };
  const experiment = migrated.experiment;
  const errors = new ErrorList();

  const names = new Map<string, number>();
  experiment.variants?.forEach((variant, i) => {
    const earlier = names.get(variant.name);
    if (earlier !== undefined) {
      errors.add(
        toJsonPointer(['variants', i, 'name']),
        `${JSON.stringify(variant.name)} is not allowed; variant names must be unique, and variant ${earlier} has this name already`,
      );
    } else names.set(variant.name, i);
  });

  const sweepKeys = Object.keys(experiment.sweep ?? {});
  if (sweepKeys.length > L.maxSweepKeys) {
    errors.add('/sweep', `${sweepKeys.length} keys are not allowed; a sweep may vary at most ${L.maxSweepKeys} values`);
  }
  for (const key of sweepKeys) {
    const pointer = parseJsonPointer(key);
    const at = toJsonPointer(['sweep', key]);
    if (!pointer.ok) errors.add(at, `${JSON.stringify(key)} is not allowed; a sweep key must be a JSON Pointer (RFC 6901) into the scenario, such as "/ice/A": ${pointer.reason}`);
    else if (key === '' || FIXED_POINTERS.has(key)) errors.add(at, `${JSON.stringify(key)} is not allowed; a sweep may not replace the whole scenario, its format or its version`);
  }

  let samples: EnsembleSamples | undefined;
  if (experiment.ensemble !== undefined) {
    const checked = checkEnsemble(experiment.ensemble);
    if (!checked.ok) for (const e of checked.errors) errors.add(e.path, e.message);
    else samples = drawEnsemble(checked.ensemble);
  }

  const count = memberCount(experiment.variants?.length ?? 0, experiment.sweep, samples?.values.length ?? 1);
  if (count > L.maxMembers) {
    errors.add(
      samples ? '/ensemble/members' : experiment.sweep ? '/sweep' : '/variants',
      `${formatNumber(count)} members are not allowed; an experiment has at most ${formatNumber(L.maxMembers)} members ` +
        '(variants, or 1 without variants, times the product of the sweep list lengths, times the ensemble members)',
    );
  }

  const base = validateScenario(experiment.base);
  if (!base.ok) for (const e of base.errors) errors.add('/base' + e.path, e.message);
  if (errors.errors.length > 0) return { ok: false, errors: errors.result() };

  const members: ExperimentMember[] = [];
  for (const plan of planMembers(experiment.variants, experiment.sweep, samples)) {
    if (errors.full) break;
    const variant = plan.variantIndex === undefined ? undefined : experiment.variants![plan.variantIndex];
    const built = memberDocument(experiment.base, variant, plan.sweep, plan.sample);
    if (!built.ok && 'parameter' in built) {
      errors.add(
        toJsonPointer(['ensemble', 'parameters', built.parameter]),
        `in ${describeMember(plan)} the ensemble parameter ${JSON.stringify(built.parameter)} cannot be sampled: ${built.reason}; ` +
          'a parameter must name a number in the scenario (after the variant and the sweep)',
        built.reason,
      );
      continue;
    }
    if (!built.ok) {
      errors.add(
        toJsonPointer(['sweep', built.choice.pointer]),
        `in ${describeMember(plan)} the sweep key ${JSON.stringify(built.choice.pointer)} cannot be set: ${built.reason}; ` +
          'a sweep key must point to a value whose parent exists in the scenario',
        built.reason,
      );
      continue;
    }
    const result = validateScenario(built.document);
    if (!result.ok) {
      for (const e of result.errors) {
        const at = sourceOf(experiment, plan, e.path);
        errors.add(at, `in ${describeMember(plan)}: ${e.path === '' ? '/' : e.path}: ${e.message}`, `${e.path}\n${e.message}`);
      }
      continue;
    }
    members.push({ ...plan, scenario: result.scenario, warnings: result.warnings });
  }
  if (errors.errors.length > 0 || !base.ok) return { ok: false, errors: errors.result() };
  return { ok: true, experiment: { ...experiment, base: base.scenario }, members };
}

/** Text in (a file's contents), as validateExperiment; JSON syntax errors with line and column. */
export function parseExperimentText(text: string): ExperimentValidation {
  const fail = (message: string): ExperimentValidation => ({ ok: false, errors: [{ path: '', message }] });
  if (text.length > L.maxTextBytes || utf8Length(text, L.maxTextBytes) > L.maxTextBytes) {
    return fail(`the text is longer than ${formatNumber(L.maxTextBytes)} bytes, the largest experiment accepted`);
  }
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (/^[ \t\n\r]*$/.test(body)) return fail('the text is empty; an experiment is a JSON object');
  let value: unknown;
  try {
    value = JSON.parse(body);
  } catch {
    const found = findJsonSyntaxError(body) ?? { position: body.length, reason: 'the text is not valid JSON' };
    const { line, column } = textPosition(body, found.position);
    const reason = found.reason || `unexpected ${describeCharacter(body, found.position)}`;
    return { ok: false, errors: [{ path: '', message: `the text is not valid JSON (RFC 8259) at line ${line}, column ${column}: ${reason}`, line, column }] };
  }
  return validateExperiment(value);
}
