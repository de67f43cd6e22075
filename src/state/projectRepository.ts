/**
 * The stored projects: the list of projects (id, name, times) under one key, the last one open,
 * and each project's versioned records (persistenceVersions). Records read back are validated,
 * never trusted. Knows nothing of the editor or of other tabs; the project store decides what to
 * read and write and when.
 */
import type { Experiment } from '../experiment/experimentSchema';
import { validateScenario, type ValidScenario } from '../scenario/validateScenario';
import type { KeyValueStorage } from './persistence';
import { deleteVersions, readHead, writeFirstVersion, writeVersion } from './persistenceVersions';

export interface ProjectMeta {
  id: string;
  name: string;
  /** Milliseconds since 1970. */
  created: number;
  modified: number;
}

export interface SavedProject {
  /** Saved only after the validator made it, and validated again when read back. */
  scenario: ValidScenario;
  /** Model year selected when last saved, shown again once a run reaches it. */
  time: number | null;
  /**
   * The experiments view's experiment (the firnline-experiment format), when there is one.
   * Optional: projects saved before experiments existed have none and open as before.
   */
  experiment?: Experiment;
}

export const PROJECTS_KEY = 'projects';
export const CURRENT_KEY = 'current';

export interface ReadProject {
  record: SavedProject;
  version: string;
  /** Set when the latest version was unusable and the previous one was read instead. */
  notice: string | null;
}

export interface ProjectRepository {
  /** The stored list of projects. */
  list(): Promise<ProjectMeta[]>;
  /** The project open when the app was last used, if stored. */
  lastOpened(): Promise<string | undefined>;
  setLastOpened(id: string): Promise<void>;
  /** The current version, else the previous one with a notice naming `name`, else why neither. */
  read(id: string, name: string): Promise<ReadProject | string>;
  /** Stores a new project; its name is chosen from the names already listed. */
  add(name: (taken: Set<string>) => string, record: SavedProject): Promise<{ meta: ProjectMeta; projects: ProjectMeta[] }>;
  /** Saves a new version of a project over `lastGood` and marks it modified. */
  save(id: string, record: SavedProject, lastGood: string | null): Promise<{ version: string; projects: ProjectMeta[] }>;
  rename(id: string, name: string): Promise<ProjectMeta[]>;
  /** Takes a project off the list (its records stay until deleteRecords). */
  unlist(id: string): Promise<ProjectMeta[]>;
  /** Deletes every version of a project. */
  deleteRecords(id: string): Promise<void>;
}

export interface RepositoryOptions {
  /** Milliseconds since 1970, for the projects' times. */
  now: () => number;
  newId?: () => string;
}

function randomId(): string {
  return globalThis.crypto?.randomUUID?.() ?? `${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}`;
}

/** A stored record that still validates; stored data from elsewhere is checked, never trusted. */
async function readVersion(storage: KeyValueStorage, key: string): Promise<SavedProject | string> {
  const record = await storage.get<SavedProject>(key);
  if (!record || typeof record !== 'object') return 'its saved data is missing';
  const checked = validateScenario(record.scenario);
  if (!checked.ok) return `its saved scenario is not valid (${checked.errors[0]?.message ?? 'unknown problem'})`;
  const time = typeof record.time === 'number' ? record.time : null;
  // The experiment is checked when it is shown, not here: it may hold thousands of members.
  return record.experiment === undefined ? { scenario: checked.scenario, time } : { scenario: checked.scenario, time, experiment: record.experiment };
}

export function createProjectRepository(storage: KeyValueStorage, { now, newId = randomId }: RepositoryOptions): ProjectRepository {
  /**
   * Every change of the list is a read-modify-write of the stored list in one transaction, never
   * a write of the list this tab last saw: another tab may have added, renamed or removed
   * projects since, and their changes are kept. Resolves to the list as stored after the change.
   */
  const changeList = (change: (projects: ProjectMeta[]) => ProjectMeta[]): Promise<ProjectMeta[]> =>
    storage.update<ProjectMeta[]>(PROJECTS_KEY, (stored) => change(Array.isArray(stored) ? stored : []));

  return {
    async list() {
      return (await storage.get<ProjectMeta[]>(PROJECTS_KEY)) ?? [];
    },

    lastOpened: () => storage.get<string>(CURRENT_KEY),
    setLastOpened: (id) => storage.set(CURRENT_KEY, id),

    async read(id, name) {
      const head = await readHead(storage, id);
      const latest = await readVersion(storage, head.current);
      if (typeof latest !== 'string') return { record: latest, version: head.current, notice: null };
      if (head.previous) {
        const previous = await readVersion(storage, head.previous);
        if (typeof previous !== 'string') {
          const notice = `The latest save of "${name}" could not be used (${latest}); the previous saved version was opened instead.`;
          return { record: previous, version: head.previous, notice };
        }
      }
      return latest;
    },

    async add(name, record) {
      const id = newId();
      await writeFirstVersion(storage, id, record);
      const time = now();
      let meta: ProjectMeta | undefined;
      const projects = await changeList((list) => {
        meta = { id, name: name(new Set(list.map((p) => p.name))), created: time, modified: time };
        return [...list, meta];
      });
      return { meta: meta!, projects };
    },

    async save(id, record, lastGood) {
      const version = await writeVersion(storage, id, record, lastGood ?? (await readHead(storage, id)).current);
      const time = now();
      const projects = await changeList((list) => list.map((p) => (p.id === id ? { ...p, modified: time } : p)));
      return { version, projects };
    },

    rename(id, name) {
      const time = now();
      return changeList((list) => list.map((p) => (p.id === id ? { ...p, name, modified: time } : p)));
    },

    unlist: (id) => changeList((list) => list.filter((p) => p.id !== id)),
    deleteRecords: (id) => deleteVersions(storage, id),
  };
}
