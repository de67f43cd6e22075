/**
 * The tools that act on the long profile itself (undo/redo, the edit mode, the selected point),
 * kept directly under it so that drawing and its controls stay in view together.
 */
import { useEditorStore } from '../../state/editorStore';
import { EditModeBar } from './EditModeBar';
import { PointEditor } from './PointEditor';
import { UndoRedoBar } from './UndoRedoBar';

export function ProfileEditToolbar() {
  const mode = useEditorStore((s) => s.mode);
  return (
    <section className="profile-edit-toolbar" aria-label="Profile editing">
      <UndoRedoBar />
      <EditModeBar />
      {mode === 'edit-points' && <PointEditor />}
    </section>
  );
}
