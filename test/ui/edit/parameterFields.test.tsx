// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { MassBalanceParameters } from '../../../src/ui/edit/MassBalanceParameters';
import { IceParameters } from '../../../src/ui/edit/IceParameters';
import { RunParameters } from '../../../src/ui/edit/RunParameters';
import { VariabilityEditor } from '../../../src/ui/edit/VariabilityEditor';
import { DebrisEditor } from '../../../src/ui/edit/DebrisEditor';
import { FrontalAblationEditor } from '../../../src/ui/edit/FrontalAblationEditor';
import { useScenarioStore } from '../../../src/state/scenarioStore';
import { rateFactorFromTemperature } from '../../../src/model/physics/rateFactor';
import { formatScientific } from '../../../src/chart/formatScientific';
import { resetStores } from '../../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);

function typeAndLeave(label: string | RegExp, text: string) {
  const input = screen.getByLabelText(label) as HTMLInputElement;
  fireEvent.change(input, { target: { value: text } });
  fireEvent.blur(input);
  return input;
}

// Allowed ranges from docs/scenario-format.md, checked by validateScenario.
describe('parameter fields', () => {
  it('refuses an ELA outside the allowed range with the reason, keeps the typed text and applies nothing', () => {
    render(<MassBalanceParameters />);
    const before = useScenarioStore.getState().scenario;
    const input = typeAndLeave('ELA', '12000');
    expect(useScenarioStore.getState().scenario).toBe(before);
    expect(input.value).toBe('12000');
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByRole('alert').textContent).toMatch(/Not applied: 12000 is not allowed.*10,000/);
  });

  it('refuses an accumulation change below -20 % per K at the field, and applies +7 (Clausius–Clapeyron scale)', () => {
    render(<MassBalanceParameters />);
    const before = useScenarioStore.getState().scenario;
    typeAndLeave('Accumulation change per K of warming', '-25');
    expect(useScenarioStore.getState().scenario).toBe(before);
    expect(screen.getByRole('alert').textContent).toMatch(/Not applied: -25 is not allowed.*from -20 to 30 % K⁻¹$/);
    typeAndLeave('Accumulation change per K of warming', '7');
    expect(useScenarioStore.getState().scenario.massBalance).toMatchObject({ precipitationPerK: 7 });
  });

  it('year-to-year weather: switched on with defaults, a seed that is not whole refused at the field', () => {
    render(<VariabilityEditor />);
    fireEvent.click(screen.getByLabelText('Random weather each model year'));
    expect(useScenarioStore.getState().scenario.variability).toEqual({ temperatureSd: 0.8, precipitationSd: 0.15, seed: 1 });
    const before = useScenarioStore.getState().scenario;
    typeAndLeave('Seed', '2.5');
    expect(useScenarioStore.getState().scenario).toBe(before);
    expect(screen.getByRole('alert').textContent).toMatch(/Not applied: 2.5 is not allowed.*whole number/);
    typeAndLeave('Seed', '17');
    expect(useScenarioStore.getState().scenario.variability?.seed).toBe(17);
  });

  it('frontal ablation: a negative coefficient refused at the field with the range, 2.5 applied, empty removes the key', () => {
    render(<FrontalAblationEditor />);
    const before = useScenarioStore.getState().scenario;
    const input = typeAndLeave('Calving coefficient c', '-1');
    expect(useScenarioStore.getState().scenario).toBe(before);
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByRole('alert').textContent).toMatch(/Not applied: -1 is not allowed.*from 0 to 100 a⁻¹$/);
    typeAndLeave('Calving coefficient c', '2.5');
    expect(useScenarioStore.getState().scenario.frontalAblation).toEqual({ waterDepthCoefficient: 2.5 });
    typeAndLeave('Calving coefficient c', '');
    expect(useScenarioStore.getState().scenario.frontalAblation).toBeUndefined();
  });

  it('debris cover: added on the lower half, a negative thickness refused at its cell', () => {
    render(<DebrisEditor />);
    fireEvent.click(screen.getByRole('button', { name: 'Add debris cover' }));
    const length = useScenarioStore.getState().scenario.grid.length;
    expect(useScenarioStore.getState().scenario.debris).toEqual([[length / 2, 0], [length, 0.3]]);
    const before = useScenarioStore.getState().scenario;
    typeAndLeave('Debris thickness, row 2 (m)', '-0.2');
    expect(useScenarioStore.getState().scenario).toBe(before);
    expect(screen.getByRole('alert').textContent).toMatch(/-0.2 is not allowed.*from 0 to 10 m/);
  });

  it('refuses text that is not a number, naming it', () => {
    render(<MassBalanceParameters />);
    typeAndLeave('ELA', '2,800');
    expect(screen.getByRole('alert').textContent).toMatch(/"2,800" is not a number; write decimals with a point/);
    expect(useScenarioStore.getState().past).toHaveLength(0);
  });

  it('applies a good value as one undoable edit labelled with the field', () => {
    render(<MassBalanceParameters />);
    typeAndLeave('ELA', '2900');
    const state = useScenarioStore.getState();
    expect(state.scenario.massBalance).toMatchObject({ model: 'linear', ela: 2900 });
    expect(state.past).toHaveLength(1);
    expect(state.label).toBe('Set ELA');
    expect(screen.queryByRole('alert')).toBeNull();
    state.undo();
    expect(useScenarioStore.getState().scenario.massBalance).toMatchObject({ ela: 2780 });
  });

  it('shows balance gradients per 100 m and stores them per metre', () => {
    render(<MassBalanceParameters />);
    const input = screen.getByLabelText('Ablation gradient (below the ELA)') as HTMLInputElement;
    expect(input.value).toBe('0.7');
    typeAndLeave('Ablation gradient (below the ELA)', '0.9');
    expect(useScenarioStore.getState().scenario.massBalance).toMatchObject({ ablationGradient: 0.009 });
  });

  it('refuses a balance gradient in the unit it is shown in (per 100 m), not per metre', () => {
    render(<MassBalanceParameters />);
    const before = useScenarioStore.getState().scenario;
    // The file's limit is 0.1 (m w.e. a^-1) m^-1, shown as 10 per 100 m.
    typeAndLeave('Ablation gradient (below the ELA)', '20');
    expect(useScenarioStore.getState().scenario).toBe(before);
    expect(screen.getByRole('alert').textContent).toBe(
      'Not applied: 20 is not allowed; the ablation gradient must be a finite number greater than 0 and at most 10 m w.e. a⁻¹ per 100 m',
    );
    cleanup();
    render(<MassBalanceParameters />);
    typeAndLeave('Accumulation gradient (above the ELA)', '-0.3');
    expect(screen.getByRole('alert').textContent).toBe(
      'Not applied: -0.3 is not allowed; the accumulation gradient must be a finite number from 0 to 10 m w.e. a⁻¹ per 100 m',
    );
  });

  it('writes the rate factor unit with the chosen n, in the field and in its refusal (Pa⁻⁴ s⁻¹ for n = 4)', () => {
    const s = useScenarioStore.getState().scenario;
    useScenarioStore.getState().apply({ ...s, ice: { n: 4, A: 1e-30 } }, 'n = 4');
    const { container } = render(<IceParameters />);
    expect(container.textContent).toContain('Pa⁻⁴ s⁻¹');
    expect(container.textContent).not.toContain('Pa⁻ⁿ');
    typeAndLeave('Rate factor A', '-1');
    expect(screen.getByRole('alert').textContent).toBe('Not applied: -1 is not allowed; the rate factor A must be a finite number greater than 0 Pa⁻⁴ s⁻¹');
  });

  it('refuses a refreezing share in per cent, as shown, not as a fraction', () => {
    render(<MassBalanceParameters />);
    fireEvent.change(screen.getByLabelText('Mass-balance model'), { target: { value: 'degree-day' } });
    typeAndLeave('Refreezing share of melt and rain', '150');
    expect(screen.getByRole('alert').textContent).toMatch(/^Not applied: 150 is not allowed; the refreezing fraction must be a finite number from 0 to 100 %$/);
    cleanup();
    render(<MassBalanceParameters />);
    // Lapse rate: K m^-1 in the file, K per km on screen.
    typeAndLeave('Temperature lapse rate', '40');
    expect(screen.getByRole('alert').textContent).toMatch(/^Not applied: 40 is not allowed; the lapse rate must be a finite number from 0 to 15 K per km$/);
  });

  it('clears an optional value back to the default when emptied', () => {
    render(<MassBalanceParameters />);
    typeAndLeave('Largest accumulation', '');
    expect('maxAccumulation' in useScenarioStore.getState().scenario.massBalance).toBe(false);
    expect(useScenarioStore.getState().label).toBe('Clear Largest accumulation');
  });

  it('switches the rate factor to ice temperature and shows the resulting A (Cuffey & Paterson 2010, sec. 3.4)', () => {
    render(<IceParameters />);
    fireEvent.click(screen.getByLabelText(/ice temperature/));
    expect(useScenarioStore.getState().scenario.ice).toEqual({ n: 3, density: 910, temperature: 0 });
    typeAndLeave('Ice temperature', '-5');
    expect(screen.getByText(/Resulting A =/).textContent).toContain(formatScientific(rateFactorFromTemperature(-5)));
    typeAndLeave('Ice temperature', '3');
    expect(screen.getByRole('alert').textContent).toMatch(/3 is not allowed/);
    expect(useScenarioStore.getState().scenario.ice.temperature).toBe(-5);
  });

  it('refuses an output interval longer than the run (a cross-field rule), at that field', () => {
    render(<RunParameters />);
    typeAndLeave('Output interval', '500');
    expect(screen.getByRole('alert').textContent).toMatch(/500/);
    expect(useScenarioStore.getState().scenario.run.outputEvery).toBe(5);
  });
});
