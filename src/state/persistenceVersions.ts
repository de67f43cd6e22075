/**
 * Crash-safe project records. A save writes the new version completely under a key of its own,
 * then switches the project's head (which version is current, which came before) in one write,
 * then forgets the version before that. A tab closed or a write failing at any point leaves a
 * head that names complete versions: the new one, or the previous good one.
 */
import type { KeyValueStorage } from './persistence';

export interface ProjectHead {
  current: string;
  /** The version saved before `current`, kept until the next save succeeds. */
  previous: string | null;
}

/** The first version of a project (and the only one before versioned saves existed). */
export const projectKey = (id: string) => `project:${id}`;
export const headKey = (id: string) => `head:${id}`;

/** A name no other save (of this tab or another) will use. */
export function uniqueSuffix(): string {
  const random = globalThis.crypto?.randomUUID?.() ?? `${Math.random().toString(36).slice(2)}${Math.random().toString(36).slice(2)}`;
  return `${Date.now().toString(36)}-${random}`;
}

const versionKey = (id: string) => `${projectKey(id)}@${uniqueSuffix()}`;

/** The head, or the implied one of a project stored before heads existed. */
export async function readHead(storage: KeyValueStorage, id: string): Promise<ProjectHead> {
  const head = await storage.get<ProjectHead>(headKey(id));
  if (head && typeof head.current === 'string') return { current: head.current, previous: typeof head.previous === 'string' ? head.previous : null };
  return { current: projectKey(id), previous: null };
}

/** Writes the first version of a new project. */
export async function writeFirstVersion(storage: KeyValueStorage, id: string, record: unknown): Promise<void> {
  await storage.set(projectKey(id), record);
  await storage.set(headKey(id), { current: projectKey(id), previous: null } satisfies ProjectHead);
}

/**
 * Saves `record` as the project's new current version; `lastGood` is the version the editor
 * holds (it becomes `previous`). Returns the new version's key.
 */
export async function writeVersion(storage: KeyValueStorage, id: string, record: unknown, lastGood: string): Promise<string> {
  const old = await readHead(storage, id);
  const key = versionKey(id);
  await storage.set(key, record);
  await storage.set(headKey(id), { current: key, previous: lastGood } satisfies ProjectHead);
  // Versions no longer named by the head; losing this clean-up costs space, never data.
  for (const stale of new Set([old.current, old.previous])) {
    if (stale && stale !== key && stale !== lastGood) await storage.del(stale).catch(() => undefined);
  }
  return key;
}

/** Removes every version of a project and its head. */
export async function deleteVersions(storage: KeyValueStorage, id: string): Promise<void> {
  const head = await readHead(storage, id);
  await storage.del(headKey(id));
  for (const key of new Set([head.current, head.previous, projectKey(id)])) if (key) await storage.del(key);
}

/** The record the head names as current (unchecked; the project store validates it). */
export async function readCurrentRecord<T>(storage: KeyValueStorage, id: string): Promise<T | undefined> {
  return storage.get<T>((await readHead(storage, id)).current);
}
