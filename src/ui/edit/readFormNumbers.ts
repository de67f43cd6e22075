/**
 * Reads the typed values of a form, checking each against its allowed range; returns the numbers
 * or one message per bad field naming the field, the text and what is allowed.
 */
import { parseTypedNumber } from './parseTypedNumber';

export interface FormNumberSpec {
  label: string;
  text: string;
  min?: number;
  max?: number;
  /** min is exclusive (value must be greater than min). */
  above?: boolean;
}

export function readFormNumbers<K extends string>(specs: Record<K, FormNumberSpec>): { ok: true; values: Record<K, number> } | { ok: false; errors: string[] } {
  const values = {} as Record<K, number>;
  const errors: string[] = [];
  for (const key of Object.keys(specs) as K[]) {
    const { label, text, min, max, above } = specs[key];
    const parsed = parseTypedNumber(text);
    if (!parsed.ok) {
      errors.push(`${label}: ${parsed.message}`);
      continue;
    }
    const v = parsed.value;
    const low = min !== undefined && (above ? v <= min : v < min);
    const high = max !== undefined && v > max;
    if (low || high) {
      const range =
        min !== undefined && max !== undefined
          ? `${above ? 'greater than' : 'from'} ${min} ${above ? 'and at most' : 'to'} ${max}`
          : min !== undefined
            ? `${above ? 'greater than' : 'at least'} ${min}`
            : `at most ${max}`;
      errors.push(`${label}: ${v} is not allowed; it must be ${range}`);
      continue;
    }
    values[key] = v;
  }
  return errors.length ? { ok: false, errors } : { ok: true, values };
}
