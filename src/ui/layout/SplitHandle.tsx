/**
 * The handle between the long profile and the supporting views: drag it (mouse, touch or pen) or
 * focus it and use the arrow keys, Page Up/Down, Home and End to give the views more or less of
 * the height. A window separator after the WAI-ARIA pattern
 * (https://www.w3.org/WAI/ARIA/apg/patterns/windowsplitter/); the share is kept in localStorage.
 */
import { useEffect, useRef, useState, type KeyboardEvent, type PointerEvent, type RefObject } from 'react';

/** Share of the workbench's height the supporting views take [%]: default, limits, key steps. */
export const VIEWS_SHARE = { initial: 28, min: 12, max: 70, step: 2, pageStep: 10 } as const;
const STORAGE_KEY = 'firnline.viewsShare';

const clampShare = (share: number) => Math.min(VIEWS_SHARE.max, Math.max(VIEWS_SHARE.min, Math.round(share)));

function storedShare(): number {
  try {
    const value = Number(globalThis.localStorage?.getItem(STORAGE_KEY));
    return value > 0 ? clampShare(value) : VIEWS_SHARE.initial;
  } catch {
    return VIEWS_SHARE.initial; // storage refused (private mode): the default
  }
}

/**
 * The share [%] and the handle. The share is written to the CSS variable --views-share on the
 * element `container` names, which the grid uses for the views' row.
 */
export function useViewsShare(container: RefObject<HTMLElement | null>) {
  const [share, setShare] = useState(storedShare);
  useEffect(() => {
    container.current?.style.setProperty('--views-share', `${share}%`);
    try {
      globalThis.localStorage?.setItem(STORAGE_KEY, String(share));
    } catch {
      // Not kept across reloads; the layout still works.
    }
  }, [share, container]);
  return [share, (next: number) => setShare(clampShare(next))] as const;
}

export function SplitHandle({ share, onShare, container, controls }: { share: number; onShare: (share: number) => void; container: RefObject<HTMLElement | null>; controls: string }) {
  const drag = useRef<{ top: number; height: number } | null>(null);

  function onPointerDown(event: PointerEvent<HTMLDivElement>) {
    const box = container.current?.getBoundingClientRect();
    if (!box) return;
    drag.current = { top: box.top, height: box.height };
    event.currentTarget.setPointerCapture(event.pointerId);
    event.preventDefault();
  }

  function onPointerMove(event: PointerEvent<HTMLDivElement>) {
    const d = drag.current;
    if (!d || d.height <= 0) return;
    onShare((100 * (d.top + d.height - event.clientY)) / d.height);
  }

  function onPointerUp(event: PointerEvent<HTMLDivElement>) {
    drag.current = null;
    if (event.currentTarget.hasPointerCapture(event.pointerId)) event.currentTarget.releasePointerCapture(event.pointerId);
  }

  function onKeyDown(event: KeyboardEvent<HTMLDivElement>) {
    const next =
      event.key === 'ArrowUp' ? share + VIEWS_SHARE.step
      : event.key === 'ArrowDown' ? share - VIEWS_SHARE.step
      : event.key === 'PageUp' ? share + VIEWS_SHARE.pageStep
      : event.key === 'PageDown' ? share - VIEWS_SHARE.pageStep
      : event.key === 'Home' ? VIEWS_SHARE.min
      : event.key === 'End' ? VIEWS_SHARE.max
      : null;
    if (next === null) return;
    event.preventDefault();
    onShare(next);
  }

  return (
    <div
      className="split-handle"
      role="separator"
      aria-orientation="horizontal"
      aria-label="Height of the results and tools"
      aria-controls={controls}
      aria-valuenow={share}
      aria-valuemin={VIEWS_SHARE.min}
      aria-valuemax={VIEWS_SHARE.max}
      aria-valuetext={`Results and tools take ${share} % of the height`}
      tabIndex={0}
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={onPointerUp}
      onPointerCancel={onPointerUp}
      onKeyDown={onKeyDown}
    />
  );
}
