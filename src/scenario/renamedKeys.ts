/**
 * Keys the scenario format has renamed. Files and saved projects written with an old name still
 * open: the one validator (and the inversion's input, and the experiment file's pointers) read
 * the old name as the new one, say so in a warning, and give back the scenario under the new
 * name, key order kept. Both names at once are refused: which one was meant cannot be known.
 */
import type { ValidationMessage } from './validationMessage';

interface RenamedKey {
  /** Path of the object holding the key. */
  parent: readonly string[];
  old: string;
  current: string;
}

/** massBalance.gradient became ablationGradient, the pair of accumulationGradient. */
export const RENAMED_KEYS: readonly RenamedKey[] = [{ parent: ['massBalance'], old: 'gradient', current: 'ablationGradient' }];

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

const pointerOf = (tokens: readonly string[]) => '/' + tokens.join('/');

export interface KeyMigration {
  /** The input with every old key renamed (the input itself when nothing was renamed). */
  value: unknown;
  /** Refusals: an object that holds both names. */
  errors: ValidationMessage[];
  /** One note per renamed key, for the warnings. */
  notes: ValidationMessage[];
}

/** The object with `old` renamed to `current` in place (same key order). */
function renameKey(object: Record<string, unknown>, old: string, current: string): Record<string, unknown> {
  const renamed: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(object)) renamed[key === old ? current : key] = value;
  return renamed;
}

/**
 * Renames old keys in a scenario (or in a JSON Merge Patch on one, whose null deletes a key: the
 * rename keeps the null). `at` prefixes the pointers in the messages (e.g. "/base").
 */
export function migrateScenarioKeys(input: unknown, at = ''): KeyMigration {
  let value = input;
  const errors: ValidationMessage[] = [];
  const notes: ValidationMessage[] = [];
  for (const { parent, old, current } of RENAMED_KEYS) {
    if (!isObject(value)) break;
    // Walk to the parent, copying each object on the way so the input is never changed.
    const chain: Record<string, unknown>[] = [value];
    for (const token of parent) {
      const next = chain[chain.length - 1][token];
      if (!isObject(next)) break;
      chain.push(next);
    }
    if (chain.length !== parent.length + 1) continue;
    const holder = chain[chain.length - 1];
    if (!Object.hasOwn(holder, old)) continue;
    const oldPath = at + pointerOf([...parent, old]);
    const newPath = at + pointerOf([...parent, current]);
    if (Object.hasOwn(holder, current)) {
      errors.push({
        path: oldPath,
        message: `both ${oldPath} (the old name) and ${newPath} are given; keep only ${newPath}, the new name of the same value`,
      });
      continue;
    }
    let rebuilt = renameKey(holder, old, current);
    for (let depth = parent.length - 1; depth >= 0; depth--) rebuilt = { ...chain[depth], [parent[depth]]: rebuilt };
    value = rebuilt;
    notes.push({ path: newPath, message: `${oldPath} is the old name of ${newPath}; it was read as ${current}; write ${current} in new files` });
  }
  return { value, errors, notes };
}

/** A JSON Pointer into a scenario with an old key replaced by the new one (others unchanged). */
export function migrateScenarioPointer(pointer: string): string {
  for (const { parent, old, current } of RENAMED_KEYS) {
    const oldPath = pointerOf([...parent, old]);
    if (pointer === oldPath || pointer.startsWith(oldPath + '/')) return pointerOf([...parent, current]) + pointer.slice(oldPath.length);
  }
  return pointer;
}
