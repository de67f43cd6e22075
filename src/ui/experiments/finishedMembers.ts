/** The members of the last run that have results, with their chart style, in member order. */
import type { ExperimentMember } from '../../experiment/validateExperiment';
import type { MemberResultOk } from '../../state/experimentStore';
import type { MemberPlan } from '../../experiment/experimentMembers';
import { SWEEP_PARAMETERS } from './experimentSets';
import { memberStyle, type MemberStyle, type MemberStyler } from './memberStyles';
import { shortNumber } from './variantFields';

/** "+1 K by year 80, A = 1.2e-24": the variant's name (or "base") and each swept value. */
export function memberLabel(plan: Pick<MemberPlan, 'variantName' | 'sweep'>): string {
  const parts = [plan.variantName ?? 'base'];
  for (const c of plan.sweep) {
    const known = Object.entries(SWEEP_PARAMETERS).find(([, p]) => p.pointer === c.pointer);
    const value = typeof c.value === 'number' ? shortNumber(c.value) : JSON.stringify(c.value);
    parts.push(`${known ? known[0] : c.pointer} = ${value}`);
  }
  return parts.join(', ');
}

export interface FinishedMember {
  index: number;
  /** The member's name, as in outcomes.csv. */
  name: string;
  /** The same in words: the variant's name and the swept values. */
  label: string;
  /** Variant index, or -1 for the base alone: members of one group share a spread band. */
  group: number;
  /** Ensemble group (members differing only in their sample), for the percentile bands. */
  ensembleGroup: number;
  style: MemberStyle;
  result: MemberResultOk;
}

/** `results[k]`: member k's result, or null while it has none. */
export function finishedMembers(members: readonly ExperimentMember[], results: readonly (MemberResultOk | null)[], styleOf: MemberStyler = memberStyle): FinishedMember[] {
  const out: FinishedMember[] = [];
  members.forEach((m, k) => {
    const result = results[k];
    if (result) out.push({ index: m.index, name: m.name, label: memberLabel(m), group: m.variantIndex ?? -1, ensembleGroup: m.group, style: styleOf(m.index), result });
  });
  return out;
}

/** Volumes as the app shows them: km³, or 10⁶ m³ per metre of width for a unit-width flowline. */
export function volumeScale(unitWidth: boolean): { divisor: number; unit: string } {
  return unitWidth ? { divisor: 1e6, unit: '10⁶ m³ per m of width' } : { divisor: 1e9, unit: 'km³' };
}
