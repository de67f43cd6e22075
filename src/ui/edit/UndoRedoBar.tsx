/** Undo and redo buttons that say what they will undo or redo, with the keyboard shortcuts installed. */
import { useScenarioStore } from '../../state/scenarioStore';
import { useUndoShortcuts } from './useUndoShortcuts';

export function UndoRedoBar() {
  useUndoShortcuts();
  const label = useScenarioStore((s) => s.label);
  const canUndo = useScenarioStore((s) => s.past.length > 0);
  const redoLabel = useScenarioStore((s) => s.future[0]?.label ?? null);
  const { undo, redo } = useScenarioStore.getState();
  return (
    <div className="undo-bar" role="group" aria-label="Undo and redo">
      <button type="button" onClick={undo} disabled={!canUndo} title="Ctrl+Z">
        {canUndo ? `Undo: ${label}` : 'Undo'}
      </button>
      <button type="button" onClick={redo} disabled={redoLabel === null} title="Ctrl+Shift+Z or Ctrl+Y">
        {redoLabel !== null ? `Redo: ${redoLabel}` : 'Redo'}
      </button>
    </div>
  );
}
