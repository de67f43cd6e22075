/**
 * How members are told apart on the charts, in Okabe–Ito colours in the order the app uses them
 * (yellow left out: too faint on white).
 * - In general each member has its own colour, then the same colours dashed, then dotted (21
 *   members before a style repeats).
 * - When variants are crossed with a sweep, the colour names the variant and the line style the
 *   swept value, so each variant's members read as one family beside its shaded range.
 */
import type { ExperimentMember } from '../../experiment/validateExperiment';

const MEMBER_COLOURS = ['#0072b2', '#d55e00', '#009e73', '#cc79a7', '#e69f00', '#56b4e9', '#000000'] as const;
const DASHES = ['', '9 5', '2 4', '12 4 2 4', '4 8'] as const;

export interface MemberStyle {
  colour: string;
  /** SVG stroke-dasharray; '' is solid. */
  dash: string;
}

export function memberStyle(index: number): MemberStyle {
  const n = MEMBER_COLOURS.length;
  return { colour: MEMBER_COLOURS[index % n], dash: DASHES[Math.floor(index / n) % 3] };
}

export type MemberStyler = (index: number) => MemberStyle;

export function memberStyler(members: readonly Pick<ExperimentMember, 'index' | 'variantIndex'>[], hasSweep: boolean): MemberStyler {
  const variants = new Set(members.map((m) => m.variantIndex));
  if (!hasSweep || variants.size < 2) return memberStyle;
  // Members come variant by variant; a member's place within its variant is its swept value.
  const first = new Map<number | undefined, number>();
  for (const m of members) if (!first.has(m.variantIndex)) first.set(m.variantIndex, m.index);
  const byIndex = new Map(members.map((m) => [m.index, m]));
  const order = [...first.keys()];
  return (index) => {
    const m = byIndex.get(index);
    if (!m) return memberStyle(index);
    const group = order.indexOf(m.variantIndex);
    return { colour: MEMBER_COLOURS[group % MEMBER_COLOURS.length], dash: DASHES[(index - first.get(m.variantIndex)!) % DASHES.length] };
  };
}
