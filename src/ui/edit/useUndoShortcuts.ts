/**
 * Ctrl/Cmd+Z undoes, Ctrl/Cmd+Shift+Z and Ctrl+Y redo, anywhere in the page except while typing
 * in a text field (where the browser's own text undo belongs).
 */
import { useEffect } from 'react';
import { useScenarioStore } from '../../state/scenarioStore';
import { useViewStore } from '../../state/viewStore';

function isTyping(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable) return true;
  if (target instanceof HTMLTextAreaElement || target instanceof HTMLSelectElement) return true;
  if (target instanceof HTMLInputElement) return !['checkbox', 'radio', 'button', 'submit', 'reset', 'range', 'file'].includes(target.type);
  return false;
}

function undoShortcut(event: KeyboardEvent): 'undo' | 'redo' | null {
  if (!(event.ctrlKey || event.metaKey) || event.altKey || isTyping(event.target)) return null;
  const key = event.key.toLowerCase();
  if (key === 'z') return event.shiftKey ? 'redo' : 'undo';
  if (key === 'y' && !event.shiftKey) return 'redo';
  return null;
}

export function useUndoShortcuts(): void {
  useEffect(() => {
    function onKeyDown(event: KeyboardEvent) {
      const action = undoShortcut(event);
      // The workbench's history: while the experiments view is shown it is out of sight, so the keys leave it alone.
      if (!action || useViewStore.getState().view !== 'workbench') return;
      event.preventDefault();
      useScenarioStore.getState()[action]();
    }
    window.addEventListener('keydown', onKeyDown);
    return () => window.removeEventListener('keydown', onKeyDown);
  }, []);
}
