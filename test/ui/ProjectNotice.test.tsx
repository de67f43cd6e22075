// @vitest-environment jsdom
/**
 * A project that could not be opened is announced at the top of the page until dismissed, and a
 * fresh project never takes the name of one already listed.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { memoryStorage } from '../../src/state/persistence';
import { newProjectName, type ProjectStore } from '../../src/state/projectStore';
import { demoScenario } from '../../src/state/scenarioStore';
import { ProjectNotice } from '../../src/ui/ProjectNotice';
import { ProjectsContext } from '../../src/ui/projects/ProjectsContext';
import { resetStores, testProjects } from '../helpers/resetStores';

let useProjectStore: ProjectStore;
const renderNotice = () =>
  render(
    <ProjectsContext.Provider value={useProjectStore}>
      <ProjectNotice />
    </ProjectsContext.Provider>,
  );

beforeEach(() => {
  resetStores();
  useProjectStore = testProjects(memoryStorage());
});
afterEach(cleanup);

describe('project notice', () => {
  it('shows the opening problem as an alert and goes away when dismissed', () => {
    useProjectStore.setState({ error: 'Project "Survey 2019" could not be opened: its saved scenario is not valid (x). It is left as it was.' });
    renderNotice();
    expect(screen.getByRole('alert').textContent).toMatch(/^Project "Survey 2019" could not be opened/);
    fireEvent.click(screen.getByRole('button', { name: 'Dismiss' }));
    expect(useProjectStore.getState().error).toBeNull();
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('renders nothing when there is no problem', () => {
    const { container } = renderNotice();
    expect(container.textContent).toBe('');
  });
});

describe('names of new projects', () => {
  it('uses the demo name when free, else the first free "Demo k"', () => {
    const demo = demoScenario.name!;
    expect(newProjectName('demo', new Set())).toBe(demo);
    expect(newProjectName('demo', new Set([demo]))).toBe('Demo 2');
    expect(newProjectName('demo', new Set([demo, 'Demo 2']))).toBe('Demo 3');
    expect(newProjectName('blank', new Set(['Blank valley']))).toBe('Blank valley 2');
  });
});
