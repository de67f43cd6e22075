/**
 * The members of an experiment: every variant (or the base alone) times every combination of the
 * sweep values, in a fixed order (variants in file order; for each, the sweep combinations with
 * the first sweep key varying slowest, like nested loops). Each member gets a stable, file-safe
 * name: its 1-based number padded to a common width (so names sort in member order and are
 * unique), the variant's name and each swept value.
 */
import { applyMergePatch } from '../json/jsonMergePatch';
import { parseJsonPointer } from '../json/jsonPointer';
import { setJsonPointer } from '../json/jsonPointerSet';
import type { ExperimentVariant } from './experimentSchema';

export interface SweepChoice {
  pointer: string;
  /** Index of the value in the sweep list. */
  valueIndex: number;
  value: unknown;
}

export interface MemberPlan {
  /** 0-based position in member order. */
  index: number;
  name: string;
  /** Index into "variants"; undefined for the base alone. */
  variantIndex: number | undefined;
  variantName: string | undefined;
  sweep: SweepChoice[];
}

/** Longest piece of a name taken from free text (variant names can be 200 characters). */
const MAX_SLUG_LENGTH = 60;

/** Letters, digits and . + = - only; anything else becomes one "-". Safe on every file system. */
export function fileSafe(text: string): string {
  return text
    .replace(/[^A-Za-z0-9.+=-]+/g, '-')
    .replace(/^[-.]+|[-.]+$/g, '')
    .slice(0, MAX_SLUG_LENGTH)
    .replace(/[-.]+$/g, '');
}

function valueText(value: unknown, valueIndex: number): string {
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (typeof value === 'string' && fileSafe(value) !== '') return fileSafe(value);
  // Lists and objects (e.g. a whole warming series) are named by their place in the sweep list.
  return `v${valueIndex + 1}`;
}

function pointerText(pointer: string): string {
  const parsed = parseJsonPointer(pointer);
  return parsed.ok ? fileSafe(parsed.tokens.join('.')) : fileSafe(pointer);
}

export function memberCount(variantCount: number, sweep: Record<string, unknown[]> | undefined): number {
  let count = Math.max(1, variantCount);
  for (const values of Object.values(sweep ?? {})) count *= values.length;
  return count;
}

export function planMembers(variants: readonly ExperimentVariant[] | undefined, sweep: Record<string, unknown[]> | undefined): MemberPlan[] {
  const keys = Object.keys(sweep ?? {});
  const lists = keys.map((k) => sweep![k]);
  const combinations: SweepChoice[][] = [[]];
  for (let k = 0; k < keys.length; k++) {
    const next: SweepChoice[][] = [];
    for (const prefix of combinations) {
      lists[k].forEach((value, valueIndex) => next.push([...prefix, { pointer: keys[k], valueIndex, value }]));
    }
    combinations.splice(0, combinations.length, ...next);
  }
  const variantList: (ExperimentVariant | undefined)[] = variants && variants.length > 0 ? [...variants] : [undefined];
  const total = variantList.length * combinations.length;
  const width = String(total).length;
  const plans: MemberPlan[] = [];
  variantList.forEach((variant, variantIndex) => {
    for (const choices of combinations) {
      const index = plans.length;
      const parts = [String(index + 1).padStart(width, '0'), variant ? fileSafe(variant.name) || 'variant' : 'base'];
      for (const c of choices) parts.push(`${pointerText(c.pointer)}=${valueText(c.value, c.valueIndex)}`);
      plans.push({
        index,
        name: parts.join('_'),
        variantIndex: variant ? variantIndex : undefined,
        variantName: variant?.name,
        sweep: choices,
      });
    }
  });
  return plans;
}

/** The member's scenario as JSON data (not yet validated), or why a sweep pointer does not fit. */
export function memberDocument(
  base: unknown,
  variant: ExperimentVariant | undefined,
  sweep: readonly SweepChoice[],
): { ok: true; document: unknown } | { ok: false; choice: SweepChoice; reason: string } {
  let document = variant ? applyMergePatch(base, variant.set) : base;
  for (const choice of sweep) {
    const set = setJsonPointer(document, choice.pointer, choice.value);
    if (!set.ok) return { ok: false, choice, reason: set.reason };
    document = set.document;
  }
  return { ok: true, document };
}
