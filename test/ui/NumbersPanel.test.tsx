// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen } from '@testing-library/react';
import type { GlacierNumbers } from '../../src/model/diagnostics';
import { NumbersPanel, numberRows } from '../../src/ui/results/NumbersPanel';
import { act } from '@testing-library/react';
import { useScenarioStore } from '../../src/state/scenarioStore';
import { loadFinishedRun } from '../state/runFixtures';

afterEach(cleanup);

const numbers: GlacierNumbers = {
  time: 45,
  volume: 1.4449e9,
  area: 8.123e6,
  length: 9100,
  terminus: 9150,
  ela: 2861.4,
  aar: 0.6234,
  maxThickness: 312.4,
  maxSurfaceSpeed: 85.27,
  warming: 0.675,
  frontalAblation: 0,
};

describe('numberRows', () => {
  it('gives every number its unit, with report-style rounding', () => {
    expect(numberRows(numbers, false)).toEqual([
      { label: 'Model year', value: '45 a' },
      { label: 'Length', value: '9.10 km' },
      { label: 'Terminus', value: '9.15 km down-valley' },
      { label: 'Volume', value: '1.445 km³' },
      { label: 'Area', value: '8.12 km²' },
      { label: 'Accumulation-area ratio', value: '0.62' },
      { label: 'Maximum thickness', value: '312 m' },
      { label: 'Maximum surface speed', value: '85.3 m a⁻¹' },
      { label: 'ELA', value: '2861 m a.s.l.' },
      { label: 'Warming since year 0', value: '+0.68 K' },
    ]);
  });

  it('states volume and area per metre of width for a unit-width flowline', () => {
    const rows = numberRows({ ...numbers, volume: 2.5e6, area: 9000 }, true);
    expect(rows.find((r) => r.label === 'Volume')?.value).toBe('2.500 × 10⁶ m³ per m of width');
    expect(rows.find((r) => r.label === 'Area')?.value).toBe('9.00 × 10³ m² per m of width');
  });

  it('shows the frontal ablation only when the scenario calves, as a volume rate', () => {
    expect(numberRows(numbers, false).some((r) => r.label.startsWith('Frontal ablation'))).toBe(false);
    const rows = numberRows({ ...numbers, frontalAblation: 4.8e6 }, false, true);
    expect(rows.find((r) => r.label.startsWith('Frontal ablation'))?.value).toBe('4.800 × 10⁶ m³ a⁻¹');
    const perWidth = numberRows({ ...numbers, frontalAblation: 2500 }, true, true);
    expect(perWidth.find((r) => r.label.startsWith('Frontal ablation'))?.value).toBe('2.50 × 10³ m³ a⁻¹ per m of width');
  });

  it('shows a dash, not NaN, where a number is undefined, and says when there is no glacier', () => {
    const rows = numberRows({ ...numbers, terminus: NaN, length: 0, aar: NaN, ela: NaN, warming: -0.5 }, false);
    expect(rows.find((r) => r.label === 'Terminus')?.value).toBe('no glacier');
    expect(rows.find((r) => r.label === 'Accumulation-area ratio')?.value).toBe('—');
    expect(rows.find((r) => r.label === 'ELA')?.value).toBe('—');
    expect(rows.find((r) => r.label === 'Warming since year 0')?.value).toBe('−0.50 K');
    expect(rows.map((r) => r.value).join(' ')).not.toMatch(/NaN/);
  });
});

describe('NumbersPanel', () => {
  it('lists the numbers of the selected frame under a heading', () => {
    render(<NumbersPanel />);
    act(() => loadFinishedRun());
    expect(screen.getByRole('heading', { name: 'Glacier at the selected year' })).toBeTruthy();
    expect(screen.getByText('Maximum surface speed')).toBeTruthy();
    expect(document.querySelector('dd[data-number="Model year"]')?.textContent).toBe('20 a');
    expect(document.querySelector('dd[data-number="Volume"]')?.textContent).toMatch(/^\d+\.\d{3} km³$/);
  });
});

describe('NumbersPanel when the scenario has changed since the run', () => {
  it('says the numbers are out of date', () => {
    render(<NumbersPanel />);
    act(() => loadFinishedRun());
    expect(screen.queryByText(/Out of date/)).toBeNull();
    act(() => useScenarioStore.getState().apply({ ...useScenarioStore.getState().scenario, name: 'Changed' }, 'Rename'));
    expect(screen.getByText('Out of date: made before the last change to the scenario.')).toBeTruthy();
  });
});
