/**
 * Reads the typed values of a form, checking each against its allowed range; returns the numbers
 * or one message per bad field naming the field, the text and what is allowed.
 */
import { formatNumber } from '../../scenario/formatNumber';
import { parseTypedNumber } from './parseTypedNumber';

export interface FormNumberSpec {
  label: string;
  text: string;
  min?: number;
  max?: number;
  /** min is exclusive (value must be greater than min). */
  above?: boolean;
  /** The unit shown beside the field, repeated in the refusal ('' or absent: a pure number). */
  unit?: string;
}

export function readFormNumbers<K extends string>(specs: Record<K, FormNumberSpec>): { ok: true; values: Record<K, number> } | { ok: false; errors: string[] } {
  const values = {} as Record<K, number>;
  const errors: string[] = [];
  for (const key of Object.keys(specs) as K[]) {
    const { label, text, min, max, above, unit } = specs[key];
    const parsed = parseTypedNumber(text);
    if (!parsed.ok) {
      errors.push(`${label}: ${parsed.message}`);
      continue;
    }
    const v = parsed.value;
    const low = min !== undefined && (above ? v <= min : v < min);
    const high = max !== undefined && v > max;
    if (low || high) {
      const f = (x: number) => formatNumber(x);
      const range =
        min !== undefined && max !== undefined
          ? `${above ? 'greater than' : 'from'} ${f(min)} ${above ? 'and at most' : 'to'} ${f(max)}`
          : min !== undefined
            ? `${above ? 'greater than' : 'at least'} ${f(min)}`
            : `at most ${f(max!)}`;
      const u = unit === undefined || unit === '' || unit === '–' ? '' : ` ${unit}`;
      errors.push(`${label}: ${v} is not allowed; it must be ${range}${u}`);
      continue;
    }
    values[key] = v;
  }
  return errors.length ? { ok: false, errors } : { ok: true, values };
}
