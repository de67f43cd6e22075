// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, render, screen } from '@testing-library/react';
import { useRunStore } from '../../src/state/runStore';
import { useScenarioStore } from '../../src/state/scenarioStore';
import { RunClientContext } from '../../src/ui/run/RunClientContext';
import { RunControls } from '../../src/ui/run/RunControls';
import type { RunClient } from '../../src/worker/workerClient';
import { loadFinishedRun, runMessages, shortDemo } from '../state/runFixtures';
import { checked } from '../helpers/checkedScenario';
import { resetStores } from '../helpers/resetStores';

function fakeClient() {
  const calls: string[] = [];
  const client: RunClient = {
    run: (scenario, revision, options) => calls.push(`run:${scenario.name}:${revision}${options?.paused ? ':paused' : ''}`),
    pause: () => calls.push('pause'),
    resume: () => calls.push('resume'),
    stop: () => calls.push('stop'),
    step: () => calls.push('step'),
  };
  return { client, calls };
}

function renderControls() {
  const fake = fakeClient();
  render(
    <RunClientContext.Provider value={fake.client}>
      <RunControls />
    </RunClientContext.Provider>,
  );
  return fake;
}

const button = (name: string) => screen.getByRole('button', { name }) as HTMLButtonElement;
const enabled = () =>
  ['Run', 'Run again', 'Pause', 'Resume', 'Stop', 'Step one output']
    .filter((name) => screen.queryByRole('button', { name }))
    .filter((name) => !button(name).disabled);
const statusText = () => screen.getAllByRole('status')[0].textContent;
const receive = (...messages: Parameters<ReturnType<typeof useRunStore.getState>['receive']>[0]) =>
  act(() => useRunStore.getState().receive(messages));

beforeEach(() => {
  resetStores();
  useScenarioStore.getState().load(shortDemo, 'Test');
});
afterEach(cleanup);

describe('RunControls', () => {
  it('offers Run and Step before the first run and sends the current scenario and revision', () => {
    const { calls } = renderControls();
    expect(enabled()).toEqual(['Run', 'Step one output']);
    expect(statusText()).toBe('Not run yet.');
    fireEvent.click(button('Run'));
    expect(calls).toEqual([`run:${shortDemo.name}:${useScenarioStore.getState().revision}`]);
  });

  it('starts a run held at its start when stepping with no run going on', () => {
    const { calls } = renderControls();
    fireEvent.click(button('Step one output'));
    expect(calls).toEqual([`run:${shortDemo.name}:${useScenarioStore.getState().revision}:paused`, 'step']);
  });

  it('follows the run through spin-up, running, paused and done, enabling only what applies', () => {
    const { calls } = renderControls();
    act(() => useRunStore.getState().begin(1, useScenarioStore.getState().revision, 20));
    expect(enabled()).toEqual(['Stop']);
    const messages = runMessages(shortDemo, 1);
    const started = { ...(messages[0] as Extract<(typeof messages)[0], { type: 'started' }>), spinUp: true };
    receive(started, { type: 'spinup-progress', runId: 1, year: 1230, of: 20000 });
    expect(statusText()).toBe('Spin-up to a steady state under the year-0 climate: 1230 model years (at most 20,000).');
    expect(screen.getByRole('progressbar', { name: 'Spin-up, 1230 model years' })).toBeTruthy();
    expect(enabled()).toEqual(['Pause', 'Stop']);
    receive(messages[1], messages[2]);
    expect(statusText()).toBe('Running: year 5 of 20.');
    const bar = screen.getByRole('progressbar', { name: 'Run progress in model years' }) as HTMLProgressElement;
    expect([bar.value, bar.max]).toEqual([5, 20]);
    fireEvent.click(button('Pause'));
    receive({ type: 'paused', runId: 1 });
    expect(statusText()).toBe('Paused at year 5.');
    expect(enabled()).toEqual(['Resume', 'Stop', 'Step one output']);
    fireEvent.click(button('Step one output'));
    fireEvent.click(button('Resume'));
    expect(calls).toEqual(['pause', 'step', 'resume']);
    receive({ type: 'resumed', runId: 1 }, ...messages.slice(3));
    expect(statusText()).toBe('Done: 20 years, 5 outputs.');
    expect(enabled()).toEqual(['Run again', 'Step one output']);
    expect(screen.queryByRole('progressbar')).toBeNull();
  });

  it('states a numerical failure with its year and place, keeping the outputs before it', () => {
    renderControls();
    act(() => useRunStore.getState().begin(1, 0, 20));
    const messages = runMessages(shortDemo, 1);
    receive(messages[0], messages[1], { type: 'failed', runId: 1, message: 'ice thickness is not a number', year: 7.5, position: 4200 });
    expect(statusText()).toBe('The run failed at year 7.5, 4.20 km down-valley: ice thickness is not a number. 1 output before it is kept.');
    expect(enabled()).toEqual(['Run again', 'Step one output']);
  });

  it('marks the results out of date when the scenario changes after the run', () => {
    renderControls();
    act(() => loadFinishedRun());
    expect(screen.queryByText(/Results are out of date/)).toBeNull();
    act(() => useScenarioStore.getState().apply(checked({ ...shortDemo, name: 'Edited' }), 'Rename'));
    expect(screen.getByText('Results are out of date: the scenario has changed since this run. Run again to update them.')).toBeTruthy();
    act(() => useScenarioStore.getState().undo());
    // Undo makes a new revision: the results were made from the older one, so they stay stale.
    expect(screen.getByText(/Results are out of date/)).toBeTruthy();
  });

  it('folds the warnings of a run into one line that opens to list them', () => {
    renderControls();
    act(() => loadFinishedRun());
    const summary = useRunStore.getState().summary!;
    act(() => useRunStore.setState({ summary: { ...summary, warnings: ['First warning.', 'Second warning.'] } }));
    const fold = screen.getByText('2 warnings from the run').closest('details')!;
    expect(fold.open).toBe(false);
    const list = screen.getByRole('list', { hidden: true, name: 'Warnings from the run' });
    expect(Array.from(list.querySelectorAll('li')).map((li) => li.textContent)).toEqual(['First warning.', 'Second warning.']);
    act(() => useRunStore.setState({ summary: { ...summary, warnings: ['Only one.'] } }));
    expect(screen.getByText('1 warning from the run')).toBeTruthy();
  });

  it('shows a crashed worker as an alert', () => {
    renderControls();
    act(() => useRunStore.getState().begin(1, 0, 20));
    act(() => useRunStore.getState().workerLost('The model stopped unexpectedly (boom).'));
    expect(screen.getByRole('alert').textContent).toBe('The model stopped unexpectedly (boom).');
    expect(enabled()).toEqual(['Run again', 'Step one output']);
  });
});
