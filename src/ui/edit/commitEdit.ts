/**
 * The one way the editor changes the document: validate the complete candidate scenario and
 * apply it as one undoable edit only if it is valid. Returns the errors otherwise, so the caller
 * can show them where the user made the change; nothing is half-applied.
 */
import type { Scenario } from '../../model/scenario';
import { formatMessage, validateScenario, type ValidationMessage } from '../../scenario/validateScenario';
import { useScenarioStore } from '../../state/scenarioStore';

export type CommitResult = { ok: true } | { ok: false; errors: ValidationMessage[] };

export function commitEdit(next: Scenario, label: string): CommitResult {
  const store = useScenarioStore.getState();
  // The document itself, unchanged: valid already, and no edit to record.
  if (next === store.scenario) return { ok: true };
  const result = validateScenario(next);
  if (!result.ok) return { ok: false, errors: result.errors };
  // What the validator returns (the same content as `next`), so the store only ever holds checked
  // scenarios.
  store.apply(result.scenario, label);
  return { ok: true };
}

/** Errors about `path` or inside it; all errors when none is that specific. */
export function errorsAt(errors: ValidationMessage[], path: string): ValidationMessage[] {
  const here = errors.filter((e) => e.path === path || e.path.startsWith(`${path}/`));
  return here.length ? here : errors;
}

/**
 * What to show where an edit of `path` was made: null when it was applied, else its errors there
 * ('' for an edit of the whole document: every error).
 */
export function refusalAt(result: CommitResult, path = ''): string | null {
  return result.ok ? null : errorsAt(result.errors, path).map(formatMessage).join('; ');
}
