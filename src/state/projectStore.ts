/**
 * Projects: a named scenario plus where the user was (the selected model year). The open
 * project's scenario is saved about half a second after every change and restored on reload, so
 * closing the tab loses nothing. Results are not saved: they are recomputed by running again.
 *
 * createProjects builds the store from what it works with, so nothing here is shared between
 * instances: the storage (projectRepository over IndexedDB, or memory), the channel to other
 * tabs (tabLock), the page's events (autosave flushes when the page goes away), the clock and the
 * workspace (the editor's stores). The app makes one, in appProjects.ts; tests make their own.
 */
import { create, type StoreApi, type UseBoundStore } from 'zustand';
import { blankValleyScenario } from '../scenario/blankValleyScenario';
import { formatMessage } from '../scenario/validationMessage';
import { createAutosave, systemClock, type Clock, type PageEvents } from './autosave';
import { isQuotaExceeded, type KeyValueStorage, type OpenedStorage } from './persistence';
import { projectKey } from './persistenceVersions';
import { checkProjectName, copyName, newProjectName } from './projectNames';
import { createProjectRepository, type ProjectMeta, type ProjectRepository, type SavedProject } from './projectRepository';
import type { ProjectWorkspace } from './projectWorkspace';
import { demoScenario } from './scenarioStore';
import { createTabLock, type ChannelLike, type TabLock } from './tabLock';

export type { ProjectMeta, SavedProject } from './projectRepository';
export { CURRENT_KEY, PROJECTS_KEY } from './projectRepository';
export { checkProjectName, MAX_NAME_LENGTH, newProjectName } from './projectNames';
export { projectKey };
export const AUTOSAVE_DELAY_MS = 500;

export const READ_ONLY_ELSEWHERE =
  'This project is open in another tab, which saves it. This tab is read-only: edits here are not saved unless you take over.';
export const READ_ONLY_TAKEN =
  'Another tab took this project over and now saves it. This tab is read-only: edits here are not saved unless you take over.';

export interface ProjectState {
  ready: boolean;
  projects: ProjectMeta[];
  currentId: string | null;
  /** Storage problems the user must know about (memory only, a failed save). */
  storageWarning: string | null;
  /** The last thing that could not be done, in words. */
  error: string | null;
  /** Set while another tab saves the open project: this tab shows it but does not save. */
  readOnly: string | null;
  /** Opens storage and the last project (or a first one from the demo). Runs once; later calls wait for it. */
  init: () => Promise<void>;
  /** Saves from this tab again (its version of the project wins); the other tab turns read-only. */
  takeOver: () => Promise<void>;
  create: (from: 'demo' | 'blank') => Promise<void>;
  open: (id: string) => Promise<void>;
  /** Returns an error message, or null when renamed. */
  rename: (id: string, name: string) => Promise<string | null>;
  duplicate: (id: string) => Promise<void>;
  remove: (id: string) => Promise<void>;
  /** Writes the open project now (pending autosave included). */
  flush: () => Promise<void>;
  /** Stops saving and listening (the tab channel, the page, the workspace). */
  dispose: () => void;
}

export type ProjectStore = UseBoundStore<StoreApi<ProjectState>>;

export interface ProjectsOptions {
  /** The storage itself, or how to open it (the app: IndexedDB, else memory with a warning). */
  storage: KeyValueStorage | (() => Promise<OpenedStorage>);
  /** With a given storage: the warning to show about it (as openStorage words it). */
  warning?: string | null;
  /** The channel to other tabs of this app, or how to open it; null: no other tabs are heard. */
  tabs: ChannelLike | null | (() => ChannelLike | null);
  /** Where the page says it is going away; null: nowhere. */
  page: PageEvents | null;
  workspace: ProjectWorkspace;
  clock?: Clock;
  /** This tab's name on the tab channel. */
  tabId?: string;
}

export function createProjects(options: ProjectsOptions): ProjectStore {
  const { workspace, page, clock = systemClock } = options;
  let repository: ProjectRepository | null = null;
  let tabLock: TabLock | null = null;
  /** While a project is being loaded its own scenario change must not count as an edit. */
  let loading = false;
  /** Storage key of the version the editor was loaded from or last saved to (the last good one). */
  let currentVersion: string | null = null;
  let started: Promise<void> | null = null;
  let stopWatching: (() => void) | null = null;
  let disposed = false;

  return create<ProjectState>()((set, get) => {
    const failed = (what: string, error: unknown) =>
      set({
        storageWarning: isQuotaExceeded(error)
          ? `${what} failed: the browser's storage for this site is full (QuotaExceededError). Your work is still open in this tab, but it is not being kept; save the scenario as a file, or free space by deleting projects or site data.`
          : `${what} failed (${error instanceof Error ? error.message : String(error)}). Your work is still open in this tab; save the scenario as a file to keep it.`,
      });

    const nameOf = (id: string) => get().projects.find((p) => p.id === id)?.name ?? 'this project';

    const save = async () => {
      const { currentId, readOnly } = get();
      // A read-only tab never writes: the tab that holds the project would be overwritten.
      if (!repository || !currentId || readOnly) return;
      try {
        const saved = await repository.save(currentId, workspace.snapshot(), currentVersion);
        currentVersion = saved.version;
        set({ projects: saved.projects });
      } catch (error) {
        failed('Saving the project', error);
      }
    };

    const autosave = createAutosave({ save, delayMs: AUTOSAVE_DELAY_MS, clock, page });

    /** Makes a project current: its scenario goes into the editor, old results are dropped. */
    /** Returns a notice when the project's saved experiment had to be left out. */
    const show = async (id: string, record: SavedProject, version: string = projectKey(id)): Promise<string | null> => {
      loading = true;
      try {
        currentVersion = version;
        const leftOut = await workspace.show(record, 'Open project');
        set({ currentId: id, error: null, readOnly: null });
        tabLock?.announce(id);
        await repository!.setLastOpened(id);
        if (!leftOut) return null;
        const problem = leftOut[0] ? formatMessage(leftOut[0]) : 'unknown problem';
        return `Project "${nameOf(id)}": its saved experiment is not valid (${problem}) and was left out; the scenario opened as saved.`;
      } finally {
        loading = false;
      }
    };

    const add = async (name: (taken: Set<string>) => string, record: SavedProject) => {
      const added = await repository!.add(name, record);
      set({ projects: added.projects });
      return added.meta;
    };

    const openTabs = () => (typeof options.tabs === 'function' ? options.tabs() : options.tabs);

    const start = async () => {
      const channel = openTabs();
      tabLock = channel
        ? createTabLock(
            channel,
            {
              heldElsewhere: (project) => {
                if (project === get().currentId) set({ readOnly: READ_ONLY_ELSEWHERE });
              },
              takenOver: (project) => {
                if (project === get().currentId) set({ readOnly: READ_ONLY_TAKEN });
              },
            },
            options.tabId,
          )
        : null;
      const opened = typeof options.storage === 'function' ? await options.storage() : { storage: options.storage, warning: options.warning ?? null };
      repository = createProjectRepository(opened.storage, { now: () => clock.now() });
      set({ storageWarning: opened.warning });
      try {
        const projects = await repository.list();
        set({ projects });
        const lastId = await repository.lastOpened();
        const candidates = [lastId, ...projects.map((p) => p.id)].filter((id): id is string => typeof id === 'string');
        let shown = false;
        let problem: string | null = null;
        for (const id of new Set(candidates)) {
          if (!projects.some((p) => p.id === id)) continue;
          const record = await repository.read(id, nameOf(id));
          if (typeof record === 'string') {
            problem ??= `Project "${projects.find((p) => p.id === id)?.name}" could not be opened: ${record}. It is left as it was.`;
            continue;
          }
          const left = await show(id, record.record, record.version);
          problem = record.notice ?? left ?? problem;
          shown = true;
          break;
        }
        if (!shown) {
          // A new name when a project that could not be opened holds the demo's: two list entries
          // of one name would leave the user guessing which is the broken one.
          const meta = await add((taken) => newProjectName('demo', taken), { scenario: demoScenario, time: null });
          await show(meta.id, { scenario: demoScenario, time: null });
        }
        set({ error: problem });
      } catch (error) {
        failed('Opening saved projects', error);
      }
      set({ ready: true });
      if (disposed) return;
      autosave.start();
      stopWatching = workspace.onChange(() => {
        if (!loading && get().ready) autosave.schedule();
      });
    };

    return {
      ready: false,
      projects: [],
      currentId: null,
      storageWarning: null,
      error: null,
      readOnly: null,

      init() {
        started ??= start();
        return started;
      },

      async create(from) {
        await get().flush();
        const scenario = from === 'demo' ? demoScenario : blankValleyScenario();
        try {
          const meta = await add((taken) => newProjectName(from, taken), { scenario, time: null });
          await show(meta.id, { scenario, time: null });
        } catch (error) {
          failed('Creating the project', error);
        }
      },

      async open(id) {
        if (id === get().currentId) return;
        await get().flush();
        try {
          const record = await repository!.read(id, nameOf(id));
          if (typeof record === 'string') {
            set({ error: `That project could not be opened: ${record}. It is left as it was.` });
            return;
          }
          const left = await show(id, record.record, record.version);
          if (record.notice || left) set({ error: record.notice ?? left });
        } catch (error) {
          failed('Opening the project', error);
        }
      },

      async rename(id, name) {
        const problem = checkProjectName(name);
        if (problem) return problem;
        try {
          set({ projects: await repository!.rename(id, name.trim()) });
        } catch (error) {
          failed('Renaming the project', error);
        }
        return null;
      },

      async duplicate(id) {
        await get().flush();
        const original = get().projects.find((p) => p.id === id);
        if (!original) return;
        try {
          const record = await repository!.read(id, original.name);
          if (typeof record === 'string') {
            set({ error: `That project could not be duplicated: ${record}.` });
            return;
          }
          const { scenario, time, experiment } = record.record;
          const meta = await add((taken) => copyName(original.name, taken), { scenario, time, ...(experiment ? { experiment } : {}) });
          await show(meta.id, record.record);
        } catch (error) {
          failed('Duplicating the project', error);
        }
      },

      async remove(id) {
        const { currentId } = get();
        if (id === currentId) autosave.cancel();
        try {
          const rest = await repository!.unlist(id);
          set({ projects: rest });
          await repository!.deleteRecords(id);
          if (id !== currentId) return;
          set({ currentId: null });
          const next = rest[rest.length - 1];
          const record = next ? await repository!.read(next.id, next.name) : undefined;
          if (next && record && typeof record !== 'string') {
            await show(next.id, record.record, record.version);
          } else {
            // Never leave the workbench without a project: the demo can always be reopened.
            const meta = await add(() => demoScenario.name ?? 'Demo', { scenario: demoScenario, time: null });
            await show(meta.id, { scenario: demoScenario, time: null });
          }
        } catch (error) {
          failed('Deleting the project', error);
        }
      },

      async takeOver() {
        if (!get().readOnly) return;
        tabLock?.takeOver();
        set({ readOnly: null });
        autosave.cancel();
        await save();
      },

      flush: () => autosave.flush(),

      dispose() {
        disposed = true;
        autosave.dispose();
        stopWatching?.();
        stopWatching = null;
        tabLock?.close();
        tabLock = null;
      },
    };
  });
}
