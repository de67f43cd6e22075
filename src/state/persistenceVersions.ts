/**
 * Crash-safe project records. A save writes the new version under a key of its own and switches
 * the project's head (which version is current, which came before) in one transaction, then
 * forgets the version before that. A tab closed or a write failing at any point leaves a head
 * that names complete versions: the new one, or the previous good one.
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

/** The head as stored, or the implied one of a project stored before heads existed. */
function asHead(id: string, head: unknown): ProjectHead {
  const stored = head as Partial<ProjectHead> | undefined;
  if (stored && typeof stored.current === 'string') return { current: stored.current, previous: typeof stored.previous === 'string' ? stored.previous : null };
  return { current: projectKey(id), previous: null };
}

/** The head, or the implied one of a project stored before heads existed. */
export async function readHead(storage: KeyValueStorage, id: string): Promise<ProjectHead> {
  return asHead(id, await storage.get<ProjectHead>(headKey(id)));
}

/** Writes the first version of a new project and its head, in one transaction. */
export async function writeFirstVersion(storage: KeyValueStorage, id: string, record: unknown): Promise<void> {
  await storage.replace([
    [projectKey(id), record],
    [headKey(id), { current: projectKey(id), previous: null } satisfies ProjectHead],
  ]);
}

/**
 * Saves `record` as the project's new current version; `lastGood` is the version the editor
 * holds (it becomes `previous`). Returns the new version's key.
 *
 * The version and the head go to storage in one transaction sent before this function first
 * waits, with no read before it: called from a pagehide handler, the save is on its way before
 * the page goes.
 */
export async function writeVersion(storage: KeyValueStorage, id: string, record: unknown, lastGood: string): Promise<string> {
  const key = versionKey(id);
  const written = storage.replace([
    [key, record],
    [headKey(id), { current: key, previous: lastGood } satisfies ProjectHead],
  ]);
  const old = asHead(id, (await written)[1]);
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
