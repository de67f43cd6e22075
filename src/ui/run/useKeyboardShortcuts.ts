/**
 * Workbench keys that do not steal typing: Space plays or pauses, the left and right arrows step
 * one output, Home and End jump to the first and last. Ignored while focus is in a field, on a
 * button (where Space presses it) or on the editor's own widgets, and after another handler
 * has taken the key (defaultPrevented).
 */
import { useEffect } from 'react';
import { usePlaybackStore } from '../../state/playbackStore';
import { useRunStore } from '../../state/runStore';
import { useViewStore } from '../../state/viewStore';

function typingTarget(target: EventTarget | null): boolean {
  if (!(target instanceof Element)) return false;
  // Anything Space or the arrows already operate: fields, buttons (native or by role), tabs,
  // disclosure summaries, the editor's focusable points.
  const own =
    'textarea, select, button, summary, a[href], [contenteditable=""], [contenteditable="true"], ' +
    '[role="button"], [role="tab"], [role="slider"], [role="menuitem"], [role="application"]';
  if (target.closest(own)) return true;
  return target instanceof HTMLInputElement && target.type !== 'range';
}

export function useKeyboardShortcuts(): void {
  useEffect(() => {
    const onKey = (event: KeyboardEvent) => {
      if (event.defaultPrevented || event.altKey || event.ctrlKey || event.metaKey) return;
      if (typingTarget(event.target)) return;
      // Playback belongs to the workbench; the experiments view has none.
      if (useViewStore.getState().view !== 'workbench') return;
      const playback = usePlaybackStore.getState();
      const last = useRunStore.getState().frames.length - 1;
      if (last < 0) return;
      const onSlider = event.target instanceof HTMLInputElement && event.target.type === 'range';
      if (event.key === ' ') playback.toggle();
      else if (onSlider) return; // the slider handles its own arrows, Home and End
      else if (event.key === 'ArrowLeft') playback.stepBy(-1);
      else if (event.key === 'ArrowRight') playback.stepBy(1);
      else if (event.key === 'Home') playback.stepBy(-last);
      else if (event.key === 'End') playback.stepBy(last);
      else return;
      event.preventDefault();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
}
