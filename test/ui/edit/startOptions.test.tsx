// @vitest-environment jsdom
/**
 * The start of a run in the Climate and run tab (StartOptions): steady, as drawn, and the glacier
 * as it is today (observed, transient with start year and climate offset), each one undoable
 * edit; ranges and cross-field rules of docs/scenario-format.md refused at the field.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, render, screen } from '@testing-library/react';
import type { Scenario } from '../../../src/model/scenario';
import { useScenarioStore } from '../../../src/state/scenarioStore';
import { RunParameters } from '../../../src/ui/edit/RunParameters';
import { testValley } from '../../analysis/valley';
import { checked } from '../../helpers/checkedScenario';
import { resetStores } from '../../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);

const observed = (): Scenario =>
  testValley({
    warming: [[-120, -0.4], [0, 0.3], [100, 1]],
    surface: [[0, 3260], [2000, 2990], [4000, 2600], [4400, 2490], [6000, 2250]],
    observations: { terminus: 4400 },
  });

function typeAndLeave(label: string | RegExp, text: string) {
  const input = screen.getByLabelText(label) as HTMLInputElement;
  fireEvent.change(input, { target: { value: text } });
  fireEvent.blur(input);
  return input;
}
const radio = (name: RegExp) => screen.getByRole('radio', { name }) as HTMLInputElement;

describe('Start of the run', () => {
  it('offers steady, as drawn, today observed and today transient; the transient start year and offset with their ranges; each one undoable edit', () => {
    const start = checked(observed());
    useScenarioStore.getState().load(start, 'Test');
    render(<RunParameters />);
    expect(radio(/Spin up to a steady state/).checked).toBe(true);
    expect(screen.queryByLabelText(/Start year/)).toBeNull();

    fireEvent.click(radio(/Today, from a transient past/));
    // The warming's first year (-120 a) is the default start year; the offset is fitted.
    expect(useScenarioStore.getState().scenario.start).toEqual({ from: 'transient', startYear: -120 });
    expect(useScenarioStore.getState().scenario.spinup).toBeUndefined();
    expect((screen.getByLabelText(/Start year/) as HTMLInputElement).value).toBe('-120');
    expect((screen.getByLabelText(/Climate offset/) as HTMLInputElement).value).toBe('');

    typeAndLeave(/Start year/, '-20000');
    expect(screen.getByRole('alert').textContent).toMatch(/-20000 is not allowed.*at least -10,000 and less than 0 a/);
    typeAndLeave(/Start year/, '5');
    expect(screen.getByRole('alert').textContent).toMatch(/5 is not allowed/);
    typeAndLeave(/Start year/, '-150');
    expect(useScenarioStore.getState().scenario.start).toEqual({ from: 'transient', startYear: -150 });

    typeAndLeave(/Climate offset/, '20');
    expect(screen.getByRole('alert').textContent).toMatch(/20 is not allowed.*from -16 to 16 K/);
    typeAndLeave(/Climate offset/, '0.5');
    expect(useScenarioStore.getState().scenario.start).toEqual({ from: 'transient', startYear: -150, climateOffset: 0.5 });
    typeAndLeave(/Climate offset/, '');
    expect(useScenarioStore.getState().scenario.start).toEqual({ from: 'transient', startYear: -150 });

    fireEvent.click(radio(/Today, as observed/));
    expect(useScenarioStore.getState().scenario.start).toEqual({ from: 'observed' });
    expect(screen.queryByLabelText(/Start year/)).toBeNull();
    act(() => useScenarioStore.getState().undo());
    expect(useScenarioStore.getState().scenario.start).toEqual({ from: 'transient', startYear: -150 });

    fireEvent.click(radio(/Spin up to a steady state/));
    expect(useScenarioStore.getState().scenario.spinup).toBe(true);
    expect(useScenarioStore.getState().scenario.start).toBeUndefined();
    fireEvent.click(radio(/From the initial surface as drawn/));
    expect(useScenarioStore.getState().scenario.spinup).toBe(false);
  });

  it('refuses a start from today without an observed surface, or a fit without an observed terminus, at the field', () => {
    const { surface: _surface, ...noSurface } = observed();
    useScenarioStore.getState().load(checked(noSurface as Scenario), 'Test');
    render(<RunParameters />);
    const before = useScenarioStore.getState().scenario;
    fireEvent.click(radio(/Today, as observed/));
    expect(screen.getByRole('alert').textContent).toContain('needs the observed glacier: its surface (/surface)');
    expect(useScenarioStore.getState().scenario).toBe(before);
    cleanup();

    useScenarioStore.getState().load(checked({ ...observed(), observations: {} }), 'Test');
    render(<RunParameters />);
    fireEvent.click(radio(/Today, from a transient past/));
    expect(screen.getByRole('alert').textContent).toContain('give /observations/terminus, or a fixed climateOffset');
    expect(useScenarioStore.getState().scenario.start).toBeUndefined();
  });
});
