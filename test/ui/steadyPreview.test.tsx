// @vitest-environment jsdom
/**
 * The steady-glacier preview on the workbench, with the real preview driver in process: after an
 * edit of the ELA the text and the dashed glacier follow the new climate; an ELA above the valley
 * says no glacier survives; a refused edit shows nothing but the reason at the field; the switch
 * turns it off (and the choice is kept); while a run goes on the preview waits.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { useRunStore } from '../../src/state/runStore';
import { STEADY_PREVIEW_SETTING } from '../../src/state/steadyPreviewStore';
import { steadyPreviewSink } from '../../src/state/steadyPreviewStore';
import { MassBalanceParameters } from '../../src/ui/edit/MassBalanceParameters';
import { PreviewClientContext } from '../../src/ui/results/PreviewClientContext';
import { ProfilePanel } from '../../src/ui/results/ProfilePanel';
import { PreviewWorkerClient } from '../../src/worker/steadyPreviewClient';
import { InProcessPreviewWorker } from '../helpers/inProcessPreviewWorker';
import { resetStores } from '../helpers/resetStores';

const text = () => screen.getByTestId('steady-preview-text').textContent ?? '';
const overlay = () => document.querySelector('[data-layer="steady-glacier"] path.steady-surface');
const elaField = () => screen.getByLabelText('ELA') as HTMLInputElement;

function setEla(value: string) {
  fireEvent.change(elaField(), { target: { value } });
  fireEvent.keyDown(elaField(), { key: 'Enter' });
}

function renderPage() {
  const workers: InProcessPreviewWorker[] = [];
  const client = new PreviewWorkerClient(steadyPreviewSink, () => {
    const worker = new InProcessPreviewWorker();
    workers.push(worker);
    return worker;
  });
  render(
    <PreviewClientContext.Provider value={client}>
      <MassBalanceParameters />
      <ProfilePanel />
    </PreviewClientContext.Provider>,
  );
  return workers;
}

beforeEach(() => {
  localStorage.clear();
  resetStores();
});
afterEach(cleanup);

describe('steady-glacier preview', () => {
  it('states the steady glacier of the demo, and follows an edit of the ELA', async () => {
    renderPage();
    expect(text()).toMatch(/^Working out the steady glacier/);
    await waitFor(() => expect(text()).toBe('Steady glacier for this climate: terminus 9.35 km, 1.565 km³'), { timeout: 10_000 });
    expect(overlay()?.getAttribute('d')).toMatch(/^M[\d.,-]+(L[\d.,-]+){10,}$/);
    setEla('2700');
    await waitFor(() => expect(text()).toMatch(/^Steady glacier for this climate: terminus 11\.\d\d km, 2\.0\d\d km³$/), { timeout: 10_000 });
  });

  it('says no glacier survives when the ELA lies above the valley, and draws none', async () => {
    renderPage();
    setEla('4500');
    await waitFor(() => expect(text()).toBe('No glacier survives in this valley under this climate.'), { timeout: 10_000 });
    expect(overlay()).toBeNull();
  });

  it('shows nothing stale after a refused edit, the reason at the field, and the preview again after Escape', async () => {
    renderPage();
    await waitFor(() => expect(text()).toMatch(/^Steady glacier/), { timeout: 10_000 });
    setEla('20000');
    expect(screen.getByRole('alert').textContent).toBe('Not applied: 20000 is not allowed; the equilibrium-line altitude must be a finite number from -1000 to 10,000 m a.s.l.');
    expect(text()).toMatch(/^No steady glacier shown: the last edit was not applied/);
    expect(overlay()).toBeNull();
    fireEvent.keyDown(elaField(), { key: 'Escape' });
    expect(text()).toBe('Steady glacier for this climate: terminus 9.35 km, 1.565 km³');
    expect(overlay()).not.toBeNull();
  });

  it('turns off with its switch, remembers that, and computes nothing while off', async () => {
    const workers = renderPage();
    await waitFor(() => expect(text()).toMatch(/^Steady glacier/), { timeout: 10_000 });
    fireEvent.click(screen.getByLabelText('Show the steady glacier for this climate'));
    expect(text()).toBe('');
    expect(overlay()).toBeNull();
    expect(localStorage.getItem(STEADY_PREVIEW_SETTING)).toBe('off');
    const sent = workers[0].sent.length;
    setEla('2700');
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(workers[0].sent.length).toBe(sent);
    fireEvent.click(screen.getByLabelText('Show the steady glacier for this climate'));
    await waitFor(() => expect(text()).toMatch(/^Steady glacier for this climate: terminus 11\./), { timeout: 10_000 });
  });

  it('waits while a run goes on', async () => {
    renderPage();
    await waitFor(() => expect(text()).toMatch(/^Steady glacier/), { timeout: 10_000 });
    act(() => useRunStore.getState().begin(1, 0, 300));
    expect(text()).toBe('The steady-glacier preview waits while the run goes on.');
    expect(overlay()).toBeNull();
  });
});
