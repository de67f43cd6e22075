/**
 * The analyses' typed inputs, checked before anything starts: each message names the field, what
 * is wrong and what is allowed. Pure, so every message is unit-tested.
 */
import { parseTypedNumber } from '../edit/parseTypedNumber';

export type Checked<T> = { ok: true; value: T } | { ok: false; message: string };

/** Limits of the sensitivity curve: warmings held [K], step [K], number of warmings. */
export const SENSITIVITY_LIMITS = { lowest: -10, highest: 10, smallestStep: 0.1, largestStep: 2, mostWarmings: 41 } as const;

/** A tolerance in metres may not exceed this share of the domain (a looser "match" says nothing). */
const LARGEST_TOLERANCE_SHARE = 0.25;

function number(field: string, text: string): Checked<number> {
  if (text.trim() === '') return { ok: false, message: `${field}: enter a number.` };
  const parsed = parseTypedNumber(text);
  return parsed.ok ? parsed : { ok: false, message: `${field}: ${parsed.message}.` };
}

const km = (metres: number) => Number((metres / 1000).toFixed(3));
const kelvin = (value: number) => `${value > 0 ? '+' : value < 0 ? '\u2212' : ''}${Math.abs(value)} K`;

export function checkSensitivityInputs(fromText: string, toText: string, stepText: string): Checked<{ from: number; to: number; step: number }> {
  const { lowest, highest, smallestStep, largestStep, mostWarmings } = SENSITIVITY_LIMITS;
  const from = number('Lowest warming', fromText);
  if (!from.ok) return from;
  const to = number('Highest warming', toText);
  if (!to.ok) return to;
  const step = number('Step', stepText);
  if (!step.ok) return step;
  for (const [field, value] of [['Lowest warming', from.value], ['Highest warming', to.value]] as const) {
    if (value < lowest || value > highest) {
      return { ok: false, message: `${field}: ${kelvin(value)} is outside the allowed ${kelvin(lowest)} to ${kelvin(highest)}.` };
    }
  }
  if (!(to.value > from.value)) {
    return { ok: false, message: `Highest warming (${kelvin(to.value)}) must be above the lowest (${kelvin(from.value)}).` };
  }
  if (step.value < smallestStep || step.value > largestStep) {
    return { ok: false, message: `Step: ${step.value} K is outside the allowed ${smallestStep} to ${largestStep} K.` };
  }
  const span = to.value - from.value;
  const count = span / step.value;
  if (Math.abs(count - Math.round(count)) > 1e-6) {
    return {
      ok: false,
      message: `Step: ${step.value} K does not divide the range of ${Number(span.toFixed(6))} K into whole steps; choose a step that does (e.g. ${suggestStep(span)} K).`,
    };
  }
  if (Math.round(count) + 1 > mostWarmings) {
    return {
      ok: false,
      message: `Step: ${step.value} K makes ${Math.round(count) + 1} warmings; at most ${mostWarmings} are allowed, so use a step of at least ${Number((span / (mostWarmings - 1)).toPrecision(3))} K.`,
    };
  }
  return { ok: true, value: { from: from.value, to: to.value, step: step.value } };
}

/** A step from a short list of round ones that divides `span` into an allowed number of steps. */
function suggestStep(span: number): number {
  const { smallestStep, largestStep, mostWarmings } = SENSITIVITY_LIMITS;
  for (const step of [0.5, 0.25, 1, 0.2, 2, 0.1]) {
    const count = span / step;
    if (step >= smallestStep && step <= largestStep && Math.abs(count - Math.round(count)) < 1e-6 && count + 1 <= mostWarmings) return step;
  }
  return Number((span / Math.min(mostWarmings - 1, Math.max(1, Math.round(span / 0.5)))).toPrecision(3));
}

/** The observed terminus typed in km; must lie inside the flowline (0 to its length, ends excluded). Returns metres. */
export function checkObservedTerminus(text: string, domainLength: number): Checked<number> {
  const field = 'Observed terminus';
  const parsed = number(field, text);
  if (!parsed.ok) return parsed;
  const metres = parsed.value * 1000;
  if (!(metres > 0 && metres < domainLength)) {
    return {
      ok: false,
      message: `${field}: ${parsed.value} km is ${metres <= 0 ? 'at or above the head of the valley' : 'at or beyond the end of the flowline'}; give a position between 0 and ${km(domainLength)} km down-valley (both ends excluded).`,
    };
  }
  return { ok: true, value: metres };
}

/**
 * The tolerance typed in metres: at least half a grid cell (the terminus moves in whole cells, so
 * a finer match need not exist) and at most a quarter of the flowline.
 */
export function checkTolerance(text: string, spacing: number, domainLength: number): Checked<number> {
  const field = 'Tolerance';
  const parsed = number(field, text);
  if (!parsed.ok) return parsed;
  const lowest = spacing / 2;
  const highest = LARGEST_TOLERANCE_SHARE * domainLength;
  if (parsed.value < lowest || parsed.value > highest) {
    return {
      ok: false,
      message: `${field}: ${parsed.value} m is outside the allowed ${lowest} to ${highest} m (from half a grid cell, as the terminus moves in whole ${spacing} m cells, to a quarter of the flowline).`,
    };
  }
  return { ok: true, value: parsed.value };
}

/**
 * The smoothing distance of the bed from the surface [m]: SMOOTHING_RANGE_METRES (0 to 5,000 m);
 * below three grid cells the inversion smooths over three cells.
 */
export function checkSmoothing(text: string, range: readonly [number, number]): Checked<number> {
  const value = number('Smoothing distance', text);
  if (!value.ok) return value;
  if (value.value < range[0] || value.value > range[1]) {
    return { ok: false, message: `Smoothing distance: ${value.value} m is outside the allowed ${range[0]} to ${range[1].toLocaleString('en')} m.` };
  }
  return value;
}
