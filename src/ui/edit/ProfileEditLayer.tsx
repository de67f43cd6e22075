/**
 * Editing overlay on the long profile. Drawn last, on top of the plot, inside the plot's SVG.
 *
 * Coordinates: xScale/yScale map metres to the coordinates of this <g>'s parent and invertX/
 * invertY map back; the plot area spans x from xScale(0) for `width` and y from `plotTop`
 * (default 0) for `height` in those coordinates. Drawing strokes are caught over that area.
 *
 * Draw modes: a freehand stroke (pointer down, drag, up; mouse, finger or pen alike, one pointer
 * at a time; the plot's <svg> has touch-action: none while editing) becomes a simplified point
 * list that replaces the part of the bed or ice surface under it, committed once when the pointer
 * is released. Edit-points mode: drag a point (x held between its neighbours), double-click the line
 * to insert a point, and with a point focused use the arrow keys (Shift for larger steps), Delete
 * and Insert (or +).
 */
import { useEffect, useRef, type KeyboardEvent, type MouseEvent, type PointerEvent } from 'react';
import type { Point } from '../../model/scenario';
import { useEditorStore } from '../../state/editorStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { DEFAULT_SNAP, snapPoint } from './geometry/snapPoint';
import { spliceProfile } from './geometry/spliceProfile';
import { strokeToProfile } from './geometry/strokeToProfile';
import {
  capitalised,
  commitTargetPoints,
  deletePoint,
  insertPointAt,
  keyboardStep,
  movedPoints,
  nudgePoint,
} from './pointEditActions';
import { profileTargetPoints, TARGET_NAMES } from './profileTargetPoints';

export interface ProfileEditLayerProps {
  xScale: (xMetres: number) => number;
  yScale: (elevationMetres: number) => number;
  invertX: (px: number) => number;
  invertY: (px: number) => number;
  width: number;
  height: number;
  /** Top edge of the plot area in the scales' coordinates (0 when the layer is translated to it). */
  plotTop?: number;
}

/** Pointer position in the parent's user coordinates (falls back to client coordinates in tests). */
function localPoint(event: PointerEvent<Element> | MouseEvent<Element>, element: SVGGraphicsElement | null): [number, number] {
  const ctm = element?.getScreenCTM?.();
  const svg = element?.ownerSVGElement;
  if (ctm && svg) {
    const p = svg.createSVGPoint();
    p.x = event.clientX;
    p.y = event.clientY;
    const local = p.matrixTransform(ctm.inverse());
    return [local.x, local.y];
  }
  return [event.clientX, event.clientY];
}

function formatPoint([x, z]: Point): string {
  return `${(x / 1000).toFixed(2)} km, ${Math.round(z)} m a.s.l.`;
}

export function ProfileEditLayer({ xScale, yScale, invertX, invertY, width, height, plotTop = 0 }: ProfileEditLayerProps) {
  const scenario = useScenarioStore((s) => s.scenario);
  const { mode, target, selected, stroke, dragPreview, snap, drawToleranceM } = useEditorStore();
  const editor = useEditorStore.getState;
  const groupRef = useRef<SVGGElement>(null);
  const dragging = useRef<{ index: number; pointerId: number } | null>(null);
  // The pointer drawing the stroke: a second finger or a hovering pen neither restarts nor extends it.
  const strokePointer = useRef<number | null>(null);

  const drawing = mode === 'draw-bed' || mode === 'draw-surface';
  const gestureActive = stroke !== null || dragPreview !== null;

  // Escape abandons a stroke or drag in progress; nothing is committed.
  useEffect(() => {
    if (!gestureActive) return undefined;
    const onKey = (event: globalThis.KeyboardEvent) => {
      if (event.key !== 'Escape') return;
      dragging.current = null;
      strokePointer.current = null;
      useEditorStore.getState().setStroke(null);
      useEditorStore.getState().setDragPreview(null);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [gestureActive]);
  const points = dragPreview ?? profileTargetPoints(scenario, target);
  const showPoints = mode !== 'view';
  const toMetres = (px: [number, number]): Point => {
    const m: Point = [invertX(px[0]), invertY(px[1])];
    return snap ? snapPoint(m, DEFAULT_SNAP) : m;
  };
  const path = (list: readonly Point[]) => list.map(([x, z], i) => `${i ? 'L' : 'M'}${xScale(x)},${yScale(z)}`).join('');
  const pointsPath = showPoints ? path(points) : '';
  const left = xScale(0);

  // Mouse, finger and pen alike (pointer events; button 0 is a mouse's left button, a touch, or
  // a pen's tip). Capture keeps the stroke's moves coming when it leaves the plot.
  function startStroke(event: PointerEvent<SVGRectElement>) {
    if (event.button !== 0 || !event.isPrimary) return;
    event.currentTarget.setPointerCapture?.(event.pointerId);
    strokePointer.current = event.pointerId;
    editor().setNotice(null);
    editor().setStroke([toMetres(localPoint(event, groupRef.current))]);
  }
  function extendStroke(event: PointerEvent<SVGRectElement>) {
    const current = editor().stroke;
    if (!current || event.pointerId !== strokePointer.current) return;
    editor().setStroke([...current, toMetres(localPoint(event, groupRef.current))]);
  }
  function endStroke(event: PointerEvent<SVGRectElement>) {
    if (event.pointerId !== strokePointer.current) return;
    strokePointer.current = null;
    const current = editor().stroke;
    editor().setStroke(null);
    if (!current) return;
    const drawTarget = mode === 'draw-bed' ? 'bed' : 'surface';
    const piece = strokeToProfile(current, scenario.grid.length, drawToleranceM);
    if (piece.length < 2) {
      editor().setNotice('Nothing drawn: drag down-valley (left to right) across the profile to draw a line of at least two points.');
      return;
    }
    const base = profileTargetPoints(scenario, drawTarget);
    if (commitTargetPoints(drawTarget, spliceProfile(base, piece), `Draw ${TARGET_NAMES[drawTarget]}`)) editor().select(null);
  }

  function startDrag(event: PointerEvent<SVGCircleElement>, index: number) {
    if (event.button !== 0 || !event.isPrimary) return;
    event.stopPropagation();
    event.currentTarget.setPointerCapture?.(event.pointerId);
    dragging.current = { index, pointerId: event.pointerId };
    editor().select(index);
    editor().setNotice(null);
  }
  function moveDrag(event: PointerEvent<SVGCircleElement>) {
    const drag = dragging.current;
    if (!drag || event.pointerId !== drag.pointerId) return;
    const [x, z] = localPoint(event, groupRef.current);
    editor().setDragPreview(movedPoints(target, drag.index, [invertX(x), invertY(z)]));
  }
  function endDrag(event: PointerEvent<SVGCircleElement>) {
    const drag = dragging.current;
    if (drag && event.pointerId !== drag.pointerId) return;
    dragging.current = null;
    const preview = editor().dragPreview;
    editor().setDragPreview(null);
    if (drag && preview) commitTargetPoints(target, preview, `Move ${TARGET_NAMES[target]} point ${drag.index + 1}`);
  }

  function onPointKey(event: KeyboardEvent<SVGCircleElement>, index: number) {
    const step = keyboardStep(event.shiftKey);
    const moves: Record<string, [number, number]> = {
      ArrowLeft: [-step.dx, 0],
      ArrowRight: [step.dx, 0],
      ArrowUp: [0, step.dz],
      ArrowDown: [0, -step.dz],
    };
    if (moves[event.key]) {
      event.preventDefault();
      nudgePoint(target, index, ...moves[event.key]);
    } else if (event.key === 'Delete' || event.key === 'Backspace') {
      event.preventDefault();
      deletePoint(target, index);
    } else if (event.key === 'Insert' || event.key === '+') {
      event.preventDefault();
      insertPointAt(target, { after: index });
    } else if (event.key === 'Escape') {
      dragging.current = null;
      editor().setDragPreview(null);
    }
  }

  function onLineDoubleClick(event: MouseEvent<SVGPathElement>) {
    const [x] = localPoint(event, groupRef.current);
    insertPointAt(target, invertX(x));
  }

  return (
    // A named group (axe: aria-label is not allowed on a <g> without a role).
    <g ref={groupRef} className="profile-edit-layer" data-mode={mode} role="group" aria-label={`Profile editing, ${modeName(mode)}`}>
      {drawing && (
        <rect
          className="draw-capture"
          data-testid="draw-capture"
          x={left}
          y={plotTop}
          width={width}
          height={height}
          fill="transparent"
          onPointerDown={startStroke}
          onPointerMove={extendStroke}
          onPointerUp={endStroke}
          onPointerCancel={(event) => {
            if (event.pointerId !== strokePointer.current) return;
            strokePointer.current = null;
            editor().setStroke(null);
          }}
        />
      )}
      {stroke && stroke.length > 1 && <path className="draw-stroke" d={path(stroke)} pointerEvents="none" />}
      {showPoints && (
        <>
          <path className={`edit-line edit-line-${target}`} d={pointsPath} pointerEvents="none" />
          {mode === 'edit-points' && (
            <path className="edit-line-hit" d={pointsPath} onDoubleClick={onLineDoubleClick}>
              <title>Double-click to insert a point</title>
            </path>
          )}
          <g role="group" aria-label={`${capitalised(TARGET_NAMES[target])} points`}>
            {points.map((p, i) => (
              <circle
                key={i}
                className={`edit-point${selected === i ? ' selected' : ''}`}
                cx={xScale(p[0])}
                cy={yScale(p[1])}
                r={selected === i ? 8 : 6}
                tabIndex={mode === 'edit-points' ? 0 : -1}
                // While drawing, the points only show the result; a stroke may start on them.
                pointerEvents={drawing ? 'none' : undefined}
                role="button"
                aria-pressed={selected === i}
                aria-label={`${capitalised(TARGET_NAMES[target])} point ${i + 1} of ${points.length}: ${formatPoint(p)}`}
                onFocus={() => editor().select(i)}
                onPointerDown={mode === 'edit-points' ? (e) => startDrag(e, i) : undefined}
                onPointerMove={moveDrag}
                onPointerUp={endDrag}
                onPointerCancel={(event) => {
                  if (dragging.current && event.pointerId !== dragging.current.pointerId) return;
                  dragging.current = null;
                  editor().setDragPreview(null);
                }}
                onKeyDown={mode === 'edit-points' ? (e) => onPointKey(e, i) : undefined}
              />
            ))}
          </g>
        </>
      )}
    </g>
  );
}

function modeName(mode: string): string {
  switch (mode) {
    case 'draw-bed':
      return 'drawing the bed';
    case 'draw-surface':
      return 'drawing the ice surface';
    case 'edit-points':
      return 'editing points';
    default:
      return 'viewing';
  }
}
