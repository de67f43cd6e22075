/**
 * The one reset of the page's stores for tests: every zustand store back to the state it is
 * created with (a fresh page), a run's messages no longer matched, playback stopped, and the
 * project stores made with testProjects closed (their autosave, tab channel and page listeners).
 */
import type { StoreApi } from 'zustand';
import { useUpdateStore } from '../../src/pwa/updateStore';
import { useAnalysisStore } from '../../src/state/analysisStore';
import { useEditorStore } from '../../src/state/editorStore';
import { useExperimentStore } from '../../src/state/experimentStore';
import { usePlaybackStore } from '../../src/state/playbackStore';
import { createProjects, type ProjectsOptions, type ProjectStore } from '../../src/state/projectStore';
import { storeWorkspace } from '../../src/state/projectWorkspace';
import { useRunStore } from '../../src/state/runStore';
import { useScenarioStore } from '../../src/state/scenarioStore';
import { useSteadyPreviewStore } from '../../src/state/steadyPreviewStore';
import { useViewStore } from '../../src/state/viewStore';
import type { KeyValueStorage } from '../../src/state/persistence';

type ResettableStore = Pick<StoreApi<object>, 'setState' | 'getInitialState'>;

const pageStores: ResettableStore[] = [
  useScenarioStore,
  useEditorStore,
  useRunStore,
  usePlaybackStore,
  useAnalysisStore,
  useExperimentStore,
  useViewStore,
  useSteadyPreviewStore,
  useUpdateStore,
] as unknown as ResettableStore[];

const openProjects: ProjectStore[] = [];

export function resetStores(): void {
  for (const projects of openProjects.splice(0)) projects.getState().dispose();
  usePlaybackStore.getState().pause();
  for (const store of pageStores) store.setState(store.getInitialState(), true);
  // As after a run is dropped: messages still on their way from an earlier test's run are ignored.
  useRunStore.getState().reset();
}

/**
 * A project store over `storage` and the page's stores, with no other tabs and no page events
 * unless given; closed by the next resetStores().
 */
export function testProjects(storage: KeyValueStorage, options: Partial<ProjectsOptions> = {}): ProjectStore {
  const projects = createProjects({ storage, tabs: null, page: null, workspace: storeWorkspace(), ...options });
  openProjects.push(projects);
  return projects;
}
