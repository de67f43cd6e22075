/**
 * Common sets of members, made from a few numbers: a warming ladder (variants), a sweep of one
 * parameter over a range (a JSON Pointer sweep in the file), and a low/central/high spread of one
 * quantity (three variants). Each returns the complete next experiment or messages naming the
 * field and what is allowed; the caller applies it through the store's validator. Pure.
 */
import { memberCount } from '../../experiment/experimentMembers';
import { EXPERIMENT_LIMITS, type Experiment, type ExperimentVariant } from '../../experiment/experimentSchema';
import { formatNumber } from '../../scenario/formatNumber';
import type { Scenario } from '../../model/scenario';
import type { ValidExperiment } from '../../experiment/validateExperiment';
import { describeValues, shortNumber, variantPatch, warmingName, type FieldError, type VariantValues } from './variantFields';

export type SetResult = { ok: true; experiment: Experiment; note: string } | { ok: false; errors: FieldError[] };

const L = EXPERIMENT_LIMITS;

/** Refuses a set that would make more members than an experiment may have, before building it. */
function countCheck(variants: number, sweep: Record<string, unknown[]> | undefined, field: string, samples = 1): FieldError[] {
  if (variants > L.maxVariants) return [{ field, message: `${formatNumber(variants)} variants are not allowed; an experiment has at most ${formatNumber(L.maxVariants)} variants` }];
  const count = memberCount(variants, sweep, samples);
  if (count > L.maxMembers) {
    const times = samples > 1 ? ' times the sweep values, times the ensemble members' : ' times the sweep values';
    return [{ field, message: `this would make ${formatNumber(count)} members; an experiment has at most ${formatNumber(L.maxMembers)} (variants, or 1,${times})` }];
  }
  return [];
}

/** Samples of the experiment's ensemble (1 without one, or while its count is not a valid number). */
const ensembleSize = (experiment: Experiment): number => {
  const n = experiment.ensemble?.members;
  return typeof n === 'number' && Number.isInteger(n) && n >= 1 ? n : 1;
};

function withVariants(experiment: Experiment, added: ExperimentVariant[]): Experiment {
  return { ...experiment, variants: [...(experiment.variants ?? []), ...added] };
}

/** Numbers from `from` to `to` in steps of `step`, without accumulated rounding (0.1 + 0.2). */
export function ladderValues(from: number, to: number, step: number): number[] {
  const count = Math.floor((to - from) / step + 1e-9) + 1;
  return Array.from({ length: count }, (_, k) => Number((from + k * step).toPrecision(12)));
}

export interface LadderInput {
  fromK: number;
  toK: number;
  stepK: number;
  year: number;
}

/** Adds one variant per warming, "+1 K by year 80" and so on. */
export function warmingLadder(experiment: ValidExperiment, input: LadderInput): SetResult {
  const { fromK, toK, stepK, year } = input;
  if (!(stepK > 0)) return { ok: false, errors: [{ field: 'Step', message: `${stepK} K is not allowed; the step must be above 0 K` }] };
  if (!(toK >= fromK)) return { ok: false, errors: [{ field: 'To', message: `${toK} K is not allowed; it must be at least the first warming, ${fromK} K` }] };
  const rungs = Math.floor((toK - fromK) / stepK + 1e-9) + 1;
  const tooMany = countCheck((experiment.variants?.length ?? 0) + rungs, experiment.sweep, 'Ladder', ensembleSize(experiment));
  if (tooMany.length) return { ok: false, errors: tooMany };
  const base = experiment.base;
  const added: ExperimentVariant[] = [];
  for (const kelvin of ladderValues(fromK, toK, stepK)) {
    const patch = variantPatch(base, { warmingEnd: kelvin, warmingYear: year });
    if (!patch.ok) return patch;
    added.push({ name: warmingName(kelvin, year), set: patch.set });
  }
  return { ok: true, experiment: withVariants(experiment, added), note: `Added ${added.length} warming variant${added.length === 1 ? '' : 's'}.` };
}

export type SweepParameter = 'A' | 'C' | 'ELA';

export const SWEEP_PARAMETERS: Record<SweepParameter, { label: string; unit: string; pointer: string }> = {
  A: { label: 'Rate factor A', unit: 'Pa⁻ⁿ s⁻¹', pointer: '/ice/A' },
  C: { label: 'Sliding coefficient C', unit: 'm a⁻¹ Pa⁻ᵐ', pointer: '/sliding/C' },
  ELA: { label: 'ELA', unit: 'm a.s.l.', pointer: '/massBalance/ela' },
};

export interface SweepInput {
  parameter: SweepParameter;
  from: number;
  to: number;
  count: number;
  spacing: 'linear' | 'logarithmic';
}

/** Evenly spaced values, rounded to 6 significant digits so member names stay readable. */
export function sweepValues(from: number, to: number, count: number, spacing: 'linear' | 'logarithmic'): number[] {
  if (count === 1) return [from];
  return Array.from({ length: count }, (_, k) => {
    const share = k / (count - 1);
    const value = spacing === 'linear' ? from + share * (to - from) : from * Math.pow(to / from, share);
    return Number(value.toPrecision(6));
  });
}

/** Why the base cannot take a sweep of this parameter, or null. */
function sweepUnfit(base: Scenario, parameter: SweepParameter): string | null {
  if (parameter === 'A' && base.ice.temperature !== undefined) {
    return 'the base scenario gives the ice temperature, not A; set "Rate factor given as: A directly" in the workbench and take the base again, or use variants';
  }
  if (parameter === 'C' && !base.sliding) return 'the base scenario has no sliding; add sliding in the workbench and take the base again, or use variants';
  if (parameter === 'ELA' && base.massBalance.model !== 'linear') {
    return `needs the linear mass-balance model (it has an ELA); the base scenario uses the ${JSON.stringify(base.massBalance.model)} model`;
  }
  return null;
}

/** Sets the experiment's sweep of one parameter (replacing an earlier sweep of the same one). */
export function parameterSweep(experiment: ValidExperiment, input: SweepInput): SetResult {
  const { parameter, from, to, count, spacing } = input;
  const { label, pointer } = SWEEP_PARAMETERS[parameter];
  if (!Number.isInteger(count) || count < 2 || count > L.maxSweepValues) {
    return { ok: false, errors: [{ field: 'Values', message: `${count} is not allowed; a sweep takes a whole number of values from 2 to ${formatNumber(L.maxSweepValues)}` }] };
  }
  if (spacing === 'logarithmic' && !(from > 0 && to > 0)) {
    return { ok: false, errors: [{ field: 'From', message: `logarithmic spacing needs both ends above 0 (here ${from} and ${to}); use linear spacing to include 0` }] };
  }
  if (from === to) return { ok: false, errors: [{ field: 'To', message: `must differ from the first value, ${from}` }] };
  const unfit = sweepUnfit(experiment.base, parameter);
  if (unfit) return { ok: false, errors: [{ field: label, message: unfit }] };
  const sweep = { ...(experiment.sweep ?? {}), [pointer]: sweepValues(from, to, count, spacing) };
  const tooMany = countCheck(experiment.variants?.length ?? 0, sweep, 'Sweep', ensembleSize(experiment));
  if (tooMany.length) return { ok: false, errors: tooMany };
  return { ok: true, experiment: { ...experiment, sweep }, note: `${label} swept over ${count} values from ${shortNumber(from)} to ${shortNumber(to)}.` };
}

export type SpreadQuantity = 'warming' | 'elaShift' | 'rateFactor' | 'slidingC';

export interface SpreadInput {
  quantity: SpreadQuantity;
  low: number;
  central: number;
  high: number;
  /** For a warming spread: the year the warming is reached [a]. */
  year: number;
}

function spreadValues(quantity: SpreadQuantity, value: number, year: number): VariantValues {
  return quantity === 'warming' ? { warmingEnd: value, warmingYear: year } : { [quantity]: value };
}

/** Adds three variants, "low: …", "central: …", "high: …". */
export function spread(experiment: ValidExperiment, input: SpreadInput): SetResult {
  const { quantity, low, central, high, year } = input;
  if (!(low <= central && central <= high)) {
    return { ok: false, errors: [{ field: 'Spread', message: `low ${low}, central ${central} and high ${high} are not allowed; they must be in order, low ≤ central ≤ high` }] };
  }
  const tooMany = countCheck((experiment.variants?.length ?? 0) + 3, experiment.sweep, 'Spread', ensembleSize(experiment));
  if (tooMany.length) return { ok: false, errors: tooMany };
  const base = experiment.base;
  const added: ExperimentVariant[] = [];
  for (const [tag, value] of [['low', low], ['central', central], ['high', high]] as const) {
    const values = spreadValues(quantity, value, year);
    const patch = variantPatch(base, values);
    if (!patch.ok) return { ok: false, errors: patch.errors.map((e) => ({ ...e, field: `${e.field} (${tag})` })) };
    added.push({ name: `${tag}: ${describeValues(values)}`, set: patch.set });
  }
  return { ok: true, experiment: withVariants(experiment, added), note: 'Added the low, central and high variants.' };
}
