// @vitest-environment jsdom
/**
 * Two tabs on one project, joined by a fake broadcast channel: the second tab is told, does not
 * save, and only writes after the user takes over, which turns the first tab read-only.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, fireEvent, render, screen } from '@testing-library/react';
import { memoryStorage } from '../../src/state/persistence';
import { readCurrentRecord } from '../../src/state/persistenceVersions';
import { AUTOSAVE_DELAY_MS, READ_ONLY_ELSEWHERE, READ_ONLY_TAKEN, type SavedProject } from '../../src/state/projectStore';
import { demoScenario, useScenarioStore } from '../../src/state/scenarioStore';
import { createTabLock } from '../../src/state/tabLock';
import { ProjectsContext } from '../../src/ui/projects/ProjectsContext';
import { TabNotice } from '../../src/ui/TabNotice';
import { channelHub } from '../helpers/channelHub';
import { resetStores, testProjects } from '../helpers/resetStores';

beforeEach(resetStores);
afterEach(() => {
  cleanup();
  vi.useRealTimers();
});

describe('tab lock', () => {
  it('tells the second tab on the same project, not a tab on another project', () => {
    const hub = channelHub();
    const first = { heldElsewhere: vi.fn(), takenOver: vi.fn() };
    const second = { heldElsewhere: vi.fn(), takenOver: vi.fn() };
    const a = createTabLock(hub.join(), first, 'a');
    const b = createTabLock(hub.join(), second, 'b');
    a.announce('p1');
    b.announce('p2');
    expect(second.heldElsewhere).not.toHaveBeenCalled();
    b.announce('p1');
    expect(second.heldElsewhere).toHaveBeenCalledWith('p1');
    expect(b.holds('p1')).toBe(false);
    expect(a.holds('p1')).toBe(true);
    b.takeOver();
    expect(first.takenOver).toHaveBeenCalledWith('p1');
    expect([a.holds('p1'), b.holds('p1')]).toEqual([false, true]);
  });

  it('the second tab of one project saves nothing until it takes over; then the first stops saving', async () => {
    vi.useFakeTimers();
    const hub = channelHub();
    const storage = memoryStorage();
    // The first tab: made the project and holds it (a lock of its own on the same hub).
    const firstPage = testProjects(storage);
    await firstPage.getState().init();
    const id = firstPage.getState().currentId!;
    const firstTab = { heldElsewhere: vi.fn(), takenOver: vi.fn() };
    const other = createTabLock(hub.join(), firstTab, 'first-tab');
    other.announce(id);
    // The second tab loads the page: the same storage, the same last project.
    firstPage.getState().dispose();
    const secondTab = testProjects(storage, { tabs: hub.join() });
    await secondTab.getState().init();
    expect(secondTab.getState().currentId).toBe(id);
    expect(firstTab.heldElsewhere).not.toHaveBeenCalled();
    expect(secondTab.getState().readOnly).toBe(READ_ONLY_ELSEWHERE);

    render(
      <ProjectsContext.Provider value={secondTab}>
        <TabNotice />
      </ProjectsContext.Provider>,
    );
    expect(screen.getByRole('alert').textContent).toContain('This project is open in another tab');
    await act(async () => {
      useScenarioStore.getState().apply({ ...demoScenario, name: 'Edited in the second tab' }, 'Rename scenario');
      await vi.advanceTimersByTimeAsync(AUTOSAVE_DELAY_MS + 10);
    });
    await secondTab.getState().flush();
    expect((await readCurrentRecord<SavedProject>(storage, id))?.scenario.name).toBe(demoScenario.name);

    await act(async () => {
      fireEvent.click(screen.getByRole('button', { name: 'Take over' }));
      await vi.advanceTimersByTimeAsync(10);
    });
    expect(firstTab.takenOver).toHaveBeenCalledWith(id);
    expect(secondTab.getState().readOnly).toBeNull();
    expect((await readCurrentRecord<SavedProject>(storage, id))?.scenario.name).toBe('Edited in the second tab');
    expect(screen.queryByRole('alert')).toBeNull();

    // And the other way round: being taken over makes this tab read-only.
    other.takeOver();
    expect(secondTab.getState().readOnly).toBe(READ_ONLY_TAKEN);
  });
});
