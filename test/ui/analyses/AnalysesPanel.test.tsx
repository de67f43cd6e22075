// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { committedChangeAtYear } from '../../../src/model/analysis/committedChange';
import { spunUpTerminus, withCalibrationParameter } from '../../../src/model/analysis/calibrateTerminus';
import { useAnalysisStore } from '../../../src/state/analysisStore';
import { useScenarioStore } from '../../../src/state/scenarioStore';
import { formatKmChange } from '../../../src/ui/analyses/formatAnalysis';
import { testValley } from '../../analysis/valley';
import { renderAnalysesPanel } from '../../helpers/renderAnalysesPanel';
import { loadFinishedRun, shortDemo } from '../../state/runFixtures';
import { checked } from '../../helpers/checkedScenario';
import { resetStores } from '../../helpers/resetStores';

const renderPanel = () => renderAnalysesPanel();

const tab = (name: string) => fireEvent.click(screen.getByRole('tab', { name }));
const field = (label: RegExp) => screen.getByLabelText(label) as HTMLInputElement;
const type = (label: RegExp, text: string) => fireEvent.change(field(label), { target: { value: text } });
const press = (name: RegExp) => fireEvent.click(screen.getByRole('button', { name }));
const done = (kind: 'committed' | 'sensitivity' | 'calibration') =>
  waitFor(() => expect(useAnalysisStore.getState()[kind].status).toBe('done'), { timeout: 20_000 });

beforeEach(resetStores);
afterEach(cleanup);

describe('Analyses panel: tabs by keyboard', () => {
  it('is one tab stop; the arrows, Home and End move between the tabs and show the one reached', () => {
    renderPanel();
    const tabs = screen.getAllByRole('tab');
    expect(tabs.map((t) => t.getAttribute('tabindex'))).toEqual(['0', '-1', '-1', '-1']);
    act(() => tabs[0].focus());
    fireEvent.keyDown(tabs[0], { key: 'ArrowRight' });
    expect(document.activeElement).toBe(screen.getByRole('tab', { name: 'Sensitivity' }));
    expect(screen.getByRole('tab', { name: 'Sensitivity' }).getAttribute('aria-selected')).toBe('true');
    expect(screen.getByRole('tabpanel', { name: 'Sensitivity' })).toBeTruthy();
    fireEvent.keyDown(document.activeElement!, { key: 'End' });
    expect(document.activeElement).toBe(screen.getByRole('tab', { name: 'Bed from the surface' }));
    fireEvent.keyDown(document.activeElement!, { key: 'ArrowRight' });
    expect(document.activeElement).toBe(screen.getByRole('tab', { name: 'Committed change' }));
    fireEvent.keyDown(document.activeElement!, { key: 'ArrowLeft' });
    expect(document.activeElement).toBe(screen.getByRole('tab', { name: 'Bed from the surface' }));
    fireEvent.keyDown(document.activeElement!, { key: 'Home' });
    expect(screen.getByRole('tab', { name: 'Committed change' }).getAttribute('aria-selected')).toBe('true');
    expect(screen.getAllByRole('tab').map((t) => t.getAttribute('tabindex'))).toEqual(['0', '-1', '-1', '-1']);
  });
});

describe('Analyses panel: committed change', () => {
  it('asks for a run first, then computes from the selected year with numbers and two charts', async () => {
    useScenarioStore.getState().load(shortDemo, 'Test');
    renderPanel();
    expect(screen.getByText(/Run the scenario first/)).toBeTruthy();
    expect((screen.getByRole('button', { name: 'Compute committed change' }) as HTMLButtonElement).disabled).toBe(true);

    act(() => loadFinishedRun()); // the short demo, frames at 0 ... 20 a; the newest is selected
    expect(screen.getByText(/From model year/).textContent).toBe('From model year 20 a, warming held at +0.30 K.');
    press(/Compute committed change/);
    await done('committed');

    // Independent route: the model run directly to year 20, then held (no worker, no frames).
    const direct = committedChangeAtYear(shortDemo, 20);
    const shown = useAnalysisStore.getState().committed.result!.committed;
    console.info(`short demo, held from year 20 at +0.30 K: length ${shown.lengthChange} m (direct ${direct.lengthChange} m), volume ${shown.volumeChange.toExponential(3)} m^3 (direct ${direct.volumeChange.toExponential(3)})`);
    expect(shown.warming).toBeCloseTo(0.3, 12);
    expect(Math.abs(shown.lengthChange - direct.lengthChange)).toBeLessThanOrEqual(shortDemo.grid.spacing);
    expect(Math.abs(shown.volumeChange - direct.volumeChange)).toBeLessThan(0.01 * Math.abs(direct.volumeChange));

    const numbers = document.querySelector('[data-numbers="committed"]') as HTMLElement;
    expect(within(numbers).getByText('Length change to come').nextElementSibling!.textContent).toMatch(new RegExp(`^${formatKmChange(shown.lengthChange)} \\(`));
    expect(within(numbers).getByText('Warming held').nextElementSibling!.textContent).toBe('+0.30 K');
    for (const chart of ['committed-length', 'committed-volume']) {
      const svg = document.querySelector(`[data-chart="${chart}"]`)!;
      expect(svg.querySelector('[data-series="run"] path')!.getAttribute('d')).toMatch(/^M[\d.,-]+(L[\d.,-]+){3,}/);
      expect(svg.querySelector('[data-series="held"] path')!.getAttribute('d')).toMatch(/^M[\d.,-]+(L[\d.,-]+){3,}/);
      expect(within(svg as HTMLElement).getByText('Model year (a)')).toBeTruthy();
    }
  }, 30_000);
});

describe('Analyses panel: sensitivity curve', () => {
  it('refuses a step that does not divide the range, then draws both branches with a legend and a table', async () => {
    useScenarioStore.getState().load(checked(testValley()), 'Test');
    renderPanel();
    tab('Sensitivity');
    expect(field(/Lowest warming/).value).toBe('-2');
    expect(field(/Highest warming/).value).toBe('4');
    type(/Lowest warming/, '0');
    type(/Highest warming/, '1');
    type(/^Step/, '0.3');
    press(/Compute sensitivity curve/);
    expect(screen.getByRole('alert').textContent).toBe('Step: 0.3 K does not divide the range of 1 K into whole steps; choose a step that does (e.g. 0.5 K).');
    expect(useAnalysisStore.getState().sensitivity.status).toBe('idle');

    type(/^Step/, '0.5');
    press(/Compute sensitivity curve/);
    expect(screen.queryByRole('alert')).toBeNull();
    await done('sensitivity');
    const rows = document.querySelectorAll('[data-numbers="sensitivity"] tbody tr');
    expect(Array.from(rows, (r) => r.querySelector('th')!.textContent)).toEqual(['0.00', '+0.50', '+1.00']);
    expect(rows[2].textContent).toMatch(/\(turn\)/);
    const terminus = document.querySelector('[data-chart="sensitivity-terminus"]') as HTMLElement;
    expect(within(terminus).getByText('Warming held (K)')).toBeTruthy();
    expect(within(terminus).getByText('Terminus (km)')).toBeTruthy();
    expect(within(terminus).getByText('Warming up')).toBeTruthy();
    expect(within(terminus).getByText('Cooling back')).toBeTruthy();
    // Up: 3 filled markers; down: drawn from the turn, 3 open markers on a dashed line.
    expect(terminus.querySelectorAll('[data-series="up"] circle.filled')).toHaveLength(3);
    expect(terminus.querySelectorAll('[data-series="down"] circle.open')).toHaveLength(3);
    expect(terminus.querySelector('[data-series="down"] path')!.getAttribute('class')).toBe('series dashed');
    expect(document.querySelector('[data-numbers="sensitivity-summary"]')!.textContent).toMatch(/branches agree within one grid cell \(100 m\)/);
  }, 30_000);

  it('can be cancelled, and says so', async () => {
    useScenarioStore.getState().load(checked(testValley()), 'Test');
    renderPanel();
    tab('Sensitivity');
    press(/Compute sensitivity curve/);
    expect(screen.getByRole('button', { name: 'Cancel' })).toBeTruthy();
    press(/^Cancel$/);
    await waitFor(() => expect(useAnalysisStore.getState().sensitivity.status).toBe('cancelled'));
    expect(screen.getByText('Cancelled.')).toBeTruthy();
    expect(useAnalysisStore.getState().active).toBeNull();
  });
});

describe('Analyses panel: calibration', () => {
  it('validates the observed terminus, recovers a known ELA and applies it as one undoable edit', async () => {
    // Identical twin: the terminus the model gives with an ELA of 2870 m is the "observation".
    const trueEla = 2870;
    const truth = testValley({ massBalance: { model: 'linear', ela: trueEla, ablationGradient: 0.007, accumulationGradient: 0.004, maxAccumulation: 2 } });
    const observed = spunUpTerminus(truth).terminus;
    const start = withCalibrationParameter(truth, 2750);
    useScenarioStore.getState().load(checked(start), 'Test');
    renderPanel();
    tab('Calibration');
    expect(field(/Tolerance/).value).toBe('50');
    type(/Observed terminus/, '6.5');
    press(/Calibrate the ELA/);
    expect(screen.getByRole('alert').textContent).toBe(
      'Observed terminus: 6.5 km is at or beyond the end of the flowline; give a position between 0 and 6 km down-valley (both ends excluded).',
    );
    expect(useAnalysisStore.getState().calibration.status).toBe('idle');

    type(/Observed terminus/, String(observed / 1000));
    press(/Calibrate the ELA/);
    await done('calibration');
    const c = useAnalysisStore.getState().calibration.result!.calibration;
    console.info(`UI calibration: true ELA ${trueEla} m, found ${c.parameter.toFixed(2)} m (band ${c.matchBand!.map((b) => b.toFixed(2)).join(' to ')} m), ${c.iterations} spin-ups, terminus ${c.terminus} m vs ${observed} m`);
    expect(c.matched).toBe(true);
    expect(c.matchBand![0]).toBeLessThanOrEqual(trueEla);
    expect(c.matchBand![1]).toBeGreaterThanOrEqual(trueEla);
    expect(screen.getByText(/^Matched: the terminus lies within 50 m/)).toBeTruthy();
    const found = Number(within(document.querySelector('[data-numbers="calibration"]') as HTMLElement).getByText('ELA found').nextElementSibling!.textContent!.replace(' m a.s.l.', ''));
    expect(Math.abs(found - trueEla)).toBeLessThanOrEqual((c.matchBand![1] - c.matchBand![0]) / 2 + 0.01);
    expect(document.querySelectorAll('[data-numbers="calibration-trials"] tbody tr')).toHaveLength(c.iterations);
    expect(document.querySelectorAll('[data-chart="calibration"] [data-series="trials"] circle')).toHaveLength(c.iterations);

    const revision = useScenarioStore.getState().revision;
    press(/^Apply ELA/);
    expect(useScenarioStore.getState().revision).toBe(revision + 1);
    expect(useScenarioStore.getState().scenario.massBalance).toMatchObject({ model: 'linear', ela: found });
    expect(screen.getByText(/^Applied: ELA .* Undo with Ctrl\+Z/)).toBeTruthy();
    // The scenario changed: the offer is withdrawn; one undo restores the starting ELA.
    expect((screen.getByRole('button', { name: /^Apply ELA/ }) as HTMLButtonElement).disabled).toBe(true);
    act(() => useScenarioStore.getState().undo());
    expect(useScenarioStore.getState().scenario).toEqual(start);
  }, 30_000);
});
