// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, render, screen, within } from '@testing-library/react';
import demo from '../../examples/demo-valley.json';
import { LongProfileView, type ProfileResult } from '../../src/ui/LongProfileView';
import { demoScenario } from '../../src/state/scenarioStore';
import { useEditorStore } from '../../src/state/editorStore';
import { resetStores } from '../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);

describe('LongProfileView', () => {
  it('draws a debris cover as a band on the ice with its thickness in the tooltip and the legend', () => {
    const { container } = render(<LongProfileView scenario={{ ...demoScenario, debris: [[3000, 0], [6000, 0.4]] }} />);
    const band = container.querySelector('[data-layer="debris"] path.debris-band');
    expect(band).not.toBeNull();
    expect(band?.querySelector('title')?.textContent).toMatch(/^Debris cover, up to 0\.\d+ m thick, \d+\.\d–\d+\.\d km$/);
    const legend = container.querySelector('[data-layer="legend"]') as HTMLElement;
    expect(within(legend).getByText(/^Debris ≤ 0\.\d+ m$/)).toBeTruthy();
  });

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

    expect(screen.getByText(`ELA ${demo.massBalance.ela} m a.s.l.`)).toBeTruthy();
    const exaggeration = screen.getByText(/^Vertical exaggeration ×/).textContent ?? '';
    expect(Number(exaggeration.replace('Vertical exaggeration ×', ''))).toBeGreaterThan(1);
  });

  it('draws at the size the layout measured, and moves the legend under the state label when they would collide', () => {
    const legendY = (container: HTMLElement) => {
      const entry = container.querySelector('[data-layer="legend"] g')?.getAttribute('transform') ?? '';
      return Number(/translate\([\d.-]+,([\d.-]+)\)/.exec(entry)?.[1]);
    };
    const labelY = (container: HTMLElement) => Number(container.querySelector('[data-layer="model-year"]')?.getAttribute('y'));

    const wide = render(<LongProfileView scenario={demoScenario} frame={{ width: 1200, height: 420 }} />);
    expect(wide.container.querySelector('svg')?.getAttribute('viewBox')).toBe('0 0 1200 420');
    expect(legendY(wide.container)).toBe(labelY(wide.container));
    cleanup();

    // 460 px: "Initial state" and the legend (Bed, Ice, ELA and, with a result, crevasses and a
    // lake) do not fit on one line; the legend takes the next row.
    const narrow = render(<LongProfileView scenario={demoScenario} frame={{ width: 460, height: 300 }} />);
    expect(narrow.container.querySelector('svg')?.getAttribute('viewBox')).toBe('0 0 460 300');
    expect(legendY(narrow.container)).toBeGreaterThan(labelY(narrow.container));
  });

  it('gives the figure an accessible name', () => {
    render(<LongProfileView scenario={demoScenario} />);
    expect(screen.getByRole('img', { name: 'Long profile of the flowline' })).toBeTruthy();
  });

  it('is a named group, not an image, while its points are edited, so they stay reachable', () => {
    render(<LongProfileView scenario={demoScenario} />);
    act(() => useEditorStore.getState().setMode('edit-points'));
    // An image's content is presentational to assistive technology (WAI-ARIA 1.2, img role).
    expect(screen.queryByRole('img', { name: 'Long profile of the flowline' })).toBeNull();
    const group = screen.getByRole('group', { name: 'Long profile of the flowline' });
    expect(within(group).getAllByRole('button', { name: /^Bed point \d+ of 13:/ })).toHaveLength(13);
    act(() => useEditorStore.getState().setMode('view'));
    expect(screen.getByRole('img', { name: 'Long profile of the flowline' })).toBeTruthy();
  });

  it('leaves out the ELA line when the balance model has no fixed ELA', () => {
    const table = { ...demoScenario, massBalance: { model: 'table' as const, points: [[2000, -3], [3000, 1]] as [number, number][] } };
    const { container } = render(<LongProfileView scenario={table} />);
    expect(container.querySelector('[data-layer="ela"]')).toBeNull();
    expect(container.querySelector('path[data-layer="ice"]')).not.toBeNull();
  });
});

describe('LongProfileView with a result', () => {
  const x = [25, 75, 125, 175];
  const bed = [1100, 1080, 1060, 1040];
  const thickness = [60, 50, 20, 0];
  const result: ProfileResult = {
    time: 45,
    samples: { x, bed, thickness, surface: bed.map((b, i) => b + thickness[i]) },
    // Crevasse-prone in the middle two cells only.
    crevasseDepth: [0, 12, 8, 0],
    ela: 1120,
    terminus: 150,
    alsoShow: [1200],
  };
  const small = { ...demoScenario, grid: { length: 200, spacing: 50 } };

  it('draws the year, the terminus with its position in km, the ELA at that year and the crevasse band', () => {
    const { container } = render(<LongProfileView scenario={small} result={result} />);
    expect(container.querySelector('[data-layer="model-year"]')?.textContent).toBe('Year 45');
    expect(container.querySelector('[data-layer="terminus"] text')?.textContent).toBe('Terminus 0.15 km');
    expect(screen.getByText('ELA 1120 m a.s.l.')).toBeTruthy();
    const bands = container.querySelectorAll('[data-layer="crevasses"] path');
    expect(bands).toHaveLength(1);
    expect(bands[0].getAttribute('d')).toMatch(/^M[\d.,-]+(L[\d.,-]+){3,}Z$/);
    const legend = container.querySelector('[data-layer="legend"]') as HTMLElement;
    expect(within(legend).getByText('Crevasse-prone')).toBeTruthy();
    expect(screen.getByRole('img', { name: 'Long profile of the flowline' }).textContent).toMatch(/Model year 45\./);
  });

  it('leaves out terminus and crevasses where there are none', () => {
    const bare: ProfileResult = {
      ...result,
      samples: { ...result.samples, thickness: [0, 0, 0, 0], surface: bed },
      crevasseDepth: [0, 0, 0, 0],
      terminus: Number.NaN,
      ela: Number.NaN,
    };
    const { container } = render(<LongProfileView scenario={small} result={bare} />);
    expect(container.querySelector('[data-layer="terminus"]')).toBeNull();
    expect(container.querySelector('[data-layer="crevasses"]')).toBeNull();
    expect(container.querySelector('[data-layer="ela"]')).toBeNull();
    expect(container.querySelector('path[data-layer="ice"]')).toBeNull();
  });
});
