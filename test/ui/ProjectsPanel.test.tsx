// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { memoryStorage, type KeyValueStorage } from '../../src/state/persistence';
import { projectKey, type ProjectMeta, type ProjectStore, type SavedProject } from '../../src/state/projectStore';
import { demoScenario, useScenarioStore } from '../../src/state/scenarioStore';
import { ProjectsContext } from '../../src/ui/projects/ProjectsContext';
import { ProjectsPanel } from '../../src/ui/projects/ProjectsPanel';
import { resetStores, testProjects } from '../helpers/resetStores';
import { RunClientContext } from '../../src/ui/run/RunClientContext';
import type { RunClient } from '../../src/worker/workerClient';

let storage: KeyValueStorage;
let useProjectStore: ProjectStore;
let stops = 0;
const client: RunClient = { run() {}, pause() {}, resume() {}, stop: () => void stops++, step() {} };

async function renderPanel() {
  render(
    <ProjectsContext.Provider value={useProjectStore}>
      <RunClientContext.Provider value={client}>
        <ProjectsPanel />
      </RunClientContext.Provider>
    </ProjectsContext.Provider>,
  );
  await act(() => useProjectStore.getState().init());
}

const names = () => within(screen.getByRole('list')).getAllByRole('listitem').map((li) => li.querySelector('.project-name')?.textContent);
const click = (name: string) => act(async () => void fireEvent.click(screen.getByRole('button', { name })));

beforeEach(() => {
  resetStores();
  storage = memoryStorage();
  useProjectStore = testProjects(storage);
  stops = 0;
});
afterEach(cleanup);

describe('ProjectsPanel', () => {
  it('lists the demo project as open and makes new projects from the demo or a blank valley', async () => {
    await renderPanel();
    expect(names()).toEqual([`${demoScenario.name} (open)`]);
    await click('New blank valley');
    await waitFor(() => expect(names()).toEqual([demoScenario.name, 'Blank valley (open)']));
    expect(useScenarioStore.getState().scenario.name).toBe('Blank valley');
    await click('New from demo');
    await waitFor(() => expect(names()).toEqual([demoScenario.name, 'Blank valley', 'Demo 2 (open)']));
    // A run going on belongs to the project it was made from: it is stopped first.
    expect(stops).toBe(2);
  });

  it('opens another project', async () => {
    await renderPanel();
    await click('New blank valley');
    await waitFor(() => expect(names()).toHaveLength(2));
    await click(`Open ${demoScenario.name}`);
    await waitFor(() => expect(names()).toEqual([`${demoScenario.name} (open)`, 'Blank valley']));
    expect(useScenarioStore.getState().scenario).toEqual(demoScenario);
    const current = document.querySelector('[aria-current="true"]');
    expect(current?.textContent).toMatch(demoScenario.name!);
  });

  it('renames inline, refusing an empty name with a message that says what is allowed', async () => {
    await renderPanel();
    await click(`Rename ${demoScenario.name}`);
    const input = screen.getByLabelText(`New name for “${demoScenario.name}”`) as HTMLInputElement;
    expect(document.activeElement).toBe(input);
    fireEvent.change(input, { target: { value: '  ' } });
    await click('Save name');
    expect(screen.getByRole('alert').textContent).toBe('A project name needs at least one character other than spaces.');
    expect(input.getAttribute('aria-invalid')).toBe('true');
    fireEvent.change(input, { target: { value: 'Fennimow, 2 K' } });
    await click('Save name');
    await waitFor(() => expect(names()).toEqual(['Fennimow, 2 K (open)']));
    const stored = await storage.get<ProjectMeta[]>('projects');
    expect(stored?.[0].name).toBe('Fennimow, 2 K');
  });

  it('cancels a rename with Escape, leaving the name as it was', async () => {
    await renderPanel();
    await click(`Rename ${demoScenario.name}`);
    const input = screen.getByLabelText(`New name for “${demoScenario.name}”`);
    fireEvent.change(input, { target: { value: 'Something else' } });
    fireEvent.keyDown(input, { key: 'Escape' });
    expect(names()).toEqual([`${demoScenario.name} (open)`]);
  });

  it('duplicates a project with its scenario', async () => {
    await renderPanel();
    await click(`Duplicate ${demoScenario.name}`);
    await waitFor(() => expect(names()).toEqual([demoScenario.name, `Copy of ${demoScenario.name} (open)`]));
    const copy = useProjectStore.getState().projects[1];
    expect((await storage.get<SavedProject>(projectKey(copy.id)))?.scenario).toEqual(demoScenario);
  });

  it('deletes only after confirming, and can be talked out of it', async () => {
    await renderPanel();
    await click('New blank valley');
    await waitFor(() => expect(names()).toHaveLength(2));
    await click('Delete Blank valley');
    expect(screen.getByRole('group', { name: 'Delete Blank valley?' }).textContent).toMatch(/cannot be undone/);
    await click('Keep it');
    expect(useProjectStore.getState().projects).toHaveLength(2);
    await click('Delete Blank valley');
    await click('Delete project');
    await waitFor(() => expect(names()).toEqual([`${demoScenario.name} (open)`]));
    expect(useScenarioStore.getState().scenario).toEqual(demoScenario);
  });
});
