import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { blankValleyScenario } from '../../src/scenario/blankValleyScenario';
import { validateScenario } from '../../src/scenario/validateScenario';
import { MEMORY_ONLY_WARNING, memoryStorage, openStorage, type KeyValueStorage } from '../../src/state/persistence';
import { usePlaybackStore } from '../../src/state/playbackStore';
import {
  AUTOSAVE_DELAY_MS,
  CURRENT_KEY,
  PROJECTS_KEY,
  projectKey,
  type ProjectMeta,
  type ProjectStore,
  type SavedProject,
} from '../../src/state/projectStore';
import { demoScenario, useScenarioStore } from '../../src/state/scenarioStore';
import { readCurrentRecord } from '../../src/state/persistenceVersions';
import { resetStores, testProjects } from '../helpers/resetStores';

let storage: KeyValueStorage;
let store: ProjectStore;
const projects = () => store.getState();

/** A fresh page over the same storage: no project open, the demo in the editor. */
function reload(over: KeyValueStorage = storage, warning: string | null = null) {
  resetStores();
  store = testProjects(over, { warning });
}

beforeEach(() => {
  storage = memoryStorage();
  reload();
});

afterEach(() => vi.useRealTimers());

describe('project store', () => {
  it('starts with the demo as a saved project when nothing is stored', async () => {
    await projects().init();
    expect(projects().ready).toBe(true);
    expect(projects().projects.map((p) => p.name)).toEqual([demoScenario.name]);
    const id = projects().currentId!;
    expect(await storage.get(CURRENT_KEY)).toBe(id);
    expect((await readCurrentRecord<SavedProject>(storage, id))?.scenario).toEqual(demoScenario);
    expect(useScenarioStore.getState().scenario).toEqual(demoScenario);
  });

  it('saves an edit half a second after it, and a reload opens it where the user was', async () => {
    vi.useFakeTimers();
    await projects().init();
    const edited = { ...demoScenario, name: 'Edited', run: { years: 100, outputEvery: 10 } };
    useScenarioStore.getState().apply(edited, 'Set run length');
    usePlaybackStore.setState({ pendingTime: 40 });
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS - 50);
    expect((await readCurrentRecord<SavedProject>(storage, projects().currentId!))?.scenario.name).toBe(demoScenario.name);
    await vi.advanceTimersByTimeAsync(100);
    const saved = await readCurrentRecord<SavedProject>(storage, projects().currentId!);
    expect(saved).toEqual({ scenario: edited, time: 40 });

    // "Reload": fresh stores over the same storage.
    const id = projects().currentId;
    reload();
    await projects().init();
    expect(projects().currentId).toBe(id);
    expect(useScenarioStore.getState().scenario).toEqual(edited);
    expect(useScenarioStore.getState().past).toEqual([]);
    expect(usePlaybackStore.getState().pendingTime).toBe(40);
  });

  it('creates projects from the demo and from a valid, ice-free blank valley', async () => {
    await projects().init();
    await projects().create('blank');
    expect(projects().projects.map((p) => p.name)).toEqual([demoScenario.name, 'Blank valley']);
    expect(useScenarioStore.getState().scenario).toEqual(blankValleyScenario());
    expect(validateScenario(blankValleyScenario()).ok).toBe(true);
    expect(blankValleyScenario().surface).toBeUndefined();
    await projects().create('demo');
    await projects().create('blank');
    expect(projects().projects.map((p) => p.name)).toEqual([demoScenario.name, 'Blank valley', 'Demo 2', 'Blank valley 2']);
    expect((await storage.get<ProjectMeta[]>(PROJECTS_KEY))?.length).toBe(4);
  });

  it('opens another project after saving the pending edit of the one open', async () => {
    vi.useFakeTimers();
    await projects().init();
    const demoId = projects().currentId!;
    await projects().create('blank');
    const blankId = projects().currentId!;
    useScenarioStore.getState().apply({ ...blankValleyScenario(), name: 'Edited blank' }, 'Rename scenario');
    await projects().open(demoId);
    expect(useScenarioStore.getState().scenario).toEqual(demoScenario);
    expect((await readCurrentRecord<SavedProject>(storage, blankId))?.scenario.name).toBe('Edited blank');
    await projects().open(blankId);
    expect(useScenarioStore.getState().scenario.name).toBe('Edited blank');
  });

  it('renames with a trimmed name and refuses an empty or overlong one, saying what is allowed', async () => {
    await projects().init();
    const id = projects().currentId!;
    expect(await projects().rename(id, '   ')).toBe('A project name needs at least one character other than spaces.');
    expect(await projects().rename(id, 'x'.repeat(101))).toBe('A project name can have at most 100 characters; this one has 101.');
    expect(projects().projects[0].name).toBe(demoScenario.name);
    expect(await projects().rename(id, '  Fennimow 2 K  ')).toBeNull();
    expect(projects().projects[0].name).toBe('Fennimow 2 K');
    expect((await storage.get<ProjectMeta[]>(PROJECTS_KEY))?.[0].name).toBe('Fennimow 2 K');
  });

  it('duplicates a project under a new name and opens the copy', async () => {
    await projects().init();
    const id = projects().currentId!;
    await projects().duplicate(id);
    await projects().duplicate(id);
    expect(projects().projects.map((p) => p.name)).toEqual([
      demoScenario.name,
      `Copy of ${demoScenario.name}`,
      `Copy 2 of ${demoScenario.name}`,
    ]);
    expect(projects().currentId).not.toBe(id);
    expect(useScenarioStore.getState().scenario).toEqual(demoScenario);
  });

  it('deletes projects; deleting the last one leaves a fresh demo open', async () => {
    await projects().init();
    const demoId = projects().currentId!;
    await projects().create('blank');
    const blankId = projects().currentId!;
    await projects().remove(blankId);
    expect(projects().currentId).toBe(demoId);
    expect(await storage.get(projectKey(blankId))).toBeUndefined();
    await projects().remove(demoId);
    expect(projects().projects).toHaveLength(1);
    expect(projects().currentId).not.toBe(demoId);
    expect(useScenarioStore.getState().scenario).toEqual(demoScenario);
  });

  it('does not open a stored project that no longer validates, and leaves it untouched', async () => {
    const meta: ProjectMeta = { id: 'old', name: 'Old file', created: 0, modified: 0 };
    const broken = { scenario: { ...demoScenario, grid: { length: -5, spacing: 50 } }, time: null };
    await storage.set(PROJECTS_KEY, [meta]);
    await storage.set(CURRENT_KEY, 'old');
    await storage.set(projectKey('old'), broken);
    await projects().init();
    expect(projects().error).toMatch(/^Project "Old file" could not be opened: its saved scenario is not valid \(.+\)\. It is left as it was\.$/);
    expect(await storage.get(projectKey('old'))).toEqual(broken);
    // Work goes on in a new demo project beside it.
    expect(projects().projects.map((p) => p.name)).toEqual(['Old file', demoScenario.name]);
    expect(useScenarioStore.getState().scenario).toEqual(demoScenario);
  });

  it('falls back to memory with a clear warning where IndexedDB is unavailable', async () => {
    // Node has no IndexedDB, like a browser that blocks it.
    const opened = await openStorage();
    expect(opened.warning).toBe(MEMORY_ONLY_WARNING);
    await opened.storage.set('k', { a: 1 });
    expect(await opened.storage.get('k')).toEqual({ a: 1 });
    reload(opened.storage, opened.warning);
    await projects().init();
    expect(projects().storageWarning).toMatch(/projects last only until this tab is closed/);
    expect(projects().currentId).not.toBeNull();
  });

  it('tells the user when a save fails and keeps the work open', async () => {
    vi.useFakeTimers();
    await projects().init();
    storage.set = storage.replace = storage.update = async () => {
      throw new Error('QuotaExceededError');
    };
    useScenarioStore.getState().apply({ ...demoScenario, name: 'Unsaved' }, 'Rename scenario');
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS + 10);
    expect(projects().storageWarning).toBe(
      'Saving the project failed (QuotaExceededError). Your work is still open in this tab; save the scenario as a file to keep it.',
    );
    expect(useScenarioStore.getState().scenario.name).toBe('Unsaved');
  });
});
