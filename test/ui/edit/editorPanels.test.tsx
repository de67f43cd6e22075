// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { EditorPanels } from '../../../src/ui/edit/EditorPanels';
import { ProfileEditToolbar } from '../../../src/ui/edit/ProfileEditToolbar';
import { useScenarioStore } from '../../../src/state/scenarioStore';
import { useEditorStore } from '../../../src/state/editorStore';
import { resetStores } from '../../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);

describe('EditorPanels', () => {
  it('offers the edit modes (in the toolbar under the profile) and three tabs of labelled settings with units', () => {
    render(
      <>
        <ProfileEditToolbar />
        <EditorPanels />
      </>,
    );
    const modes = screen.getByRole('radiogroup', { name: 'Profile edit mode' });
    expect(within(modes).getAllByRole('radio').map((r) => r.parentElement?.textContent)).toEqual(['View', 'Draw bed', 'Draw ice surface', 'Edit points']);
    fireEvent.click(screen.getByRole('radio', { name: 'Edit points' }));
    expect(useEditorStore.getState().mode).toBe('edit-points');
    expect(screen.getByRole('group', { name: 'Selected bed point' })).toBeTruthy();

    expect(screen.getByRole('group', { name: 'Glacier width along the valley' })).toBeTruthy();
    fireEvent.click(screen.getByRole('tab', { name: 'Ice and flow' }));
    expect(screen.getByLabelText('Rate factor A')).toBeTruthy();
    expect(screen.getByText(/2.4e-24 Pa⁻³ s⁻¹ \(Cuffey & Paterson 2010, Table 3.4\)/)).toBeTruthy();
    fireEvent.click(screen.getByRole('tab', { name: 'Climate and run' }));
    expect(screen.getByRole('img', { name: 'Mass balance against elevation at year 0' })).toBeTruthy();
    expect(screen.getByText(/Ambach 1989; Larocca et al. 2024/)).toBeTruthy();
  });

  it('switching the balance model keeps the ELA and can be undone in one step', () => {
    render(<EditorPanels />);
    fireEvent.click(screen.getByRole('tab', { name: 'Climate and run' }));
    fireEvent.change(screen.getByLabelText('Mass-balance model'), { target: { value: 'degree-day' } });
    const mb = useScenarioStore.getState().scenario.massBalance;
    expect(mb).toMatchObject({ model: 'degree-day', referenceElevation: 2780, ddfSnow: 4, ddfIce: 8 });
    expect(screen.getByLabelText('Temperature lapse rate')).toHaveProperty('value', '6.5');
    fireEvent.change(screen.getByLabelText('Mass-balance model'), { target: { value: 'table' } });
    expect(screen.getByRole('table', { name: 'Balance table' })).toBeTruthy();
    useScenarioStore.getState().undo();
    expect(useScenarioStore.getState().scenario.massBalance.model).toBe('degree-day');
  });
});
