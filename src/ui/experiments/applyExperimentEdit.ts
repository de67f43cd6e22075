/**
 * Applies a complete next experiment through the store (the one validator) and words a refusal
 * for the form that asked: messages about a variant's name say "Name", others keep the
 * validator's JSON Pointer, variant and member.
 */
import type { Experiment } from '../../experiment/experimentSchema';
import { formatMessage } from '../../scenario/validationMessage';
import { useExperimentStore } from '../../state/experimentStore';
import type { SetResult } from './experimentSets';

export async function applyExperimentEdit(next: Experiment): Promise<string[]> {
  const result = await useExperimentStore.getState().edit(next);
  if (result.ok) return [];
  return result.errors.map((e) => (/^\/variants\/\d+\/name$/.test(e.path) ? `Name: ${e.message}` : e.path === '' ? e.message : formatMessage(e)));
}

/**
 * Applies a generated set and reports back to its form: the field errors of the generator, the
 * validator's refusal, or the note saying what was made.
 */
export async function applyMadeSet(made: SetResult, setErrors: (errors: string[]) => void, setNote: (note: string) => void): Promise<void> {
  if (!made.ok) return setErrors(made.errors.map((e) => `${e.field}: ${e.message}`));
  const refused = await applyExperimentEdit(made.experiment);
  setErrors(refused);
  if (!refused.length) setNote(made.note);
}
