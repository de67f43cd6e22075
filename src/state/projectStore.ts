/**
 * Projects: a named scenario plus where the user was (the selected model year). The open
 * project's scenario is saved about half a second after every change and restored on reload, so
 * closing the tab loses nothing. Results are not saved: they are recomputed by running again.
 */
import { create } from 'zustand';
import { blankValleyScenario } from '../scenario/blankValleyScenario';
import type { Experiment } from '../experiment/experimentSchema';
import { validateScenario, type ValidScenario } from '../scenario/validateScenario';
import { formatMessage } from '../scenario/validationMessage';
import type { Scenario } from '../model/scenario';
import { isQuotaExceeded, openStorage, type KeyValueStorage } from './persistence';
import { deleteVersions, projectKey, readHead, writeFirstVersion, writeVersion } from './persistenceVersions';
import { useExperimentStore } from './experimentStore';
import { usePlaybackStore } from './playbackStore';
import { browserTabChannel, createTabLock, type ChannelLike, type TabLock } from './tabLock';
import { useRunStore } from './runStore';
import { demoScenario, useScenarioStore } from './scenarioStore';

export interface ProjectMeta {
  id: string;
  name: string;
  /** Milliseconds since 1970. */
  created: number;
  modified: number;
}

export interface SavedProject {
  scenario: Scenario;
  /** Model year selected when last saved, shown again once a run reaches it. */
  time: number | null;
  /**
   * The experiments view's experiment (the firnline-experiment format), when there is one.
   * Optional: projects saved before experiments existed have none and open as before.
   */
  experiment?: Experiment;
}

/** A saved record as read back: its scenario has been through the validator again. */
interface OpenedProject extends SavedProject {
  scenario: ValidScenario;
}

export const PROJECTS_KEY = 'projects';
export const CURRENT_KEY = 'current';
export { projectKey };
export const AUTOSAVE_DELAY_MS = 500;
export const MAX_NAME_LENGTH = 100;

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
  /**
   * Opens storage and the last project (or a first one from the demo); call once at start-up.
   * `tabs`: the channel to other tabs (default: the browser's BroadcastChannel).
   */
  init: (storage?: KeyValueStorage, warning?: string | null, tabs?: ChannelLike | null) => Promise<void>;
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
}

let storage: KeyValueStorage | undefined;
let timer: ReturnType<typeof setTimeout> | undefined;
/** While a project is being loaded its own scenario change must not count as an edit. */
let loading = false;
let unsubscribe: (() => void) | undefined;
/** Storage key of the version the editor was loaded from or last saved to (the last good one). */
let currentVersion: string | null = null;
let tabLock: TabLock | null = null;

export const READ_ONLY_ELSEWHERE =
  'This project is open in another tab, which saves it. This tab is read-only: edits here are not saved unless you take over.';
export const READ_ONLY_TAKEN =
  'Another tab took this project over and now saves it. This tab is read-only: edits here are not saved unless you take over.';

interface ReadProject {
  record: OpenedProject;
  version: string;
  /** Set when the latest version was unusable and the previous one was read instead. */
  notice: string | null;
}

/** The experiment to save with the project (none until the experiments view made one). */
function currentExperiment(): Pick<SavedProject, 'experiment'> {
  const experiment = useExperimentStore.getState().experiment;
  return experiment ? { experiment } : {};
}

function newId(): string {
  return globalThis.crypto?.randomUUID?.() ?? `${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}`;
}

/** "Copy of X", or "Copy 2 of X" when that name is taken. */
/** The demo's own name (or "Blank valley"), else "Demo 2", "Demo 3", ... whichever is free. */
export function newProjectName(from: 'demo' | 'blank', taken: Set<string>): string {
  let name = from === 'demo' ? (demoScenario.name ?? 'Demo') : 'Blank valley';
  for (let k = 2; taken.has(name); k++) name = `${from === 'demo' ? 'Demo' : 'Blank valley'} ${k}`;
  return name;
}

function copyName(name: string, taken: Set<string>): string {
  let candidate = `Copy of ${name}`;
  for (let k = 2; taken.has(candidate); k++) candidate = `Copy ${k} of ${name}`;
  return candidate.slice(0, MAX_NAME_LENGTH);
}

export function checkProjectName(name: string): string | null {
  const trimmed = name.trim();
  if (!trimmed) return 'A project name needs at least one character other than spaces.';
  if (trimmed.length > MAX_NAME_LENGTH) return `A project name can have at most ${MAX_NAME_LENGTH} characters; this one has ${trimmed.length}.`;
  return null;
}

function currentTime(): number | null {
  const frames = useRunStore.getState().frames;
  if (!frames.length) return usePlaybackStore.getState().pendingTime;
  return frames[Math.min(usePlaybackStore.getState().index, frames.length - 1)].time;
}

export const useProjectStore = create<ProjectState>()((set, get) => {
  const failed = (what: string, error: unknown) =>
    set({
      storageWarning: isQuotaExceeded(error)
        ? `${what} failed: the browser's storage for this site is full (QuotaExceededError). Your work is still open in this tab, but it is not being kept; save the scenario as a file, or free space by deleting projects or site data.`
        : `${what} failed (${error instanceof Error ? error.message : String(error)}). Your work is still open in this tab; save the scenario as a file to keep it.`,
    });

  const writeList = async (projects: ProjectMeta[]) => {
    set({ projects });
    await storage!.set(PROJECTS_KEY, projects);
  };

  const save = async () => {
    clearTimeout(timer);
    timer = undefined;
    const { currentId, projects, readOnly } = get();
    // A read-only tab never writes: the tab that holds the project would be overwritten.
    if (!storage || !currentId || readOnly) return;
    const record: SavedProject = { scenario: useScenarioStore.getState().scenario, time: currentTime(), ...currentExperiment() };
    try {
      currentVersion = await writeVersion(storage, currentId, record, currentVersion ?? (await readHead(storage, currentId)).current);
      await writeList(projects.map((p) => (p.id === currentId ? { ...p, modified: Date.now() } : p)));
    } catch (error) {
      failed('Saving the project', error);
    }
  };

  const schedule = () => {
    if (loading || !get().ready) return;
    clearTimeout(timer);
    timer = setTimeout(() => void save(), AUTOSAVE_DELAY_MS);
  };

  /** Makes a project current: its scenario goes into the editor, old results are dropped. */
  /** Returns a notice when the project's saved experiment had to be left out. */
  const show = async (id: string, record: OpenedProject, version: string = projectKey(id)): Promise<string | null> => {
    loading = true;
    try {
      currentVersion = version;
      useRunStore.getState().reset();
      useScenarioStore.getState().load(record.scenario, 'Open project');
      // Checked by the experiment store (off the page's thread when large); one that no longer
      // validates is left out, and the scenario opens as saved.
      const experiment = await useExperimentStore.getState().load(record.experiment ?? null);
      if (!experiment.ok) await useExperimentStore.getState().load(null);
      usePlaybackStore.getState().setPendingTime(record.time);
      set({ currentId: id, error: null, readOnly: null });
      tabLock?.announce(id);
      await storage!.set(CURRENT_KEY, id);
      if (experiment.ok) return null;
      const name = get().projects.find((p) => p.id === id)?.name ?? 'this project';
      const problem = experiment.errors[0] ? formatMessage(experiment.errors[0]) : 'unknown problem';
      return `Project "${name}": its saved experiment is not valid (${problem}) and was left out; the scenario opened as saved.`;
    } finally {
      loading = false;
    }
  };

  const add = async (name: string, scenario: Scenario, time: number | null = null, experiment?: Experiment) => {
    const now = Date.now();
    const meta: ProjectMeta = { id: newId(), name, created: now, modified: now };
    await writeFirstVersion(storage!, meta.id, { scenario, time, ...(experiment ? { experiment } : {}) } satisfies SavedProject);
    await writeList([...get().projects, meta]);
    return meta;
  };

  /** A stored record that still validates; stored data from elsewhere is checked, never trusted. */
  const readVersion = async (key: string): Promise<OpenedProject | string> => {
    const record = await storage!.get<SavedProject>(key);
    if (!record || typeof record !== 'object') return 'its saved data is missing';
    const checked = validateScenario(record.scenario);
    if (!checked.ok) return `its saved scenario is not valid (${checked.errors[0]?.message ?? 'unknown problem'})`;
    const time = typeof record.time === 'number' ? record.time : null;
    // The experiment is checked when it is shown (show), not here: it may hold thousands of members.
    return record.experiment === undefined ? { scenario: checked.scenario, time } : { scenario: checked.scenario, time, experiment: record.experiment };
  };

  /** The current version, else the previous one with a notice saying so, else why neither. */
  const read = async (id: string): Promise<ReadProject | string> => {
    const head = await readHead(storage!, id);
    const latest = await readVersion(head.current);
    if (typeof latest !== 'string') return { record: latest, version: head.current, notice: null };
    if (head.previous) {
      const previous = await readVersion(head.previous);
      if (typeof previous !== 'string') {
        const name = get().projects.find((p) => p.id === id)?.name ?? 'this project';
        const notice = `The latest save of "${name}" could not be used (${latest}); the previous saved version was opened instead.`;
        return { record: previous, version: head.previous, notice };
      }
    }
    return latest;
  };

  return {
    ready: false,
    projects: [],
    currentId: null,
    storageWarning: null,
    error: null,
    readOnly: null,

    async init(given, warning = null, tabs = browserTabChannel()) {
      tabLock?.close();
      tabLock = tabs
        ? createTabLock(tabs, {
            heldElsewhere: (project) => {
              if (project === get().currentId) set({ readOnly: READ_ONLY_ELSEWHERE });
            },
            takenOver: (project) => {
              if (project === get().currentId) set({ readOnly: READ_ONLY_TAKEN });
            },
          })
        : null;
      const opened = given ? { storage: given, warning } : await openStorage();
      storage = opened.storage;
      set({ storageWarning: opened.warning });
      try {
        const projects = (await storage.get<ProjectMeta[]>(PROJECTS_KEY)) ?? [];
        set({ projects });
        const lastId = await storage.get<string>(CURRENT_KEY);
        const candidates = [lastId, ...projects.map((p) => p.id)].filter((id): id is string => typeof id === 'string');
        let opened = false;
        let problem: string | null = null;
        for (const id of new Set(candidates)) {
          if (!projects.some((p) => p.id === id)) continue;
          const record = await read(id);
          if (typeof record === 'string') {
            problem ??= `Project "${projects.find((p) => p.id === id)?.name}" could not be opened: ${record}. It is left as it was.`;
            continue;
          }
          const left = await show(id, record.record, record.version);
          problem = record.notice ?? left ?? problem;
          opened = true;
          break;
        }
        if (!opened) {
          // A new name when a project that could not be opened holds the demo's: two list entries
          // of one name would leave the user guessing which is the broken one.
          const meta = await add(newProjectName('demo', new Set(projects.map((p) => p.name))), demoScenario);
          await show(meta.id, { scenario: demoScenario, time: null });
        }
        set({ error: problem });
      } catch (error) {
        failed('Opening saved projects', error);
      }
      set({ ready: true });
      unsubscribe?.();
      const offScenario = useScenarioStore.subscribe((s, prev) => {
        if (s.scenario !== prev.scenario) schedule();
      });
      const offPlayback = usePlaybackStore.subscribe((s, prev) => {
        if (s.index !== prev.index && !s.playing) schedule();
      });
      const offExperiment = useExperimentStore.subscribe((s, prev) => {
        if (s.experiment !== prev.experiment) schedule();
      });
      unsubscribe = () => {
        offScenario();
        offPlayback();
        offExperiment();
      };
    },

    async create(from) {
      await get().flush();
      const name = newProjectName(from, new Set(get().projects.map((p) => p.name)));
      const scenario = from === 'demo' ? demoScenario : blankValleyScenario();
      try {
        const meta = await add(name, scenario);
        await show(meta.id, { scenario, time: null });
      } catch (error) {
        failed('Creating the project', error);
      }
    },

    async open(id) {
      if (id === get().currentId) return;
      await get().flush();
      try {
        const record = await read(id);
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
        await writeList(get().projects.map((p) => (p.id === id ? { ...p, name: name.trim(), modified: Date.now() } : p)));
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
        const record = await read(id);
        if (typeof record === 'string') {
          set({ error: `That project could not be duplicated: ${record}.` });
          return;
        }
        const meta = await add(copyName(original.name, new Set(get().projects.map((p) => p.name))), record.record.scenario, record.record.time, record.record.experiment);
        await show(meta.id, record.record);
      } catch (error) {
        failed('Duplicating the project', error);
      }
    },

    async remove(id) {
      const { projects, currentId } = get();
      if (id === currentId) {
        clearTimeout(timer);
        timer = undefined;
      }
      try {
        const rest = projects.filter((p) => p.id !== id);
        await writeList(rest);
        await deleteVersions(storage!, id);
        if (id !== currentId) return;
        set({ currentId: null });
        const next = rest[rest.length - 1];
        const record = next ? await read(next.id) : undefined;
        if (next && record && typeof record !== 'string') {
          await show(next.id, record.record, record.version);
        } else {
          // Never leave the workbench without a project: the demo can always be reopened.
          const meta = await add(demoScenario.name ?? 'Demo', demoScenario);
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
      clearTimeout(timer);
      timer = undefined;
      await save();
    },

    async flush() {
      if (timer !== undefined) await save();
    },
  };
});

/**
 * Saves a pending change before the page goes away (best effort: IndexedDB writes are async).
 * Hiding comes first when a tab is closed or left, and leaves more time than pagehide.
 */
export function saveOnPageHide(): () => void {
  const handler = () => void useProjectStore.getState().flush();
  const onHidden = () => {
    if (document.visibilityState === 'hidden') handler();
  };
  window.addEventListener('pagehide', handler);
  document.addEventListener('visibilitychange', onHidden);
  return () => {
    window.removeEventListener('pagehide', handler);
    document.removeEventListener('visibilitychange', onHidden);
  };
}
