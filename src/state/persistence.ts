/**
 * Where projects are kept: IndexedDB through idb-keyval, or memory when IndexedDB cannot be used
 * (private windows in some browsers, blocked storage). The store works the same either way; only
 * the warning differs.
 */
import { createStore, del, get, promisifyRequest, set, update, type UseStore } from 'idb-keyval';

export interface KeyValueStorage {
  get<T>(key: string): Promise<T | undefined>;
  set(key: string, value: unknown): Promise<void>;
  del(key: string): Promise<void>;
  /**
   * Writes every entry in one transaction (all of them or none) and resolves to the values they
   * replaced, in order. The writes are sent at once, not after a reply from the database, so a
   * call made while the page is being hidden or closed still reaches it.
   */
  replace(entries: [key: string, value: unknown][]): Promise<unknown[]>;
  /**
   * Reads, changes and writes one key in one transaction: no other tab's write comes between the
   * read and the write. Resolves to the value written. `change` must not have effects.
   */
  update<T>(key: string, change: (old: T | undefined) => T): Promise<T>;
}

export function memoryStorage(): KeyValueStorage {
  const data = new Map<string, unknown>();
  const read = (key: string) => (data.has(key) ? structuredClone(data.get(key)) : undefined);
  return {
    get: async <T,>(key: string) => read(key) as T | undefined,
    set: async (key, value) => void data.set(key, structuredClone(value)),
    del: async (key) => void data.delete(key),
    // Everything is copied before anything is written: a value that cannot be copied writes nothing.
    async replace(entries) {
      const old = entries.map(([key]) => read(key));
      const copies = entries.map(([key, value]) => [key, structuredClone(value)] as const);
      for (const [key, value] of copies) data.set(key, value);
      return old;
    },
    // Read, change and write with nothing in between: as atomic as IndexedDB's transaction.
    async update<T>(key: string, change: (old: T | undefined) => T) {
      const next = change(read(key) as T | undefined);
      data.set(key, structuredClone(next));
      return next;
    },
  };
}

export function indexedDbStorage(store: UseStore = createStore('firnline', 'projects')): KeyValueStorage {
  return {
    get: <T,>(key: string) => get<T>(key, store),
    set: (key, value) => set(key, value, store),
    del: (key) => del(key, store),
    replace: (entries) =>
      store('readwrite', (objectStore) => {
        // Requests of one transaction run in order: each read sees the value before the writes,
        // and the writes do not wait for the reads' replies.
        const old = Promise.all(entries.map(([key]) => promisifyRequest(objectStore.get(key))));
        old.catch(() => undefined);
        for (const [key, value] of entries) objectStore.put(value, key);
        // Nothing more comes: commit now rather than when the page next goes idle (it may not).
        const transaction = objectStore.transaction as IDBTransaction & { commit?: () => void };
        transaction.commit?.();
        return promisifyRequest(transaction).then(() => old);
      }),
    async update<T>(key: string, change: (old: T | undefined) => T) {
      let next: T | undefined;
      await update<T>(key, (old) => (next = change(old)), store);
      return next as T;
    },
  };
}

export interface OpenedStorage {
  storage: KeyValueStorage;
  /** Set when projects will not outlive the tab. */
  warning: string | null;
}

export const MEMORY_ONLY_WARNING =
  'This browser does not allow saving (IndexedDB is unavailable). You can keep working, but projects last only until this tab is closed; save scenarios you want to keep as files.';

export const STORAGE_FULL_WARNING =
  "The browser's storage for this site is full (QuotaExceededError), so projects cannot be saved. You can keep working, but projects last only until this tab is closed; save scenarios you want to keep as files, or free space by clearing this site's data.";

/** A write refused because the site's storage is full (the DOMException, or its legacy code). */
export function isQuotaExceeded(error: unknown): boolean {
  if (typeof error !== 'object' || error === null) return false;
  const { name, code } = error as { name?: unknown; code?: unknown };
  return name === 'QuotaExceededError' || name === 'NS_ERROR_DOM_QUOTA_REACHED' || code === 22;
}

/** IndexedDB if a write and a read-back succeed, else memory with a warning. */
export async function openStorage(open: () => KeyValueStorage = indexedDbStorage): Promise<OpenedStorage> {
  try {
    if (open === indexedDbStorage && typeof indexedDB === 'undefined') throw new Error('no IndexedDB');
    const storage = open();
    await storage.set('probe', 1);
    if ((await storage.get<number>('probe')) !== 1) throw new Error('read-back failed');
    return { storage, warning: null };
  } catch (error) {
    return { storage: memoryStorage(), warning: isQuotaExceeded(error) ? STORAGE_FULL_WARNING : MEMORY_ONLY_WARNING };
  }
}
