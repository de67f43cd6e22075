/**
 * Autosave that cannot lose the project: a save that dies while writing the new version or
 * switching the head (a closed tab, a failing disk) leaves the previous version current (the two
 * are one transaction, so a refused write anywhere in it writes neither), and a current version
 * that is missing or invalid is replaced by the previous one with a message.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { memoryStorage, type KeyValueStorage } from '../../src/state/persistence';
import { headKey, readCurrentRecord, readHead } from '../../src/state/persistenceVersions';
import { AUTOSAVE_DELAY_MS, projectKey, type ProjectStore, type SavedProject } from '../../src/state/projectStore';
import { demoScenario, useScenarioStore } from '../../src/state/scenarioStore';
import { resetStores, testProjects } from '../helpers/resetStores';

let store: ProjectStore;
const projects = () => store.getState();

/** A fresh page over `storage`, its projects opened. */
async function open(storage: KeyValueStorage) {
  resetStores();
  store = testProjects(storage);
  await projects().init();
}

/** Memory storage whose writes can be made to fail, by key (a transaction fails whole). */
function failingStorage(inner: KeyValueStorage = memoryStorage()) {
  let failWhen: ((key: string) => boolean) | null = null;
  const storage: KeyValueStorage & { keys: Set<string> } = {
    keys: new Set(),
    get: (key) => inner.get(key),
    async set(key, value) {
      if (failWhen?.(key)) throw new Error('the write was aborted');
      storage.keys.add(key);
      await inner.set(key, value);
    },
    async del(key) {
      storage.keys.delete(key);
      await inner.del(key);
    },
    async replace(entries) {
      // One transaction: a write refused anywhere in it writes nothing.
      for (const [key] of entries) if (failWhen?.(key)) throw new Error('the write was aborted');
      for (const [key] of entries) storage.keys.add(key);
      return inner.replace(entries);
    },
    update(key, change) {
      if (failWhen?.(key)) return Promise.reject(new Error('the write was aborted'));
      storage.keys.add(key);
      return inner.update(key, change);
    },
  };
  return { storage, failOn: (test: ((key: string) => boolean) | null) => (failWhen = test) };
}

const named = (name: string) => ({ ...demoScenario, name });

async function edit(name: string) {
  useScenarioStore.getState().apply(named(name), 'Rename scenario');
  await vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS + 10);
}

const reload = open;

beforeEach(() => {
  vi.useFakeTimers();
});
afterEach(() => vi.useRealTimers());

describe('versioned autosave', () => {
  it('keeps the project intact when a save dies between the version write and the head switch', async () => {
    const { storage, failOn } = failingStorage();
    await open(storage);
    const id = projects().currentId!;
    await edit('Saved once');
    failOn((key) => key === headKey(id));
    await edit('Never committed');
    expect(projects().storageWarning).toMatch(/^Saving the project failed \(the write was aborted\)\. Your work is still open in this tab; save the scenario as a file to keep it\.$/);
    // The refused save left nothing that points at a version it did not finish.
    failOn(null);
    await reload(storage);
    expect(projects().currentId).toBe(id);
    expect(useScenarioStore.getState().scenario.name).toBe('Saved once');
    expect(projects().error).toBeNull();
  });

  it('keeps the project intact when the version write itself fails', async () => {
    const { storage, failOn } = failingStorage();
    await open(storage);
    await edit('Saved once');
    failOn((key) => key.startsWith('project:'));
    await edit('Lost write');
    failOn(null);
    await reload(storage);
    expect(useScenarioStore.getState().scenario.name).toBe('Saved once');
  });

  it('survives an abort at every write of a save', async () => {
    for (let abortAt = 0; abortAt < 3; abortAt++) {
      const { storage, failOn } = failingStorage();
      await open(storage);
      await edit('Good');
      let writes = 0;
      failOn(() => writes++ >= abortAt);
      await edit('Interrupted');
      failOn(null);
      await reload(storage);
      // Either the new version was committed whole or the old one is still current.
      expect(['Good', 'Interrupted']).toContain(useScenarioStore.getState().scenario.name);
      expect(useScenarioStore.getState().scenario).toEqual(named(useScenarioStore.getState().scenario.name!));
    }
  });

  it('opens the previous version, with a message, when the current one is missing', async () => {
    const storage = memoryStorage();
    await open(storage);
    const id = projects().currentId!;
    await edit('First');
    await edit('Second');
    await storage.del((await readHead(storage, id)).current);
    await reload(storage);
    expect(useScenarioStore.getState().scenario.name).toBe('First');
    expect(projects().error).toBe(
      `The latest save of "${demoScenario.name}" could not be used (its saved data is missing); the previous saved version was opened instead.`,
    );
  });

  it('opens the previous version, with a message, when the current one fails validation', async () => {
    const storage = memoryStorage();
    await open(storage);
    const id = projects().currentId!;
    await edit('First');
    await edit('Second');
    const head = await readHead(storage, id);
    await storage.set(head.current, { scenario: { ...demoScenario, grid: { length: -5, spacing: 50 } }, time: null });
    await reload(storage);
    expect(useScenarioStore.getState().scenario.name).toBe('First');
    expect(projects().error).toMatch(/could not be used \(its saved scenario is not valid \(.+\)\); the previous saved version was opened instead\.$/);
    // The next save builds on the good version, not the broken one.
    await edit('Third');
    const next = await readHead(storage, id);
    expect(next.previous).toBe(head.previous);
    expect((await readCurrentRecord<SavedProject>(storage, id))?.scenario.name).toBe('Third');
  });

  it('keeps two versions, not one per save, and deleting a project removes them all', async () => {
    const { storage } = failingStorage();
    await open(storage);
    const id = projects().currentId!;
    for (let k = 0; k < 6; k++) await edit(`Edit ${k}`);
    const versions = [...storage.keys].filter((key) => key.startsWith(projectKey(id)));
    const head = await readHead(storage, id);
    expect(new Set(versions)).toEqual(new Set([head.current, head.previous]));
    await projects().create('blank');
    await projects().remove(id);
    expect([...storage.keys].filter((key) => key.includes(id))).toEqual([]);
  });
});
