/**
 * Two tabs of the app on one browser's storage: each is a project store of its own (its own
 * editor, a tab channel between them) over one shared storage. Whatever order their list changes
 * reach the storage in, none is lost, and names stay unique.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { memoryStorage, type KeyValueStorage } from '../../src/state/persistence';
import { PROJECTS_KEY, type ProjectMeta, type ProjectStore } from '../../src/state/projectStore';
import { demoScenario } from '../../src/state/scenarioStore';
import { channelHub } from '../helpers/channelHub';
import { fakeWorkspace } from '../helpers/fakeWorkspace';
import { resetStores, testProjects } from '../helpers/resetStores';

let storage: KeyValueStorage;
let hub: ReturnType<typeof channelHub>;

/** A tab opening the app: its own editor, the shared storage and channel. */
async function openTab(): Promise<ProjectStore> {
  const tab = testProjects(storage, { tabs: hub.join(), workspace: fakeWorkspace() });
  await tab.getState().init();
  return tab;
}

const stored = async () => (await storage.get<ProjectMeta[]>(PROJECTS_KEY)) ?? [];
const storedNames = async () => (await stored()).map((p) => p.name);

beforeEach(() => {
  storage = memoryStorage();
  hub = channelHub();
});
afterEach(resetStores);

describe('two tabs changing the project list', () => {
  it('both create a project at the same moment: both are kept, under different names', async () => {
    const a = await openTab();
    const b = await openTab();
    await Promise.all([a.getState().create('demo'), b.getState().create('demo')]);
    expect(await storedNames()).toEqual([demoScenario.name, 'Demo 2', 'Demo 3']);
    const made = [a.getState().currentId, b.getState().currentId];
    expect(new Set(made).size).toBe(2);
    expect((await stored()).map((p) => p.id)).toEqual(expect.arrayContaining(made));
  });

  it('one renames while the other creates, interleaved: the new name and the new project are both kept', async () => {
    const a = await openTab();
    const b = await openTab();
    const demoId = a.getState().currentId!;
    await Promise.all([a.getState().rename(demoId, 'Renamed in A'), b.getState().create('blank')]);
    expect(await storedNames()).toEqual(['Renamed in A', 'Blank valley']);
  });

  it('a tab whose list is out of date renames without dropping what the other tab added', async () => {
    const a = await openTab();
    const b = await openTab();
    const demoId = b.getState().currentId!;
    await a.getState().create('blank');
    await a.getState().duplicate(demoId);
    // B has not heard of A's two projects; its rename must not write its old list back.
    expect(b.getState().projects).toHaveLength(1);
    expect(await b.getState().rename(demoId, 'Renamed in B')).toBeNull();
    expect(await storedNames()).toEqual(['Renamed in B', 'Blank valley', `Copy of ${demoScenario.name}`]);
    // And B's list is now the stored one.
    expect(b.getState().projects.map((p) => p.name)).toEqual(await storedNames());
  });

  it('a tab deleting a project keeps the projects the other tab added meanwhile', async () => {
    const a = await openTab();
    const b = await openTab();
    await b.getState().create('blank');
    const blankId = b.getState().currentId!;
    await a.getState().create('demo');
    await b.getState().remove(blankId);
    expect(await storedNames()).toEqual([demoScenario.name, 'Demo 2']);
  });

  it('a tab whose list is out of date names a new project after the stored list, not its own', async () => {
    const a = await openTab();
    const b = await openTab();
    await a.getState().create('blank');
    await b.getState().create('blank');
    expect(await storedNames()).toEqual([demoScenario.name, 'Blank valley', 'Blank valley 2']);
  });
});
