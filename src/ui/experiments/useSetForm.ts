/**
 * What the forms that add a set of variants (ladder, sweep, spread) share: the form's errors and
 * note, and a submit that reads the typed fields (a list of errors when they cannot be read) or
 * makes the set and applies it through the one validator (applyMadeSet).
 */
import { useState, type FormEvent } from 'react';
import { applyMadeSet } from './applyExperimentEdit';
import type { SetResult } from './experimentSets';

export function useSetForm(make: () => SetResult | string[]) {
  const [errors, setErrors] = useState<string[]>([]);
  const [note, setNote] = useState<string | null>(null);
  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    setNote(null);
    const made = make();
    if (Array.isArray(made)) setErrors(made);
    else void applyMadeSet(made, setErrors, setNote);
  };
  return { errors, note, clearErrors: () => setErrors([]), onSubmit };
}
