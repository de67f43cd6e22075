// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen, within } from '@testing-library/react';
import demo from '../../examples/demo-valley.json';
import { LongProfileView } from '../../src/ui/LongProfileView';
import { demoScenario } from '../../src/state/scenarioStore';

afterEach(cleanup);

describe('LongProfileView', () => {
  it('draws the demo with unit-labelled axes, a legend, bed and ice', () => {
    const { container } = render(<LongProfileView scenario={demoScenario} />);

    expect(screen.getByText('Distance down-valley (km)')).toBeTruthy();
    expect(screen.getByText('Elevation (m a.s.l.)')).toBeTruthy();

    const legend = container.querySelector('[data-layer="legend"]') as HTMLElement;
    expect(legend).not.toBeNull();
    for (const entry of ['Bed', 'Ice', 'ELA']) expect(within(legend).getByText(entry)).toBeTruthy();

    for (const layer of ['ice', 'bed']) {
      const d = container.querySelector(`path[data-layer="${layer}"]`)?.getAttribute('d') ?? '';
      expect(d, layer).toMatch(/^M[\d.,-]+(L[\d.,-]+){10,}/);
    }

    expect(screen.getByText(`ELA ${demo.massBalance.ela} m`)).toBeTruthy();
    const exaggeration = screen.getByText(/^Vertical exaggeration ×/).textContent ?? '';
    expect(Number(exaggeration.replace('Vertical exaggeration ×', ''))).toBeGreaterThan(1);
  });

  it('gives the figure an accessible name', () => {
    render(<LongProfileView scenario={demoScenario} />);
    expect(screen.getByRole('img', { name: 'Long profile of the flowline' })).toBeTruthy();
  });

  it('leaves out the ELA line when the balance model has no fixed ELA', () => {
    const table = { ...demoScenario, massBalance: { model: 'table' as const, points: [[2000, -3], [3000, 1]] as [number, number][] } };
    const { container } = render(<LongProfileView scenario={table} />);
    expect(container.querySelector('[data-layer="ela"]')).toBeNull();
    expect(container.querySelector('path[data-layer="ice"]')).not.toBeNull();
  });
});
