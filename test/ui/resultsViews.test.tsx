// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, render, screen } from '@testing-library/react';
import { usePlaybackStore } from '../../src/state/playbackStore';
import { FlowFieldsView } from '../../src/ui/results/FlowFieldsView';
import { TimeSeriesView } from '../../src/ui/results/TimeSeriesView';
import { loadFinishedRun } from '../state/runFixtures';
import { resetStores } from '../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);

const drawn = /^M[\d.,-]+(L[\d.,-]+){3,}/;

describe('TimeSeriesView', () => {
  it('stacks length, volume, ELA and warming with units against model year, cursor at the selected year', () => {
    const { container } = render(<TimeSeriesView />);
    expect(container.querySelector('svg')).toBeNull();
    act(() => loadFinishedRun());
    for (const title of ['Length (km)', 'Volume (km³)', 'ELA (m a.s.l.)', 'Warming (K)', 'Model year (a)']) {
      expect(screen.getByText(title), title).toBeTruthy();
    }
    for (const key of ['length', 'volume', 'ela', 'warming']) {
      expect(container.querySelector(`[data-panel="${key}"] path.series`)?.getAttribute('d'), key).toMatch(drawn);
    }
    const cursorAt = () => container.querySelector('[data-layer="cursor"] line')?.getAttribute('x1');
    const atEnd = cursorAt();
    act(() => usePlaybackStore.getState().seek(0));
    expect(Number(cursorAt())).toBeLessThan(Number(atEnd));
    expect(screen.getByRole('img', { name: /cursor at year 0$/ })).toBeTruthy();
  });

  it('gives a constant series a sensible axis rather than a magnified one', () => {
    const { container } = render(<TimeSeriesView />);
    act(() => loadFinishedRun());
    // The short demo run warms by 0.3 K over 20 years: the warming axis spans at least 1 K from 0.
    const labels = [...container.querySelectorAll('[data-panel="warming"] .axis text')].map((t) => Number(t.textContent));
    expect(Math.min(...labels)).toBe(0);
    expect(Math.max(...labels)).toBeGreaterThanOrEqual(1);
  });
});

describe('FlowFieldsView', () => {
  it('draws surface and sliding speed and driving stress along the flowline with units', () => {
    const { container } = render(<FlowFieldsView />);
    expect(container.innerHTML).toBe('');
    act(() => loadFinishedRun());
    expect(screen.getByText('Speed (m a⁻¹)')).toBeTruthy();
    expect(screen.getByText('Driving stress (kPa)')).toBeTruthy();
    expect(screen.getAllByText('Distance down-valley (km)')).toHaveLength(2);
    for (const key of ['surface-speed', 'sliding-speed', 'driving-stress']) {
      expect(container.querySelector(`path[data-series="${key}"]`)?.getAttribute('d'), key).toMatch(drawn);
    }
    expect(screen.getByRole('img', { name: 'Speed along the flowline, model year 20' })).toBeTruthy();
  });
});
