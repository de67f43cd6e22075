/**
 * A validator's refusal of a number, restated in the unit and scale the field shows: a balance
 * gradient typed per 100 m is refused per 100 m, a distance typed in km in km. Only a number
 * field's range refusal is restated (its range is known: scenario/numberField.ts), and the
 * value a point-list order refusal quotes ("… before it (30,000 at index 0)" becomes "… before it
 * (30 km in row 1)"); other messages (cross-field rules) are returned as the validator wrote them.
 */
import { allowedNumberOf, allowedSentenceShown } from '../../scenario/numberField';

/** Units the editor writes for a pure number. */
const NO_UNIT = new Set(['', '–', '-']);

/** Shown value = scenario value * scale, in `unit` (as after the field). */
/** The previous point a point list's order refusal quotes: its value and 0-based index. */
const ORDER_QUOTE = /\((-?[\d,]+(?:\.\d+)?) at index (\d+)\)/;

export function refusalShown(message: string, scale: number, unit: string): string {
  const allowed = allowedNumberOf(message);
  if (allowed === undefined) {
    const quote = ORDER_QUOTE.exec(message);
    if (!quote) return message;
    const shown = Number((Number(quote[1].replace(/,/g, '')) * scale).toPrecision(12));
    return message.replace(ORDER_QUOTE, `(${shown}${NO_UNIT.has(unit) ? '' : ` ${unit}`} in row ${Number(quote[2]) + 1})`);
  }
  const at = message.indexOf(' is not allowed; ');
  const given = message.slice(0, at);
  // The value as the field shows it (the validator quotes the scenario's value).
  const value = Number(given);
  const shownValue = given.trim() !== '' && Number.isFinite(value) ? String(Number((value * scale).toPrecision(12))) : given;
  return `${shownValue} is not allowed; ${allowedSentenceShown(allowed, scale, NO_UNIT.has(unit) ? '' : unit)}`;
}
