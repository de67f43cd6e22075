// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { ValleyGenerator } from '../../../src/ui/edit/ValleyGenerator';
import { useScenarioStore, demoScenario } from '../../../src/state/scenarioStore';
import { resetStores } from '../../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);

function set(label: string, value: string) {
  fireEvent.change(screen.getByLabelText(new RegExp(`^${label} \\(`)), { target: { value } });
}

describe('ValleyGenerator', () => {
  it('starts from the current valley and replaces bed, length and surface as one undoable edit', () => {
    render(<ValleyGenerator />);
    expect((screen.getByLabelText(/^Head elevation/) as HTMLInputElement).value).toBe('3350');
    set('Valley length', '15');
    fireEvent.click(screen.getByLabelText('Overdeepening'));
    set('Overdeepening centre', '9');
    fireEvent.click(screen.getByRole('button', { name: 'Generate valley' }));
    const { scenario, past, label } = useScenarioStore.getState();
    expect(label).toBe('Generate valley');
    expect(past).toHaveLength(1);
    expect(scenario.grid).toEqual({ length: 15_000, spacing: 50 });
    expect(scenario.bed[0]).toEqual([0, 3350]);
    expect(scenario.bed[scenario.bed.length - 1]).toEqual([15_000, 1950]);
    expect(scenario.surface).toBeUndefined();
    // Width stretched from 12 km to 15 km.
    expect(scenario.width?.[scenario.width.length - 1]).toEqual([15_000, 700]);
    useScenarioStore.getState().undo();
    expect(useScenarioStore.getState().scenario).toBe(demoScenario);
  });

  it('refuses bad numbers, naming each field and its range, and applies nothing', () => {
    render(<ValleyGenerator />);
    set('Concavity exponent', '9');
    set('Head elevation', 'high');
    fireEvent.click(screen.getByRole('button', { name: 'Generate valley' }));
    const alert = screen.getByRole('alert').textContent ?? '';
    expect(alert).toMatch(/Head elevation: "high" is not a number/);
    expect(alert).toMatch(/Concavity exponent: 9 is not allowed; it must be from 0.3 to 5/);
    expect(useScenarioStore.getState().past).toHaveLength(0);
  });

  it('passes validator refusals through (an overdeepening below -1000 m)', () => {
    render(<ValleyGenerator />);
    set('Foot elevation', '-900');
    fireEvent.click(screen.getByLabelText('Overdeepening'));
    set('Overdeepening centre', '11');
    set('Overdeepening depth', '500');
    fireEvent.click(screen.getByRole('button', { name: 'Generate valley' }));
    expect(screen.getByRole('alert').textContent).toMatch(/\/bed\/\d+\/1: .* is not allowed/);
    expect(useScenarioStore.getState().past).toHaveLength(0);
  });
});
