/**
 * The members of an experiment: every variant (or the base alone) times every combination of the
 * sweep values, in a fixed order (variants in file order; for each, the sweep combinations with
 * the first sweep key varying slowest, like nested loops). Each member gets a stable, file-safe
 * name: its 1-based number padded to a common width (so names sort in member order and are
 * unique), the variant's name and each swept value.
 */
import { applyMergePatch } from '../json/jsonMergePatch';
import { parseJsonPointer, resolveJsonPointer } from '../json/jsonPointer';
import { setJsonPointer } from '../json/jsonPointerSet';
import type { EnsembleSamples } from './ensemble';
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
  /** Ensemble sample (0-based) and its values, when the experiment has an ensemble. */
  sample?: { index: number; values: { pointer: string; value: number }[] };
  /** Ensemble group (0-based): the members that share variant and sweep values, differing only in the sample. */
  group: number;
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

export function memberCount(variantCount: number, sweep: Record<string, unknown[]> | undefined, ensembleMembers = 1): number {
  let count = Math.max(1, variantCount) * ensembleMembers;
  for (const values of Object.values(sweep ?? {})) count *= values.length;
  return count;
}

export function planMembers(
  variants: readonly ExperimentVariant[] | undefined,
  sweep: Record<string, unknown[]> | undefined,
  samples?: EnsembleSamples,
): MemberPlan[] {
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
  const sampleCount = samples ? samples.values.length : 1;
  const total = variantList.length * combinations.length * sampleCount;
  const width = String(total).length;
  const sampleWidth = String(sampleCount).length;
  const plans: MemberPlan[] = [];
  let group = 0;
  variantList.forEach((variant, variantIndex) => {
    for (const choices of combinations) {
      for (let s = 0; s < sampleCount; s++) {
        const index = plans.length;
        const parts = [String(index + 1).padStart(width, '0'), variant ? fileSafe(variant.name) || 'variant' : 'base'];
        for (const c of choices) parts.push(`${pointerText(c.pointer)}=${valueText(c.value, c.valueIndex)}`);
        if (samples) parts.push(`e${String(s + 1).padStart(sampleWidth, '0')}`);
        plans.push({
          index,
          name: parts.join('_'),
          variantIndex: variant ? variantIndex : undefined,
          variantName: variant?.name,
          sweep: choices,
          ...(samples ? { sample: { index: s, values: samples.pointers.map((pointer, j) => ({ pointer, value: samples.values[s][j] })) } } : {}),
          group,
        });
      }
      group++;
    }
  });
  return plans;
}

/** The member's scenario as JSON data (not yet validated), or why a sweep pointer does not fit. */
export function memberDocument(
  base: unknown,
  variant: ExperimentVariant | undefined,
  sweep: readonly SweepChoice[],
  sample?: MemberPlan['sample'],
): { ok: true; document: unknown } | { ok: false; choice: SweepChoice; reason: string } | { ok: false; parameter: string; reason: string } {
  let document = variant ? applyMergePatch(base, variant.set) : base;
  for (const choice of sweep) {
    const set = setJsonPointer(document, choice.pointer, choice.value);
    if (!set.ok) return { ok: false, choice, reason: set.reason };
    document = set.document;
  }
  for (const { pointer, value } of sample?.values ?? []) {
    // An ensemble parameter replaces a number; it never adds a key or replaces a list or object.
    const current = resolveJsonPointer(document, pointer);
    if (!current.found) return { ok: false, parameter: pointer, reason: 'it names no value in the scenario' };
    if (typeof current.value !== 'number') {
      return { ok: false, parameter: pointer, reason: `it names ${current.value === null ? 'null' : Array.isArray(current.value) ? 'a list' : `a ${typeof current.value}`}, not a number` };
    }
    const set = setJsonPointer(document, pointer, value);
    if (!set.ok) return { ok: false, parameter: pointer, reason: set.reason };
    document = set.document;
  }
  return { ok: true, document };
}
