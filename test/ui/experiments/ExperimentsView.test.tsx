// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { useExperimentStore, type PoolOptions } from '../../../src/state/experimentStore';
import { demoScenario, useScenarioStore } from '../../../src/state/scenarioStore';
import { useViewStore } from '../../../src/state/viewStore';
import { ExperimentPoolContext } from '../../../src/ui/experiments/ExperimentPoolContext';
import { ExperimentsView } from '../../../src/ui/experiments/ExperimentsView';
import { RunClientContext } from '../../../src/ui/run/RunClientContext';
import type { RunClient } from '../../../src/worker/workerClient';
import { InProcessMemberWorker } from '../../worker/memberWorkerFakes';
import { resetStores } from '../../helpers/resetStores';

const short = { ...demoScenario, spinup: false, run: { years: 30, outputEvery: 5 } };

function renderView() {
  const runs: string[] = [];
  const client: RunClient = { run: (s, revision) => runs.push(`${s.name}:${revision}`), pause() {}, resume() {}, stop() {}, step() {} };
  const pool: PoolOptions = { size: (n) => Math.min(2, n), createWorker: () => new InProcessMemberWorker() };
  render(
    <RunClientContext.Provider value={client}>
      <ExperimentPoolContext.Provider value={pool}>
        <ExperimentsView />
      </ExperimentPoolContext.Provider>
    </RunClientContext.Provider>,
  );
  return { runs };
}

/** Clicks and lets the experiment's (asynchronous) validation settle. */
const click = (element: HTMLElement) => act(async () => void fireEvent.click(element));
const type = (container: HTMLElement, label: string, text: string) => fireEvent.change(within(container).getByLabelText(label), { target: { value: text } });

beforeEach(() => {
  resetStores();
  useScenarioStore.getState().load(short, 'Test');
  useViewStore.setState({ view: 'experiments' });
});
afterEach(cleanup);

describe('experiments view', () => {
  it('starts from the workbench scenario, with the caution on screen', () => {
    renderView();
    expect(useExperimentStore.getState().experiment?.base).toEqual(short);
    expect(screen.getByText('1 member (the base); at most 10,000.')).toBeTruthy();
    const caution = screen.getByRole('note');
    expect(caution.textContent).toMatch(/not a hazard assessment/);
  });

  it('adds a variant from typed fields, and refuses a bad value naming the field and the allowed range', async () => {
    renderView();
    const form = screen.getByRole('heading', { name: 'Add a variant' }).closest('section')!;
    type(form, 'Rate factor A (Pa⁻³ s⁻¹)', '-1');
    await click(within(form).getByRole('button', { name: 'Add variant' }));
    const alert = within(form).getByRole('alert');
    expect(alert.textContent).toBe('Not applied: Rate factor A: -1 is not allowed; the rate factor A must be a finite number greater than 0 Pa⁻³ s⁻¹');
    expect(useExperimentStore.getState().experiment?.variants).toBeUndefined();

    type(form, 'Rate factor A (Pa⁻³ s⁻¹)', 'soft');
    await click(within(form).getByRole('button', { name: 'Add variant' }));
    expect(within(form).getByRole('alert').textContent).toBe('Not applied: Rate factor A: "soft" is not a number; write e.g. 2800, 0.007 or 2.4e-24');

    type(form, 'Rate factor A (Pa⁻³ s⁻¹)', '4.8e-24');
    type(form, 'ELA shift (m)', '100');
    fireEvent.change(within(form).getByLabelText('Name'), { target: { value: 'soft and high' } });
    await click(within(form).getByRole('button', { name: 'Add variant' }));
    expect(within(form).queryByRole('alert')).toBeNull();
    expect(useExperimentStore.getState().experiment?.variants).toEqual([{ name: 'soft and high', set: { massBalance: { ela: 2880 } , ice: { A: 4.8e-24 } } }]);
    expect(screen.getByRole('list', { name: 'Variants' }).textContent).toMatch(/soft and high/);

    // The same name again: the experiment validator refuses it, and nothing is added.
    fireEvent.change(within(form).getByLabelText('Name'), { target: { value: 'soft and high' } });
    type(form, 'Sliding coefficient C (m a⁻¹ Pa⁻³)', '0');
    await click(within(form).getByRole('button', { name: 'Add variant' }));
    expect(within(form).getByRole('alert').textContent).toMatch(/^Not applied: Name: "soft and high" is not allowed; variant names must be unique/);
    expect(useExperimentStore.getState().experiment?.variants).toHaveLength(1);
  });

  it('builds a warming ladder, runs it, and shows three curves per chart, three profiles and a three-row table', async () => {
    renderView();
    const ladder = screen.getByRole('form', { name: 'Warming ladder' });
    type(ladder, 'By year (a)', '20');
    await click(within(ladder).getByRole('button', { name: 'Add ladder' }));
    expect(screen.getByText('3 members (3 variants); at most 10,000.')).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: 'Run experiment' }));
    await waitFor(() => expect(useExperimentStore.getState().runStatus).toBe('done'), { timeout: 20_000 });
    await screen.findByText('Finished: 3 of 3 done.');

    const length = await screen.findByRole('img', { name: 'Glacier length: 3 members' });
    const volume = screen.getByRole('img', { name: 'Ice volume: 3 members' });
    for (const chart of [length, volume]) {
      const lines = chart.querySelectorAll('path.member-line');
      expect(lines).toHaveLength(3);
      for (const l of lines) expect(l.getAttribute('d')).toMatch(/^M[\d.,-]+(L[\d.,-]+){6}$/);
    }
    expect(length.textContent).toMatch(/Model year \(a\)/);
    expect(length.textContent).toMatch(/Length \(km\)/);
    expect(volume.textContent).toMatch(/Volume \(km³\)/);
    const profiles = screen.getByRole('img', { name: /Glacier surface at the end of the run for 3 members/ });
    expect(profiles.querySelectorAll('path.member-line')).toHaveLength(3);
    expect(profiles.textContent).toMatch(/Distance down-valley \(km\)/);
    expect(profiles.textContent).toMatch(/Elevation \(m a\.s\.l\.\)/);
    const legend = screen.getByRole('list', { name: 'Members on the charts' });
    expect(within(legend).getAllByRole('listitem').map((li) => li.textContent)).toEqual(['+1 K by year 20', '+2 K by year 20', '+3 K by year 20']);
    // All three start from the same glacier, drawn once for reference.
    expect(profiles.querySelectorAll('path[data-layer="start-surface"]')).toHaveLength(1);

    const table = screen.getByRole('table');
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(3);
    expect(rows.map((r) => r.getAttribute('data-member'))).toEqual(['1_+1-K-by-year-20', '2_+2-K-by-year-20', '3_+3-K-by-year-20']);

    // Sorting by volume change, descending: the least warming loses least, so comes first.
    const header = within(table).getByRole('button', { name: /Volume change \(km³\)/ });
    fireEvent.click(header);
    fireEvent.click(header);
    expect(header.closest('th')!.getAttribute('aria-sort')).toBe('descending');
    expect(within(table).getAllByRole('row').slice(1).map((r) => r.getAttribute('data-member'))).toEqual([
      '1_+1-K-by-year-20',
      '2_+2-K-by-year-20',
      '3_+3-K-by-year-20',
    ]);
    fireEvent.click(header);
    expect(within(table).getAllByRole('row').slice(1)[0].getAttribute('data-member')).toBe('3_+3-K-by-year-20');
  }, 30_000);

  it('opens a member in the workbench as one undoable change and starts its run there', async () => {
    const { runs } = renderView();
    const ladder = screen.getByRole('form', { name: 'Warming ladder' });
    type(ladder, 'From (K)', '2');
    type(ladder, 'To (K)', '2');
    type(ladder, 'By year (a)', '20');
    await click(within(ladder).getByRole('button', { name: 'Add ladder' }));
    fireEvent.click(screen.getByRole('button', { name: 'Run experiment' }));
    await screen.findByText('Finished: 1 of 1 done.', undefined, { timeout: 20_000 });
    const revision = useScenarioStore.getState().revision;
    await act(async () => fireEvent.click(screen.getByRole('button', { name: '1_+2-K-by-year-20' })));
    const scenarios = useScenarioStore.getState();
    expect(scenarios.scenario.warming).toEqual([[0, 0], [20, 2]]);
    expect(scenarios.label).toBe('Open experiment member 1_+2-K-by-year-20');
    expect(scenarios.revision).toBe(revision + 1);
    expect(runs).toEqual([`${short.name}:${revision + 1}`]);
    expect(useViewStore.getState().view).toBe('workbench');
    expect(useViewStore.getState().notice).toMatch(/deterministic, so this is the same run/);
    scenarios.undo();
    expect(useScenarioStore.getState().scenario).toEqual(short);
  }, 30_000);

  it('refuses a sweep beyond the member limit with the count and the limit', async () => {
    renderView();
    const ladder = screen.getByRole('form', { name: 'Warming ladder' });
    type(ladder, 'From (K)', '0');
    type(ladder, 'To (K)', '9.9');
    type(ladder, 'Step (K)', '0.1');
    await click(within(ladder).getByRole('button', { name: 'Add ladder' }));
    const sweep = screen.getByRole('form', { name: 'Parameter sweep' });
    type(sweep, 'Values (count)', '101');
    await click(within(sweep).getByRole('button', { name: 'Set sweep' }));
    expect(within(sweep).getByRole('alert').textContent).toBe(
      'Not applied: Sweep: this would make 10,100 members; an experiment has at most 10,000 (variants, or 1, times the sweep values)',
    );
    expect(useExperimentStore.getState().experiment?.sweep).toBeUndefined();
  });

  it('opens an experiment file through the validator and names the variant and path of an error', async () => {
    renderView();
    const input = screen.getByLabelText('Experiment file to open') as HTMLInputElement;
    const bad = { format: 'firnline-experiment', version: 1, base: short, variants: [{ name: 'hot', set: { warming: [[0, 0], [80, 99]] } }] };
    const file = new File([JSON.stringify(bad)], 'hot.experiment.json', { type: 'application/json' });
    await act(async () => fireEvent.change(input, { target: { files: [file] } }));
    const alert = await screen.findByText(/hot\.experiment\.json was not opened; nothing was changed:/);
    expect(alert.closest('[role="alert"]')!.textContent).toMatch(/\/variants\/0\/set\/warming\/1\/1: in variant "hot" \(member 1_hot\): \/warming\/1\/1: 99 is not allowed/);
    expect(useExperimentStore.getState().experiment?.variants).toBeUndefined();

    const good = { ...bad, name: 'Cooler', variants: [{ name: 'mild', set: { warming: [[0, 0], [80, 1]] } }] };
    await act(async () => fireEvent.change(input, { target: { files: [new File([JSON.stringify(good)], 'mild.json')] } }));
    await screen.findByText(/Opened mild\.json/);
    expect(useExperimentStore.getState().experiment?.name).toBe('Cooler');
    expect(screen.getByRole('heading', { name: 'Cooler' })).toBeTruthy();
  });
});
