// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, render, screen } from '@testing-library/react';
import { useExperimentStore } from '../../../src/state/experimentStore';
import { demoScenario } from '../../../src/state/scenarioStore';
import { useViewStore } from '../../../src/state/viewStore';
import { App } from '../../../src/ui/App';
import { resetStores } from '../../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);

describe('view switch in the header', () => {
  it('switches between the workbench and the experiments, keeping the workbench mounted but hidden', () => {
    const { container } = render(<App />);
    const workbench = container.querySelector('main.workbench') as HTMLElement;
    expect(screen.getByRole('button', { name: 'Workbench' }).getAttribute('aria-pressed')).toBe('true');
    expect(workbench.hidden).toBe(false);
    expect(screen.queryByRole('main', { name: 'Experiments' })).toBeNull();

    fireEvent.click(screen.getByRole('button', { name: 'Experiments' }));
    expect(screen.getByRole('button', { name: 'Experiments' }).getAttribute('aria-pressed')).toBe('true');
    expect(screen.getByRole('main', { name: 'Experiments' })).toBeTruthy();
    expect(workbench.hidden).toBe(true);
    expect(container.querySelector('main.workbench')).toBe(workbench);
    // The caution beside the experiment results and at the foot of the page; the workbench's is hidden.
    expect(screen.getAllByRole('note')).toHaveLength(2);
    expect(useExperimentStore.getState().experiment?.base).toEqual(demoScenario);

    fireEvent.click(screen.getByRole('button', { name: 'Workbench' }));
    expect(workbench.hidden).toBe(false);
    expect(screen.queryByRole('main', { name: 'Experiments' })).toBeNull();
  });

  it('shows a notice after a switch made for the user, until dismissed', () => {
    render(<App />);
    act(() => useViewStore.getState().show('workbench', 'Member 1_base is now the workbench scenario.'));
    expect(screen.getByText(/Member 1_base is now the workbench scenario\./)).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Dismiss' }));
    expect(screen.queryByText(/Member 1_base/)).toBeNull();
  });
});
