// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { ForcingImport } from '../../../src/ui/edit/ForcingImport';
import { demoScenario, useScenarioStore } from '../../../src/state/scenarioStore';
import { resetStores } from '../../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);

function choose(text: string) {
  const input = screen.getByLabelText('Forcing CSV') as HTMLInputElement;
  fireEvent.change(input, { target: { files: [new File([text], 'forcing.csv', { type: 'text/csv' })] } });
}

describe('ForcingImport', () => {
  it('lists bad rows by line and applies nothing', async () => {
    render(<ForcingImport />);
    choose('year,dT,P\n0,0,1\n50,1,-1\n');
    const list = await screen.findByRole('list', { name: 'Rows that could not be read' });
    expect(within(list).getAllByRole('listitem').map((li) => li.textContent)).toEqual([
      'Line 3: -1: the precipitation factor must be greater than 0 and at most 10',
    ]);
    expect(useScenarioStore.getState().scenario).toBe(demoScenario);
  });

  it('imports a clean file as one edit that replaces the warming', async () => {
    render(<ForcingImport />);
    choose('year,dT,P\n0,0,1\n100,1.5,1.1\n');
    await waitFor(() => expect(useScenarioStore.getState().scenario.forcing).toEqual([[0, 0, 1], [100, 1.5, 1.1]]));
    const state = useScenarioStore.getState();
    expect(state.scenario.warming).toBeUndefined();
    expect(state.label).toBe('Forcing: 2 rows from CSV');
    fireEvent.click(screen.getByRole('button', { name: 'Remove forcing' }));
    expect(useScenarioStore.getState().scenario.forcing).toBeUndefined();
  });
});
