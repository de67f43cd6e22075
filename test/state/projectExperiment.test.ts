import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { useExperimentStore } from '../../src/state/experimentStore';
import { memoryStorage, type KeyValueStorage } from '../../src/state/persistence';
import { readCurrentRecord } from '../../src/state/persistenceVersions';
import { usePlaybackStore } from '../../src/state/playbackStore';
import { AUTOSAVE_DELAY_MS, CURRENT_KEY, PROJECTS_KEY, projectKey, type ProjectMeta, type ProjectStore, type SavedProject } from '../../src/state/projectStore';
import { demoScenario, useScenarioStore } from '../../src/state/scenarioStore';
import { warmingLadder } from '../../src/ui/experiments/experimentSets';
import { resetStores, testProjects } from '../helpers/resetStores';

let store: ProjectStore;
const projects = () => store.getState();
const experiments = () => useExperimentStore.getState();

/** A fresh page over the same storage, its projects opened. */
async function openPage() {
  resetStores();
  store = testProjects(storage);
  await projects().init();
}

/** A project stored as the app stored them before experiments (and before versioned heads). */
async function storeOldProject(storage: KeyValueStorage, id: string): Promise<void> {
  const meta: ProjectMeta = { id, name: 'Old valley', created: 1, modified: 1 };
  await storage.set(PROJECTS_KEY, [meta]);
  await storage.set(projectKey(id), { scenario: { ...demoScenario, name: 'Old valley' }, time: 25 });
  await storage.set(CURRENT_KEY, id);
}

let storage: KeyValueStorage;
beforeEach(() => {
  storage = memoryStorage();
});
afterEach(() => vi.useRealTimers());

describe('experiments saved with the project', () => {
  it('a project saved before experiments existed still opens, with no experiment and no complaint', async () => {
    await storeOldProject(storage, 'old');
    await openPage();
    expect(projects().currentId).toBe('old');
    expect(projects().error).toBeNull();
    expect(useScenarioStore.getState().scenario.name).toBe('Old valley');
    expect(usePlaybackStore.getState().pendingTime).toBe(25);
    expect(experiments().experiment).toBeNull();
  });

  it('saves the experiment with the scenario after an edit, and a reload restores it', async () => {
    vi.useFakeTimers();
    await storeOldProject(storage, 'old');
    await openPage();
    experiments().startFrom(useScenarioStore.getState().scenario);
    const made = warmingLadder(experiments().experiment!, { fromK: 1, toK: 2, stepK: 1, year: 50 });
    if (!made.ok) throw new Error('ladder refused');
    await expect(experiments().edit(made.experiment)).resolves.toEqual({ ok: true });
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS + 50);
    const saved = await readCurrentRecord<SavedProject>(storage, 'old');
    expect(saved?.experiment).toEqual(made.experiment);
    expect(saved?.scenario.name).toBe('Old valley');

    await openPage();
    expect(experiments().experiment).toEqual(made.experiment);
    expect(experiments().members.map((m) => m.name)).toEqual(['1_+1-K-by-year-50', '2_+2-K-by-year-50']);
  });

  it('a project saved with the old key massBalance.gradient opens under the new name, its experiment too, and is saved so', async () => {
    vi.useFakeTimers();
    await storeOldProject(storage, 'old');
    const { ablationGradient, ...rest } = demoScenario.massBalance as { ablationGradient: number };
    const oldScenario = { ...demoScenario, name: 'Old valley', massBalance: { ...rest, gradient: ablationGradient } };
    const oldExperiment = {
      format: 'firnline-experiment',
      version: 1,
      base: oldScenario,
      sweep: { '/massBalance/gradient': [0.006, 0.008] },
    };
    await storage.set(projectKey('old'), { scenario: oldScenario, time: null, experiment: oldExperiment });
    await openPage();
    expect(projects().error).toBeNull();
    const opened = useScenarioStore.getState().scenario;
    expect(opened.massBalance).toEqual(demoScenario.massBalance);
    expect(Object.keys(experiments().experiment!.sweep!)).toEqual(['/massBalance/ablationGradient']);
    expect(experiments().members.map((m) => (m.scenario.massBalance as { ablationGradient: number }).ablationGradient)).toEqual([0.006, 0.008]);

    // The next save writes the new name.
    useScenarioStore.getState().apply({ ...opened, name: 'Old valley, edited' }, 'Rename');
    await vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS + 50);
    const saved = await readCurrentRecord<SavedProject>(storage, 'old');
    expect(saved?.scenario.massBalance).toEqual(demoScenario.massBalance);
    expect(JSON.stringify(saved)).not.toContain('"gradient"');
  });

  it('a stored experiment that no longer validates is left out with a notice; the scenario opens', async () => {
    await storeOldProject(storage, 'old');
    const broken = { format: 'firnline-experiment', version: 1, base: demoScenario, variants: [{ name: 'hot', set: { warming: [[0, 0], [80, 99]] } }] };
    await storage.set(projectKey('old'), { scenario: demoScenario, time: null, experiment: broken });
    await openPage();
    expect(projects().currentId).toBe('old');
    expect(useScenarioStore.getState().scenario).toEqual(demoScenario);
    expect(experiments().experiment).toBeNull();
    expect(projects().error).toMatch(/saved experiment is not valid \(\/variants\/0\/set\/warming\/1\/1: in variant "hot".*99 is not allowed/);
  });

  it('opening another project replaces the experiment with that project’s (or none)', async () => {
    await storeOldProject(storage, 'old');
    await openPage();
    experiments().startFrom(demoScenario);
    await projects().create('demo');
    expect(experiments().experiment).toBeNull();
  });
});
