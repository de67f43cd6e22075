// @vitest-environment jsdom
/**
 * The calibration section's fit to the scenario's own observations (FitSection): every target the
 * core supports is offered, refusals come at the field in the core's words, the fit runs in the
 * analysis worker (in process here) and is applied as one undoable edit. Twins on the invented
 * Thrummel test valley: the observations are made by the model on known A and ELA.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { createFlowlineModel } from '../../../src/model/createFlowlineModel';
import { profileFields } from '../../../src/model/diagnostics';
import { glacierExtent } from '../../../src/model/glacierExtent';
import { sampleCells } from '../../../src/model/inversion/invertBed';
import type { ObservedPoint, Point, Scenario } from '../../../src/model/scenario';
import { spinUp } from '../../../src/model/spinUp';
import { useAnalysisStore } from '../../../src/state/analysisStore';
import { useScenarioStore } from '../../../src/state/scenarioStore';
import { fitTargets } from '../../../src/ui/analyses/FitSection';
import { testValley } from '../../analysis/valley';
import { checked } from '../../helpers/checkedScenario';
import { renderAnalysesPanel } from '../../helpers/renderAnalysesPanel';
import { resetStores } from '../../helpers/resetStores';

const TRUE_A = 2.4e-24;
const TRUE_ELA = 2900;
const SPEED_X = [800, 1600, 2400, 3200, 4000];

/** The test valley's steady glacier on the true values, observed: surface, speeds (5 %), terminus. */
function observedValley(): Scenario {
  const truth = testValley();
  const model = createFlowlineModel(truth);
  const H = spinUp(model, model.initialThickness).thickness;
  const surface: Point[] = Array.from(model.grid.x, (x, i) => [x, model.grid.bed[i] + H[i]]);
  const u = profileFields(model, H, 0).surfaceSpeed;
  const surfaceSpeed: ObservedPoint[] = SPEED_X.map((x) => {
    const v = sampleCells(u, model.grid.spacing, x);
    return [x, v, 0.05 * v];
  });
  const terminus = glacierExtent(model.grid, H).terminus;
  return { ...truth, surface, observations: { terminus, surfaceSpeed } };
}

const renderPanel = () => renderAnalysesPanel('Calibration');

const choose = (label: string) => {
  const select = screen.getByLabelText('Parameter and observation') as HTMLSelectElement;
  const option = within(select).getByRole('option', { name: label }) as HTMLOptionElement;
  fireEvent.change(select, { target: { value: option.value } });
};
const refusal = () => document.querySelector('[data-refusal="fit"]')!.textContent;
const fitButton = () => screen.getByRole('button', { name: /^Fit \// }) as HTMLButtonElement;
const done = () => waitFor(() => expect(useAnalysisStore.getState().fit.status).toBe('done'), { timeout: 20_000 });
const number = (label: string) => within(document.querySelector('[data-numbers="fit"]') as HTMLElement).getByText(label).nextElementSibling!.textContent!;

beforeEach(resetStores);
afterEach(cleanup);

describe('Analyses panel: fit to the observations', () => {
  it('offers every target the core supports, for the balance model in use', () => {
    expect(fitTargets(testValley()).map((t) => t.key)).toEqual([
      '/ice/A surfaceSpeed',
      '/ice/enhancement surfaceSpeed',
      '/sliding/C surfaceSpeed',
      '/ice/A thickness',
      '/ice/enhancement thickness',
      '/massBalance/ela terminus',
      '/massBalance/ela terminusRecord',
      '/massBalance/ela geodeticBalance',
    ]);
  });

  it('refuses at the field a target the scenario cannot support, in the core\'s words, with Fit disabled', () => {
    useScenarioStore.getState().load(checked(observedValley()), 'Test');
    renderPanel();
    // The first target the scenario supports is offered first.
    expect((screen.getByLabelText('Parameter and observation') as HTMLSelectElement).value).toBe('/ice/A surfaceSpeed');
    choose('ELA to the terminus record (transient runs)');
    expect(screen.getByLabelText('Parameter and observation').getAttribute('aria-describedby')).toBeTruthy();
    expect(refusal()).toMatch(/^Cannot fit: the scenario has no observation that constrains \/massBalance\/ela: it needs a terminus record/);
    expect(fitButton().disabled).toBe(true);
    choose('Enhancement factor E to the surface speeds');
    expect(refusal()).toBe('Cannot fit: /ice/enhancement names no number in the scenario: the scenario has no /ice/enhancement');
    choose('Rate factor A to the surface speeds');
    expect(document.querySelector('[data-refusal="fit"]')).toBeNull();
    expect(fitButton().disabled).toBe(false);
  });

  it('fits A to surface speeds from 3 A (within 1 %), shows misfits and the observed against modelled chart, applies as one undoable edit', async () => {
    const start = checked({ ...observedValley(), ice: { n: 3, A: 3 * TRUE_A } });
    useScenarioStore.getState().load(start, 'Test');
    renderPanel();
    choose('Rate factor A to the surface speeds');
    fireEvent.click(fitButton());
    await done();
    const fit = useAnalysisStore.getState().fit.result!.fit;
    console.info(`UI fit: A ${fit.value.toExponential(4)} (true ${TRUE_A}); RMS ${fit.misfitBefore.rms.toFixed(2)} -> ${fit.misfitAfter.rms.toFixed(4)} m a^-1`);
    expect(Math.abs(fit.value / TRUE_A - 1)).toBeLessThan(0.01);
    expect(fit.misfitAfter.rms).toBeLessThan(fit.misfitBefore.rms);
    expect(number('Before')).toBe('7.200e-24 Pa^-3 s^-1');
    expect(number('Misfit before')).toMatch(/^RMS [\d.]+ m a\^-1, bias \u2212?[\d.]+ m a\^-1 \(5 observations, \u03c7\u00b2 /);
    expect(number('Misfit after')).toMatch(/^RMS [\d.e-]+ m a\^-1/);
    const chart = document.querySelector('[data-chart="fit"]') as HTMLElement;
    expect(chart.querySelectorAll('[data-series="observed"] circle')).toHaveLength(SPEED_X.length);
    expect(chart.querySelectorAll('[data-series="after"] circle')).toHaveLength(SPEED_X.length);
    expect(within(chart).getByText('Surface speed (m a^-1)')).toBeTruthy();
    expect(within(chart).getByText('Distance down-valley (km)')).toBeTruthy();

    const revision = useScenarioStore.getState().revision;
    fireEvent.click(screen.getByRole('button', { name: /^Apply \/ice\/A/ }));
    expect(useScenarioStore.getState().revision).toBe(revision + 1);
    expect(useScenarioStore.getState().scenario.ice.A).toBe(fit.value);
    expect(screen.getByText(/^Applied: \/ice\/A = .* Undo with Ctrl\+Z/)).toBeTruthy();
    expect((screen.getByRole('button', { name: /^Apply \/ice\/A/ }) as HTMLButtonElement).disabled).toBe(true);
    act(() => useScenarioStore.getState().undo());
    expect(useScenarioStore.getState().scenario).toEqual(start);
  }, 30_000);

  it('fits the ELA to the observed terminus from 2750 m (the true 2900 m within the matching band)', async () => {
    const base = observedValley();
    useScenarioStore.getState().load(checked({ ...base, massBalance: { ...base.massBalance, ela: 2750 } as Scenario['massBalance'] }), 'Test');
    renderPanel();
    choose('ELA to the observed terminus (spin-ups)');
    fireEvent.click(fitButton());
    await done();
    const fit = useAnalysisStore.getState().fit.result!.fit;
    console.info(`UI fit: ELA ${fit.value.toFixed(2)} m (true ${TRUE_ELA}), band ${fit.range!.low.toFixed(1)} to ${fit.range!.high.toFixed(1)} m, ${fit.runs.count} spin-ups`);
    expect(fit.range!.low).toBeLessThanOrEqual(TRUE_ELA);
    expect(fit.range!.high).toBeGreaterThanOrEqual(TRUE_ELA);
    expect(fit.misfitAfter.rms).toBeLessThanOrEqual(50);
    const chart = document.querySelector('[data-chart="fit"]') as HTMLElement;
    expect(within(chart).getByText('Terminus (m)')).toBeTruthy();
    expect(chart.querySelectorAll('[data-series="modelled"] circle')).toHaveLength(2);
  }, 30_000);
});
