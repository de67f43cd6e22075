// @vitest-environment jsdom
// Observations drawn on the plots, from plain typed data (the scenario fixtures with observations
// are validated once the validator knows the key).
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, render, screen, within } from '@testing-library/react';
import { SeriesPlot } from '../../src/ui/results/TimeSeriesView';
import { FlowFieldsPlots } from '../../src/ui/results/FlowFieldsView';
import { useRunStore } from '../../src/state/runStore';
import { loadFinishedRun } from '../state/runFixtures';
import { resetStores } from '../helpers/resetStores';
import { LongProfileView, type ProfileResult } from '../../src/ui/LongProfileView';
import { AlongFlowPlot } from '../../src/ui/results/AlongFlowPlot';
import { demoScenario } from '../../src/state/scenarioStore';
import type { Scenario } from '../../src/model/scenario';

afterEach(cleanup);

const x = [25, 75, 125, 175];
const bed = [1100, 1080, 1060, 1040];
const thickness = [60, 50, 20, 0];
const result: ProfileResult = {
  time: 45,
  samples: { x, bed, thickness, surface: bed.map((b, i) => b + thickness[i]) },
  crevasseDepth: [0, 0, 0, 0],
  ela: 1120,
  terminus: 150,
  alsoShow: [1200],
};
const observed: Scenario = {
  ...demoScenario,
  grid: { length: 200, spacing: 50 },
  observations: {
    year: 30,
    terminus: 160,
    // At x = 50 the surface shown is (1160 + 1130)/2 = 1145 m: 70 m of ice implies a bed at 1075 m.
    thickness: [
      [50, 70, 10],
      [100, 45, 0],
      [900, 10, 5], // outside the domain: not drawn
    ],
  },
};

function pathY(el: Element | null | undefined): number[] {
  return [el?.getAttribute('y1'), el?.getAttribute('y2')].map(Number);
}

describe('observations on the long profile', () => {
  it('draws measured thickness as the bed it implies under the surface shown, with its bar, and the observed terminus', () => {
    const { container } = render(<LongProfileView scenario={observed} result={result} />);
    const marks = container.querySelectorAll('[data-layer="observed-thickness"] > g');
    expect(marks).toHaveLength(2);
    // The first has a bar (three lines: bar and caps); the second, with no uncertainty, only a point.
    expect(marks[0].querySelectorAll('line')).toHaveLength(3);
    expect(marks[1].querySelectorAll('line')).toHaveLength(0);
    expect(marks[0].querySelector('title')?.textContent).toBe('Measured thickness 70 ± 10 m at 0.05 km: bed 1075 m a.s.l. under this surface');
    // The bar is centred on the point and spans 20 m of elevation.
    const cy = Number(marks[0].querySelector('circle')?.getAttribute('cy'));
    const [y1, y2] = pathY(marks[0].querySelector('line'));
    expect((y1 + y2) / 2).toBeCloseTo(cy, 6);
    const bedLine = container.querySelector('[data-layer="observed-terminus"]');
    expect(bedLine?.querySelector('title')?.textContent).toBe('Observed terminus 0.16 km (year 30)');
    const legend = container.querySelector('[data-layer="observation-legend"]') as HTMLElement;
    expect(within(legend).getByText('Observed, year 30:')).toBeTruthy();
    expect(within(legend).getByText('Bed implied by measured thickness')).toBeTruthy();
    expect(within(legend).getByText('Observed terminus')).toBeTruthy();
    expect(container.querySelector('desc')?.textContent).toMatch(/2 measured thicknesses \(year 30\) drawn as the bed they imply under this surface, observed terminus 0\.16 km \(year 30\)/);
    // The model's legend row is unchanged, and the axes keep their units.
    expect(within(container.querySelector('[data-layer="legend"]') as HTMLElement).getByText('Bed')).toBeTruthy();
    expect(within(container as HTMLElement).getByText('Elevation (m a.s.l.)')).toBeTruthy();
  });

  it('moves the implied bed with the surface shown', () => {
    const { container, rerender } = render(<LongProfileView scenario={observed} result={result} />);
    const before = Number(container.querySelector('[data-layer="observed-thickness"] circle')?.getAttribute('cy'));
    const thinner = { ...result, samples: { ...result.samples, thickness: [40, 30, 0, 0], surface: bed.map((b, i) => b + [40, 30, 0, 0][i]) } };
    rerender(<LongProfileView scenario={observed} result={thinner} />);
    const after = Number(container.querySelector('[data-layer="observed-thickness"] circle')?.getAttribute('cy'));
    // A lower surface implies a lower bed: further down the plot.
    expect(after).toBeGreaterThan(before);
  });

  it('draws nothing extra without observations', () => {
    const { container } = render(<LongProfileView scenario={{ ...observed, observations: undefined }} result={result} />);
    expect(container.querySelector('[data-layer="observed-thickness"]')).toBeNull();
    expect(container.querySelector('[data-layer="observation-legend"]')).toBeNull();
    expect(container.querySelector('svg')?.getAttribute('viewBox')).toBe('0 0 860 500');
  });
});

describe('observations on an along-flow plot', () => {
  it('draws measured surface speeds with bars and a legend entry naming the year', () => {
    const { container } = render(
      <AlongFlowPlot
        title="Speed along the flowline"
        yTitle="Speed (m a⁻¹)"
        x={x}
        lengthM={200}
        thickness={thickness}
        yMax={40}
        time={45}
        series={[{ key: 'surface-speed', label: 'Surface speed', values: [10, 20, 30, 0], className: 'speed' }]}
        observed={{ label: 'Measured surface speed', year: 30, points: [{ x: 60, value: 18, sigma: 3, index: 0 }] }}
      />,
    );
    const marks = container.querySelectorAll('[data-layer="observed"] > g');
    expect(marks).toHaveLength(1);
    const [y1, y2] = pathY(marks[0].querySelector('line'));
    expect(y2 - y1).toBeGreaterThan(0);
    expect(container.querySelector('[data-legend="observed"]')?.textContent).toBe('Measured surface speed, year 30');
    expect(within(container as HTMLElement).getByText('Speed (m a⁻¹)')).toBeTruthy();
    expect(within(container as HTMLElement).getByText('Distance down-valley (km)')).toBeTruthy();
  });
});

describe('observations on the results views (plain typed data)', () => {
  beforeEach(resetStores);

  it('adds a terminus panel with the observed record beside the modelled terminus', () => {
    act(() => loadFinishedRun());
    const { frames, years } = useRunStore.getState();
    const modelled = frames[0].numbers.terminus;
    const { container } = render(
      <SeriesPlot
        frames={frames}
        index={frames.length - 1}
        years={years}
        unitWidth
        terminusRecord={[
          [0, modelled],
          [10, modelled - 200],
          [500, modelled], // after the run: not drawn
        ]}
      />,
    );
    const panel = container.querySelector('[data-panel="terminus"]') as HTMLElement;
    expect(within(panel).getByText('Terminus (km down-valley)')).toBeTruthy();
    expect(panel.querySelector('path.series')?.getAttribute('d')).toMatch(/^M[\d.,-]+(L[\d.,-]+){3,}/);
    const points = panel.querySelectorAll('[data-layer="observed-terminus"] > circle');
    expect(points).toHaveLength(2);
    expect(points[1].querySelector('title')?.textContent).toBe(`Observed terminus ${((modelled - 200) / 1000).toFixed(2)} km in year 10`);
    // The first observation equals the modelled terminus at year 0: the point sits on the line's start.
    const start = (panel.querySelector('path.series')?.getAttribute('d') ?? '').match(/^M([\d.-]+),([\d.-]+)/);
    expect(Number(start?.[1])).toBeCloseTo(Number(points[0].getAttribute('cx')), 0);
    expect(Number(start?.[2])).toBeCloseTo(Number(points[0].getAttribute('cy')), 0);
    expect(within(panel).getByText('observed')).toBeTruthy();
    // Without a record the panels are as before.
    cleanup();
    const plain = render(<SeriesPlot frames={frames} index={0} years={years} unitWidth terminusRecord={[]} />);
    expect(plain.container.querySelector('[data-panel="terminus"]')).toBeNull();
  });

  it('draws measured surface speeds on the speed plot, widening its axis to show the bars', () => {
    act(() => loadFinishedRun());
    const { frames, grid, ranges } = useRunStore.getState();
    if (!grid || !ranges) throw new Error('no run');
    const high = ranges.maxSpeed + 50;
    render(
      <FlowFieldsPlots
        frame={frames[frames.length - 1]}
        grid={grid}
        maxSpeed={ranges.maxSpeed}
        maxStress={ranges.maxStress}
        observationYear={20}
        observedSpeed={[{ x: 3000, value: high, sigma: 10, index: 0 }]}
      />,
    );
    const speed = screen.getByRole('img', { name: 'Speed along the flowline, model year 20' });
    const mark = speed.querySelector('[data-layer="observed"] > g') as SVGGElement;
    expect(mark).not.toBeNull();
    const topTick = Math.max(...[...speed.querySelectorAll('.axis text')].map((t) => Number(t.textContent)).filter(Number.isFinite));
    expect(topTick).toBeGreaterThanOrEqual(high + 10);
    expect(speed.querySelector('[data-legend="observed"]')?.textContent).toBe('Measured speed, year 20');
    // The stress plot has no observations.
    expect(screen.getByRole('img', { name: 'Driving stress along the flowline, model year 20' }).querySelector('[data-layer="observed"]')).toBeNull();
  });
});
