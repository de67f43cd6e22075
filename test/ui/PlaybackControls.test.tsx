// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, render, screen } from '@testing-library/react';
import { setAnimationSource, usePlaybackStore } from '../../src/state/playbackStore';
import { NumbersPanel } from '../../src/ui/results/NumbersPanel';
import { PlaybackControls } from '../../src/ui/run/PlaybackControls';
import { useKeyboardShortcuts } from '../../src/ui/run/useKeyboardShortcuts';
import { loadFinishedRun } from '../state/runFixtures';
import { resetStores } from '../helpers/resetStores';

let callbacks: ((now: number) => void)[] = [];
setAnimationSource({ request: (cb) => callbacks.push(cb), cancel: () => void (callbacks = []) });

function Harness() {
  useKeyboardShortcuts();
  return (
    <>
      <input aria-label="Some text field" />
      <PlaybackControls />
      <NumbersPanel />
    </>
  );
}

const slider = () => screen.getByRole('slider', { name: 'Model year' }) as HTMLInputElement;
const yearShown = () => document.querySelector('output')?.textContent;
const numberShown = (label: string) => document.querySelector(`dd[data-number="${label}"]`)?.textContent;

beforeEach(() => {
  callbacks = [];
  resetStores();
});
afterEach(cleanup);

describe('PlaybackControls', () => {
  it('is absent before there are results', () => {
    render(<Harness />);
    expect(screen.queryByRole('slider')).toBeNull();
    expect(screen.getByText('No results yet. Press Run to compute them.')).toBeTruthy();
  });

  it('seeks with the slider, and the numbers follow the selected year', () => {
    render(<Harness />);
    act(() => loadFinishedRun());
    expect(slider().max).toBe('4');
    expect(slider().value).toBe('4');
    expect(yearShown()).toBe('Year 20 of 20 a');
    expect(slider().getAttribute('aria-valuetext')).toBe('Year 20');
    expect(numberShown('Model year')).toBe('20 a');
    const lengthAt20 = numberShown('Length');
    fireEvent.change(slider(), { target: { value: '0' } });
    expect(yearShown()).toBe('Year 0 of 20 a');
    expect(numberShown('Model year')).toBe('0 a');
    expect(numberShown('Length')).toMatch(/^\d+\.\d\d km$/);
    expect(numberShown('Length')).not.toBe(lengthAt20);
    expect(numberShown('Warming since year 0')).toBe('0.00 K');
  });

  it('plays and pauses with the button and with Space, but not while typing', () => {
    render(<Harness />);
    act(() => loadFinishedRun());
    fireEvent.change(slider(), { target: { value: '1' } });
    fireEvent.click(screen.getByRole('button', { name: 'Play' }));
    expect(usePlaybackStore.getState().playing).toBe(true);
    expect(screen.getByRole('button', { name: 'Pause playback' })).toBeTruthy();
    fireEvent.keyDown(document.body, { key: ' ' });
    expect(usePlaybackStore.getState().playing).toBe(false);
    fireEvent.keyDown(screen.getByLabelText('Some text field'), { key: ' ' });
    expect(usePlaybackStore.getState().playing).toBe(false);
    fireEvent.keyDown(document.body, { key: 'ArrowRight' });
    expect(yearShown()).toBe('Year 10 of 20 a');
    fireEvent.keyDown(document.body, { key: 'Home' });
    expect(yearShown()).toBe('Year 0 of 20 a');
  });

  it('sets the playback speed in outputs per second', () => {
    render(<Harness />);
    act(() => loadFinishedRun());
    const speed = screen.getByLabelText('Speed') as HTMLSelectElement;
    expect([...speed.options].map((o) => o.textContent)).toEqual(['1 output / s', '2 outputs / s', '5 outputs / s', '10 outputs / s', '20 outputs / s']);
    fireEvent.change(speed, { target: { value: '20' } });
    expect(usePlaybackStore.getState().fps).toBe(20);
  });
});

describe('keyboard shortcuts beside the editor', () => {
  it('leave Space and the arrows to a focused widget that handles them itself', () => {
    render(
      <>
        <Harness />
        <svg>
          <circle role="button" tabIndex={0} aria-label="Bed point 1" />
        </svg>
      </>,
    );
    act(() => loadFinishedRun());
    fireEvent.change(slider(), { target: { value: '1' } });
    fireEvent.keyDown(screen.getByLabelText('Bed point 1'), { key: ' ' });
    fireEvent.keyDown(screen.getByLabelText('Bed point 1'), { key: 'ArrowRight' });
    expect(usePlaybackStore.getState().playing).toBe(false);
    expect(yearShown()).toBe('Year 5 of 20 a');
  });
});
