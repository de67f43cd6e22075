/**
 * The tools that act on the long profile itself (the edit mode, the selected point), kept
 * directly under it so that drawing and its controls stay in view together. Undo and redo act on
 * every edit, so they sit with the run controls (UndoRedoBar).
 */
import { useEditorStore } from '../../state/editorStore';
import { EditModeBar } from './EditModeBar';
import { PointEditor } from './PointEditor';

export function ProfileEditToolbar() {
  const mode = useEditorStore((s) => s.mode);
  return (
    <section className="profile-edit-toolbar" aria-label="Profile editing">
      <EditModeBar />
      {mode === 'edit-points' && <PointEditor />}
    </section>
  );
}
