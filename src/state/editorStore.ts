/**
 * Editor state that is not part of the document: the edit mode, the selected point, snapping,
 * and the live preview of a gesture in progress (a stroke being drawn, a point being dragged).
 * The document itself changes only through scenarioStore.apply, once per finished gesture.
 */
import { create } from 'zustand';
import type { Point } from '../model/scenario';

export type EditMode = 'view' | 'draw-bed' | 'draw-surface' | 'edit-points';
/** The point lists edited on the long profile. */
export type ProfileTarget = 'bed' | 'surface';

/** Default simplification tolerance for drawn strokes [m of elevation]. */
export const DEFAULT_DRAW_TOLERANCE_M = 5;

export interface EditorState {
  mode: EditMode;
  /** Which list "edit points" works on. */
  target: ProfileTarget;
  /** Index of the selected point in the target list, or null. */
  selected: number | null;
  snap: boolean;
  /** Ramer–Douglas–Peucker tolerance for drawn strokes [m of elevation]. */
  drawToleranceM: number;
  /** Freehand stroke in progress [x m, z m], or null. */
  stroke: Point[] | null;
  /** The target list as it would be after the drag in progress, or null. */
  dragPreview: Point[] | null;
  /** Last reason an edit on the profile was refused, shown beside the profile; null when fine. */
  notice: string | null;
  setMode: (mode: EditMode) => void;
  setTarget: (target: ProfileTarget) => void;
  select: (index: number | null) => void;
  setSnap: (snap: boolean) => void;
  setDrawTolerance: (metres: number) => void;
  setStroke: (stroke: Point[] | null) => void;
  setDragPreview: (points: Point[] | null) => void;
  setNotice: (notice: string | null) => void;
}

/** The editor as the page opens (also what component tests reset to). */
export const EDITOR_INITIAL_STATE = {
  mode: 'view',
  target: 'bed',
  selected: null,
  snap: false,
  drawToleranceM: DEFAULT_DRAW_TOLERANCE_M,
  stroke: null,
  dragPreview: null,
  notice: null,
} satisfies Partial<EditorState>;

export const useEditorStore = create<EditorState>()((set) => ({
  ...EDITOR_INITIAL_STATE,
  setMode: (mode) =>
    set((s) => ({
      mode,
      // Drawing the surface leads on to editing the surface's points, and likewise for the bed.
      target: mode === 'draw-bed' ? 'bed' : mode === 'draw-surface' ? 'surface' : s.target,
      stroke: null,
      dragPreview: null,
      notice: null,
    })),
  setTarget: (target) => set({ target, selected: null, dragPreview: null }),
  select: (selected) => set({ selected }),
  setSnap: (snap) => set({ snap }),
  setDrawTolerance: (drawToleranceM) => set({ drawToleranceM }),
  setStroke: (stroke) => set({ stroke }),
  setDragPreview: (dragPreview) => set({ dragPreview }),
  setNotice: (notice) => set({ notice }),
}));
