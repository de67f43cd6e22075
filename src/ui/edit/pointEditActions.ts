/**
 * Point edits on the long profile shared by the mouse, the keyboard and the point-editor panel:
 * each builds the complete next scenario and commits it as one undoable edit, or reports why not.
 */
import type { Point } from '../../model/scenario';
import { useEditorStore, type ProfileTarget } from '../../state/editorStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit, refusalAt } from './commitEdit';
import { insertPoint, midpointAfter } from './geometry/insertPoint';
import { movePoint } from './geometry/movePoint';
import { DEFAULT_SNAP, snapPoint } from './geometry/snapPoint';
import { MIN_POINTS, profileTargetPoints, TARGET_NAMES, withProfileTarget } from './profileTargetPoints';

function capitalised(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** Commits a new point list for the target; on refusal shows the reason and returns false. */
export function commitTargetPoints(target: ProfileTarget, points: Point[], label: string): boolean {
  const scenario = useScenarioStore.getState().scenario;
  const result = commitEdit(withProfileTarget(scenario, target, points), label);
  const refusal = refusalAt(result);
  useEditorStore.getState().setNotice(refusal === null ? null : `Not applied: ${refusal}`);
  return result.ok;
}

/** The list after moving point `index` to `target` (snapped when snapping is on), not committed. */
export function movedPoints(target: ProfileTarget, index: number, to: Point): Point[] {
  const { scenario } = useScenarioStore.getState();
  const { snap } = useEditorStore.getState();
  const points = profileTargetPoints(scenario, target);
  const wanted = snap ? snapPoint(to, DEFAULT_SNAP) : to;
  return movePoint(points, index, wanted, { lower: 0, upper: scenario.grid.length });
}

/** Keyboard step: 10 m along / 1 m up, ten times that with Shift; the snap grid when snapping. */
export function keyboardStep(shift: boolean): { dx: number; dz: number } {
  if (useEditorStore.getState().snap) {
    const k = shift ? 10 : 1;
    return { dx: DEFAULT_SNAP.dx * k, dz: DEFAULT_SNAP.dz * k };
  }
  return shift ? { dx: 100, dz: 10 } : { dx: 10, dz: 1 };
}

export function nudgePoint(target: ProfileTarget, index: number, dx: number, dz: number): boolean {
  const points = profileTargetPoints(useScenarioStore.getState().scenario, target);
  const p = points[index];
  if (!p) return false;
  return commitTargetPoints(target, movedPoints(target, index, [p[0] + dx, p[1] + dz]), `Move ${TARGET_NAMES[target]} point ${index + 1}`);
}

export function setPoint(target: ProfileTarget, index: number, to: Point): boolean {
  return commitTargetPoints(target, movedPoints(target, index, to), `Move ${TARGET_NAMES[target]} point ${index + 1}`);
}

export function deletePoint(target: ProfileTarget, index: number): boolean {
  const points = profileTargetPoints(useScenarioStore.getState().scenario, target);
  if (points.length <= MIN_POINTS[target]) {
    useEditorStore
      .getState()
      .setNotice(`The ${TARGET_NAMES[target]} needs at least ${MIN_POINTS[target]} point${MIN_POINTS[target] === 1 ? '' : 's'}; point ${index + 1} was not deleted.`);
    return false;
  }
  const next = points.filter((_, i) => i !== index).map((p) => [p[0], p[1]] as Point);
  const ok = commitTargetPoints(target, next, `Delete ${TARGET_NAMES[target]} point ${index + 1}`);
  if (ok) useEditorStore.getState().select(Math.min(index, next.length - 1));
  return ok;
}

/** Inserts a point at x (on the line), or halfway after point `after` when x is not given. */
export function insertPointAt(target: ProfileTarget, x: number | { after: number }): boolean {
  const points = profileTargetPoints(useScenarioStore.getState().scenario, target);
  const at = typeof x === 'number' ? x : midpointAfter(points, x.after);
  const inserted = insertPoint(points, at);
  if (!inserted) {
    useEditorStore.getState().setNotice(`A ${TARGET_NAMES[target]} point already lies within 1 m of ${(at / 1000).toFixed(3)} km.`);
    return false;
  }
  const ok = commitTargetPoints(target, inserted.points, `Insert ${TARGET_NAMES[target]} point`);
  if (ok) useEditorStore.getState().select(inserted.index);
  return ok;
}

export { capitalised };
