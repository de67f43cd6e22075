// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { SurfaceTools } from '../../../src/ui/edit/SurfaceTools';
import { WidthEditor } from '../../../src/ui/edit/WidthEditor';
import { WarmingEditor } from '../../../src/ui/edit/WarmingEditor';
import { useScenarioStore } from '../../../src/state/scenarioStore';
import { piecewiseLinear } from '../../../src/model/piecewiseLinear';
import { resetStores } from '../../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);
const scenario = () => useScenarioStore.getState().scenario;

describe('initial ice', () => {
  it('starts ice-free by removing the surface, as one undo step', () => {
    render(<SurfaceTools />);
    fireEvent.click(screen.getByRole('button', { name: 'Start ice-free' }));
    expect(scenario().surface).toBeUndefined();
    expect(useScenarioStore.getState().label).toBe('Start ice-free');
  });

  it('fills the valley with a plastic glacier ending at the chosen terminus (Nye 1952, 100 kPa default)', () => {
    render(<SurfaceTools />);
    fireEvent.change(screen.getByLabelText('Terminus position (km)'), { target: { value: '9' } });
    fireEvent.click(screen.getByRole('button', { name: 'Fill with plastic ice' }));
    const s = piecewiseLinear(scenario().surface!);
    const b = piecewiseLinear(scenario().bed);
    expect(s(9500) - b(9500)).toBeCloseTo(0, 6);
    expect(s(4000) - b(4000)).toBeGreaterThan(100);
    expect(useScenarioStore.getState().label).toBe('Plastic ice surface (100 kPa)');
  });

  it('refuses a yield stress of zero with the allowed range', () => {
    render(<SurfaceTools />);
    fireEvent.change(screen.getByLabelText('Yield stress (kPa)'), { target: { value: '0' } });
    fireEvent.click(screen.getByRole('button', { name: 'Fill with plastic ice' }));
    expect(screen.getByRole('alert').textContent).toMatch(/Yield stress: 0 is not allowed; it must be greater than 0 and at most 1000 kPa$/);
    expect(useScenarioStore.getState().past).toHaveLength(0);
  });
});

describe('width strip', () => {
  it('moves a width point by keyboard and refuses a width of zero with the validator reason', () => {
    useScenarioStore.getState().apply({ ...scenario(), width: [[0, 15], [12000, 700]] }, 'Narrow head');
    render(<WidthEditor />);
    const first = screen.getByRole('button', { name: /^Width point 1 of 2/ });
    fireEvent.keyDown(first, { key: 'ArrowUp', shiftKey: true });
    expect(scenario().width?.[0]).toEqual([0, 115]);
    fireEvent.keyDown(first, { key: 'ArrowDown', shiftKey: true });
    fireEvent.keyDown(first, { key: 'ArrowDown', shiftKey: true });
    expect(scenario().width?.[0]).toEqual([0, 15]);
    expect(screen.getByRole('alert').textContent).toMatch(/\/width\/0\/1: -85 is not allowed/);
  });
});

describe('width table', () => {
  it('refuses a distance in km, as the column shows it, and a width in m', () => {
    useScenarioStore.getState().apply({ ...scenario(), width: [[0, 800], [12000, 700]] }, 'Two widths');
    render(<WidthEditor />);
    // The file's limit is 10,000,000 m either side of the head: 10,000 km in the table.
    const distance = screen.getByLabelText('Distance, row 2 (km)');
    fireEvent.change(distance, { target: { value: '20000' } });
    fireEvent.blur(distance);
    expect(screen.getByRole('alert').textContent).toBe(
      'Not applied: Distance, row 2: 20000 is not allowed; the width x must be a finite number from -10,000 to 10,000 km',
    );
    const width = screen.getByLabelText('Width, row 1 (m)');
    fireEvent.change(width, { target: { value: '200000' } });
    fireEvent.blur(width);
    expect(screen.getByRole('alert').textContent).toMatch(/^Not applied: Width, row 1: 200000 is not allowed; the width must be a finite number greater than 0 and at most 100,000 m$/);
    expect(scenario().width).toEqual([[0, 800], [12000, 700]]);
  });
});

describe('valley cross-section', () => {
  it('sets a trapezoidal section with a 200 m widening, refuses a widening of 0 with its range, and a rectangular one brings its own side-drag table', () => {
    useScenarioStore.getState().apply({ ...scenario(), width: [[0, 400], [12000, 200]], shapeFactor: { crossSection: 'parabolic' } }, 'Width');
    render(<WidthEditor />);
    fireEvent.change(screen.getByLabelText('Valley cross-section'), { target: { value: 'trapezoidal' } });
    expect(scenario().section).toEqual({ shape: 'trapezoidal', widening: 200 });
    expect(scenario().shapeFactor).toEqual({ crossSection: 'parabolic' });
    const widening = screen.getByLabelText(/Widening at 100 m of ice/);
    fireEvent.change(widening, { target: { value: '0' } });
    fireEvent.blur(widening);
    expect(screen.getByRole('alert').textContent).toMatch(/0 is not allowed; the section widening must be a finite number greater than 0 and at most 100,000 m/);
    expect(scenario().section).toEqual({ shape: 'trapezoidal', widening: 200 });
    fireEvent.change(screen.getByLabelText('Valley cross-section'), { target: { value: 'rectangular' } });
    expect(scenario().section).toEqual({ shape: 'rectangular' });
    expect(scenario().shapeFactor).toEqual({ crossSection: 'rectangular' });
    expect(useScenarioStore.getState().label).toBe('Set valley section');
  });

  it('a unit width drops the section in the same edit', () => {
    useScenarioStore.getState().apply({ ...scenario(), width: [[0, 400]], section: { shape: 'parabolic', widening: 300 } }, 'Width');
    render(<WidthEditor />);
    fireEvent.click(screen.getByRole('button', { name: 'Use a unit width (1 m) instead' }));
    expect(scenario().width).toBeUndefined();
    expect(scenario().section).toBeUndefined();
  });
});

describe('warming presets', () => {
  it('sets a ramp that keeps rising to the end of the run', () => {
    render(<WarmingEditor />);
    fireEvent.change(screen.getByLabelText('Warming amount (K)'), { target: { value: '1' } });
    fireEvent.change(screen.getByLabelText('Ramp length (a)'), { target: { value: '50' } });
    fireEvent.click(screen.getByRole('button', { name: 'Ramp that keeps rising' }));
    // 1 K per 50 a kept over the 300-year run: 6 K at year 300.
    expect(scenario().warming).toEqual([[0, 0], [300, 6]]);
    fireEvent.click(screen.getByRole('button', { name: 'Step' }));
    expect(scenario().warming).toEqual([[0, 0], [1, 1]]);
    expect(useScenarioStore.getState().past).toHaveLength(2);
  });
});
