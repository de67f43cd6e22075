/**
 * Applies a complete next experiment through the store (the one validator) and words a refusal
 * for the form that asked: messages about a variant's name say "Name", others keep the
 * validator's JSON Pointer, variant and member.
 */
import type { Experiment } from '../../io/experimentSchema';
import { formatMessage } from '../../io/validationMessage';
import { useExperimentStore } from '../../state/experimentStore';

export async function applyExperimentEdit(next: Experiment): Promise<string[]> {
  const result = await useExperimentStore.getState().edit(next);
  if (result.ok) return [];
  return result.errors.map((e) => (/^\/variants\/\d+\/name$/.test(e.path) ? `Name: ${e.message}` : e.path === '' ? e.message : formatMessage(e)));
}
