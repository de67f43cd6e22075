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
function describeRange(range: NumberRange, unit: string): string {
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

/**
 * `what` names the quantity in a sentence ("the cell spacing"); `unit` is its unit ('' for none);
 * `description` is the JSON Schema description (meaning and unit); `why`, when given, is added to
 * every failure after a semicolon to say why the range is what it is.
 */
export function numberField(what: string, unit: string, range: NumberRange, description: string, why?: string) {
  const allowed = `${what} must be a finite number ${describeRange(range, unit)}`.trimEnd() + (why === undefined ? '' : `; ${why}`);
  // The bounds as checks added in one step: each chained .gte()/.lte() builds a whole new schema,
  // which the command line's start-up pays for at every field (docs/performance.md, 4a).
  const bounds: z.core.$ZodCheck<number>[] = [];
  if (range.min !== undefined) bounds.push(range.minExclusive ? z.gt(range.min, { error: allowed }) : z.gte(range.min, { error: allowed }));
  if (range.max !== undefined) bounds.push(range.maxExclusive ? z.lt(range.max, { error: allowed }) : z.lte(range.max, { error: allowed }));
  const schema = z.number({ error: allowed });
  return (bounds.length > 0 ? schema.check(...bounds) : schema).describe(description);
}
