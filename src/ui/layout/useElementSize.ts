/**
 * The content-box size of an element in CSS pixels, kept up to date by a ResizeObserver, or
 * undefined until measured (and where the browser has no ResizeObserver, as in jsdom). Plots
 * draw at this size so that their text keeps its nominal size at any window size.
 */
import { useEffect, useState, type RefObject } from 'react';

export interface ElementSize {
  width: number;
  height: number;
}

export function useElementSize(ref: RefObject<HTMLElement | null>): ElementSize | undefined {
  const [size, setSize] = useState<ElementSize>();
  useEffect(() => {
    const element = ref.current;
    if (!element || typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(([entry]) => {
      const box = entry.contentRect;
      // Whole pixels: sub-pixel changes would redraw the plot for nothing.
      const next = { width: Math.round(box.width), height: Math.round(box.height) };
      setSize((previous) => (previous && previous.width === next.width && previous.height === next.height ? previous : next));
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, [ref]);
  return size;
}
