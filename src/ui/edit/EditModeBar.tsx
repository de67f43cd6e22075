/** What a pointer on the long profile does: view, draw the bed, draw the surface, edit points; snapping and stroke tolerance. */
import { useShallow } from 'zustand/react/shallow';
import { useEditorStore, type EditMode, type ProfileTarget } from '../../state/editorStore';
import { DEFAULT_SNAP } from './geometry/snapPoint';

const MODES: { value: EditMode; label: string }[] = [
  { value: 'view', label: 'View' },
  { value: 'draw-bed', label: 'Draw bed' },
  { value: 'draw-surface', label: 'Draw ice surface' },
  { value: 'edit-points', label: 'Edit points' },
];

const TOLERANCES = [1, 2, 5, 10, 20];

export function EditModeBar() {
  // Only what the bar shows: the stroke and drag preview change with every pointer move.
  const { mode, target, snap, drawToleranceM, notice } = useEditorStore(
    useShallow((s) => ({ mode: s.mode, target: s.target, snap: s.snap, drawToleranceM: s.drawToleranceM, notice: s.notice })),
  );
  const { setMode, setTarget, setSnap, setDrawTolerance } = useEditorStore.getState();
  return (
    <div className="edit-mode-bar">
      <div role="radiogroup" aria-label="Profile edit mode" className="segmented">
        {MODES.map((m) => (
          <label key={m.value} className={mode === m.value ? 'active' : undefined}>
            <input type="radio" name="profile-edit-mode" value={m.value} checked={mode === m.value} onChange={() => setMode(m.value)} />
            {m.label}
          </label>
        ))}
      </div>
      {mode === 'edit-points' && (
        <label>
          Points of{' '}
          <select value={target} onChange={(e) => setTarget(e.target.value as ProfileTarget)}>
            <option value="bed">the bed</option>
            <option value="surface">the ice surface</option>
          </select>
        </label>
      )}
      <label>
        <input type="checkbox" checked={snap} onChange={(e) => setSnap(e.target.checked)} /> Snap to {DEFAULT_SNAP.dx} m × {DEFAULT_SNAP.dz} m
      </label>
      {(mode === 'draw-bed' || mode === 'draw-surface') && (
        <label>
          Simplify strokes to{' '}
          <select value={drawToleranceM} onChange={(e) => setDrawTolerance(Number(e.target.value))}>
            {TOLERANCES.map((t) => (
              <option key={t} value={t}>
                {t} m
              </option>
            ))}
          </select>{' '}
          of elevation
        </label>
      )}
      {mode !== 'view' && <p className="edit-hint">{hint(mode)}</p>}
      {notice && (
        <p className="field-error" role="alert">
          {notice}
        </p>
      )}
    </div>
  );
}

function hint(mode: EditMode): string {
  switch (mode) {
    case 'draw-bed':
      return 'Drag across the profile from left (head) to right to draw the bed; the part you draw over is replaced.';
    case 'draw-surface':
      return 'Drag across the profile to draw the initial ice surface; where it is below the bed there is no ice.';
    case 'edit-points':
      return 'Drag a point, or Tab to it and use the arrow keys (Shift: ×10), Delete, and Insert or + to add a point after it. Double-click the line to add a point there.';
    default:
      return '';
  }
}
