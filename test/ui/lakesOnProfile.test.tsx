// @vitest-environment jsdom
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { act, cleanup, render, screen, within } from '@testing-library/react';
import { LAKE_CAUTION_TEXT } from '../../src/outputs/caution';
import { usePlaybackStore } from '../../src/state/playbackStore';
import { useRunStore } from '../../src/state/runStore';
import { demoScenario, useScenarioStore } from '../../src/state/scenarioStore';
import { NumbersPanel } from '../../src/ui/results/NumbersPanel';
import { ProfilePanel } from '../../src/ui/results/ProfilePanel';
import type { FromWorker } from '../../src/worker/protocol';
import { runMessages } from '../state/runFixtures';
import { checked } from '../helpers/checkedScenario';

// The demo warmed by 3 K over 80 years (as in test/analysis/exposedLakes.test.ts): by year 200
// the ice has left the overdeepening behind the riegel. Worked by hand there from the demo bed:
// water level 2469.0625 m, deepest bed 2412.142857 m at 5925 m, so 56.92 m deep; 5.3 to 6.6 km.
const warmed = checked({ ...demoScenario, warming: [[0, 0], [80, 3]], run: { years: 200, outputEvery: 100 } });
let messages: FromWorker[];

beforeAll(() => {
  messages = runMessages(warmed, 0);
}, 60_000);
afterEach(cleanup);

function loadRun() {
  useScenarioStore.getState().load(warmed, 'Test');
  const runId = useRunStore.getState().runId + 1;
  useRunStore.getState().begin(runId, useScenarioStore.getState().revision, warmed.run.years);
  useRunStore.getState().receive(messages.map((m) => ({ ...m, runId })));
}

describe('lakes in exposed overdeepenings on the workbench', () => {
  it('draws the lake in water colour with its depth and volume, lists it and shows the caution', () => {
    act(loadRun);
    act(() => usePlaybackStore.getState().seek(2)); // year 200
    render(
      <>
        <ProfilePanel />
        <NumbersPanel />
      </>,
    );
    const svg = document.querySelector('svg.long-profile') as unknown as HTMLElement;
    const water = svg.querySelectorAll('[data-layer="lakes"] path.lake-water');
    expect(water).toHaveLength(1);
    expect(water[0].getAttribute('d')).toMatch(/^M[\d.,-]+(L[\d.,-]+){10,}Z$/);
    expect(within(svg).getByText('Lake, up to 57 m deep')).toBeTruthy();
    expect(within(svg).getByText(/^≈ \d+ × 10⁶ m³$/)).toBeTruthy();
    expect(within(svg).getByText('Lake')).toBeTruthy(); // legend entry
    expect(screen.getByText('Lakes in exposed overdeepenings').nextElementSibling!.textContent).toMatch(/^1, up to 57 m deep at 5\.92 km, 1\.30 km long, ≈ \d+ × 10⁶ m³$/);
    const note = screen.getAllByRole('note').find((n) => n.textContent!.includes(LAKE_CAUTION_TEXT));
    expect(note).toBeTruthy();
    expect(note!.textContent).toMatch(/hazard precursor/);
    expect(note!.textContent).toMatch(/local authorities and licensed professional practice/);
  });

  it('shows no lake, and no lake caution, while the ice still fills the overdeepening (year 0)', () => {
    act(loadRun);
    act(() => usePlaybackStore.getState().seek(0));
    render(
      <>
        <ProfilePanel />
        <NumbersPanel />
      </>,
    );
    expect(document.querySelector('[data-layer="lakes"]')).toBeNull();
    expect(screen.getByText('Lakes in exposed overdeepenings').nextElementSibling!.textContent).toBe('none');
    expect(screen.queryAllByRole('note').some((n) => n.textContent!.includes('hazard precursor'))).toBe(false);
  });
});
