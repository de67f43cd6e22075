// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { act, cleanup, fireEvent, render, screen } from '@testing-library/react';
import { ProfileEditLayer } from '../../../src/ui/edit/ProfileEditLayer';
import { PointEditor } from '../../../src/ui/edit/PointEditor';
import { useScenarioStore } from '../../../src/state/scenarioStore';
import { useEditorStore } from '../../../src/state/editorStore';
import { resetStores } from '../../helpers/resetStores';

beforeEach(resetStores);
afterEach(cleanup);

// 1 px = 10 m along the valley, 1 px = 1 m of elevation, elevation 4000 m at the top (y = 0).
const scales = {
  xScale: (x: number) => x / 10,
  yScale: (z: number) => 4000 - z,
  invertX: (px: number) => px * 10,
  invertY: (px: number) => 4000 - px,
  width: 1200,
  height: 3000,
};

function renderLayer() {
  return render(
    <svg>
      <ProfileEditLayer {...scales} />
    </svg>,
  );
}

const bed = () => useScenarioStore.getState().scenario.bed;

describe('ProfileEditLayer: points by keyboard', () => {
  beforeEach(() => useEditorStore.getState().setMode('edit-points'));

  it('lists the bed points with their positions and units', () => {
    renderLayer();
    const points = screen.getAllByRole('button', { name: /^Bed point/ });
    expect(points).toHaveLength(13);
    expect(points[1].getAttribute('aria-label')).toBe('Bed point 2 of 13: 1.00 km, 3080 m a.s.l.');
  });

  it('moves the focused point with the arrow keys, Shift for larger steps, each as one undo step', () => {
    renderLayer();
    const point = screen.getByRole('button', { name: /^Bed point 2 of/ });
    act(() => point.focus());
    expect(useEditorStore.getState().selected).toBe(1);
    fireEvent.keyDown(point, { key: 'ArrowUp' });
    expect(bed()[1]).toEqual([1000, 3081]);
    fireEvent.keyDown(point, { key: 'ArrowRight', shiftKey: true });
    expect(bed()[1]).toEqual([1100, 3081]);
    expect(useScenarioStore.getState().past).toHaveLength(2);
    expect(useScenarioStore.getState().label).toBe('Move bed point 2');
  });

  it('keeps x between the neighbours', () => {
    renderLayer();
    const point = screen.getByRole('button', { name: /^Bed point 2 of/ });
    for (let i = 0; i < 20; i++) fireEvent.keyDown(point, { key: 'ArrowRight', shiftKey: true });
    // Next point at 2500 m; the point stops 1 m short of it.
    expect(bed()[1][0]).toBe(2499);
  });

  it('inserts a point after the focused one on the line, and deletes with Delete', () => {
    renderLayer();
    const point = screen.getByRole('button', { name: /^Bed point 1 of/ });
    fireEvent.keyDown(point, { key: '+' });
    expect(bed()).toHaveLength(14);
    expect(bed()[1]).toEqual([500, 3215]);
    expect(useEditorStore.getState().selected).toBe(1);
    fireEvent.keyDown(screen.getByRole('button', { name: /^Bed point 2 of 14/ }), { key: 'Delete' });
    expect(bed()).toHaveLength(13);
    expect(bed()[1]).toEqual([1000, 3080]);
  });

  it('refuses to delete below two bed points, saying why', () => {
    useScenarioStore.getState().apply({ ...useScenarioStore.getState().scenario, bed: [[0, 3000], [12000, 2000]] }, 'Two points');
    renderLayer();
    fireEvent.keyDown(screen.getByRole('button', { name: /^Bed point 1 of 2/ }), { key: 'Delete' });
    expect(bed()).toHaveLength(2);
    expect(useEditorStore.getState().notice).toMatch(/at least 2 points/);
  });

  it('refuses a move that makes the scenario invalid, with the validator message', () => {
    useScenarioStore.getState().apply({ ...useScenarioStore.getState().scenario, bed: [[0, 8995], [12000, 2000]] }, 'High head');
    renderLayer();
    fireEvent.keyDown(screen.getByRole('button', { name: /^Bed point 1 of 2/ }), { key: 'ArrowUp', shiftKey: true });
    expect(bed()[0]).toEqual([0, 8995]);
    expect(useEditorStore.getState().notice).toMatch(/\/bed\/0\/1: 9005 is not allowed/);
  });

  it('edits the selected point by typed values in the point editor', () => {
    render(<PointEditor />);
    act(() => useEditorStore.getState().select(3));
    const elevation = screen.getByLabelText('Elevation (m a.s.l.)') as HTMLInputElement;
    expect(elevation.value).toBe('2600');
    fireEvent.change(elevation, { target: { value: '2620' } });
    fireEvent.blur(elevation);
    expect(bed()[3]).toEqual([4000, 2620]);
    fireEvent.click(screen.getByRole('button', { name: 'Delete point' }));
    expect(bed()).toHaveLength(12);
  });
});

describe('ProfileEditLayer: mouse editing', () => {
  beforeEach(() => useEditorStore.getState().setMode('edit-points'));

  it('inserts a point on the line where it is double-clicked', () => {
    const { container } = renderLayer();
    fireEvent.doubleClick(container.querySelector('.edit-line-hit')!, { clientX: 175, clientY: 0 });
    // x = 1750 m, on the line between (1000, 3080) and (2500, 2800).
    expect(bed()[2]).toEqual([1750, 2940]);
    expect(useScenarioStore.getState().label).toBe('Insert bed point');
  });

  it('previews a drag without committing, commits once on release, and Escape abandons a drag', () => {
    renderLayer();
    const point = screen.getByRole('button', { name: /^Bed point 4 of/ });
    fireEvent.pointerDown(point, { button: 0, clientX: 400, clientY: 1400, pointerId: 1, isPrimary: true });
    fireEvent.pointerMove(point, { clientX: 420, clientY: 1450, pointerId: 1 });
    expect(useEditorStore.getState().dragPreview?.[3]).toEqual([4200, 2550]);
    expect(useScenarioStore.getState().past).toHaveLength(0);
    fireEvent.pointerUp(point, { clientX: 420, clientY: 1450, pointerId: 1 });
    expect(bed()[3]).toEqual([4200, 2550]);
    expect(useScenarioStore.getState().past).toHaveLength(1);

    fireEvent.pointerDown(point, { button: 0, clientX: 420, clientY: 1450, pointerId: 2, isPrimary: true });
    fireEvent.pointerMove(point, { clientX: 430, clientY: 1500, pointerId: 2 });
    fireEvent.keyDown(window, { key: 'Escape' });
    fireEvent.pointerUp(point, { clientX: 430, clientY: 1500, pointerId: 2 });
    expect(bed()[3]).toEqual([4200, 2550]);
    expect(useScenarioStore.getState().past).toHaveLength(1);
  });

  it('snaps a dragged point to 50 m × 10 m when snapping is on', () => {
    useEditorStore.getState().setSnap(true);
    renderLayer();
    const point = screen.getByRole('button', { name: /^Bed point 4 of/ });
    fireEvent.pointerDown(point, { button: 0, clientX: 400, clientY: 1400, pointerId: 1, isPrimary: true });
    fireEvent.pointerMove(point, { clientX: 412.3, clientY: 1433.7, pointerId: 1 });
    fireEvent.pointerUp(point, { clientX: 412.3, clientY: 1433.7, pointerId: 1 });
    expect(bed()[3]).toEqual([4100, 2570]);
  });
});

describe('ProfileEditLayer: drawing', () => {
  it('turns a dragged stroke into bed points replacing the part drawn over, committed once on release', () => {
    useEditorStore.getState().setMode('draw-bed');
    renderLayer();
    const capture = screen.getByTestId('draw-capture');
    // From x = 2 km to 6 km (200 to 600 px), a straight line from 2900 m to 2500 m (y = 1100 to 1500).
    fireEvent.pointerDown(capture, { button: 0, clientX: 200, clientY: 1100, pointerId: 1, isPrimary: true });
    for (let px = 210; px <= 600; px += 10) {
      fireEvent.pointerMove(capture, { clientX: px, clientY: 1100 + (px - 200), pointerId: 1 });
    }
    expect(useScenarioStore.getState().past).toHaveLength(0);
    expect(useEditorStore.getState().stroke?.length).toBe(41);
    fireEvent.pointerUp(capture, { clientX: 600, clientY: 1500, pointerId: 1 });
    const b = bed();
    expect(useScenarioStore.getState().label).toBe('Draw bed');
    expect(useScenarioStore.getState().past).toHaveLength(1);
    // Points before 2 km and after 6 km are kept; the stroke is simplified to its two ends.
    expect(b).toEqual([[0, 3350], [1000, 3080], [2000, 2900], [6000, 2500], [6600, 2470], [7400, 2440], [8000, 2400], [8200, 2300], [9500, 2170], [11000, 2020], [12000, 1950]]);
    expect(screen.getAllByRole('button', { name: /^Bed point/ })).toHaveLength(11);
  });

  it('follows only the finger that started the stroke: a second finger neither restarts nor bends it', () => {
    useEditorStore.getState().setMode('draw-bed');
    renderLayer();
    const capture = screen.getByTestId('draw-capture');
    fireEvent.pointerDown(capture, { button: 0, clientX: 200, clientY: 1100, pointerId: 7, isPrimary: true, pointerType: 'touch' });
    fireEvent.pointerMove(capture, { clientX: 400, clientY: 1300, pointerId: 7, pointerType: 'touch' });
    // A second finger lands and moves far off: not part of the stroke.
    fireEvent.pointerDown(capture, { button: 0, clientX: 900, clientY: 100, pointerId: 8, isPrimary: false, pointerType: 'touch' });
    fireEvent.pointerMove(capture, { clientX: 950, clientY: 150, pointerId: 8, pointerType: 'touch' });
    fireEvent.pointerUp(capture, { clientX: 950, clientY: 150, pointerId: 8, pointerType: 'touch' });
    expect(useEditorStore.getState().stroke).toHaveLength(2);
    expect(useScenarioStore.getState().past).toHaveLength(0);
    fireEvent.pointerMove(capture, { clientX: 600, clientY: 1500, pointerId: 7, pointerType: 'touch' });
    fireEvent.pointerUp(capture, { clientX: 600, clientY: 1500, pointerId: 7, pointerType: 'touch' });
    // The same bed as the mouse stroke above: 2 km at 2900 m to 6 km at 2500 m.
    expect(useScenarioStore.getState().label).toBe('Draw bed');
    expect(bed()).toEqual([[0, 3350], [1000, 3080], [2000, 2900], [6000, 2500], [6600, 2470], [7400, 2440], [8000, 2400], [8200, 2300], [9500, 2170], [11000, 2020], [12000, 1950]]);
  });

  it('ignores a click without a drag and says how to draw', () => {
    useEditorStore.getState().setMode('draw-surface');
    renderLayer();
    const capture = screen.getByTestId('draw-capture');
    fireEvent.pointerDown(capture, { button: 0, clientX: 200, clientY: 1100, pointerId: 1, isPrimary: true });
    fireEvent.pointerUp(capture, { clientX: 200, clientY: 1100, pointerId: 1 });
    expect(useScenarioStore.getState().past).toHaveLength(0);
    expect(useEditorStore.getState().notice).toMatch(/Nothing drawn/);
  });
});
