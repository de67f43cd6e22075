/**
 * An edit made just before the page is closed is kept. When the page goes (pagehide, or hidden
 * first), the browser runs the handlers and then nothing more of the page: a save that first
 * waits for a reply from the database never sends its writes. The fake storage here is such a
 * page's: what is asked for while the handlers run is done; nothing asked for after is.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { browserPageEvents, type PageTargets } from '../../src/state/autosave';
import { memoryStorage, type KeyValueStorage } from '../../src/state/persistence';
import { readCurrentRecord } from '../../src/state/persistenceVersions';
import { AUTOSAVE_DELAY_MS, type ProjectStore, type SavedProject } from '../../src/state/projectStore';
import { demoScenario, useScenarioStore } from '../../src/state/scenarioStore';
import { resetStores, testProjects } from '../helpers/resetStores';

/** The storage of a page that can be closed: from then on its requests are never carried out. */
function closingPageStorage(database: KeyValueStorage) {
  let closed = false;
  const never = new Promise<never>(() => undefined);
  const storage: KeyValueStorage = {
    get: (key) => (closed ? never : database.get(key)),
    set: (key, value) => (closed ? never : database.set(key, value)),
    del: (key) => (closed ? never : database.del(key)),
    replace: (entries) => (closed ? never : database.replace(entries)),
    update: (key, change) => (closed ? never : database.update(key, change)),
  };
  return { storage, closePage: () => void (closed = true) };
}

/** A window and a document that only dispatch events. */
function fakePage() {
  const document = Object.assign(new EventTarget(), { visibilityState: 'visible' as DocumentVisibilityState });
  return { window: new EventTarget(), document } satisfies PageTargets;
}

let database: KeyValueStorage;
let page: ReturnType<typeof fakePage>;
let closing: ReturnType<typeof closingPageStorage>;
let projects: ProjectStore;

beforeEach(async () => {
  vi.useFakeTimers();
  resetStores();
  database = memoryStorage();
  page = fakePage();
  closing = closingPageStorage(database);
  projects = testProjects(closing.storage, { page: browserPageEvents(() => page) });
  await projects.getState().init();
});
afterEach(() => {
  resetStores();
  vi.useRealTimers();
});

const named = (name: string) => ({ ...demoScenario, name });

/** What the next page finds. */
async function reopened() {
  resetStores();
  const next = testProjects(database);
  await next.getState().init();
  return useScenarioStore.getState().scenario.name;
}

describe('an edit just before the page goes', () => {
  it('is saved when pagehide comes before the autosave delay has passed', async () => {
    const id = projects.getState().currentId!;
    useScenarioStore.getState().apply(named('Edited just before closing'), 'Rename scenario');
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS / 5);
    expect((await readCurrentRecord<SavedProject>(database, id))?.scenario.name).toBe(demoScenario.name);

    page.window.dispatchEvent(new Event('pagehide'));
    closing.closePage();
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS * 2);

    expect((await readCurrentRecord<SavedProject>(database, id))?.scenario.name).toBe('Edited just before closing');
    expect(await reopened()).toBe('Edited just before closing');
  });

  it('is saved when the page is hidden (the first sign of a tab being closed)', async () => {
    const id = projects.getState().currentId!;
    useScenarioStore.getState().apply(named('Edited, then the tab hidden'), 'Rename scenario');
    page.document.visibilityState = 'hidden';
    page.document.dispatchEvent(new Event('visibilitychange'));
    closing.closePage();
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS * 2);

    expect((await readCurrentRecord<SavedProject>(database, id))?.scenario.name).toBe('Edited, then the tab hidden');
    expect(await reopened()).toBe('Edited, then the tab hidden');
  });

  it('a page shown again saves nothing early: only hiding flushes', async () => {
    const id = projects.getState().currentId!;
    useScenarioStore.getState().apply(named('Still typing'), 'Rename scenario');
    page.document.dispatchEvent(new Event('visibilitychange'));
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS / 5);
    expect((await readCurrentRecord<SavedProject>(database, id))?.scenario.name).toBe(demoScenario.name);
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS);
    expect((await readCurrentRecord<SavedProject>(database, id))?.scenario.name).toBe('Still typing');
  });
});
