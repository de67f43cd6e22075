/**
 * Builds a zod number schema with a closed or open range, whose every failure (wrong type,
 * non-finite, out of range) carries the same sentence saying what is allowed.
 */
import * as z from 'zod';
import { formatNumber } from './formatNumber';

export interface NumberRange {
  min?: number;
  /** true: the value must be greater than min, not equal to it. */
  minExclusive?: boolean;
  max?: number;
  maxExclusive?: boolean;
}

/** "from 1 to 5 m", "greater than 0 and at most 1", "of at least 0 m a^-1", ... */
export function describeRange(range: NumberRange, unit: string): string {
  const u = unit === '' ? '' : ` ${unit}`;
  const { min, max } = range;
  const lower = min === undefined ? '' : `${range.minExclusive ? 'greater than' : 'at least'} ${formatNumber(min)}`;
  const upper = max === undefined ? '' : `${range.maxExclusive ? 'less than' : 'at most'} ${formatNumber(max)}`;
  if (min !== undefined && max !== undefined && !range.minExclusive && !range.maxExclusive) {
    return `from ${formatNumber(min)} to ${formatNumber(max)}${u}`;
  }
  if (lower !== '' && upper !== '') return `${lower} and ${upper}${u}`;
  if (lower !== '') return `${range.minExclusive ? '' : 'of '}${lower}${u}`;
  if (upper !== '') return `${range.maxExclusive ? '' : 'of '}${upper}${u}`;
  return unit === '' ? '' : `in ${unit}`;
}

/** What a number field allows, as its refusals state it. */
export interface AllowedNumber {
  what: string;
  unit: string;
  range: NumberRange;
  why?: string;
  /** The sentence around the range ("from 0 to 12,000 m"), for a rule worded otherwise. */
  template?: (range: string) => string;
}

/** Every number field's sentence of what is allowed, so a screen can restate it in its own unit. */
const ALLOWED = new Map<string, AllowedNumber>();

/** How many sentences are number fields' (never forgotten). */
const NUMBER_FIELDS = { count: 0 };

/** Range rules hang on a scenario's own numbers (the domain length): only the latest are kept. */
const MAX_RULE_SENTENCES = 1000;

function allowedSentence({ what, unit, range, why, template }: AllowedNumber): string {
  if (template !== undefined) return template(describeRange(range, unit));
  return `${what} must be a finite number ${describeRange(range, unit)}`.trimEnd() + (why === undefined ? '' : `; ${why}`);
}

/**
 * `what` names the quantity in a sentence ("the cell spacing"); `unit` is its unit ('' for none);
 * `description` is the JSON Schema description (meaning and unit); `why`, when given, is added to
 * every failure after a semicolon to say why the range is what it is.
 */
export function numberField(what: string, unit: string, range: NumberRange, description: string, why?: string) {
  const allowed = allowedSentence({ what, unit, range, why });
  if (!ALLOWED.has(allowed)) NUMBER_FIELDS.count++;
  ALLOWED.set(allowed, { what, unit, range, why });
  // The bounds as checks added in one step: each chained .gte()/.lte() builds a whole new schema,
  // which the command line's start-up pays for at every field (docs/performance.md, 4a).
  const bounds: z.core.$ZodCheck<number>[] = [];
  if (range.min !== undefined) bounds.push(range.minExclusive ? z.gt(range.min, { error: allowed }) : z.gte(range.min, { error: allowed }));
  if (range.max !== undefined) bounds.push(range.maxExclusive ? z.lt(range.max, { error: allowed }) : z.lte(range.max, { error: allowed }));
  const schema = z.number({ error: allowed });
  return (bounds.length > 0 ? schema.check(...bounds) : schema).describe(description);
}

/**
 * The sentence of a cross-field range rule (e.g. a position within the domain), remembered like a
 * number field's so that a screen can restate it in its own unit.
 */
export function rangeRuleSentence(allowed: AllowedNumber & { template: (range: string) => string }): string {
  const sentence = allowedSentence(allowed);
  if (!ALLOWED.has(sentence)) {
    if (ALLOWED.size >= MAX_RULE_SENTENCES + NUMBER_FIELDS.count) {
      // Forget the oldest rule sentence, never a number field's.
      const oldest = [...ALLOWED].find(([, value]) => value.template !== undefined);
      if (oldest) ALLOWED.delete(oldest[0]);
    }
    ALLOWED.set(sentence, allowed);
  }
  return sentence;
}

/**
 * The range behind a refusal ("<value> is not allowed; <sentence>") of a number field, when the
 * message is one; undefined for any other message (cross-field rules, missing keys).
 */
export function allowedNumberOf(message: string): AllowedNumber | undefined {
  const at = message.indexOf(' is not allowed; ');
  return at < 0 ? undefined : ALLOWED.get(message.slice(at + ' is not allowed; '.length));
}

/**
 * The same sentence for a value shown as value * scale in `unit` (e.g. a gradient per m shown per
 * 100 m): the bounds scaled, binary noise rounded away. `why` is kept as written.
 */
export function allowedSentenceShown(allowed: AllowedNumber, scale: number, unit: string): string {
  const shown = (x: number | undefined) => (x === undefined ? undefined : Number((x * scale).toPrecision(12)));
  const { min, max, minExclusive, maxExclusive } = allowed.range;
  // A negative scale would swap the bounds; no field shows a value that way.
  const range: NumberRange = { min: shown(min), max: shown(max), minExclusive, maxExclusive };
  return allowedSentence({ ...allowed, range, unit });
}
