/**
 * A validator's refusal of a number, restated in the unit and scale the field shows: a balance
 * gradient typed per 100 m is refused per 100 m, a distance typed in km in km. Only a number
 * field's range refusal is restated (its range is known: scenario/numberField.ts); other
 * messages (cross-field rules) are returned as the validator wrote them.
 */
import { allowedNumberOf, allowedSentenceShown } from '../../scenario/numberField';

/** Units the editor writes for a pure number. */
const NO_UNIT = new Set(['', '–', '-']);

/** Shown value = scenario value * scale, in `unit` (as after the field). */
export function refusalShown(message: string, scale: number, unit: string): string {
  const allowed = allowedNumberOf(message);
  if (allowed === undefined) return message;
  const at = message.indexOf(' is not allowed; ');
  const given = message.slice(0, at);
  // The value as the field shows it (the validator quotes the scenario's value).
  const value = Number(given);
  const shownValue = given.trim() !== '' && Number.isFinite(value) ? String(Number((value * scale).toPrecision(12))) : given;
  return `${shownValue} is not allowed; ${allowedSentenceShown(allowed, scale, NO_UNIT.has(unit) ? '' : unit)}`;
}
