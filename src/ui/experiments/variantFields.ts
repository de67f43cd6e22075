/**
 * The typed fields a variant can change, and how each becomes part of a JSON Merge Patch on the
 * base scenario. A variant's scenario is then checked by the one scenario validator; its
 * messages are put on the field that supplied the value, so the user reads which field is wrong
 * and what is allowed. Pure: no React, no store.
 */
import { applyMergePatch } from '../../json/jsonMergePatch';
import { validateScenario } from '../../scenario/validateScenario';
import type { Scenario } from '../../model/scenario';
import { withExponents } from '../../chart/flowUnits';
import { refusalShown } from '../edit/refusalShown';

export type VariantFieldKey = 'warmingEnd' | 'warmingYear' | 'elaShift' | 'rateFactor' | 'slidingC';

/** Values typed for one variant; an absent key leaves the base's value as it is. */
export type VariantValues = Partial<Record<VariantFieldKey, number>>;

export interface VariantField {
  key: VariantFieldKey;
  label: string;
  unit: string;
  help: string;
}

export const VARIANT_FIELDS: readonly VariantField[] = [
  { key: 'warmingEnd', label: 'Warming reached', unit: 'K', help: 'Warming dT at the year below, from 0 K at year 0, linear in between and held after; −50 to 50.' },
  { key: 'warmingYear', label: 'Reached by year', unit: 'a', help: 'Model year at which that warming is reached; above 0.' },
  { key: 'elaShift', label: 'ELA shift', unit: 'm', help: 'Added to the ELA of the linear mass-balance model (positive: higher ELA, less ice).' },
  { key: 'rateFactor', label: 'Rate factor A', unit: 'Pa⁻ⁿ s⁻¹', help: 'Above 0; for n = 3 at most 1e-20. Temperate ice: 2.4e-24 Pa⁻³ s⁻¹.' },
  { key: 'slidingC', label: 'Sliding coefficient C', unit: 'm a⁻¹ Pa⁻ᵐ', help: '0 or more; 0 turns sliding off. Added with m = 3 if the base has no sliding.' },
];

const fieldLabel = (key: VariantFieldKey) => VARIANT_FIELDS.find((f) => f.key === key)!.label;

/** A unit with the base's exponents written in (Pa⁻³ s⁻¹ for n = 3); C added anew takes m = 3. */
export function unitFor(unit: string, base: Scenario): string {
  return withExponents(unit, base.ice.n, base.sliding?.m ?? 3);
}

/** The unit a validator path is shown in, when a field shows that value as it is stored. */
function shownUnit(path: string, base: Scenario): string | undefined {
  const key: VariantFieldKey | undefined =
    path === '/warming/1/1' ? 'warmingEnd' : path === '/warming/1/0' ? 'warmingYear' : path === '/ice/A' ? 'rateFactor' : path === '/sliding/C' ? 'slidingC' : undefined;
  return key === undefined ? undefined : unitFor(VARIANT_FIELDS.find((f) => f.key === key)!.unit, base);
}

export interface FieldError {
  /** The field's label, or "Name" / "Variant" for the whole variant. */
  field: string;
  message: string;
}

export type PatchResult = { ok: true; set: Record<string, unknown> } | { ok: false; errors: FieldError[] };

/** Which field a scenario validator path comes from. */
function fieldOf(path: string): string {
  if (path.startsWith('/warming/1/1')) return fieldLabel('warmingEnd');
  if (path.startsWith('/warming')) return fieldLabel('warmingYear');
  if (path.startsWith('/massBalance')) return fieldLabel('elaShift');
  if (path.startsWith('/ice')) return fieldLabel('rateFactor');
  if (path.startsWith('/sliding')) return fieldLabel('slidingC');
  return 'Variant';
}

/** The merge patch for the typed values, checked against the base; errors name the field. */
export function variantPatch(base: Scenario, values: VariantValues): PatchResult {
  const errors: FieldError[] = [];
  const set: Record<string, unknown> = {};
  const { warmingEnd, warmingYear, elaShift, rateFactor, slidingC } = values;

  if ((warmingEnd === undefined) !== (warmingYear === undefined)) {
    const missing = warmingEnd === undefined ? 'warmingEnd' : 'warmingYear';
    errors.push({ field: fieldLabel(missing), message: 'needs a value too: a warming is given by the warming reached and the year it is reached, or by neither' });
  } else if (warmingEnd !== undefined && warmingYear !== undefined) {
    if (!(warmingYear > 0)) errors.push({ field: fieldLabel('warmingYear'), message: `${warmingYear} is not allowed; the year must be after year 0 (above 0)` });
    else set.warming = [[0, 0], [warmingYear, warmingEnd]];
  }

  if (elaShift !== undefined) {
    const balance = base.massBalance;
    if (balance.model !== 'linear') {
      errors.push({ field: fieldLabel('elaShift'), message: `needs the linear mass-balance model (it has an ELA); the base scenario uses the ${JSON.stringify(balance.model)} model` });
    } else {
      set.massBalance = { ela: Number((balance.ela + elaShift).toPrecision(12)) };
    }
  }

  if (rateFactor !== undefined) {
    // A replaces a temperature-based rate factor: the format takes exactly one of the two.
    set.ice = base.ice.temperature !== undefined ? { A: rateFactor, temperature: null, enhancement: null } : { A: rateFactor };
  }

  if (slidingC !== undefined) set.sliding = base.sliding ? { C: slidingC } : { C: slidingC, m: 3 };

  if (errors.length > 0) return { ok: false, errors };
  if (Object.keys(set).length === 0) return { ok: false, errors: [{ field: 'Variant', message: 'changes nothing; fill in at least one field' }] };

  const checked = validateScenario(applyMergePatch(base, set));
  if (!checked.ok) {
    // In the unit beside the field (the file's units are plain text, e.g. Pa^-n s^-1).
    const shown = (path: string, message: string) => {
      const unit = shownUnit(path, base);
      return unit === undefined ? message : refusalShown(message, 1, unit);
    };
    return { ok: false, errors: checked.errors.map((e) => ({ field: fieldOf(e.path), message: shown(e.path, e.message) })) };
  }
  return { ok: true, set };
}

/** Short text for a number in a variant name: at most 4 significant digits, no binary noise. */
export function shortNumber(value: number): string {
  if (value !== 0 && (Math.abs(value) < 1e-3 || Math.abs(value) >= 1e6)) return value.toExponential(Math.min(3, significantDecimals(value)));
  return String(Number(value.toPrecision(4)));
}

function significantDecimals(value: number): number {
  const mantissa = Number(value.toExponential(3).split('e')[0]);
  for (let d = 0; d <= 3; d++) if (Number(mantissa.toFixed(d)) === mantissa) return d;
  return 3;
}

/** "+1 K by year 80", "−0.5 K by year 40". */
export function warmingName(kelvin: number, year: number): string {
  const k = shortNumber(kelvin);
  return `${kelvin > 0 ? '+' : ''}${k.replace('-', '−')} K by year ${shortNumber(year)}`;
}

/** A name describing the typed values, for when the user leaves the name empty. */
export function describeValues(values: VariantValues): string {
  const parts: string[] = [];
  if (values.warmingEnd !== undefined && values.warmingYear !== undefined) parts.push(warmingName(values.warmingEnd, values.warmingYear));
  if (values.elaShift !== undefined) parts.push(`ELA ${values.elaShift >= 0 ? '+' : '−'}${shortNumber(Math.abs(values.elaShift))} m`);
  if (values.rateFactor !== undefined) parts.push(`A = ${shortNumber(values.rateFactor)}`);
  if (values.slidingC !== undefined) parts.push(`C = ${shortNumber(values.slidingC)}`);
  return parts.join(', ');
}
