// @vitest-environment jsdom
/**
 * The observations editor: every change is one undoable, validated edit; a refused value stays at
 * its field with the validator's message; the CSV import lists unreadable rows line by line and
 * imports nothing until they are left out.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { useScenarioStore, demoScenario } from '../../../src/state/scenarioStore';
import { ObservationsEditor } from '../../../src/ui/edit/ObservationsEditor';
import { resetStores } from '../../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);

const state = () => useScenarioStore.getState();
const typeInto = (label: string | RegExp, value: string) => {
  const input = screen.getByLabelText(label) as HTMLInputElement;
  fireEvent.change(input, { target: { value } });
  fireEvent.blur(input);
};

describe('ObservationsEditor', () => {
  it('adds a thickness point, edits it in km, refuses a position beyond the domain at the field, and undoes', () => {
    render(<ObservationsEditor />);
    expect(state().scenario.observations).toBeUndefined();
    fireEvent.click(screen.getByRole('button', { name: 'Add thickness point' }));
    const length = demoScenario.grid.length;
    expect(state().scenario.observations?.thickness).toEqual([[Math.round(length / 2), 100, 10]]);
    expect(state().past.length).toBe(1);

    typeInto('Measured ice thickness: x, row 1 (km)', '2.5');
    expect(state().scenario.observations?.thickness).toEqual([[2500, 100, 10]]);

    const before = state().scenario;
    typeInto('Measured ice thickness: x, row 1 (km)', String(length / 1000 + 1));
    expect(state().scenario).toBe(before);
    const alert = screen.getByRole('alert');
    // In km, as the column shows positions, not in the file's metres.
    expect(alert.textContent).toBe(
      `Not applied: /observations/thickness/0/0: ${length / 1000 + 1} is not allowed; the x of each thickness observation must lie within the domain, from 0 to ${length / 1000} km (grid.length)`,
    );
    // The refused text stays as typed.
    expect((screen.getByLabelText('Measured ice thickness: x, row 1 (km)') as HTMLInputElement).value).toBe(String(length / 1000 + 1));

    typeInto('Measured ice thickness: Uncertainty, row 1 (m)', '0');
    expect(screen.getByRole('alert').textContent).toMatch(/zero uncertainty cannot weight a fit/);

    fireEvent.click(screen.getByRole('button', { name: 'Remove measured ice thickness row 1' }));
    expect(state().scenario.observations).toBeUndefined();
    state().undo();
    expect(state().scenario.observations?.thickness).toEqual([[2500, 100, 10]]);
  });

  it('sets the year and the terminus as a position in km or a record, each one edit', () => {
    render(<ObservationsEditor />);
    typeInto(/^Observation year/, '-5');
    expect(state().scenario.observations).toEqual({ year: -5 });
    fireEvent.click(screen.getByLabelText('One position'));
    typeInto(/^Terminus position/, '4.2');
    expect(state().scenario.observations).toEqual({ year: -5, terminus: 4200 });
    fireEvent.click(screen.getByLabelText('Record in time'));
    expect(state().scenario.observations?.terminus).toEqual([[-5, 4200]]);
    fireEvent.click(screen.getByLabelText('None'));
    expect(state().scenario.observations).toEqual({ year: -5 });
  });

  it('imports speeds from CSV: lists bad rows by line, imports nothing until they are left out, then replaces the list', () => {
    render(<ObservationsEditor />);
    fireEvent.click(screen.getByRole('button', { name: /Import surface speed from CSV/ }));
    const dialog = screen.getByRole('dialog', { name: /Import measured surface speed/ });
    expect(dialog.textContent).toContain('x (distance down-valley, km or m), surface speed (m a⁻¹), uncertainty (m a⁻¹, one sigma, greater than 0)');
    fireEvent.change(within(dialog).getByLabelText('Measured surface speed as CSV'), { target: { value: 'x_km,speed,sigma\n1,14,3\n2,fast,3\n3,30,-1\n4,25,3\n' } });
    const items = within(within(dialog).getByRole('list', { name: 'Rows that could not be read' })).getAllByRole('listitem').map((li) => li.textContent);
    expect(items).toEqual(['Line 3: surface speed "fast" is not a number', 'Line 4: uncertainty -1 m a⁻¹ must be greater than 0 (a zero uncertainty cannot weight a fit)']);
    const importButton = within(dialog).getByRole('button', { name: 'Import' }) as HTMLButtonElement;
    expect(importButton.disabled).toBe(true);
    fireEvent.click(importButton);
    expect(state().scenario).toBe(demoScenario);

    fireEvent.click(within(dialog).getByLabelText(/Leave out the 2 unreadable rows/));
    fireEvent.click(importButton);
    expect(state().scenario.observations?.surfaceSpeed).toEqual([
      [1000, 14, 3],
      [4000, 25, 3],
    ]);
    expect(state().past.length).toBe(1);
    expect(screen.queryByRole('dialog')).toBeNull();
  });

  it('shows the validator refusal of an import (a point beyond the domain) and applies nothing', () => {
    render(<ObservationsEditor />);
    fireEvent.click(screen.getByRole('button', { name: /Import thickness from CSV/ }));
    const far = demoScenario.grid.length + 1000;
    fireEvent.change(screen.getByLabelText('Measured ice thickness as CSV'), { target: { value: `x (m),thickness,sigma\n1000,50,5\n${far},60,5\n` } });
    fireEvent.click(screen.getByRole('button', { name: 'Import' }));
    expect(state().scenario).toBe(demoScenario);
    expect(screen.getByRole('alert').textContent).toMatch(/^Not applied: .*thickness observation must lie within the domain/);
  });
});
