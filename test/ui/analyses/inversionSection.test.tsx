// @vitest-environment jsdom
/**
 * The bed from the surface in the Analyses panel: says what the scenario lacks, refuses a
 * smoothing outside its range, computes in the (in-process) analysis worker, shows the
 * statements, multiplier, range and misfit with the caution, previews the bed on the long
 * profile, applies it as one undoable edit and discards the preview.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { invertBed } from '../../../src/model/inversion/invertBed';
import { useAnalysisStore } from '../../../src/state/analysisStore';
import { demoScenario, useScenarioStore } from '../../../src/state/scenarioStore';
import { LongProfileView } from '../../../src/ui/LongProfileView';
import { checkedJson } from '../../helpers/checkedScenario';
import { renderAnalysesPanel } from '../../helpers/renderAnalysesPanel';
import { resetStores } from '../../helpers/resetStores';

import observedJson from '../../../examples/zindleton-observed.json';

const observed = checkedJson(observedJson);

const renderPanel = () => renderAnalysesPanel('Bed from the surface');

const press = (name: RegExp) => fireEvent.click(screen.getByRole('button', { name }));
const section = () => document.querySelector('[data-analysis="inversion"]') as HTMLElement;

beforeEach(resetStores);
afterEach(cleanup);

describe('Analyses panel: bed from the surface', () => {
  it('says which input is missing, and starts nothing', () => {
    const noTerminus = checkedJson({ ...demoScenario, surface: [[0, 3000], [demoScenario.grid.length, 2000]] });
    useScenarioStore.getState().load(noTerminus, 'Test');
    renderPanel();
    expect(within(section()).getByText('The bed from the surface needs the observed terminus (editor, Observations tab), which this scenario does not have.')).toBeTruthy();
    const { surface: _surface, ...bare } = demoScenario;
    act(() => useScenarioStore.getState().load(checkedJson(bare), 'Test'));
    expect(
      within(section()).getByText(
        'The bed from the surface needs the observed ice surface (editor, Geometry tab: the initial surface) and the observed terminus (editor, Observations tab); this scenario has neither.',
      ),
    ).toBeTruthy();
    press(/Compute the bed from the surface/);
    expect(within(section()).getByRole('alert').textContent).toMatch(/needs the observed ice surface/);
    expect(useAnalysisStore.getState().inversion.status).toBe('idle');
  });

  it('refuses a smoothing outside 0 to 5,000 m', () => {
    useScenarioStore.getState().load(observed, 'Test');
    renderPanel();
    fireEvent.change(within(section()).getByLabelText(/Smoothing distance/), { target: { value: '9000' } });
    press(/Compute the bed from the surface/);
    expect(within(section()).getByRole('alert').textContent).toBe('Smoothing distance: 9000 m is outside the allowed 0 to 5,000 m.');
  });

  it('computes, shows statements, multiplier, range and misfit with the caution; previews; applies as one undoable edit', async () => {
    useScenarioStore.getState().load(observed, 'Test');
    renderPanel();
    render(<LongProfileView scenario={observed} />);
    press(/Compute the bed from the surface/);
    await waitFor(() => expect(useAnalysisStore.getState().inversion.status).toBe('done'), { timeout: 20_000 });
    const r = useAnalysisStore.getState().inversion.result!.bed.inversion;
    // Independent route: the model's inversion called directly.
    const direct = invertBed(observed, { smoothingMetres: 300 });
    expect(r.rateFactorMultiplier).toBeCloseTo(direct.rateFactorMultiplier, 10);
    const numbers = within(section().querySelector('[data-numbers="inversion"]') as HTMLElement);
    expect(numbers.getByText('Multiplier of A').nextElementSibling!.textContent).toBe(direct.rateFactorMultiplier.toPrecision(3));
    expect(numbers.getByText('Range of the multiplier').nextElementSibling!.textContent).toMatch(/^\d\.\d+ to \d+\.?\d* ?$/);
    expect(numbers.getByText('Thickness points compared').nextElementSibling!.textContent).toBe('5');
    expect(numbers.getByText('Misfit to measured thickness, RMS').nextElementSibling!.textContent).toBe(`${Math.round(direct.misfit!.rmsMetres)} m`);
    const statements = Array.from(section().querySelectorAll('[data-numbers="inversion-statements"] li'), (li) => li.textContent);
    expect(statements).toEqual(direct.statements);
    expect(within(section()).getByRole('note').textContent).toMatch(/^Caution:/);

    // The preview on the long profile, with its legend entry.
    await waitFor(() => expect(document.querySelector('[data-layer="bed-preview"] .bed-preview-line')).toBeTruthy());
    expect(document.querySelector('[data-layer="bed-preview"] .bed-preview-band')!.getAttribute('d')).toMatch(/Z$/);
    expect(document.querySelector('[data-layer="preview-legend"]')!.textContent).toBe('Bed from the surface (preview)');

    const before = useScenarioStore.getState().scenario;
    press(/Apply this bed to the scenario/);
    const after = useScenarioStore.getState().scenario;
    expect(after).not.toBe(before);
    expect(after.ice.A).toBe(Number((observed.ice.A! * direct.rateFactorMultiplier).toPrecision(4)));
    expect(useScenarioStore.getState().label).toMatch(/^Bed from the surface/);
    expect(useAnalysisStore.getState().inversionPreview).toBe(false);
    expect(document.querySelector('[data-layer="bed-preview"]')).toBeNull();
    useScenarioStore.getState().undo();
    expect(useScenarioStore.getState().scenario).toBe(before);
    // The result is now out of date (made before the apply and undo): it cannot be applied again.
    expect(within(section()).getByText(/Out of date/)).toBeTruthy();
    expect((screen.getByRole('button', { name: /Apply this bed/ }) as HTMLButtonElement).disabled).toBe(true);
  }, 30_000);

  it('without fitting A, compares the points only; Discard removes the preview', async () => {
    useScenarioStore.getState().load(observed, 'Test');
    renderPanel();
    fireEvent.click(within(section()).getByLabelText(/Fit the rate factor A to the 5 measured thickness points/));
    press(/Compute the bed from the surface/);
    await waitFor(() => expect(useAnalysisStore.getState().inversion.status).toBe('done'), { timeout: 20_000 });
    const numbers = within(section().querySelector('[data-numbers="inversion"]') as HTMLElement);
    expect(numbers.getByText('Multiplier of A').nextElementSibling!.textContent).toBe('1 (not fitted)');
    expect(numbers.getByText('Band shown').nextElementSibling!.textContent).toBe('A / 2 to 2 A');
    expect(numbers.getByText('Thickness points compared').nextElementSibling!.textContent).toBe('5');
    expect(useAnalysisStore.getState().inversionPreview).toBe(true);
    press(/Discard the preview/);
    expect(useAnalysisStore.getState().inversionPreview).toBe(false);
    expect(screen.getByRole('button', { name: /Show the preview/ })).toBeTruthy();
  }, 30_000);
});
